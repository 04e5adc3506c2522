using DistillPlan.Core;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.VaporPressure;

/// <summary>The worked examples in the curve classes' doc comments, reproduced; and each form's inverse.</summary>
public class CurveFormTests
{
    private static Antoine EthylAcetatePoling() => new()
    {
        // Poling, Prausnitz, O'Connell 2001, App. A: ethyl ethanoate, log10(P/Pa), T in K, 265.5–372.51 K.
        Log10 = true, A = 9.13361, B = 1195.13, C = -60.68, Source = "poling-2001", TMinK = 265.5, TMaxK = 372.51,
    };

    private static Dippr101 WaterPerry() => new()
    {
        // Perry's 8th ed. Table 2-8, water.
        C1 = 73.649, C2 = -7258.2, C3 = -7.3037, C4 = 4.1653e-6, C5 = 2, Source = "perry-2-8", TMinK = 273.16, TMaxK = 647.096,
    };

    private static Wagner WaterWagnerPruss() => new()
    {
        // Wagner and Pruß, J. Phys. Chem. Ref. Data 22 (1993) 783, six-term saturation equation.
        FormName = "wagner-general", TcK = 647.096, PcPa = 22.064e6,
        Terms = [(-7.85951783, 1), (1.84408259, 1.5), (-11.7866497, 3), (22.6807411, 3.5), (-15.9618719, 4), (1.80122502, 7.5)],
        Source = "wagner-pruss-1993", TMinK = 273.16, TMaxK = 647.096,
    };

    [Fact]
    public void Antoine_reproduces_its_worked_example_for_ethyl_acetate()
    {
        // Hand: 10^(9.13361 − 1195.13/(350.25 − 60.68)) = 10^5.00635 = 101 473 Pa.
        Assert.Equal(101473, EthylAcetatePoling().PressurePa(350.25), 1.0);
    }

    [Fact]
    public void Dippr101_gives_one_atmosphere_for_water_near_100_C()
    {
        // Hand: ln P = 73.649 − 7258.2/373.15 − 7.3037·ln 373.15 + 4.1653e−6·373.15² = 11.5254 → 101.26 kPa;
        // IAPWS-IF97 gives 101.418 kPa at 373.15 K, so the Perry fit is within 0.2 % here.
        Assert.Equal(101418, WaterPerry().PressurePa(373.15), 101418 * 0.002);
    }

    [Fact]
    public void Wagner_Pruss_gives_the_normal_boiling_point_of_water()
    {
        // IAPWS: water boils at 373.124 K at 101 325 Pa (ITS-90).
        Assert.Equal(373.124, WaterWagnerPruss().TemperatureK(101325), 0.002);
    }

    [Fact]
    public void Clausius_Clapeyron_reproduces_its_worked_example_for_ethanol()
    {
        var cc = new ClausiusClapeyron { T1K = 351.39, P1Pa = 101325, EnthalpyJPerMol = 38600, Source = "memory", TMinK = 300, TMaxK = 360 };
        // Hand: 101325·exp(−38600/8.314462618·(1/313.15 − 1/351.39)) = 20 186 Pa.
        Assert.Equal(20186, cc.PressurePa(313.15), 2.0);
    }

    [Fact]
    public void Dippr106_reproduces_its_worked_example_for_ethanol()
    {
        var dh = new Dippr106 { TcK = 514, C1 = 55789, C2 = 0.31245, Source = "perry-2-150" };
        // Hand: 55789·(1 − 351.4/514)^0.31245 = 38 937 J/mol; CRC gives 38.56 kJ/mol at Tb (from memory), within 1 %.
        Assert.Equal(38937, dh.At(351.4), 5.0);
        Assert.Equal(38560, dh.At(351.4), 38560 * 0.01);
    }

    [Fact]
    public void Trouton_estimate_puts_the_boiling_point_back_at_one_atmosphere()
    {
        var cc = ClausiusClapeyron.FromTrouton(400, hydrogenBonded: false);
        Assert.Equal(88 * 400, cc.EnthalpyJPerMol, 1e-9);
        Assert.Equal(101325, cc.PressurePa(400), 1e-6);
    }

    public static TheoryData<string> Forms => new() { "antoine", "dippr101", "wagner", "clausius-clapeyron" };

    [Theory]
    [MemberData(nameof(Forms))]
    public void Every_form_inverts_its_own_pressure(string form)
    {
        IVaporPressureCurve curve = form switch
        {
            "antoine" => EthylAcetatePoling(),
            "dippr101" => WaterPerry(),
            "wagner" => WaterWagnerPruss(),
            _ => ClausiusClapeyron.FromTrouton(350, false),
        };
        for (double t = curve.TMinK; t <= curve.TMaxK - 1; t += (curve.TMaxK - curve.TMinK) / 17)
            Assert.Equal(t, curve.TemperatureK(curve.PressurePa(t)), 1e-6);
    }

    [Fact]
    public void Model_flags_extrapolation_and_stays_close_to_the_curve_just_outside_it()
    {
        var model = new VaporPressureModel("ethyl acetate", [EthylAcetatePoling()]);
        var inside = model.SaturationPressure(300);
        var outside = model.SaturationPressure(380);
        Assert.False(inside.Extrapolated);
        Assert.True(outside.Extrapolated);
        // 7.5 K past the edge, the Clausius–Clapeyron extension and the Antoine fit agree within 1 %.
        Assert.Equal(EthylAcetatePoling().PressurePa(380), outside.PressurePa, EthylAcetatePoling().PressurePa(380) * 0.01);
    }

    [Fact]
    public void Model_refuses_above_the_critical_temperature()
    {
        var model = new VaporPressureModel("water", [WaterWagnerPruss()], 647.096, 22.064e6);
        var e = Assert.Throws<OutOfRangeException>(() => model.SaturationPressure(700));
        Assert.Contains("critical", e.Message);
        Assert.Throws<OutOfRangeException>(() => model.SaturationTemperature(30e6));
    }

    [Fact]
    public void Model_prefers_the_first_curve_that_covers_the_temperature()
    {
        var model = new VaporPressureModel("water", [WaterWagnerPruss(), WaterPerry()]);
        Assert.Equal("wagner-pruss-1993", model.SaturationPressure(350).Curve.Source);
        Assert.Equal("wagner-pruss-1993", model.SaturationTemperature(50000).Curve.Source);
    }
}
