using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>The planner screen driven through Terminal.Gui's ANSI driver at a fixed size, read back as text.</summary>
[Collection(TerminalCollection.Name)]
public sealed class HeadlessPlannerTests : IDisposable
{
    private readonly IApplication _app;
    private readonly PlannerWindow _window;
    private readonly PlannerViewModel _vm;
    private readonly SessionToken _session;

    public HeadlessPlannerTests()
    {
        _app = Application.Create();
        _app.Init(DriverRegistry.Names.ANSI);
        _app.Driver!.SetScreenSize(80, 24);
        _vm = new PlannerViewModel(TestLibrary.Library);
        // Questions answered "go on" (first button) and recent files kept in a temporary folder: no modal loop, no user files.
        _window = new PlannerWindow(_vm, Path.Combine(Path.GetTempPath(), "dp-none", "solvents.yaml"), new FakeDialogs { Answer = _ => 0 },
            new Model.RecentPlans(Path.Combine(Path.GetTempPath(), $"dp-recent-{Guid.NewGuid():N}.txt")));
        _window.AttachTo(_app);
        _session = _app.Begin(_window)!;
        _window.FocusSearch();
        _app.LayoutAndDraw();
    }

    public void Dispose()
    {
        _app.End(_session);
        _window.Dispose();
        _app.Dispose();
    }

    private string Screen()
    {
        _app.LayoutAndDraw();
        return _app.Driver!.ToString() ?? "";
    }

    private void Type(string text)
    {
        var injector = _app.GetInputInjector();
        foreach (char ch in text) injector.InjectKey(new Key(ch));
    }

    private void Press(Key key) => _app.GetInputInjector().InjectKey(key);

    [Fact]
    public void The_first_screen_shows_bath_vapour_vacuum_and_condenser_for_the_default_charge()
    {
        var p = _vm.Outcome.Plan!;
        string screen = Screen();
        Assert.Contains($"Bath {p.Bath}", screen);
        Assert.Contains($"Vapour {p.Vapor}", screen);
        Assert.Contains($"Vacuum {_vm.P(p.VacuumSetpoint)}", screen);
        Assert.Contains($"Condenser <= {p.CondenserMax}", screen);
    }

    [Fact]
    public void Typing_a_solvent_and_enter_updates_the_vacuum_setpoint_on_screen()
    {
        string before = _vm.P(_vm.Outcome.Plan!.VacuumSetpoint);
        Type("ethanol");
        Press(Key.Enter);
        string screen = Screen();
        Assert.Equal("ethanol", _vm.Document.Charge);
        string after = _vm.P(_vm.Outcome.Plan!.VacuumSetpoint);
        Assert.NotEqual(before, after);
        Assert.Contains($"Vacuum {after}", screen);
    }

    [Fact]
    public void F1_shows_the_help_with_every_key_and_F1_again_hides_it()
    {
        Press(Key.F1);
        string screen = Screen();
        foreach (var k in KeyMap.All) Assert.Contains(k.KeyText, screen);
        Press(Key.F1);
        Assert.DoesNotContain("F1 or Esc closes", Screen());
    }

    [Fact]
    public void The_plan_pane_shows_severity_words_without_colour()
    {
        Environment.SetEnvironmentVariable("NO_COLOR", "1");
        try
        {
            _vm.Edit(d => d with { Charge = "thf" });
            Press(Key.F4);
            string screen = Screen();
            Assert.Contains("WARNING", screen);
            Assert.Contains("Checks", screen);
        }
        finally { Environment.SetEnvironmentVariable("NO_COLOR", null); }
    }

    [Fact]
    public void Bad_input_shows_the_message_in_place_of_the_setpoints()
    {
        _vm.Edit(d => d with { Charge = "ethanoll" });
        Assert.Contains("Cannot plan: solvent: 'ethanoll' is not in the library", Screen());
    }

    [Fact]
    public void Every_pane_draws_and_a_resize_to_a_small_window_does_not_throw()
    {
        foreach (var k in KeyMap.Panes.Append(Key.F1))
        {
            Press(k);
            Assert.NotEmpty(Screen());
            foreach (var (w, h) in new[] { (40, 12), (20, 6), (120, 40), (80, 24) })
            {
                _app.Driver!.SetScreenSize(w, h);
                Assert.NotEmpty(Screen());
            }
        }
    }

    [Fact]
    public void The_pane_keys_switch_panes()
    {
        Press(Key.F5);
        Assert.Contains("O setpoint", Screen());
        Press(Key.F6);
        Assert.Contains("evaporated (by", Screen());
        Press(Key.F3);
        Assert.Contains("Coolant temp:", Screen());
    }
}
