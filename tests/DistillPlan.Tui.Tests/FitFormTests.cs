using DistillPlan.Core.Fitting;
using DistillPlan.Core.Quantities;
using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>
/// The fit form, driven headlessly at 80×24 like the planner tests. Points for water are from
/// IAPWS-IF97 (R7-97(2012) eq. 30, with the coefficients of tests/DistillPlan.Core.Tests/Reference/IapwsIf97.cs),
/// computed once and typed here: 30 °C 42.467 mbar, 50 °C 123.51 mbar, 70 °C 312.01 mbar, 90 °C 701.82 mbar.
/// </summary>
[Collection(TerminalCollection.Name)]
public sealed class FitFormTests : IDisposable
{
    private const string WaterPoints = "30C:42.467mbar,50C:123.51mbar,70C:312.01mbar,90C:701.82mbar";
    private readonly string _dir = Directory.CreateTempSubdirectory("dp-fit-tui-").FullName;
    private readonly IApplication _app;
    private readonly PlannerWindow _window;
    private readonly PlannerViewModel _vm;
    private readonly SessionToken _session;

    public FitFormTests()
    {
        _app = Application.Create();
        _app.Init(DriverRegistry.Names.ANSI);
        _app.Driver!.SetScreenSize(80, 24);
        _vm = new PlannerViewModel(TestLibrary.Library);
        _window = new PlannerWindow(_vm, Path.Combine(_dir, "solvents.yaml"), new FakeDialogs { Answer = _ => 0 }, new RecentPlans(Path.Combine(_dir, "recent.txt")));
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
        Directory.Delete(_dir, recursive: true);
    }

    private string Screen()
    {
        _app.LayoutAndDraw();
        return _app.Driver!.ToString() ?? "";
    }

    private void Type(string text)
    {
        foreach (char ch in text) _app.GetInputInjector().InjectKey(new Key(ch));
    }

    private void Press(Key key) => _app.GetInputInjector().InjectKey(key);

    private void FillIn(string name, string molarMass, string points)
    {
        Press(Key.F8);   // KeyMap.Fit; a fresh Key, as injecting marks the instance handled
        Type(name);
        Press(Key.Tab);
        Type(molarMass);
        Press(Key.Tab);
        Type(points);
    }

    [Fact]
    public void F8_opens_the_form_with_the_same_text_as_the_command_line_and_Esc_closes_it_keeping_the_plan()
    {
        Environment.SetEnvironmentVariable("NO_COLOR", "1");
        try
        {
            var plan = _vm.Document;
            string vacuum = _vm.P(_vm.Outcome.Plan!.VacuumSetpoint);
            FillIn("water-fit", "18.015", WaterPoints);
            string screen = Screen();
            // The CLI prints FitText.Lines of the same fit (FitVerbTests pins that); here the screen shows them.
            var pts = MeasuredPoints.ParseList(WaterPoints, "points", Pressure.FromPascal(101325));
            var expected = FitText.Lines(CompoundFit.Make("water-fit", pts, FitForm.Auto, false, 18.015), _vm.Unit);
            foreach (string line in expected.Take(10).Where(l => l.Length > 0)) Assert.Contains(line, screen);
            Assert.Contains("Antoine equation fitted to 4 measured points", screen);
            Press(Key.Esc);
            screen = Screen();
            Assert.DoesNotContain("Fit your own compound", screen);
            Assert.Equal(plan, _vm.Document);
            Assert.Contains($"Vacuum {vacuum}", screen);
        }
        finally { Environment.SetEnvironmentVariable("NO_COLOR", null); }
    }

    [Fact]
    public void Bad_points_show_one_line_saying_what_to_fix()
    {
        FillIn("x", "", "30C:42mbar,50C:abc");
        Assert.Contains("No fit: points: 'abc' is not valid", Screen());
    }

    [Fact]
    public void Adding_writes_the_users_library_and_the_planner_then_plans_the_compound()
    {
        FillIn("water-fit", "18.015", WaterPoints);
        Press(Key.A.WithAlt);   // the button's hot key
        string file = Path.Combine(_dir, "solvents.yaml");
        Assert.Contains("Added 'water-fit'", Screen());
        Assert.True(File.Exists(file));
        Assert.True(_vm.Library.TryFind("water-fit", out _));
        Press(Key.Esc);
        _vm.Edit(d => d with { Charge = "water-fit" });
        var plan = _vm.Outcome.Plan!;
        // IAPWS-IF97 at the plan's vapour temperature (40 °C by default): 73.84 mbar; the fit is within 0.5 %.
        Assert.Equal(40.0, plan.Vapor.Celsius, 1e-6);
        Assert.Equal(73.84, plan.VacuumSetpoint.Millibar, 73.84 * 0.005);
        // A second add of the same name is refused and the file is left as it was.
        string before = File.ReadAllText(file);
        Press(Key.F8);   // KeyMap.Fit; a fresh Key, as injecting marks the instance handled
        Press(Key.A.WithAlt);
        Assert.Contains("Not added", Screen());
        Assert.Equal(before, File.ReadAllText(file));
    }

    [Fact]
    public void The_form_draws_at_small_sizes_without_throwing()
    {
        FillIn("water-fit", "18.015", WaterPoints);
        foreach (var (w, h) in new[] { (40, 12), (20, 6), (120, 40), (80, 24) })
        {
            _app.Driver!.SetScreenSize(w, h);
            Assert.NotEmpty(Screen());
        }
    }
}
