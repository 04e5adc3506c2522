using MathNet.Numerics.RootFinding;

namespace DistillPlan.Core.Mixtures;

/// <summary>Whether an azeotrope boils below or above both pure components, or is heterogeneous.</summary>
public enum AzeotropeKind
{
    /// <summary>Minimum-boiling (positive deviation from Raoult's law, γ &gt; 1): the
    /// azeotrope distils first and the heavier excess stays behind.</summary>
    MinimumBoiling,

    /// <summary>Maximum-boiling (negative deviation, γ &lt; 1): the azeotrope stays in the
    /// flask and the excess component distils first.</summary>
    MaximumBoiling,

    /// <summary>Heterogeneous (a heteroazeotrope): the liquid splits into two layers and the
    /// vapour composition lies between them. While both layers are present the pot boils at this
    /// temperature, below either pure component, and the vapour keeps this composition; the
    /// condensate separates into two layers, which is how azeotropic drying works.</summary>
    Heterogeneous,
}

/// <summary>A binary azeotrope at a given pressure: the liquid composition where y = x.</summary>
/// <param name="TemperatureK">Boiling temperature of the azeotrope [K].</param>
/// <param name="PressurePa">Pressure [Pa].</param>
/// <param name="MoleFractions">Composition [mol/mol] by component name (liquid = vapour).</param>
/// <param name="Kind">Minimum- or maximum-boiling.</param>
public sealed record Azeotrope(
    double TemperatureK,
    double PressurePa,
    IReadOnlyDictionary<string, double> MoleFractions,
    AzeotropeKind Kind)
{
    /// <summary>For a heteroazeotrope, the two liquid layers in equilibrium with the vapour
    /// (each composition and its share at the overall composition <see cref="MoleFractions"/>);
    /// empty otherwise.</summary>
    public IReadOnlyList<LiquidPhase> LiquidPhases { get; init; } = [];

    /// <summary>Citation when this azeotrope is a published value rather than the model's, or null.</summary>
    public string? Source { get; init; }
}

/// <summary>Outcome of an azeotrope search for one pair at one pressure.</summary>
/// <param name="PressurePa">Pressure searched [Pa].</param>
/// <param name="Azeotropes">Azeotropes found, by rising mole fraction of the first component;
/// empty for a zeotropic pair.</param>
/// <param name="PureBoilingPointsK">Boiling temperature of each pure component at the pressure [K].</param>
/// <param name="Model">Activity model used.</param>
/// <param name="FallbackReason">Why a less preferred model replaced the requested one, or null.
/// (An ideal solution never has an azeotrope, so falling back to it makes a negative answer
/// uninformative.)</param>
public sealed record AzeotropeSearchResult(
    double PressurePa,
    IReadOnlyList<Azeotrope> Azeotropes,
    IReadOnlyDictionary<string, double> PureBoilingPointsK,
    string Model,
    string? FallbackReason)
{
    /// <summary>True when at least one azeotrope was found (or is published).</summary>
    public bool Found => Azeotropes.Count > 0;

    /// <summary>What the model itself found (the same as <see cref="Azeotropes"/> unless a published
    /// fact overruled it).</summary>
    public IReadOnlyList<Azeotrope> ModelAzeotropes { get; init; } = [];

    /// <summary>The published azeotrope or zeotrope fact that applies to the pair at this pressure, or null.</summary>
    public PublishedAzeotropeFact? PublishedFact { get; init; }

    /// <summary>True when <see cref="Azeotropes"/> are the published facts because the model contradicts them.</summary>
    public bool UsesPublishedValue { get; init; }

    /// <summary>One sentence when the model disagrees with a published fact (the answer then uses
    /// and cites the fact), or when a published fact exists only at another pressure; null otherwise.</summary>
    public string? Note { get; init; }

    /// <summary>Non-null when the answer is approximate (a carboxylic acid: vapour association not modelled).</summary>
    public string? ApproximationNote { get; init; }
}

/// <summary>
/// Finds binary azeotropes at a given pressure: scans the liquid mole fraction x1 over (0, 1)
/// for sign changes of y1 − x1 at the bubble temperature and refines each with Brent's method.
/// </summary>
/// <remarks>
/// The kind follows from the direction of the sign change (Gibbs–Konovalov: at constant P the
/// bubble temperature falls while y1 &gt; x1): y1 − x1 going from + to − with rising x1 is a
/// temperature minimum, − to + a maximum; where the liquid at y = x has split into two layers
/// (the bubble points honour the split), it is a heteroazeotrope. A published azeotrope or
/// zeotrope of the pair (<see cref="PublishedMixtureFacts"/>) overrules a model that contradicts
/// it, and the result says so. A scan cannot see an azeotrope closer to a pure end
/// than the first grid point (1/<c>gridIntervals</c>), nor two sign changes within one interval.
/// </remarks>
public static class AzeotropeSearch
{
    /// <summary>Searches the pair (<paramref name="first"/>, <paramref name="second"/>) at
    /// pressure P with the requested model (UNIFAC by default, ideal with a reason if a
    /// parameter is missing).</summary>
    /// <param name="first">First component (x1 is its mole fraction).</param>
    /// <param name="second">Second component.</param>
    /// <param name="pressurePa">Pressure [Pa]; 1 atm by default.</param>
    /// <param name="requested">Activity model asked for.</param>
    /// <param name="gridIntervals">Number of intervals of the x1 scan.</param>
    /// <param name="tolerance">Tolerance on x1 of the refinement [-].</param>
    public static AzeotropeSearchResult Find(MixtureComponent first, MixtureComponent second,
        double pressurePa = 101325.0, ActivityModelKind requested = ActivityModelKind.Dortmund,
        int gridIntervals = 400, double tolerance = 1e-10)
        => Find(PhaseEquilibrium.Create([first, second], requested), pressurePa, gridIntervals, tolerance);

    /// <summary>Searches a two-component <see cref="PhaseEquilibrium"/> at pressure P.</summary>
    /// <param name="equilibrium">Equilibrium of exactly two volatile components.</param>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <param name="gridIntervals">Number of intervals of the x1 scan, ≥ 4.</param>
    /// <param name="tolerance">Tolerance on x1 of the refinement [-].</param>
    /// <exception cref="EquilibriumConvergenceException">A bubble point could not be found.</exception>
    public static AzeotropeSearchResult Find(PhaseEquilibrium equilibrium, double pressurePa,
        int gridIntervals = 400, double tolerance = 1e-10)
    {
        ArgumentNullException.ThrowIfNull(equilibrium);
        ArgumentOutOfRangeException.ThrowIfLessThan(gridIntervals, 4);
        var components = equilibrium.Components;
        if (components.Count != 2 || components.Any(c => c.IsNonVolatile))
            throw new ArgumentException("an azeotrope search needs exactly two volatile components", nameof(equilibrium));

        double guessK = equilibrium.PureBoilingTemperatureK(0, pressurePa);
        var pure = new Dictionary<string, double>
        {
            [components[0].Name] = guessK,
            [components[1].Name] = equilibrium.PureBoilingTemperatureK(1, pressurePa),
        };

        // y1 − x1 at the bubble point; the last temperature warm-starts the next solve. Only T
        // and y are needed here, so the point's reader parts (names, K values) are not built.
        double Excess(double x1)
        {
            var point = equilibrium.BubbleTemperatureCore(pressurePa, equilibrium.Normalise([x1, 1 - x1], "liquid"), initialGuessK: guessK);
            guessK = point.TemperatureK;
            return point.Y[0] - x1;
        }

        var found = new List<Azeotrope>();
        double xPrev = 1.0 / gridIntervals, dPrev = Excess(xPrev);
        for (int j = 2; j < gridIntervals; j++)
        {
            double x = (double)j / gridIntervals, d = Excess(x);
            if (d == 0 || Math.Sign(d) != Math.Sign(dPrev) && dPrev != 0)
            {
                double x1 = d == 0 ? x : Brent.FindRoot(Excess, xPrev, x, tolerance, 200);
                var point = equilibrium.BubbleTemperature(pressurePa, [x1, 1 - x1], initialGuessK: guessK);
                var kind = point.LiquidPhaseCount == 2 ? AzeotropeKind.Heterogeneous
                    : dPrev > 0 ? AzeotropeKind.MinimumBoiling : AzeotropeKind.MaximumBoiling;
                found.Add(new Azeotrope(point.TemperatureK, pressurePa, point.Liquid, kind)
                {
                    LiquidPhases = point.LiquidPhaseCount == 2 ? point.LiquidPhases : [],
                });
            }
            (xPrev, dPrev) = (x, d);
        }
        var result = new AzeotropeSearchResult(pressurePa, found, pure, equilibrium.Model.Name, equilibrium.Model.FallbackReason)
        {
            ModelAzeotropes = found,
            ApproximationNote = equilibrium.Model.ApproximationNote,
        };
        return PublishedAzeotropes.Apply(result, equilibrium);
    }
}
