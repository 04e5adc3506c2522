using DistillPlan.Core.Fitting;
using DistillPlan.Core.Tests.Reference;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.VaporPressure;

/// <summary>
/// Physical sense of every curve in the library: the latent heat it implies,
/// ΔHvap = −R·d ln P/d(1/T), is positive and does not rise with temperature (for every liquid
/// ΔHvap falls from the triple point to zero at Tc; common practice). Checked up to 0.7·Tc:
/// above that the ideal-gas slope is ΔHvap/ΔZ, which passes through a minimum near Tr 0.8–0.85 and
/// rises again towards Tc for real fluids (Waring, Ind. Eng. Chem. 46 (1954) 762; from memory),
/// so a rise there is no fault of the curve.
/// </summary>
public class LatentHeatTests
{
    private const double R = 8.314462618;   // CODATA 2018
    private const int Samples = 60;

    private static double Implied(IVaporPressureCurve c, double t)
    {
        const double h = 0.01;
        return -R * (Math.Log(c.PressurePa(t + h)) - Math.Log(c.PressurePa(t - h))) / (1 / (t + h) - 1 / (t - h));
    }

    [Theory]
    [MemberData(nameof(CurvePropertyTests.EveryCurve), MemberType = typeof(CurvePropertyTests))]
    public void The_latent_heat_a_curve_implies_is_positive_and_does_not_rise_with_temperature(string name, int index)
    {
        var s = ShippedLibrary.Instance.Find(name);
        var c = s.VaporPressure.Curves[index];
        // Tc: the Wagner curve's own, else the library's, else the end of a DIPPR-101 fit (Perry fits run to Tc)
        double? tc = c is Wagner w ? w.TcK : s.CriticalTemperatureK ?? (c is Dippr101 ? c.TMaxK : null);
        double top = Math.Min(c.TMaxK, tc is double t ? 0.7 * t : double.MaxValue) - 0.02;
        double bottom = c.TMinK + 0.02;
        if (top <= bottom) return;   // the whole fit lies above 0.7 Tc (1,4-dioxane L-B, 427-583 K): nothing to check there
        double previous = double.MaxValue;
        for (int k = 0; k <= Samples; k++)
        {
            double temp = bottom + (top - bottom) * k / Samples;
            double dh = Implied(c, temp);
            Assert.True(dh > 0, $"{name} {c.Source}: implied ΔHvap {dh:F0} J/mol at {temp:F1} K");
            Assert.True(dh <= previous * (1 + 1e-7),
                $"{name} {c.Source}: implied ΔHvap rises from {previous:F0} to {dh:F0} J/mol at {temp:F1} K");
            previous = dh;
        }
    }

    [Fact]
    public void The_sulfolane_curve_is_the_least_squares_refit_of_the_Landolt_Bornstein_row_and_the_CRC_boiling_point()
    {
        // Landolt-Boernstein IV/20, sulfolane (126-33-0): ln(P/Pa) = 24.0578004910676 − 7266.808885458164/(T + 22.975), 364–529 K;
        // CRC normal boiling point 559.15 K. The library's curve (source lb-iv20-refit) must be exactly this fit.
        double Lb(double t) => Math.Exp(24.0578004910676 - 7266.808885458164 / (t + 22.975));
        var pts = Enumerable.Range(0, 12).Select(i => (364.0 + 15 * i, Lb(364.0 + 15 * i))).ToList();
        pts.Add((559.15, 101325.0));
        var fit = VaporPressureFit.Fit(pts, FitForm.ClausiusClapeyron);
        var lib = (ClausiusClapeyron)ShippedLibrary.Instance.Find("sulfolane").VaporPressure.Curves.Single();
        Assert.Equal("lb-iv20-refit", lib.Source);
        Assert.Equal(fit.Coefficients["dhvap_j_per_mol"], lib.EnthalpyJPerMol, 1e-6);
        for (double t = 364; t <= 529; t += 5)
            Assert.InRange(lib.PressurePa(t) / Lb(t) - 1, -0.02, 0.02);          // within 2 % of the L-B row
        Assert.InRange(lib.TemperatureK(101325) - 559.15, -1.0, 1.0);              // and 1 K of the CRC Tb
    }
}
