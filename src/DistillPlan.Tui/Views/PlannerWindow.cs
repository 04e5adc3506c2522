using DistillPlan.Core;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The planner screen: the setpoint readout on top, the panes as tabs below, the main keys at
/// the bottom. It wires keys to the view model and tells the panes to redraw when the plan
/// changes; the panes themselves hold no planning logic.
/// </summary>
public sealed class PlannerWindow : Window
{
    private readonly PlannerViewModel _vm;
    private readonly SetpointReadout _readout = new();
    private readonly Tabs _tabs;
    private readonly ChargePane _charge;
    private readonly EquipmentPane _equipment;
    private readonly PlanPane _plan = new();
    private readonly CurvePane _curve = new();
    private readonly RampPane _ramp = new();
    private readonly HelpOverlay _help = new();
    private readonly FitOverlay _fit;
    private readonly View[] _panes;

    /// <summary>A planner screen over a view model.</summary>
    /// <param name="vm">The plan.</param>
    /// <param name="userLibraryPath">Where the fit form adds compounds (default: the per-user library).</param>
    public PlannerWindow(PlannerViewModel vm, string? userLibraryPath = null)
    {
        _vm = vm;
        Title = "DistillPlan";
        // The whole terminal is the window: a border would cost two of 24 rows.
        BorderStyle = Terminal.Gui.Drawing.LineStyle.None;
        _charge = new ChargePane(vm);
        _equipment = new EquipmentPane(vm);
        _panes = [_charge, _equipment, _plan, _curve, _ramp];

        _tabs = new Tabs { X = 0, Y = Pos.Bottom(_readout), Width = Dim.Fill(), Height = Dim.Fill(1) };
        for (int i = 0; i < _panes.Length; i++)
        {
            // The pane's key in its tab title: the tabs double as the key legend for panes.
            _panes[i].Title = $"F{i + 2} {_panes[i].Title}";
            _tabs.Add(_panes[i]);
        }

        var bar = new StatusBar(KeyMap.All.Where(k => k.InStatusBar is not null && k.Key is not null)
            .Select(k => new Shortcut(k.Key!, k.InStatusBar!, () => Handle(k.Key!))));
        _fit = new FitOverlay(new FitFormModel(userLibraryPath ?? Core.Library.SolventLibrary.DefaultUserPath), () => _vm.Unit);
        _fit.Added += vm.UseLibrary;
        Add(_readout, _tabs, bar, _help, _fit);

        KeyDown += (_, key) => { if (Handle(key)) key.Handled = true; };
        vm.Changed += ShowAll;
        ShowAll();
    }

    /// <summary>Shown in place of the plan when a file operation fails (one line, never a stack trace).</summary>
    public string? LastMessage { get; private set; }

    /// <summary>The pane on show.</summary>
    public View CurrentPane => _tabs.Value ?? _charge;

    /// <summary>Puts the cursor where a user starts: the solvent search.</summary>
    public void FocusSearch() => _charge.SearchField.SetFocus();

    private bool Handle(Key key)
    {
        if (key == KeyMap.Fit || (key == Key.Esc && _fit.Visible)) { ToggleFit(); return true; }
        if (key == KeyMap.Help || (key == Key.Esc && _help.Visible)) { ToggleHelp(); return true; }
        int pane = Array.FindIndex(KeyMap.Panes, k => k == key);
        if (pane >= 0) { ShowPane(_panes[pane]); return true; }
        if (key == KeyMap.Unit) { _vm.CycleUnit(); return true; }
        if (key == KeyMap.Save) { SaveAs(); return true; }
        if (key == KeyMap.Open) { OpenFile(); return true; }
        if (key == KeyMap.Quit) { Quit(); return true; }
        return false;
    }

    private void ShowPane(View pane)
    {
        _help.Visible = false;
        _fit.Visible = false;
        _tabs.Value = pane;
        if (pane == _charge) FocusSearch(); else pane.SetFocus();
    }

    private void ToggleHelp()
    {
        _fit.Visible = false;
        _help.Visible = !_help.Visible;
        if (_help.Visible) _help.SetFocus(); else CurrentPane.SetFocus();
        SetNeedsDraw();
    }

    private void ToggleFit()
    {
        _help.Visible = false;
        if (_fit.Visible) { _fit.Visible = false; CurrentPane.SetFocus(); } else _fit.Open();
        SetNeedsDraw();
    }

    private void ShowAll()
    {
        _readout.Show(_vm);
        _charge.Refresh();
        _equipment.Refresh();
        _plan.Show(_vm);
        _curve.Show(_vm);
        _ramp.Show(_vm);
        SetNeedsDraw();
    }

    // Without a running application (never in practice) a question is answered "no": nothing is lost.
    private int? Ask(string title, string message, params string[] buttons) =>
        App is null ? null : MessageBox.Query(App, title, message, buttons);

    private void Quit()
    {
        if (_vm.IsDirty)
        {
            int? answer = Ask( "Quit", "The plan has changes that are not saved.", "_Keep working", "_Quit without saving");
            if (answer != 1) return;
        }
        App?.RequestStop();
    }

    private void SaveAs()
    {
        string? path = PathPrompt.Ask(App, "Save plan", "Save to file:", _vm.FilePath ?? Path.Combine(Environment.CurrentDirectory, "plan.yaml"));
        if (path is null) return;
        try
        {
            var outcome = _vm.Save(path, full => Ask( "Replace file?",
                $"{full} already exists.\nReplace it with this plan?", "_Cancel", "_Replace") == 1);
            LastMessage = outcome == SaveOutcome.Saved ? $"Saved {path}" : "Not saved: the existing file was kept.";
        }
        catch (DistillPlanException e) { LastMessage = e.Message; }
        Ask( "Save", LastMessage, "_OK");
    }

    private void OpenFile()
    {
        if (_vm.IsDirty && Ask( "Open", "The plan has changes that are not saved.\nOpen another and discard them?", "_Cancel", "_Discard and open") != 1)
            return;
        string? path = PathPrompt.Ask(App, "Open plan", "Open file:", _vm.FilePath ?? Environment.CurrentDirectory + Path.DirectorySeparatorChar);
        if (path is null) return;
        try { _vm.Open(path); LastMessage = $"Opened {path}"; }
        catch (DistillPlanException e) { LastMessage = e.Message; Ask( "Open", e.Message, "_OK"); }
    }
}
