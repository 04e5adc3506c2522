using DistillPlan.Core.Checks;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;
using DistillPlan.Reports;
using DistillPlan.Tui.Model;

namespace DistillPlan.Tui.Tests;

public sealed class PlannerViewModelTests
{
    private static PlannerViewModel New() => new(TestLibrary.Library);

    // The reference for every expected value here is Core's own planner on the same inputs:
    // the view model must show what `distillplan setpoints` computes, not a number of its own.
    private static Plan Reference(string charge, PlanInputs? inputs = null)
    {
        var setup = (inputs ?? new PlanInputs()).Build();
        var c = ChargeParser.Parse(charge, Basis.Volume, TestLibrary.Library);
        return SetpointPlanner.Plan(c, BoilingSystems.For(c, null), setup);
    }

    [Fact]
    public void A_new_planner_already_has_a_plan_for_the_default_charge()
    {
        var vm = New();
        var expected = Reference(PlannerViewModel.DefaultCharge);
        Assert.NotNull(vm.Outcome.Plan);
        Assert.Equal(expected.VacuumSetpoint, vm.Outcome.Plan!.VacuumSetpoint);
        Assert.Contains($"Vacuum {vm.P(expected.VacuumSetpoint)}", vm.Readout()[0]);
        Assert.False(vm.IsDirty);
    }

    [Fact]
    public void Typing_a_charge_replans_with_the_same_result_as_the_core_planner()
    {
        var vm = New();
        int changes = 0;
        vm.Changed += () => changes++;
        vm.Edit(d => d with { Charge = "ethanol", Inputs = d.Inputs.With("coolant-temp", "0") });
        var expected = Reference("ethanol", PlanInputs.Of(("coolant-temp", "0")));
        Assert.Equal(expected.VacuumSetpoint, vm.Outcome.Plan!.VacuumSetpoint);
        Assert.Equal(expected.Bath, vm.Outcome.Plan.Bath);
        // Once for the edit (the plan is computing), once when its plan arrives.
        Assert.Equal(2, changes);
        Assert.True(vm.IsDirty);
    }

    [Theory]
    [InlineData("ethanoll", "nearest names")]
    [InlineData("ethanol=abc", "ethanol")]
    [InlineData("", "at least one solvent")]
    public void Bad_charge_text_gives_the_one_line_message_and_keeps_the_last_good_plan_marked_as_such(string charge, string fragment)
    {
        var vm = New();
        var good = vm.Outcome.Plan;
        vm.Edit(d => d with { Charge = charge });
        Assert.Same(good, vm.Outcome.Plan);
        Assert.False(vm.IsCurrent);
        Assert.Contains(fragment, vm.Error);
        Assert.DoesNotContain("\n", vm.Error);
        var readout = vm.Readout(width: 1000);
        Assert.StartsWith("Last good: Bath", readout[0]);
        Assert.Equal("Cannot plan: " + vm.Error, readout[1]);
        Assert.Contains(vm.Error!, vm.PlanReport(width: 1000));
        Assert.Contains("LAST GOOD PLAN", vm.PlanReport());
        // Fixed again: the plan is current and the error is gone.
        vm.Edit(d => d with { Charge = "ethanol" });
        Assert.True(vm.IsCurrent);
        Assert.Null(vm.Error);
        Assert.StartsWith("Bath", vm.Readout()[0]);
    }

    [Fact]
    public void A_bad_equipment_value_names_its_option_in_place_of_the_plan()
    {
        var vm = New();
        vm.SetSetting("pump-limit", "5 bananas");
        Assert.StartsWith("--pump-limit", vm.Error);
    }

    [Fact]
    public void The_plan_report_shows_every_check_with_its_severity_word_and_action_and_the_cautions()
    {
        var vm = New();
        vm.Edit(d => d with { Charge = "thf" });
        // A wide pane, so no message is wrapped and each can be found whole.
        string report = vm.PlanReport(width: 1000);
        Assert.NotEmpty(vm.Outcome.Plan!.Checks);
        foreach (var c in vm.Outcome.Plan.Checks)
        {
            Assert.Contains($"{SeverityText.Label(c.Severity)} {c.Code}: {c.Message(vm.Display)}", report);
            Assert.Contains(c.Action(vm.Display), report);
        }
        foreach (var caution in Cautions.General) Assert.Contains(caution, report);
    }

    [Fact]
    public void Cycling_the_unit_changes_how_the_setpoint_is_shown_not_its_value()
    {
        var vm = New();
        var before = vm.Outcome.Plan!.VacuumSetpoint;
        vm.CycleUnit();
        Assert.NotEqual("mbar", vm.Unit.Symbol);
        Assert.Equal(before, vm.Outcome.Plan!.VacuumSetpoint);
        Assert.Contains(vm.Unit.Symbol, vm.Readout()[0]);
    }

    [Fact]
    public void Search_finds_a_solvent_by_alias_and_by_cas_number()
    {
        var vm = New();
        var thf = TestLibrary.Library.Find("thf");
        Assert.Equal(thf, vm.Search("THF")[0].Solvent);
        Assert.Equal(thf, vm.Search(thf.Cas)[0].Solvent);
    }

    [Fact]
    public void Adding_a_solvent_leaves_an_amount_to_type_and_using_one_replaces_the_charge()
    {
        var vm = New();
        var heptane = TestLibrary.Library.Find("heptane");
        vm.Edit(d => d with { Charge = "ethyl-acetate=100mL" });
        vm.AddSolvent(heptane);
        Assert.Equal("ethyl-acetate=100mL," + PlannerViewModel.ChargeName(heptane) + "=", vm.Document.Charge);
        vm.UseSolvent(heptane);
        Assert.Equal(PlannerViewModel.ChargeName(heptane), vm.Document.Charge);
    }

    [Fact]
    public void The_ramp_of_a_pure_solvent_is_flat_at_the_setpoint_and_stops_short_of_dryness()
    {
        var vm = New();
        var ramp = vm.Outcome.Ramp!;
        Assert.All(ramp.Steps, s => Assert.Equal(vm.Outcome.Plan!.VacuumSetpoint.Pascal, s.Pressure.Pascal, 1e-6 * s.Pressure.Pascal));
        // The strip planner's default end: 5 % of the charge left (ethyl acetate is no peroxide former).
        Assert.Equal(1 - StripPlanner.DefaultFractionLeft, ramp.Steps[^1].Evaporated, 6);
        Assert.Equal(ramp.Steps.Count, vm.RampTable!.Rows.Count);
    }

    [Fact]
    public void The_ramp_is_the_strip_the_command_line_plans_with_the_same_basis_and_end()
    {
        // Pure DMF: the UI once stopped at 90 % "for peroxides" while the CLI went to 95 %.
        var vm = New();
        vm.Edit(d => d with { Charge = "dmf" });
        var expected = StripPlanner.Plan(vm.Outcome.Plan!, new StripRequest(null, StripEnd.Default), null, reportEvery: 0.1);
        Assert.Equal(expected.Steps[^1].Evaporated, vm.Outcome.Ramp!.Steps[^1].Evaporated, 9);
        Assert.Equal("volume", vm.Outcome.Ramp.Basis);
        Assert.Equal(expected.EndText(DisplayFormat.Default), vm.Outcome.Ramp.EndText(DisplayFormat.Default));
        Assert.DoesNotContain("peroxide", vm.Outcome.Ramp.EndText(DisplayFormat.Default));
    }

    [Fact]
    public void A_mixture_ramp_falls_in_pressure_as_the_light_solvent_leaves()
    {
        var vm = New();
        vm.Edit(d => d with { Charge = "ethyl-acetate=100mL,heptane=100mL" });
        var steps = vm.Outcome.Ramp!.Steps;
        Assert.True(steps.Count >= 3);
        Assert.Equal(vm.Outcome.Plan!.VacuumSetpoint.Pascal, steps[0].Pressure.Pascal, 1e-6 * steps[0].Pressure.Pascal);
        Assert.All(steps.Zip(steps.Skip(1)), p => Assert.True(p.Second.Pressure.Pascal <= p.First.Pressure.Pascal));
        Assert.True(steps[^1].Liquid["ethyl acetate"] < steps[0].Liquid["ethyl acetate"]);
        // The table shows every component's liquid fraction.
        Assert.Contains(vm.RampTable!.Columns, c => c.Header == "x ethyl acetate" && !c.MachineOnly);
        Assert.Contains(vm.RampTable.Columns, c => c.Header == "x heptane" && !c.MachineOnly);
    }

    [Fact]
    public void The_curve_picture_marks_the_setpoint_on_the_solvents_own_curve()
    {
        var vm = New();
        var c = vm.Outcome.Curve!;
        var plan = vm.Outcome.Plan!;
        Assert.Equal(Math.Log10(plan.VacuumSetpoint.Millibar), c.Operating.Log10Mbar, 9);
        Assert.InRange(c.Operating.Log10Mbar, c.MinLog10, c.MaxLog10);
        Assert.InRange(c.PumpLog10Mbar, c.MinLog10, c.MaxLog10);
        // Psat rises with temperature along the drawn curve.
        var pts = c.Lines[0].Points;
        Assert.All(pts.Zip(pts.Skip(1)), p => Assert.True(p.Second.Log10Mbar > p.First.Log10Mbar));
    }

    [Fact]
    public void Opening_a_file_replaces_the_document_and_marks_it_saved()
    {
        var vm = New();
        string path = Path.Combine(TestLibrary.RepoRoot, "examples", "dmf-reaction-workup.yaml");
        vm.Open(path);
        Assert.Equal(PlanFileReader.Load(path), vm.Document);
        Assert.False(vm.IsDirty);
        Assert.Equal("Torr", vm.Unit.Symbol);
    }

    [Fact]
    public void Saving_over_a_file_the_user_declines_keeps_the_document_unsaved()
    {
        var vm = New();
        vm.Edit(d => d with { Charge = "ethanol" });
        string path = Path.Combine(Path.GetTempPath(), $"dp-vm-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, "mine");
        try
        {
            Assert.Equal(SaveOutcome.Declined, vm.Save(path, _ => false));
            Assert.True(vm.IsDirty);
            Assert.Equal("mine", File.ReadAllText(path));
            Assert.Equal(SaveOutcome.Saved, vm.Save(path, _ => true));
            Assert.False(vm.IsDirty);
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void Wrapping_keeps_short_lines_as_they_are_and_indents_continuations()
    {
        var lines = LineWrap.Wrap("  short   aligned\n[!] WARNING a-long-code: one two three four five six", 24, 2).ToList();
        Assert.Equal("  short   aligned", lines[0]);
        Assert.All(lines, l => Assert.True(l.Length <= 24));
        Assert.StartsWith("  ", lines[2]);
    }

    [Theory]
    [InlineData(90, 78)]
    [InlineData(100, 20)]
    [InlineData(20, 18)]
    [InlineData(5000, 10)]
    public void Wrapping_ends_for_any_indent_and_width(int spaces, int width)
    {
        // A line indented by about the pane width once looped for ever in the plan pane.
        var lines = LineWrap.Wrap(new string(' ', spaces) + "word another-word " + new string('x', 300), width).ToList();
        Assert.All(lines, l => Assert.True(l.Length <= Math.Max(width, 8)));
        Assert.Contains(lines, l => l.Contains("word"));
    }
}
