using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Core.Tests.Planning;

/// <summary>
/// Plans of wet and awkward mixtures against outside values: two liquids boil at the three-phase
/// point, the condenser must capture what boils off, and the pot must not freeze.
/// </summary>
public class MixturePlanTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static Plan PlanFor(string charge, string basis = "volume", params (string Key, string Value)[] settings)
    {
        var inputs = PlanInputs.Of([.. settings, ("basis", basis)]);
        var setup = inputs.Build();
        var c = ChargeParser.Parse(charge, setup.Basis, Library);
        return SetpointPlanner.Plan(c, BoilingSystems.For(c, setup.Model), setup);
    }

    /// <summary>Toluene by the Antoine constants of Williamham, Taylor and Rossini, J. Res. Natl. Bur. Stand. 35 (1945) 219,
    /// as listed in the NIST Chemistry WebBook: log10(P/bar) = 4.07827 − 1343.943/(T/K − 53.773), 308–384 K (from memory).
    /// A table other than the library's first toluene curve (Poling 2001).</summary>
    private static double TolueneWebBookPa(double t) => 1e5 * Math.Pow(10, 4.07827 - 1343.943 / (t - 53.773));

    [Fact]
    public void Wet_toluene_is_planned_at_the_three_phase_bubble_point()
    {
        var p = PlanFor("toluene=50,water=50", "mole");
        // Nearly immiscible liquids: P = Psat,water + Psat,toluene at 40 °C. Water by IAPWS-IF97 (7.385 kPa),
        // toluene by the NIST WebBook Antoine (7.883 kPa): 152.7 mbar. The one-liquid answer was 317.7 mbar.
        double expected = (IapwsIf97.SaturationPressurePa(313.15) + TolueneWebBookPa(313.15)) / 100;
        Assert.Equal(152.7, expected, 0.2);
        Assert.Equal(40.0, p.Vapor.Celsius, 1e-9);
        // Mutual solubility (under 1 % water in the toluene layer) lowers it a little: within 1 %.
        Assert.Equal(expected, p.VacuumSetpoint.Millibar, expected * 0.01);
        Assert.Equal(2, p.StartLiquidPhases.Count);
    }

    [Fact]
    public void Wet_toluene_says_two_liquids_and_that_toluene_leaves_first()
    {
        var p = PlanFor("toluene=50,water=50", "mole");
        var two = Assert.Single(p.Checks, c => c.Code == "two-liquids");
        Assert.Equal("water", two.Variant);
        Assert.Equal(Severity.Caution, two.Severity);
        string message = two.Message(DisplayFormat.Default);
        Assert.Contains("Two liquid phases", message);
        Assert.Contains("water comes off with the toluene", message);
        Assert.Contains("azeotropic drying works", two.Action(DisplayFormat.Default));
        // The vapour over two layers at 40 °C: y_toluene = Psat,toluene / P = 7.883 / 15.27 = 0.52 (same outside values).
        Assert.Equal(0.52, two.Values["vapor_a"].Value, 0.02);

        // Heteroazeotrope vapour 0.52 toluene over a 0.50 pot: toluene leaves first and water remains.
        var ramp = Assert.Single(p.Notes, n => n.Code == "pressure-ramp");
        Assert.StartsWith("two-liquids", ramp.Variant);
        Assert.Equal("toluene", ramp.Values["first"].Text);
        Assert.Equal("water", ramp.Values["residue"].Text);
        // The azeotrope at the setpoint is a heteroazeotrope (a working route), never "maximum-boiling".
        Assert.DoesNotContain(p.Checks, c => c.Code == "azeotrope" && c.Variant != "heterogeneous");
    }

    [Fact]
    public void A_wet_ethyl_acetate_extract_has_two_liquids()
    {
        // 10 vol % water in ethyl acetate is about 11 wt %; water dissolves in ethyl acetate only to about
        // 3 wt % at 20–40 °C (solubility tables, e.g. Stephenson and Stuart, J. Chem. Eng. Data 31 (1986) 56; from memory).
        var p = PlanFor("ethyl-acetate=90,water=10");
        Assert.Equal(2, p.StartLiquidPhases.Count);
        var two = Assert.Single(p.Checks, c => c.Code == "two-liquids");
        Assert.Contains("water comes off with the ethyl acetate", two.Message(DisplayFormat.Default));
    }

    [Fact]
    public void A_wet_column_fraction_with_two_heteroazeotropes_is_planned_with_its_ramp()
    {
        // Ethyl acetate and heptane both form heteroazeotropes with water (CRC azeotrope table, after Horsley; from memory):
        // two azeotrope findings of the same kind must both be kept, and the ramp must still be computed.
        var p = PlanFor("ethyl-acetate=45,heptane=45,water=10");
        Assert.Contains(p.Checks, c => c.Code == "two-liquids");
        Assert.NotNull(p.Ramp);
        Assert.True(p.Ramp!.Steps.Count > 1);
    }

    [Fact]
    public void A_pure_solvent_plan_gains_no_new_findings()
    {
        var p = PlanFor("ethanol");
        string[] added = ["two-liquids", "pot-freezing", "condensate-capture", "coolant-limit", "liquid-phases", "published-azeotrope"];
        Assert.DoesNotContain(p.Checks.Concat(p.Notes), f => added.Contains(f.Code));
        Assert.Equal("preferred-vapor-temperature", p.LimitingConstraint);
        Assert.Equal(20.0, p.CondenserMax.Celsius, 1e-9);
        Assert.True(p.Feasible);
    }

    [Theory]
    [InlineData("diethyl-ether=10,dmso=90")]
    [InlineData("dichloromethane=10,dmf=90")]
    public void A_little_low_boiler_in_a_high_boiler_is_planned_so_the_condenser_captures_it(string charge)
    {
        var p = PlanFor(charge);
        Assert.Equal("condensate-capture", p.LimitingConstraint);
        Assert.True(p.Feasible);
        // Breakthrough: the condensate (composition y) has a bubble pressure at the coolant at or above the setpoint.
        double condensate = p.System.BubblePressure(p.Equipment.Coolant.Kelvin, p.StartVapor).PressurePa;
        Assert.True(condensate < p.VacuumSetpoint.Pascal, $"condensate {condensate} Pa vs setpoint {p.VacuumSetpoint.Pascal} Pa");
        Assert.DoesNotContain(p.Checks, c => c.Code == "condenser-breakthrough");
        // The ramp holds the pressure, so no later step sends vapour to the pump either.
        Assert.NotNull(p.Ramp);
        Assert.DoesNotContain(p.Ramp!.Steps.SelectMany(s => s.Findings), c => c.Code == "condenser-breakthrough");
        // The condenser limit follows the condensate: colder than the pot's ΔT rule would say.
        Assert.True(p.CondenserMax < p.Vapor - p.Rules.VaporToCondenser);
        Assert.Contains(p.Notes, n => n.Code == "condensate-capture");
    }

    [Fact]
    public void Ether_in_DMSO_starts_above_the_ethers_own_vapour_pressure_at_the_condenser()
    {
        // Coolant 17 °C + 3 K margin = 20 °C, where diethyl ether has a vapour pressure of 58.6 kPa
        // (GESTIS substance database / SDS value; from memory). The first vapour is over 99 % ether, so the
        // setpoint must be above about 0.99 × 586 mbar; before the fix the plan was 372 mbar.
        var p = PlanFor("diethyl-ether=10,dmso=90", "volume", ("coolant-temp", "17"));
        Assert.True(p.StartVapor[0] > 0.99);
        Assert.True(p.VacuumSetpoint.Millibar > 0.99 * 586 * 0.98, $"setpoint {p.VacuumSetpoint.Millibar} mbar");
    }

    [Fact]
    public void A_coolant_too_warm_for_any_allowed_pressure_is_named_with_the_coolant_that_works()
    {
        // Coolant 33 °C: ether boils at 307.55 K = 34.4 °C at one atmosphere (CRC), so with a 3 K margin no
        // pressure up to the atmosphere captures an ether-rich vapour; the coolant that would is about 34.4 − 3 °C.
        var p = PlanFor("diethyl-ether=10,dmso=90", "volume", ("coolant-temp", "33"));
        var f = Assert.Single(p.Checks, c => c.Code == "coolant-limit" && c.Variant == "condensate");
        Assert.False(p.Feasible);
        Assert.Equal(34.4 - 3, f.Values["needed_coolant"].AsTemperature.Celsius, 1.0);
    }

    [Fact]
    public void A_tert_butanol_pot_is_kept_above_its_melting_point()
    {
        var p = PlanFor("tert-butanol", "volume", ("vapor-temp", "15"), ("coolant-temp", "-10"));
        // tert-Butanol melts at 298.96 K = 25.8 °C (CRC, Physical Constants of Organic Compounds); margin 2 K.
        Assert.Equal("pot-freezing", p.LimitingConstraint);
        Assert.True(p.Vapor.Celsius >= 25.81 + 2 - 1e-6, $"pot at {p.Vapor.Celsius} °C");
        Assert.DoesNotContain(p.Checks, c => c.Code == "pot-freezing");
    }

    [Fact]
    public void A_strip_at_20_mbar_over_a_mostly_DMSO_pot_is_flagged_as_freezing()
    {
        var p = PlanFor("diethyl-ether=50mL,dmso=50mL");
        var strip = StripPlanner.Plan(p, new StripRequest(Pressure.FromPascal(2000), StripEnd.Default));
        // The pot boils far below 0 °C at 20 mbar, while DMSO (59 mol % of it) melts at 291.67 K = 18.5 °C (CRC).
        Assert.True(strip.Steps[0].Vapor.Celsius < 0);
        var f = Assert.Single(strip.Findings, c => c.Code == "pot-freezing");
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Equal(18.52, f.Values["melting_point"].AsTemperature.Celsius, 0.05);
        // What to do names a pressure at which the pot boils above the limit.
        Assert.True(f.Values["safe_pressure"].AsPressure.Pascal > 2000);
    }

    [Fact]
    public void Every_finding_of_these_plans_has_its_wording()
    {
        var plans = new[]
        {
            PlanFor("toluene=50,water=50", "mole"), PlanFor("diethyl-ether=10,dmso=90"), PlanFor("dichloromethane=10,dmf=90"),
            PlanFor("tert-butanol", "volume", ("vapor-temp", "15"), ("coolant-temp", "-10")), PlanFor("ethyl-acetate=90,water=10"),
            PlanFor("diethyl-ether=10,dmso=90", "volume", ("coolant-temp", "33")), PlanFor("acetic-acid=50,water=50"),
        };
        var all = plans.SelectMany(p => p.Checks.Concat(p.Notes).Concat(p.Ramp?.Steps.SelectMany(s => s.Findings) ?? [])).ToList();
        foreach (var f in all)
        {
            Assert.False(string.IsNullOrWhiteSpace(f.Message(DisplayFormat.Default)));
            _ = f.Action(DisplayFormat.Default);
        }
        Assert.Contains(all, f => f.Code == "model" && f.Variant == "approximate");
    }
}
