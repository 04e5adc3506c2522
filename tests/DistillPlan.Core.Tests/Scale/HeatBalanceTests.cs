using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>Heat in, vapour out and gas to the pump, against IAPWS-IF97 and the ideal-gas law.</summary>
public class HeatBalanceTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static (ScaleSetup Setup, IBoilingSystem System) Water(string inputs = "")
    {
        var charge = ChargeParser.Parse("water=1L", Basis.Volume, Library);
        var settings = new PlanInputs();
        foreach (var pair in inputs.Split(';', StringSplitOptions.RemoveEmptyEntries))
        {
            var kv = pair.Split('=', 2);
            settings = settings.With(kv[0], kv[1]);
        }
        var setup = ScaleSetup.Resolve(charge, settings.Build().Equipment, out string? why) ?? throw new InvalidOperationException(why);
        return (setup, BoilingSystems.For(charge, null));
    }

    [Fact]
    public void The_evaporation_rate_is_the_duty_over_the_IAPWS_latent_heat_of_water()
    {
        var (setup, system) = Water("area=0.1m2;heat-transfer=500");
        var boil = Temperature.FromCelsius(60);
        var h = HeatBalance.At(setup, system, [1.0], 0.5e-3, boil, Temperature.FromCelsius(80), Pressure.FromMillibar(199.46), Temperature.FromCelsius(10));
        // Q = U·A·ΔT = 500 × 0.1 × 20 = 1000 W.
        Assert.Equal(1000, h.HeatDutyW, 1e-9);
        // IAPWS-IF97 at 60 °C: h'' − h' = 2357.69 kJ/kg (python3-iapws, IAPWS97(T=333.15, x=1).h − x=0) → 0.42414 g/s = 1526.9 g/h.
        Assert.Equal(1000 / 2357.69 * 3600, h.EvaporationGPerH, 0.01 * 1526.9);
        // And the defining relation itself: rate × ΔHvap = Q.
        Assert.Equal(h.HeatDutyW, h.EvaporationMolPerS * h.LatentHeatJPerMol, 1e-9);
    }

    [Fact]
    public void The_duty_scales_with_the_area_and_with_the_temperature_difference()
    {
        var (setup, system) = Water("area=0.1m2");
        var (setup2, _) = Water("area=0.2m2");
        var boil = Temperature.FromCelsius(40);
        var p = Pressure.FromMillibar(73.84);
        var c = Temperature.FromCelsius(5);
        var q10 = HeatBalance.At(setup, system, [1.0], 0.5e-3, boil, Temperature.FromCelsius(50), p, c).HeatDutyW;
        var q20 = HeatBalance.At(setup, system, [1.0], 0.5e-3, boil, Temperature.FromCelsius(60), p, c).HeatDutyW;
        var q10a2 = HeatBalance.At(setup2, system, [1.0], 0.5e-3, boil, Temperature.FromCelsius(50), p, c).HeatDutyW;
        Assert.Equal(2 * q10, q20, 1e-9);
        Assert.Equal(2 * q10, q10a2, 1e-9);
        // Default U of a rotating flask, 450 W/(m² K): 450 × 0.1 × 10 = 450 W.
        Assert.Equal(450, q10, 1e-9);
    }

    [Fact]
    public void The_pump_carries_leak_air_saturated_with_water_at_the_coolant_as_an_ideal_gas()
    {
        var (setup, system) = Water("area=0.1m2;leak-rate=1kg/h;pump-speed=20");
        var h = HeatBalance.At(setup, system, [1.0], 0.5e-3, Temperature.FromCelsius(60), Temperature.FromCelsius(62),
            Pressure.FromMillibar(100), Temperature.FromCelsius(10));
        // 1 kg/h of air = 1000/28.9644/3600 = 9.5905e-3 mol/s; the gas leaving the condenser is saturated with water at
        // 10 °C, 12.2818 mbar (IAPWS-IF97, python3-iapws), so n_total = n_air·P/(P − p_s), and V = n_total·R·T/P
        // = n_air·R·T/(P − p_s) = 9.5905e-3 × 8.314462618 × 283.15 / (10000 − 1228.18) Pa = 2.574e-3 m³/s = 9.27 m³/h.
        Assert.Equal(9.27, h.GasLoadM3PerS * 3600, 0.005 * 9.27);
        // Water carried along: n_air·p_s/(P − p_s)·M = 9.5905e-3 × 1228.18/8771.82 × 18.015 g/mol × 3600 = 87.1 g/h.
        Assert.Equal(87.1, h.SolventToPumpGPerH, 0.01 * 87.1);
        Assert.Equal(9.27 / 20, h.PumpShare, 0.01);
    }

    [Fact]
    public void The_condenser_takes_U_A_times_the_log_mean_temperature_difference()
    {
        // 0.2 m² at 70 W/(m² K), vapour 40 °C, coolant 10 °C in and 13 °C out: ΔT_lm = (30 − 27)/ln(30/27) = 28.48 K → 398.7 W.
        var rating = new CondenserRating(null, 0.2, 70);
        Assert.Equal(0.2 * 70 * 3 / Math.Log(30.0 / 27), rating.CapacityW(Temperature.FromCelsius(40), Temperature.FromCelsius(10)), 1e-9);
        Assert.Equal(398.7, rating.CapacityW(Temperature.FromCelsius(40), Temperature.FromCelsius(10)), 0.1);
        Assert.Equal(0, rating.CapacityW(Temperature.FromCelsius(5), Temperature.FromCelsius(10)));
        Assert.Equal(5000, new CondenserRating(5000, 0, 0).CapacityW(Temperature.FromCelsius(5), Temperature.FromCelsius(10)));
    }

    [Fact]
    public void Time_is_the_evaporated_amount_over_the_rate()
    {
        // Constant rate 0.01 mol/s, 3 mol in steps: 300 s.
        var t = EvaporationTime.Cumulative([0, 1, 2, 3], [0.01, 0.01, 0.01, 0.01]);
        Assert.Equal(300, t[^1], 1e-9);
        // A rate falling linearly with what is left is integrated by the trapezoidal rule on 1/r.
        var t2 = EvaporationTime.Cumulative([0, 1], [0.02, 0.01]);
        Assert.Equal(0.5 * (50 + 100), t2[1], 1e-9);
    }
}
