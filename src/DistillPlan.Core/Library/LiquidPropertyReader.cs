using System.Globalization;

namespace DistillPlan.Core.Library;

/// <summary>
/// Reads and checks the liquid-property curves of a library entry (<c>liquid_heat_capacity</c>,
/// <c>liquid_density_curve</c>; docs/solvents-schema.md). A curve must stay physical over its
/// whole range, so a copying error or a unit slip (J/(kmol·K) for J/(mol·K), mol/dm³ for
/// mol/m³, both as Perry prints them) is caught on load with file, line and field.
/// </summary>
internal static class LiquidPropertyReader
{
    // Liquid molar heat capacities of solvents lie between about 50 and 500 J/(mol·K) (CRC,
    // "Heat Capacity of Liquids"; from memory); 5000 leaves room for large molecules and still
    // catches a thousandfold unit slip (water is 75 J/(mol·K), 75 000 J/(kmol·K)).
    private const double MaxHeatCapacityJPerMolK = 5000;
    // A liquid is denser than 100 kg/m³ up to its critical point (hexane's critical density is
    // about 233 kg/m³; from memory) and lighter than 5000 kg/m³ (the densest organic liquids, such
    // as diiodomethane, are about 3300; from memory).
    private const double MinDensityKgPerM3 = 100, MaxDensityKgPerM3 = 5000;
    private const int Samples = 40;

    public static Dippr100 HeatCapacity(YamlCursor c, Func<YamlCursor, string, string> sourceOf)
    {
        string form = c.Required("form").String();
        if (form != "dippr100") throw c.Required("form").Error($"'{form}' is not a heat-capacity form; allowed: dippr100");
        c.OnlyKeys("form", "c1", "c2", "c3", "c4", "c5", "t_min_k", "t_max_k", "source");
        var (tmin, tmax) = Range(c);
        var curve = new Dippr100
        {
            C1 = c.Required("c1").Number(), C2 = c.Required("c2").Number(), C3 = c.Optional("c3")?.Number() ?? 0,
            C4 = c.Optional("c4")?.Number() ?? 0, C5 = c.Optional("c5")?.Number() ?? 0,
            TMinK = tmin, TMaxK = tmax, Source = sourceOf(c, "liquid_heat_capacity"),
        };
        foreach (double t in Grid(tmin, tmax))
        {
            double cp = curve.Polynomial(t);
            if (!(double.IsFinite(cp) && cp > 0 && cp < MaxHeatCapacityJPerMolK))
                throw c.Required("c1").Error(
                    $"Cp is {N(cp)} J/(mol K) at {N(t)} K; it must lie between 0 and {N(MaxHeatCapacityJPerMolK)} J/(mol K) over " +
                    $"t_min_k..t_max_k (check the coefficients, and that they are per mol, not per kmol)");
        }
        return curve;
    }

    public static Dippr105 DensityCurve(YamlCursor c, double molarMassGPerMol, Func<YamlCursor, string, string> sourceOf)
    {
        string form = c.Required("form").String();
        if (form != "dippr105") throw c.Required("form").Error($"'{form}' is not a density form; allowed: dippr105");
        c.OnlyKeys("form", "c1", "c2", "c3", "c4", "t_min_k", "t_max_k", "source");
        var (tmin, tmax) = Range(c);
        var curve = new Dippr105
        {
            C1 = c.Required("c1").Positive(), C2 = c.Required("c2").Positive(), C3 = c.Required("c3").Positive(),
            C4 = c.Required("c4").Positive(), TMinK = tmin, TMaxK = tmax, Source = sourceOf(c, "liquid_density_curve"),
        };
        // Above C3 the bracket 1 − T/C3 turns negative and the equation has no value.
        if (tmax > curve.C3) throw c.Required("t_max_k").Error($"t_max_k {N(tmax)} K lies above c3 {N(curve.C3)} K, where the equation has no value");
        double previous = double.MaxValue;
        foreach (double t in Grid(tmin, tmax))
        {
            double rho = curve.Equation(t) * molarMassGPerMol / 1000;
            if (!(double.IsFinite(rho) && rho > MinDensityKgPerM3 && rho < MaxDensityKgPerM3))
                throw c.Required("c1").Error(
                    $"the density is {N(rho)} kg/m3 at {N(t)} K; a liquid lies between {N(MinDensityKgPerM3)} and {N(MaxDensityKgPerM3)} kg/m3 " +
                    "(check the coefficients, and that c1 is in mol/m3, not mol/dm3)");
            if (!(rho < previous)) throw c.Required("c2").Error($"the density does not fall with temperature at {N(t)} K (check the coefficients)");
            previous = rho;
        }
        return curve;
    }

    private static (double TMinK, double TMaxK) Range(YamlCursor c)
    {
        double tmin = c.Required("t_min_k").Positive(), tmax = c.Required("t_max_k").Positive();
        if (!(tmin < tmax)) throw c.Required("t_max_k").Error($"t_max_k {N(tmax)} must be above t_min_k {N(tmin)}");
        return (tmin, tmax);
    }

    private static IEnumerable<double> Grid(double tmin, double tmax) =>
        Enumerable.Range(0, Samples + 1).Select(i => i == Samples ? tmax : tmin + (tmax - tmin) * i / Samples);

    private static string N(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
}
