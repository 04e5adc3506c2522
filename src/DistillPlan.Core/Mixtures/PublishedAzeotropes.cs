namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Applies published azeotrope and zeotrope facts to a model's azeotrope search: where the model
/// contradicts the published fact (finds an azeotrope of a zeotropic pair, none where one is
/// published, or one more than <see cref="TemperatureToleranceK"/> or
/// <see cref="MoleFractionTolerance"/> away), the result uses and cites the published value and
/// says what the model predicted.
/// </summary>
internal static class PublishedAzeotropes
{
    /// <summary>A model azeotrope within this of the published temperature [K] agrees with it.</summary>
    public const double TemperatureToleranceK = 2.0;

    /// <summary>… and within this of the published mole fraction [-].</summary>
    public const double MoleFractionTolerance = 0.05;

    public static AzeotropeSearchResult Apply(AzeotropeSearchResult result, PhaseEquilibrium equilibrium)
    {
        var a = equilibrium.Components[0];
        var b = equilibrium.Components[1];
        var fact = equilibrium.Facts.AzeotropeOf(a, b, result.PressurePa);
        string model = result.Model;
        if (fact is null)
        {
            var elsewhere = equilibrium.Facts.AnyAzeotropeOf(a, b);
            return elsewhere is null ? result : result with
            {
                Note = $"published data are for other pressures ({elsewhere.Describe()}); the {model} answer is shown",
            };
        }

        if (fact.IsZeotropic)
        {
            if (!result.Found) return result with { PublishedFact = fact };
            return result with
            {
                Azeotropes = [],
                PublishedFact = fact,
                UsesPublishedValue = true,
                Note = $"the {model} model predicts {Describe(result.ModelAzeotropes, a.Name)}, but published data say {fact.Describe()}; " +
                       "the published fact is used (the model disagrees)",
            };
        }

        bool firstIsA = fact.FirstCas == a.Cas;
        var first = firstIsA ? a : b;
        var second = firstIsA ? b : a;
        double w = fact.MassFractionFirst!.Value;
        double molesFirst = w / first.MolarMassGPerMol, molesSecond = (1 - w) / second.MolarMassGPerMol;
        double xFirst = molesFirst / (molesFirst + molesSecond);
        double tPublished = fact.TemperatureK!.Value;
        bool minimum = fact.Kind is AzeotropeKind.MinimumBoiling or AzeotropeKind.Heterogeneous;

        var match = result.ModelAzeotropes.FirstOrDefault(z =>
            (z.Kind == AzeotropeKind.MaximumBoiling) != minimum
            && Math.Abs(z.TemperatureK - tPublished) <= TemperatureToleranceK
            && Math.Abs(z.MoleFractions[first.Name] - xFirst) <= MoleFractionTolerance);
        if (match is not null) return result with { PublishedFact = fact };

        var published = new Azeotrope(tPublished, OneAtmospherePa, new Dictionary<string, double>
        {
            [a.Name] = firstIsA ? xFirst : 1 - xFirst,
            [b.Name] = firstIsA ? 1 - xFirst : xFirst,
        }, fact.Kind!.Value) { Source = fact.Source };
        string predicted = result.ModelAzeotropes.Count == 0 ? "no azeotrope" : Describe(result.ModelAzeotropes, a.Name);
        return result with
        {
            Azeotropes = [published],
            PublishedFact = fact,
            UsesPublishedValue = true,
            Note = $"the {model} model predicts {predicted}; published: {fact.Describe()}. The published azeotrope is used " +
                   "(the model disagrees; the published temperature is at 1 atm)",
        };
    }

    private const double OneAtmospherePa = 101325.0;

    private static string Describe(IReadOnlyList<Azeotrope> azeotropes, string first)
        => string.Join(" and ", azeotropes.Select(z =>
            $"a {Word(z.Kind)} azeotrope at {z.TemperatureK - 273.15:0.0} °C, x({first}) = {z.MoleFractions[first]:0.000}"));

    internal static string Word(AzeotropeKind kind) => kind switch
    {
        AzeotropeKind.MinimumBoiling => "minimum-boiling",
        AzeotropeKind.MaximumBoiling => "maximum-boiling",
        _ => "heterogeneous",
    };
}
