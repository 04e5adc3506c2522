using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>Issue 11, items 3-9 on the screen, at 80×24 with NO_COLOR=1 unless a test says otherwise.</summary>
[Collection(TerminalCollection.Name)]
public sealed class ScreenLayoutTests : IDisposable
{
    private readonly PlannerHarness _h;

    public ScreenLayoutTests()
    {
        Environment.SetEnvironmentVariable("NO_COLOR", "1");
        _h = new PlannerHarness();
    }

    public void Dispose()
    {
        _h.Dispose();
        Environment.SetEnvironmentVariable("NO_COLOR", null);
    }

    private string DebugFocus()
    {
        var chain = new List<string>();
        for (Terminal.Gui.ViewBase.View? v = _h.Window; v is not null; v = v.Focused) chain.Add(v.GetType().Name + ":" + v.Title);
        return string.Join(" > ", chain);
    }

    private string LineWith(string text) => _h.Lines().First(l => l.Contains(text));

    // ---- 3. Focus without colour, one job per key ----

    [Fact]
    public void Every_focusable_view_shows_a_marker_when_it_has_focus()
    {
        Assert.Contains("│>Find solvent:", _h.Screen());
        _h.Type("eth");
        _h.Press(Key.CursorDown);
        Assert.Contains("│> matches", _h.Screen());
        Assert.Contains("│ Find solvent:", _h.Screen());
        _h.Press(Key.Tab);
        Assert.Contains("│>Charge:", _h.Screen());
        _h.Press(Key.F3);
        Assert.Contains("│>Unit:", _h.Screen());
        _h.Press(Key.F4);
        Assert.Contains("│> Plan report", _h.Screen());
        _h.Press(Key.F5);
        Assert.Contains("│> Vapour pressure", _h.Screen());
        _h.Press(Key.F6);
        Assert.Contains("│> Steps", _h.Screen());
    }

    [Fact]
    public void Arrows_on_the_curve_neither_switch_tabs_nor_pan_the_plot()
    {
        _h.Press(Key.F5);
        string before = _h.Screen();
        _h.Press(Key.CursorLeft);
        Assert.True(_h.Window.CurrentPane == _h.Window.Curve, DebugFocus());
        _h.Press(Key.CursorLeft, 4);
        _h.Press(Key.CursorRight, 12);
        _h.Press(Key.CursorUp, 3);
        Assert.Same(_h.Window.Curve, _h.Window.CurrentPane);
        Assert.Equal(before, _h.Screen());
    }

    [Fact]
    public void Left_and_Right_on_the_ramp_move_through_the_table_and_stay_on_the_pane()
    {
        _h.Vm.Edit(d => d with { Charge = "ethyl-acetate=50,ethanol=30,water=20" });
        _h.Press(Key.F6);
        var seen = new HashSet<string>();
        for (int i = 0; i < 12; i++)
        {
            string screen = _h.Screen();
            foreach (string c in new[] { "x ethyl", "x ethan", "x water", "Evap.", "Bath" }) if (screen.Contains(c)) seen.Add(c);
            _h.Press(Key.CursorRight);
        }
        Assert.Same(_h.Window.Ramp, _h.Window.CurrentPane);
        // Every component's column is reachable (the table scrolls sideways when they do not all fit).
        Assert.Contains("x water", seen);
        Assert.Contains("x ethan", seen);
        Assert.Contains("Evap.", seen);
        _h.Press(Key.CursorLeft, 12);
        Assert.Same(_h.Window.Ramp, _h.Window.CurrentPane);
    }

    [Fact]
    public void PgDn_scrolls_the_plan_text_also_after_other_keys()
    {
        _h.Vm.Edit(d => d with { Charge = "thf" });
        _h.Press(Key.F4);
        _h.Press(Key.CursorDown);
        _h.Press(Key.CursorUp);
        int top = _h.Window.PlanText.Lines.Viewport.Y;
        _h.Press(Key.PageDown);
        Assert.True(_h.Window.PlanText.Lines.Viewport.Y > top, _h.Screen());
        _h.Press(Key.PageUp);
        Assert.Equal(top, _h.Window.PlanText.Lines.Viewport.Y);
    }

    [Fact]
    public void The_help_lists_every_key_of_the_key_map()
    {
        _h.App.Driver!.SetScreenSize(100, 40);
        _h.Press(Key.F1);
        string screen = _h.Screen();
        var lines = screen.Split('\n');
        foreach (var k in KeyMap.All) Assert.Contains(lines, l => l.Contains(k.KeyText + " ") && l.Contains(k.What));
        // The bottom line is built from the same map.
        foreach (var k in KeyMap.All.Where(k => k.InStatusBar is not null)) Assert.Contains($"{k.KeyText} {k.InStatusBar}", screen);
    }

    // ---- 4. Nothing cut off ----

    [Fact]
    public void The_condenser_limit_keeps_its_value_when_no_vacuum_is_needed()
    {
        // Diethyl ether boils at 34.6 °C (CRC) below the default 40 °C vapour temperature: no vacuum is needed.
        _h.Vm.Edit(d => d with { Charge = "diethyl-ether" });
        var p = _h.Vm.Outcome.Plan!;
        Assert.True(p.AtAtmosphericPressure);
        Assert.Contains("(none needed)", _h.Screen());
        Assert.Contains($"<= {p.CondenserMax}", _h.Screen());
    }

    [Fact]
    public void The_pump_field_shows_its_whole_value()
    {
        _h.Vm.SetSetting("pump", "liquid-ring");
        _h.Press(Key.F3);
        Assert.Contains(" liquid-ring ", LineWith("Pump:"));
    }

    [Fact]
    public void Below_one_mbar_the_curve_axes_stay_at_the_edge_under_the_pump_line()
    {
        _h.Vm.Edit(d => d with { Charge = "dmso", Inputs = d.Inputs.With("pump-limit", "0.05mbar").With("coolant-temp", "-10") });
        _h.Press(Key.F5);
        var lines = _h.Lines().ToList();
        int axis = lines.FindIndex(l => l.Contains("┼─"));
        int pump = lines.FindIndex(l => l.Contains("....P"));
        Assert.True(axis > 0 && pump > 0, string.Join("\n", lines));
        Assert.True(pump < axis, string.Join("\n", lines));
        Assert.True(pump < axis, "the pump line is drawn above the axis");
        // Nothing of the plot below the axis but its tick labels and title.
        Assert.DoesNotContain('*', lines[axis + 1]);
    }

    [Fact]
    public void In_Torr_the_axis_and_the_legend_say_Torr()
    {
        _h.Vm.Edit(d => d with { PressureUnit = "Torr" });
        _h.Press(Key.F5);
        Assert.Equal("Torr", _h.Window.Curve.Graph.AxisY.Text);
        string screen = _h.Screen();
        Assert.Contains($"O setpoint {_h.Vm.P(_h.Vm.Outcome.Plan!.VacuumSetpoint)}", screen);
        Assert.Contains(" Torr", screen);
        Assert.DoesNotContain("mbar", screen.Split('\n').SkipWhile(l => !l.Contains("Vapour pressure")).Aggregate("", (a, l) => a + l));
    }

    // ---- 5. Mixture builder ----

    [Fact]
    public void Ctrl_A_on_an_empty_charge_adds_name_equals_and_the_typed_amount_follows_the_equals()
    {
        _h.Vm.Edit(d => d with { Charge = "" });
        _h.Type("water");
        _h.Press(Key.A.WithCtrl);
        Assert.Equal("water=", _h.Vm.Document.Charge);
        _h.Type("30");
        Assert.Equal("water=30", _h.Vm.Document.Charge);
        _h.Press(Key.Esc);
        _h.Type("ethanol");
        _h.Press(Key.A.WithCtrl);
        _h.Type("70");
        Assert.Equal("water=30,ethanol=70", _h.Vm.Document.Charge);
    }

    [Fact]
    public void Ctrl_A_on_the_solvent_already_charged_does_not_add_it_twice()
    {
        _h.Type("ethyl acetate");
        _h.Press(Key.A.WithCtrl);
        Assert.Equal("ethyl-acetate=", _h.Vm.Document.Charge);
    }

    // ---- 6. Notes and the ΔT hint ----

    [Fact]
    public void Notes_typed_in_the_charge_pane_are_saved_in_the_plan_file()
    {
        _h.Window.Charge.Notes.SetFocus();
        _h.Type("batch 7, cloudy");
        Assert.Contains("│>Notes:", _h.Screen());
        Assert.Equal("batch 7, cloudy", _h.Vm.Document.Notes);
        string path = Path.Combine(_h.Dir, "notes.yaml");
        _h.Dialogs.Paths.Enqueue(path);
        _h.Press(Key.S.WithCtrl);
        Assert.Equal("batch 7, cloudy", PlanFileReader.Load(path).Notes);
        Assert.False(_h.Vm.IsDirty);
    }

    [Fact]
    public void The_delta_T_hint_names_both_steps()
    {
        _h.App.Driver!.SetScreenSize(120, 40);
        _h.Press(Key.F3);
        Assert.Contains("default 20 K bath→vapour, 20 K vapour→cond.", LineWith("ΔT steps:"));
        Assert.DoesNotContain("bath,condenser", _h.Screen());
    }

    // ---- 7. Files ----

    [Fact]
    public void Saving_and_opening_go_through_the_dialogs_and_fill_the_recent_list()
    {
        _h.Vm.Edit(d => d with { Charge = "ethanol" });
        string path = Path.Combine(_h.Dir, "day.yaml");
        _h.Dialogs.Paths.Enqueue(path);
        _h.Press(Key.S.WithCtrl);
        Assert.Contains($"Saved {path}", _h.Screen());
        Assert.Equal([path], _h.Recent.Paths);
        string example = Path.Combine(TestLibrary.RepoRoot, "examples", "dmf-reaction-workup.yaml");
        _h.Dialogs.Paths.Enqueue(example);
        _h.Press(Key.O.WithCtrl);
        Assert.Equal([example, path], _h.Recent.Paths);
        _h.Dialogs.Picked = 1;
        _h.Press(Key.R.WithCtrl);
        Assert.Equal("ethanol", _h.Vm.Document.Charge);
        Assert.Equal(path, _h.Vm.FilePath);
    }

    [Fact]
    public void A_bad_plan_file_is_one_line_on_screen_and_the_plan_stays()
    {
        string bad = Path.Combine(_h.Dir, "bad.yaml");
        File.WriteAllText(bad, "format: something-else\n");
        _h.Dialogs.Paths.Enqueue(bad);
        _h.Press(Key.O.WithCtrl);
        Assert.Equal(PlannerViewModel.DefaultCharge, _h.Vm.Document.Charge);
        Assert.Contains("bad.yaml:1: format 'something-else'", _h.Window.LastMessage);
        Assert.Contains(_h.Window.LastMessage![..40], _h.Screen());
    }

    [Fact]
    public void A_broken_user_library_is_one_line_on_screen_and_the_shipped_library_plans()
    {
        string broken = Path.Combine(_h.Dir, "solvents.yaml");
        File.WriteAllText(broken, "solvents:\n  - name: [unclosed\n");
        var (library, problem) = LibraryStartup.Load(broken);
        using var h = new PlannerHarness(vm: new PlannerViewModel(library) { LibraryProblem = problem });
        string screen = h.Screen();
        Assert.Contains("Your solvent library was not loaded", screen);
        Assert.Contains("Vacuum", screen);
        h.Vm.Edit(d => d with { Charge = "ethanol" });
        Assert.NotNull(h.Vm.Outcome.Plan);
    }

    // ---- 8. Export ----

    [Fact]
    public void Ctrl_E_exports_the_plan_report_and_on_the_ramp_pane_the_ramp()
    {
        string md = Path.Combine(_h.Dir, "plan.md"), csv = Path.Combine(_h.Dir, "ramp.csv");
        _h.Dialogs.Paths.Enqueue(md);
        _h.Press(Key.E.WithCtrl);
        Assert.True(File.Exists(md), _h.Window.LastMessage + "\n" + _h.Screen());
        Assert.Contains("plan report", _h.Dialogs.PathTitles[^1]);
        Assert.Equal(DistillPlan.Reports.MarkdownReport.Render(_h.Vm.Outcome.Report!, _h.Vm.Display).Split('\n')[0], File.ReadAllLines(md)[0]);
        _h.Press(Key.F6);
        _h.Dialogs.Paths.Enqueue(csv);
        _h.Press(Key.E.WithCtrl);
        Assert.Contains("ramp", _h.Dialogs.PathTitles[^1]);
        Assert.Contains($"Exported the ramp report to {csv}", _h.Screen());
        Assert.True(File.Exists(csv));
    }

    // ---- 9. The equipment pane scrolls at 80×24 and grows with the terminal ----

    [Fact]
    public void Every_equipment_field_comes_into_view_when_it_has_focus()
    {
        _h.Press(Key.F3);
        foreach (var s in EquipmentPane.Shown)
        {
            _h.Window.Equipment.EntryOf(s.Key).SetFocus();
            Assert.Contains(">" + s.Caption, _h.Screen());
        }
    }

    [Fact]
    public void PgDn_in_the_equipment_pane_moves_a_page_of_fields()
    {
        _h.Press(Key.F3);
        _h.Press(Key.PageDown, 3);
        Assert.True(_h.Window.Equipment.EntryOf(EquipmentPane.Shown.Last().Key).HasFocus);
        Assert.Contains(">" + EquipmentPane.Shown.Last().Caption, _h.Screen());
        Assert.Contains("ΔT steps in K: one for both (20), or bath→vapour,vapour→condenser (25,20).", _h.Screen());
    }

    [Fact]
    public void A_tall_terminal_shows_every_equipment_field_at_once()
    {
        _h.App.Driver!.SetScreenSize(120, 45);
        _h.Press(Key.F3);
        string screen = _h.Screen();
        foreach (var s in EquipmentPane.Shown) Assert.Contains(s.Caption, screen);
        foreach (string size in new[] { "flask", "vessel", "area", "heat-transfer", "condenser-capacity", "condenser-area", "pump-speed", "leak-rate", "start-temp", "min-volume", "max-volume" })
            Assert.Contains(EquipmentPane.Shown, s => s.Key == size);
    }
}
