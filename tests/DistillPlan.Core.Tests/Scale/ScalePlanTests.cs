using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>The size side of whole plans: what the chemist and the operator read, worked by hand.</summary>
public class ScalePlanTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static Plan PlanFor(string charge, params (string Key, string Text)[] settings)
    {
        var setup = PlanInputs.Of(settings).Build();
        var c = ChargeParser.Parse(charge, setup.Basis, Library);
        return SetpointPlanner.Plan(c, BoilingSystems.For(c, null), setup);
    }

    [Fact]
    public void Water_evaporates_at_the_duty_over_the_IAPWS_latent_heat()
    {
        // 250 mL of water, vapour 40 °C, bath 60 °C, a given 0.05 m² at the default U 450 W/(m² K): Q = 450 W.
        // IAPWS-IF97 at 40 °C: h'' − h' = 2406.0 kJ/kg (python3-iapws) → 0.18703 g/s. 95 % of 250 mL at the library's
        // density (CRC, 998 kg/m³ at 20 °C) = 237.1 g → 1268 s = 21.1 min at a constant area.
        var p = PlanFor("water=250mL", ("area", "0.05m2"), ("condenser-capacity", "2kW"));
        var s = p.Scale!;
        Assert.Equal(450, s.Start.HeatDutyW, 1e-6);
        double grams = 0.95 * 250e-6 * Library.Find("water").LiquidDensityKgPerM3!.Value * 1000;
        Assert.Equal(grams / (450 / 2406.0) / 60, s.EvaporationTimeS!.Value / 60, 0.02 * 21.1);
        Assert.Null(s.LoweredBathStep);
    }

    [Fact]
    public void A_small_condenser_makes_the_bath_gentle_for_a_low_boiler_and_says_so()
    {
        // 5 L of diethyl ether boils at ambient (34.6 °C, CRC); in a 10 L flask the ΔT rule's bath of 54.6 °C would put
        // about 1 kW in, far more than a 0.2 m² glass coil takes at 10 °C coolant (about 320 W).
        var p = PlanFor("diethyl-ether=5L");
        var s = p.Scale!;
        Assert.True(p.AtAtmosphericPressure);
        Assert.NotNull(s.LoweredBathStep);
        Assert.True(p.Bath < p.Vapor + p.Rules.BathToVapor);
        Assert.Equal(ScalePlanner.CondenserLoadTarget, s.Start.HeatDutyW / s.Start.CondenserCapacityW, 1e-6);
        var f = Assert.Single(p.Checks, c => c.Code == "condenser-capacity");
        Assert.Equal("bath-lowered", f.Variant);
        // A rated condenser big enough restores the rule's bath.
        var big = PlanFor("diethyl-ether=5L", ("condenser-capacity", "3kW"));
        Assert.Equal(big.Vapor.Kelvin + 20, big.Bath.Kelvin, 1e-9);
        Assert.DoesNotContain(big.Checks, c => c.Code == "condenser-capacity");
    }

    [Fact]
    public void A_pump_too_small_for_the_leak_is_a_pump_capacity_warning()
    {
        // 5 kg/h of air at 79 mbar and 10 °C is 5000/28.96/3600 mol/s × R × 283 K / 7890 Pa ≈ 14 m³/h, against 2 m³/h.
        var p = PlanFor("toluene=200L", ("vessel", "250L"), ("leak-rate", "5kg/h"), ("pump-speed", "2m3/h"));
        var f = Assert.Single(p.Checks, c => c.Code == "pump-capacity");
        Assert.Equal(Checks.Severity.Warning, f.Severity);
        Assert.True(p.Scale!.Start.GasLoadM3PerS * 3600 > 14);
    }

    [Fact]
    public void In_a_vessel_the_level_falls_and_each_step_takes_longer()
    {
        var p = PlanFor("toluene=200L", ("vessel", "250L"));
        var strip = StripPlanner.Plan(p, new StripRequest(null, StripEnd.Default));
        var times = strip.Steps.Select(st => st.TimeS!.Value).ToList();
        var areas = strip.Steps.Select(st => st.Heat!.AreaM2).ToList();
        Assert.True(areas.Zip(areas.Skip(1)).All(t => t.Second < t.First), "the wetted area shrinks");
        var gaps = times.Zip(times.Skip(1), (a, b) => b - a).ToList();
        Assert.True(gaps.Zip(gaps.Skip(1)).All(t => t.Second >= t.First - 1e-6), "equal steps of evaporation take longer");
        Assert.Equal(p.Scale!.TotalTimeS!.Value, strip.TotalTimeS!.Value, 0.03 * strip.TotalTimeS!.Value);
    }

    [Fact]
    public void A_relative_charge_without_a_size_says_why_there_is_no_time()
    {
        var p = PlanFor("ethanol=90,water=10");
        Assert.Null(p.Scale);
        Assert.Contains(p.Notes, n => n.Code == "scale" && n.Variant == "not-computed");
        // With a flask the composition fills it half.
        var f = PlanFor("ethanol=90,water=10", ("flask", "1L"));
        Assert.Equal(0.5e-3, f.Scale!.Setup.ChargeM3, 1e-12);
    }

    [Theory]
    [InlineData("toluene=300L", "vessel", "250L", "--vessel")]
    [InlineData("toluene=2L", "flask", "1L", "--flask")]
    public void A_container_smaller_than_its_charge_is_bad_input(string charge, string key, string size, string field)
    {
        var e = Assert.Throws<InputException>(() => PlanFor(charge, (key, size)));
        Assert.Equal(field, e.Field);
    }

    [Theory]
    [InlineData("area", "-0.5m2")]
    [InlineData("area", "0")]
    [InlineData("heat-transfer", "-3")]
    [InlineData("pump-speed", "1e400")]
    [InlineData("leak-rate", "2 furlongs")]
    [InlineData("condenser-capacity", "12 MJ")]
    public void Bad_sizes_name_their_option(string key, string text)
    {
        var e = Assert.Throws<InputException>(() => PlanInputs.Of((key, text)).Build());
        Assert.Equal("--" + key, e.Field);
    }

    [Fact]
    public void A_minimum_volume_above_the_working_volume_is_bad_input()
    {
        var e = Assert.Throws<InputException>(() => PlanInputs.Of(("vessel", "250L"), ("min-volume", "300L")).Build());
        Assert.Equal("--min-volume", e.Field);
    }
}
