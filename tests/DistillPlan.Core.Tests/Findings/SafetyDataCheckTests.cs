using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Tests.Findings;

/// <summary>
/// Safety checks that can be trusted: the conservative value where two standards differ, a
/// margin for heater surfaces and a warm pump exhaust, no silent skip, estimates said as such,
/// and no unreachable pressure shown as the setpoint.
/// </summary>
public class SafetyDataCheckTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static Plan PlanFor(string name, params (string, string)[] settings)
    {
        var charge = Charge.Pure(Library.Find(name));
        return SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), PlanInputs.Of(settings).Build());
    }

    [Fact]
    public void Carbon_disulfide_with_a_95_C_water_bath_is_a_danger()
    {
        // CS2 autoignites at 90 °C (NFPA 497 (2008): 363 K); a water bath may be set to 95 °C (common practice).
        var f = Assert.Single(PlanFor("carbon disulfide").Checks, c => c.Code == "autoignition");
        Assert.Equal(Severity.Danger, f.Severity);
    }

    [Fact]
    public void The_lower_published_autoignition_temperature_decides()
    {
        // Triethylamine: IEC 60079-20-1:2010 gives 215 °C, NFPA 497 (2008) 249 °C. With the lower one an
        // oil bath that may reach 180 °C is within 80 % of it (180 ≥ 0.8 × 215 = 172); with the higher it was not.
        var f = Assert.Single(PlanFor("triethylamine", ("heating", "oil-bath")).Checks, c => c.Code == "autoignition");
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Equal(215.0, f.Values["autoignition"].AsTemperature.Celsius, 0.5);
    }

    [Theory]
    // Flash points between 20 and 40 °C (NFPA 497 (2008) / IEC 60079-20-1:2010, the lower of the two):
    // never flagged while the exhaust was taken at room temperature.
    [InlineData("p-xylene")]
    [InlineData("chlorobenzene")]
    [InlineData("butyl acetate")]
    [InlineData("isobutanol")]
    [InlineData("2-butanol")]
    public void A_warm_pump_exhaust_makes_flash_points_below_40_C_a_warning(string name)
    {
        var f = Assert.Single(PlanFor(name).Checks, c => c.Code == "flammable-exhaust");
        Assert.True(f.Evaluated);
        Assert.InRange(f.Values["flash_point"].AsTemperature.Celsius, 20, 40);
        // The exhaust temperature is a setting: a user who measured a cool exhaust can say so.
        Assert.DoesNotContain(PlanFor(name, ("exhaust-temp", "15")).Checks, c => c.Code == "flammable-exhaust");
    }

    [Fact]
    public void A_missing_flammability_figure_is_shown_as_not_evaluated()
    {
        // DMSO's autoignition temperature is in neither NFPA 497 (2008) nor IEC 60079-20-1:2010 (the library records that).
        var f = Assert.Single(PlanFor("dmso").Checks, c => c.Code == "autoignition");
        Assert.False(f.Evaluated);
        Assert.Contains("NFPA 497", f.Message(DisplayFormat.Default));
    }

    [Fact]
    public void A_solvent_that_does_not_burn_needs_no_flammability_check()
    {
        var checks = PlanFor("water").Checks;
        Assert.DoesNotContain(checks, c => c.Code is "autoignition" or "flammable-exhaust");
    }

    [Theory]
    [InlineData("diglyme")]
    [InlineData("dimethyl carbonate")]
    [InlineData("cyclopentyl methyl ether")]
    public void A_plan_on_an_estimated_curve_says_so_with_the_expected_error(string name)
    {
        var f = Assert.Single(PlanFor(name).Checks, c => c.Code == "estimated-curve");
        Assert.Equal(Severity.Caution, f.Severity);
        Assert.Contains("%", f.Message(DisplayFormat.Default));
    }

    [Fact]
    public void A_published_curve_raises_no_estimate_caution() =>
        Assert.DoesNotContain(PlanFor("ethanol").Checks, c => c.Code == "estimated-curve");

    [Fact]
    public void A_pressure_the_pump_cannot_hold_is_never_the_setpoint()
    {
        // DMSO at a 90 °C jacket with a liquid-ring pump (35 mbar, holds 70): boiling at 65 °C needs about
        // 9 mbar (Perry 2-8 DIPPR-101), far below what the pump holds.
        var p = PlanFor("dmso", ("heating", "jacket"), ("bath-max", "90"), ("pump", "liquid-ring"), ("delta-t", "25,20"));
        Assert.False(p.Feasible);
        Assert.False(p.SetpointReachable);
        var report = PlanReports.ForPlan(p, new ReportContext([], k => k));
        var rows = report.Sections[0].Rows;
        Assert.DoesNotContain(rows, r => r.Label == "Vacuum setpoint");
        Assert.Contains(rows, r => r.Label == "Vacuum needed" && r.Note!.Contains("NOT REACHABLE"));
    }
}
