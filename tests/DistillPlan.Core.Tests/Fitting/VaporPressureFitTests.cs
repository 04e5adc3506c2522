using DistillPlan.Core.Fitting;
using DistillPlan.Core.Library;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Core.Tests.Fitting;

/// <summary>
/// Fits of measured points against an outside reference: water points computed with the
/// IAPWS-IF97 Region 4 saturation equation (typed in <see cref="IapwsIf97"/>), and latent heats
/// against IAPWS/CRC figures.
/// </summary>
public class VaporPressureFitTests
{
    private static (double, double) If97Point(double celsius) => (273.15 + celsius, IapwsIf97.SaturationPressurePa(273.15 + celsius));

    private static List<(double, double)> WaterPoints(double fromC, double toC, double stepC)
    {
        var pts = new List<(double, double)>();
        for (double c = fromC; c <= toC + 1e-9; c += stepC) pts.Add(If97Point(c));
        return pts;
    }

    [Fact]
    public void An_Antoine_fit_to_IAPWS_points_gives_IAPWS_back_within_0_1_percent_over_the_fitted_range()
    {
        // 9 points, 20 to 100 degC, from IAPWS-IF97 eq. 30
        var fit = VaporPressureFit.Fit(WaterPoints(20, 100, 10), FitForm.Antoine);
        Assert.Equal(FitForm.Antoine, fit.Form);
        Assert.False(fit.IsEstimate);
        Assert.Equal(293.15, fit.TMinK, 9);
        Assert.Equal(373.15, fit.TMaxK, 9);
        double worst = 0;
        for (double t = 293.15; t <= 373.15; t += 0.5)
            worst = Math.Max(worst, Math.Abs(fit.Curve.PressurePa(t) / IapwsIf97.SaturationPressurePa(t) - 1));
        Assert.True(worst < 0.001, $"largest deviation from IAPWS-IF97 {worst * 100:F3} %");
        Assert.True(fit.MaxResidualPercent < 0.1, $"max residual {fit.MaxResidualPercent:F3} %");
        Assert.Equal(9, fit.Residuals.Count);
    }

    [Fact]
    public void A_Clausius_Clapeyron_fit_to_IAPWS_points_stays_within_2_percent_over_30_to_70_C()
    {
        // a straight line in ln P against 1/T: ΔHvap varies some 5 % over 40 K, so this is the form's own error
        var fit = VaporPressureFit.Fit(WaterPoints(30, 70, 5), FitForm.ClausiusClapeyron);
        for (double t = 303.15; t <= 343.15; t += 0.5)
            Assert.InRange(fit.Curve.PressurePa(t) / IapwsIf97.SaturationPressurePa(t) - 1, -0.02, 0.02);
        Assert.True(fit.MaxResidualPercent < 2);
    }

    [Fact]
    public void Two_points_near_25_C_give_the_latent_heat_of_water_within_half_a_percent()
    {
        // ΔHvap of water at 25 degC: 43.99 kJ/mol (IAPWS-95, 2441.7 kJ/kg x 18.015 g/mol, as the CRC prints it; from memory).
        // The vapour is nearly ideal at 3 kPa, so −R d lnP/d(1/T) is ΔHvap itself.
        var fit = VaporPressureFit.Fit([If97Point(20), If97Point(30)]);
        Assert.Equal(FitForm.ClausiusClapeyron, fit.Form);
        Assert.Equal(298.15, fit.EnthalpyAtK, 0.1);
        Assert.InRange(fit.EnthalpyOfVaporizationJPerMol / 43990 - 1, -0.005, 0.005);
    }

    [Fact]
    public void Two_points_around_100_C_give_the_latent_heat_of_water_within_2_5_percent()
    {
        // ΔHvap of water at 100 degC: 40.65 kJ/mol (IAPWS-95 / CRC, from memory). At 1 atm the vapour is 1.7 % short
        // of ideal (Z about 0.983), which the ideal-gas slope carries into the latent heat: expect it about 1.7 % high.
        var fit = VaporPressureFit.Fit([If97Point(95), If97Point(105)]);
        double ratio = fit.EnthalpyOfVaporizationJPerMol / 40650;
        Assert.InRange(ratio, 1.0, 1.025);
    }

    [Fact]
    public void One_boiling_point_gives_a_Trouton_estimate_flagged_as_such()
    {
        // toluene, CRC Tb 383.75 K; at 40 degC the library (Poling 2001) gives 7.89 kPa
        var fit = VaporPressureFit.Fit([(383.75, 101325.0)]);
        Assert.Equal(FitForm.Trouton, fit.Form);
        Assert.True(fit.IsEstimate);
        Assert.NotNull(fit.Curve.Estimate);
        Assert.Equal(88 * 383.75, fit.Coefficients["dhvap_j_per_mol"], 6);
        double library = ShippedLibrary.Instance.Find("toluene").VaporPressure.SaturationPressure(313.15).PressurePa;
        Assert.InRange(fit.Curve.PressurePa(313.15) / library - 1, -0.3, 0.3);
    }

    [Fact]
    public void A_boiling_point_at_reduced_pressure_gives_an_estimate_through_that_point()
    {
        // demo data: a product said to boil at 120 degC at 15 mbar
        var fit = VaporPressureFit.Fit([(393.15, 1500.0)], associating: false);
        Assert.True(fit.IsEstimate);
        Assert.Equal(1500, fit.Curve.PressurePa(393.15), 1e-3);
        Assert.True(fit.Curve.TemperatureK(101325) > 393.15 + 60);
    }

    [Theory]
    // demo data: each row is bad input and the message names what is allowed
    [InlineData(new double[] { }, "at least one measured")]
    [InlineData(new[] { 300.0, -5.0 }, "absolute pressure above zero")]
    [InlineData(new[] { 0.0, 1000.0 }, "above absolute zero")]
    [InlineData(new[] { 300.0, 1000.0, 300.0, 1200.0 }, "each temperature once")]
    [InlineData(new[] { 300.0, 1000.0, 310.0, 900.0 }, "rise with temperature")]
    public void Bad_points_are_refused_with_one_clear_line(double[] flat, string expected)
    {
        var pts = Enumerable.Range(0, flat.Length / 2).Select(i => (flat[2 * i], flat[2 * i + 1])).ToList();
        var e = Assert.ThrowsAny<InputException>(() => VaporPressureFit.Fit(pts));
        Assert.Contains(expected, e.Message);
        Assert.DoesNotContain("\n", e.Message);
    }

    [Fact]
    public void Fewer_points_than_the_form_has_constants_are_refused()
    {
        var two = new List<(double, double)> { If97Point(20), If97Point(30) };
        var e = Assert.Throws<InputException>(() => VaporPressureFit.Fit(two, FitForm.Antoine));
        Assert.Contains("at least 3 points", e.Message);
        Assert.Throws<InputException>(() => VaporPressureFit.Fit([If97Point(20)], FitForm.ClausiusClapeyron));
        Assert.Throws<InputException>(() => VaporPressureFit.Fit(two, FitForm.Trouton));
    }

    public static TheoryData<string> EveryForm() => new() { "antoine", "clausius-clapeyron", "trouton" };

    [Theory]
    [MemberData(nameof(EveryForm))]
    public void A_written_entry_loads_back_with_the_same_vapour_pressure(string formName)
    {
        var (form, pts) = formName switch
        {
            "antoine" => (FitForm.Antoine, WaterPoints(20, 100, 10)),
            "clausius-clapeyron" => (FitForm.ClausiusClapeyron, WaterPoints(40, 60, 10)),
            _ => (FitForm.Trouton, new List<(double, double)> { (373.124, 101325.0) }),
        };
        var fit = VaporPressureFit.Fit(pts, form, associating: true);
        // demo data: name, molar mass and citation of a made-up user entry
        var compound = new FittedCompound("my water \"test\"", 18.015, "demo points typed from IAPWS-IF97") { Aliases = ["H2O-demo"] };
        string yaml = LibraryEntryWriter.Write(compound, fit);

        var loaded = SolventYamlLoader.Parse(yaml, "fit.yaml").Solvents.Single();
        Assert.Equal("my water \"test\"", loaded.Name);
        Assert.Equal("", loaded.Cas);
        Assert.Equal(fit.IsEstimate, loaded.EstimatedCurveNote is not null);
        for (double t = fit.TMinK; t <= fit.TMaxK; t += 2)
        {
            var r = loaded.VaporPressure.SaturationPressure(t);
            Assert.False(r.Extrapolated);
            Assert.Equal(fit.Curve.PressurePa(t), r.PressurePa, fit.Curve.PressurePa(t) * 1e-12);
        }
    }

    [Fact]
    public void A_written_entry_joins_the_shipped_library_as_a_user_library()
    {
        var fit = VaporPressureFit.Fit(WaterPoints(20, 100, 10));
        // demo data: a made-up product entry
        string yaml = LibraryEntryWriter.Write(new FittedCompound("demo product", 250.3, "demo"), fit);
        string path = Path.Combine(Path.GetTempPath(), $"distillplan-fit-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, yaml);
        try
        {
            var lib = SolventLibrary.LoadWithUser(path);
            Assert.Equal(fit.Curve.PressurePa(330), lib.Find("demo product").VaporPressure.SaturationPressure(330).PressurePa, 1e-6);
            Assert.True(lib.TryFind("water", out _));
        }
        finally { File.Delete(path); }
    }
}
