using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Tests.Planning;

/// <summary>Setpoint plans whose numbers are worked out by hand in the comments.</summary>
public class SetpointPlanTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static Plan PlanFor(string name, PlanInputs? inputs = null)
    {
        var setup = (inputs ?? new PlanInputs()).Build();
        var charge = Charge.Pure(Library.Find(name));
        return SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), setup);
    }

    [Fact]
    public void Ethanol_by_the_20_40_60_rule()
    {
        var p = PlanFor("ethanol");
        // Defaults: vapour 40 °C (coolant 10 + 20 = 30 ≤ 40; pump 2×5 mbar boils ethanol far below 40; bath 95 − 20 = 75 ≥ 40).
        Assert.Equal(40.0, p.Vapor.Celsius, 1e-9);
        Assert.Equal(60.0, p.Bath.Celsius, 1e-9);
        Assert.Equal(20.0, p.CondenserMax.Celsius, 1e-9);
        Assert.Equal("preferred-vapor-temperature", p.LimitingConstraint);
        // Ethanol at 40 °C: 17.88 kPa (Ambrose and Sprake, J. Chem. Thermodyn. 2 (1970) 631; from memory).
        Assert.Equal(178.8, p.VacuumSetpoint.Millibar, 178.8 * 0.02);
    }

    [Fact]
    public void A_product_limit_lowers_the_bath_and_the_vapour_temperature()
    {
        var p = PlanFor("ethanol", PlanInputs.Of(("product-max", "50")));
        // Bath ≤ 50 °C → vapour ≤ 30 °C; coolant 10 + 20 = 30 is still met exactly.
        Assert.Equal(30.0, p.Vapor.Celsius, 1e-9);
        Assert.Equal("product-limit", p.LimitingConstraint);
        // Ethanol at 30 °C: 10.48 kPa (Ambrose and Sprake 1970; from memory).
        Assert.Equal(104.8, p.VacuumSetpoint.Millibar, 104.8 * 0.02);
        Assert.Contains(p.Checks, c => c.Code == "product-limit");
    }

    [Fact]
    public void A_poor_pump_raises_the_vapour_temperature_of_DMSO()
    {
        var p = PlanFor("dmso", PlanInputs.Of(("coolant-temp", "25"), ("pump-limit", "5mbar")));
        // The pump holds 2 × 5 = 10 mbar; DMSO boils at 66.3 °C at 10 mbar by hand from Perry 2-8 DIPPR-101
        // (ln P = 56.273 − 7620.6/339.45 − 4.6279 ln 339.45 + 4.3819e−7·339.45² = 6.904 → 997 Pa).
        Assert.Equal("pump-limit", p.LimitingConstraint);
        Assert.Equal(10.0, p.VacuumSetpoint.Millibar, 0.05);
        Assert.Equal(66.3, p.Vapor.Celsius, 0.5);
        Assert.Equal(p.Vapor.Celsius + 20, p.Bath.Celsius, 1e-9);
    }

    [Fact]
    public void Conflicting_limits_name_both_and_what_would_resolve_them()
    {
        // Aspirator-grade pump (40 mbar ultimate → holds 80 mbar) on DMSO in a 95 °C water bath:
        // DMSO boils near 100 °C at 80 mbar, but the bath allows a vapour temperature of at most 75 °C.
        var p = PlanFor("dmso", PlanInputs.Of(("coolant-temp", "25"), ("pump-limit", "40")));
        var conflict = Assert.Single(p.Conflicts);
        Assert.Equal(("pump-limit", "bath-limit"), (conflict.LowerCode, conflict.UpperCode));
        Assert.False(p.Feasible);
        // Said once, as the finding of the limit that won, with both remedies.
        var finding = Assert.Single(p.Checks, c => c.Code == "bath-limit");
        Assert.StartsWith("Conflict", finding.Message(DisplayFormat.Default));
        Assert.Contains("oil bath", finding.Action(DisplayFormat.Default));
        Assert.Contains("better pump", finding.Action(DisplayFormat.Default));
        Assert.Equal(75.0, p.Vapor.Celsius, 1e-9);
        Assert.Contains(p.Checks, c => c.Code == "pump-limit");
    }

    [Fact]
    public void Dichloromethane_is_evaporated_at_atmospheric_pressure()
    {
        var p = PlanFor("dcm");
        // DCM boils at 312.95 K = 39.8 °C (CRC), below the preferred 40 °C: no vacuum needed.
        Assert.True(p.AtAtmosphericPressure);
        Assert.Equal("atmospheric-boiling-point", p.LimitingConstraint);
        Assert.Equal(1013.25, p.VacuumSetpoint.Millibar, 1e-6);
        Assert.Equal(39.8, p.Vapor.Celsius, 0.5);
    }

    [Fact]
    public void Altitude_lowers_the_atmospheric_boiling_point()
    {
        var p = PlanFor("acetone", PlanInputs.Of(("altitude", "1500")));
        // 1500 m: 101325·(1 − 2.25577e−5·1500)^5.25588 = 84 556 Pa (ICAO); acetone boils near 51 °C there
        // (CRC Tb 56.1 °C at 1 atm, about −0.36 K per 10 mbar near 1 atm, from memory), above 40 °C: vacuum still needed.
        Assert.Equal(845.56, p.Equipment.Atmosphere.Millibar, 0.05);
        Assert.InRange(p.AtmosphericBoilingPoint.Celsius, 49.5, 52.5);
        Assert.False(p.AtAtmosphericPressure);
    }

    [Theory]
    [InlineData("thf", "peroxide-former")]
    [InlineData("diisopropyl ether", "peroxide-former")]
    [InlineData("water", "bumping-risk")]
    [InlineData("benzene", "toxic-vapor")]
    [InlineData("diethyl ether", "flammable-exhaust")]
    public void Checks_fire_for_the_solvents_that_need_them(string name, string code) =>
        Assert.Contains(PlanFor(name).Checks, c => c.Code == code);

    [Fact]
    public void DMSO_freezes_in_a_10_C_condenser()
    {
        // DMSO melts at 291.67 K = 18.5 °C (CRC); coolant 10 °C is below it.
        var check = Assert.Single(PlanFor("dmso", PlanInputs.Of(("coolant-temp", "10"))).Checks, c => c.Code == "condenser-freeze");
        Assert.Equal(Checks.Severity.Warning, check.Severity);
    }

    [Fact]
    public void Carbon_disulfide_warns_of_a_hot_bath_near_its_autoignition_temperature()
    {
        // CS2 autoignites at about 90 °C (NFPA 497: 363 K); a water bath allowed to 95 °C is above it.
        var p = PlanFor("carbon disulfide");
        Assert.Contains(p.Checks, c => c.Code == "autoignition");
    }

    [Fact]
    public void Peroxide_severity_follows_the_class()
    {
        Assert.Equal(Checks.Severity.Danger, PlanFor("diisopropyl ether").Checks.First(c => c.Code == "peroxide-former").Severity);
        Assert.Equal(Checks.Severity.Warning, PlanFor("thf").Checks.First(c => c.Code == "peroxide-former").Severity);
    }

    [Fact]
    public void Every_plan_lists_its_assumptions_with_defaults_marked()
    {
        var p = PlanFor("toluene", PlanInputs.Of(("coolant-temp", "5")));
        Assert.Contains(p.Assumptions, a => a.Label == "coolant temperature" && !a.IsDefault && a.Basis == "given");
        Assert.Contains(p.Assumptions, a => a.Label == "pump ultimate pressure" && a.IsDefault);
    }

    [Fact]
    public void The_approach_steps_fall_to_the_setpoint_by_at_most_half_each()
    {
        var p = PlanFor("water");
        Assert.Equal(p.VacuumSetpoint.Pascal, p.Approach[^1].Pascal, 1e-6);
        double previous = p.Equipment.Atmosphere.Pascal;
        foreach (var step in p.Approach)
        {
            Assert.True(step.Pascal >= previous * 0.5 - 1e-6);
            previous = step.Pascal;
        }
    }
}
