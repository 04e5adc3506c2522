using DistillPlan.Core.Fitting;
using DistillPlan.Core.Library;
using DistillPlan.Core.Tests.Reference;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.VaporPressure;

/// <summary>
/// How far the estimating recipes are off, measured on the library solvents that have published
/// curves (the published curve at 40 °C is the reference; each is checked against a second table
/// in SecondTableTests). The figures stated in solvents.yaml (estimate-error-measured) and in Core
/// (<see cref="ClausiusClapeyron.TroutonConstantErrorPercent"/>, <see cref="VaporPressureFit.TroutonExpectedErrorPercent"/>)
/// must be the ones measured here.
/// </summary>
public class EstimateErrorTests
{
    private const double At40C = 313.15;

    // Hydrogen-bonded liquids for Trouton's rule (ΔSvap about 109 J/(mol K); common practice).
    private static readonly HashSet<string> Associating =
    [
        "water", "methanol", "ethanol", "1-propanol", "2-propanol", "1-butanol", "2-butanol", "isobutanol",
        "tert-butanol", "ethylene glycol", "1-methoxy-2-propanol",
    ];

    private static List<Solvent> Published() => ShippedLibrary.Instance.Solvents
        .Where(s => s.VaporPressure.Curves.All(c => c.Estimate is null)).ToList();

    private static double Error(Solvent s, bool watson, bool guldberg)
    {
        double tb = s.NormalBoilingPointK;
        double dh = (Associating.Contains(s.Name) ? ClausiusClapeyron.TroutonEntropyAssociated : ClausiusClapeyron.TroutonEntropy) * tb;
        var estimate = new ClausiusClapeyron
        {
            T1K = tb, P1Pa = 101325, EnthalpyJPerMol = dh, Source = "test", TMinK = 200, TMaxK = tb + 1,
            WatsonTcK = !watson ? null : guldberg ? VaporPressureFit.GuldbergFactor * tb : s.CriticalTemperatureK ?? VaporPressureFit.GuldbergFactor * tb,
        };
        return 100 * (estimate.PressurePa(At40C) / s.VaporPressure.SaturationPressure(At40C).PressurePa - 1);
    }

    private static double Median(IEnumerable<double> v)
    {
        var a = v.Order().ToArray();
        return (a[(a.Length - 1) / 2] + a[a.Length / 2]) / 2;
    }

    private static double Percentile90(IEnumerable<double> v)
    {
        var a = v.Order().ToArray();
        return a[(int)(0.9 * a.Length)];
    }

    [Fact]
    public void The_library_has_61_solvents_with_published_curves_to_measure_against()
    {
        Assert.Equal(61, Published().Count);
    }

    [Fact]
    public void Trouton_with_a_constant_latent_heat_overestimates_Psat_at_40_C_by_a_median_18_percent()
    {
        double median = Median(Published().Select(s => Error(s, watson: false, guldberg: false)));
        Assert.True(Math.Abs(median - ClausiusClapeyron.TroutonConstantErrorPercent) <= 1,
            $"measured median {median:F1} %, stated {ClausiusClapeyron.TroutonConstantErrorPercent} %");
    }

    [Theory]
    [InlineData(false)]   // Tc from the CRC where the library has it (dimethyl carbonate's recipe)
    [InlineData(true)]    // Tc = 1.5 Tb by Guldberg's rule (CPME, diglyme, DMAc, and one-point fits)
    public void Trouton_with_Watsons_rule_errs_by_a_median_6_percent_and_at_most_30_percent_for_nine_in_ten(bool guldberg)
    {
        var errors = Published().Select(s => Math.Abs(Error(s, watson: true, guldberg))).ToList();
        double median = Median(errors), p90 = Percentile90(errors);
        Assert.InRange(median, 4, 7);
        Assert.True(p90 <= VaporPressureFit.TroutonExpectedErrorPercent && p90 > VaporPressureFit.TroutonExpectedErrorPercent - 5,
            $"90th percentile {p90:F1} %, stated {VaporPressureFit.TroutonExpectedErrorPercent} %");
    }

    [Fact]
    public void Every_estimated_curve_states_the_measured_error_and_says_so_in_its_note()
    {
        var estimated = ShippedLibrary.Instance.Solvents.Where(s => s.EstimatedCurveNote is not null).Select(s => s.Name).Order().ToList();
        Assert.Equal(["N,N-dimethylacetamide", "cyclopentyl methyl ether", "diglyme", "dimethyl carbonate"], estimated);
        foreach (var s in ShippedLibrary.Instance.Solvents.Where(s => s.EstimatedCurveNote is not null))
        {
            var c = s.VaporPressure.Curves.Single(c => c.Estimate is not null);
            Assert.Equal(EstimateBasis.Trouton, c.Estimate!.Basis);
            Assert.Equal(VaporPressureFit.TroutonExpectedErrorPercent, c.Estimate.ExpectedErrorPercent);
            Assert.Contains("30 %", s.EstimatedCurveNote);
            Assert.True(s.VaporPressure.SaturationPressure(At40C).Estimated);
        }
        Assert.Null(ShippedLibrary.Instance.Find("toluene").EstimatedCurveNote);
    }

    [Fact]
    public void DMAc_boils_at_the_CRC_temperature_and_its_25_C_pressure_is_near_the_usual_figure()
    {
        var m = ShippedLibrary.Instance.Find("DMAc").VaporPressure;
        // CRC normal boiling point 439.05 K (the estimate is drawn through it, so this pins the repair, not the data)
        Assert.Equal(439.05, m.SaturationTemperature(101325).TemperatureK, 0.01);
        // about 3 mbar at 25 degC (from memory); the estimate's stated error is 30 %. Before: 5.5 mbar.
        Assert.InRange(m.SaturationPressure(298.15).PressurePa / 300.0, 0.7, 1.3);
    }
}
