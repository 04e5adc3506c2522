using DistillPlan.Core;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The planner screen: the setpoint readout on top, the panes as tabs below, the main keys at
/// the bottom. It wires keys to the view model and tells the panes to redraw when the plan
/// changes; the panes themselves hold no planning logic. Nothing the user typed is lost
/// without a question: Esc never quits, and every way out asks while there are unsaved changes.
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
    private readonly SwapOverlay _swap;
    private readonly View[] _panes;
    private readonly IPlannerDialogs _dialogs;
    private readonly RecentPlans _recent;
    private bool _leaveConfirmed;

    /// <summary>A planner screen over a view model.</summary>
    /// <param name="vm">The plan.</param>
    /// <param name="userLibraryPath">Where the fit form adds compounds (default: the per-user library).</param>
    /// <param name="dialogs">Questions and file choosers (default: Terminal.Gui's dialogs).</param>
    /// <param name="recent">The recent-files list (default: in the user's config folder).</param>
    public PlannerWindow(PlannerViewModel vm, string? userLibraryPath = null, IPlannerDialogs? dialogs = null, RecentPlans? recent = null)
    {
        _vm = vm;
        _dialogs = dialogs ?? new TerminalDialogs(() => App);
        _recent = recent ?? new RecentPlans(RecentPlans.DefaultFile);
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
            // Arrows and page keys that no view in the pane used stop at the pane: they never also switch tabs.
            _panes[i].KeyDown += (_, key) => { if (PaneKeys.Any(k => k == key)) key.Handled = true; };
        }
        NoFocusOnTabHeaders();

        // The main keys on the bottom line, from the one key map, as plain text: readable without colour.
        var bar = new Label
        {
            X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Height = 1,
            Text = string.Join("  ", KeyMap.All.Where(k => k.InStatusBar is not null).Select(k => $"{k.KeyText} {k.InStatusBar}")),
        };
        _fit = new FitOverlay(new FitFormModel(userLibraryPath ?? Core.Library.SolventLibrary.DefaultUserPath), () => _vm.Unit);
        _fit.Added += vm.UseLibrary;
        _swap = new SwapOverlay(new SwapFormModel(() => _vm.Document, () => _vm.Library), () => _vm.Display);
        Add(_readout, _tabs, bar, _help, _fit, _swap);

        LastMessage = vm.LibraryProblem;
        KeyDown += (_, key) => { if (Handle(key)) key.Handled = true; };
        vm.Changed += ShowAll;
        ShowAll();
    }

    private static readonly Key[] PaneKeys = [Key.CursorLeft, Key.CursorRight, Key.CursorUp, Key.CursorDown, Key.PageUp, Key.PageDown, Key.Home, Key.End];

    /// <summary>
    /// Takes the planner's own keys (KeyMap) before any field sees them, so a text field's editing
    /// keys (Ctrl+E, Ctrl+R …) never hide them; while a dialog is on top, every key is the dialog's.
    /// </summary>
    public void AttachTo(Terminal.Gui.App.IApplication app)
    {
        NoFocusOnTabHeaders();
        app.Keyboard.KeyDown += (_, key) =>
        {
            if (!key.Handled && ReferenceEquals(app.TopRunnableView, this) && Handle(key)) key.Handled = true;
        };
    }

    /// <summary>The last thing the planner said (a file opened, saved or exported, or why not): one line, never a stack trace.</summary>
    public string? LastMessage { get; private set; }

    /// <summary>The pane on show.</summary>
    public View CurrentPane => _tabs.Value ?? _charge;

    /// <summary>Puts the cursor where a user starts: the solvent search.</summary>
    public void FocusSearch() => _charge.SearchField.SetFocus();

    internal ChargePane Charge => _charge;
    internal EquipmentPane Equipment => _equipment;
    internal PlanPane PlanText => _plan;
    internal CurvePane Curve => _curve;
    internal RampPane Ramp => _ramp;

    private bool Handle(Key key)
    {
        if (key == KeyMap.Fit) { ToggleFit(); return true; }
        if (key == KeyMap.Swap) { ToggleSwap(); return true; }
        if (key == KeyMap.Help) { ToggleHelp(); return true; }
        if (key == KeyMap.Back) { Back(); return true; }
        int pane = Array.FindIndex(KeyMap.Panes, k => k == key);
        if (pane >= 0) { ShowPane(_panes[pane]); return true; }
        if (key == KeyMap.Unit) { _vm.CycleUnit(); return true; }
        if (key == KeyMap.Save) { SaveAs(); return true; }
        if (key == KeyMap.Open) { OpenFile(); return true; }
        if (key == KeyMap.Recent) { OpenRecent(); return true; }
        if (key == KeyMap.Export) { Export(); return true; }
        if (key == KeyMap.Quit) { Quit(); return true; }
        return false;
    }

    // Esc closes what is drawn over the panes, or goes back to where a user starts; it never quits.
    private void Back()
    {
        if (_fit.Visible) { ToggleFit(); return; }
        if (_swap.Visible) { ToggleSwap(); return; }
        if (_help.Visible) { ToggleHelp(); return; }
        ShowPane(_charge);
    }

    // The tab headers take no focus: F2-F6 choose panes, and a focused header showed no marker without colour.
    private void NoFocusOnTabHeaders()
    {
        foreach (var pane in _panes)
            if (pane.Border?.View is View border)
                foreach (var header in border.SubViews) header.CanFocus = false;
    }

    private void ShowPane(View pane)
    {
        NoFocusOnTabHeaders();
        _help.Visible = false;
        _fit.Visible = false;
        _swap.Visible = false;
        _tabs.Value = pane;
        if (pane == _charge) FocusSearch();
        else pane.SetFocus();
    }

    private void ToggleHelp()
    {
        _fit.Visible = false;
        _swap.Visible = false;
        _help.Visible = !_help.Visible;
        if (_help.Visible) _help.SetFocus(); else CurrentPane.SetFocus();
        SetNeedsDraw();
    }

    private void ToggleSwap()
    {
        _help.Visible = false;
        _fit.Visible = false;
        if (_swap.Visible) { _swap.Visible = false; CurrentPane.SetFocus(); } else _swap.Open();
        SetNeedsDraw();
    }

    internal SwapOverlay Swap => _swap;

    private void ToggleFit()
    {
        _help.Visible = false;
        _swap.Visible = false;
        if (_fit.Visible) { _fit.Visible = false; CurrentPane.SetFocus(); } else _fit.Open();
        SetNeedsDraw();
    }

    private void ShowAll()
    {
        _readout.Show(_vm, LastMessage);
        // While a plan computes, the panes keep the last good plan: only the readout says so.
        // Refreshing every pane on every keystroke (hints, report, curve, ramp) made a paste of
        // thousands of characters take minutes; the panes refresh once the new plan arrives.
        if (_vm.IsComputing)
        {
            SetNeedsDraw();
            return;
        }
        _charge.Refresh();
        _equipment.Refresh();
        _plan.Show(_vm);
        _curve.Show(_vm);
        _ramp.Show(_vm);
        SetNeedsDraw();
    }

    private void Say(string message)
    {
        LastMessage = message;
        _readout.Show(_vm, LastMessage);
        SetNeedsDraw();
    }

    /// <summary>True when nothing unsaved would be lost, or the user said to go on. The safe answer is the last (default) button.</summary>
    private bool MayDiscard(string title, string message, string discard, string keep) =>
        !_vm.IsDirty || _dialogs.Ask(title, message, discard, keep) == 0;

    private void Quit()
    {
        if (!MayDiscard("Quit", "The plan has changes that are not saved.", "_Quit without saving", "_Keep working")) return;
        _leaveConfirmed = true;
        App?.RequestStop();
    }

    /// <summary>Every way out (Ctrl+Q, the application's own quit key, a stop request) asks first while there are unsaved changes.</summary>
    protected override bool OnIsRunningChanging(bool oldIsRunning, bool newIsRunning)
    {
        if (oldIsRunning && !newIsRunning && !_leaveConfirmed
            && !MayDiscard("Quit", "The plan has changes that are not saved.", "_Quit without saving", "_Keep working"))
            return true;
        return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
    }

    private bool ConfirmReplace(string full) =>
        _dialogs.Ask("Replace file?", $"{full} already exists.\nReplace it?", "_Replace", "_Cancel") == 0;

    private void SaveAs()
    {
        string? path = _dialogs.SavePath("Save plan", _vm.FilePath ?? Path.Combine(Environment.CurrentDirectory, "plan.yaml"));
        if (path is null) return;
        try
        {
            var outcome = _vm.Save(path, ConfirmReplace);
            if (outcome == SaveOutcome.Saved) _recent.Add(path);
            Say(outcome == SaveOutcome.Saved ? $"Saved {path}" : "Not saved: the existing file was kept.");
        }
        catch (DistillPlanException e) { Say(e.Message); }
    }

    private void OpenFile()
    {
        if (!MayDiscard("Open", "The plan has changes that are not saved.\nOpen another and discard them?", "_Discard and open", "_Cancel")) return;
        string? start = _vm.FilePath is string f ? Path.GetDirectoryName(f) : Environment.CurrentDirectory;
        if (_dialogs.OpenPath("Open plan", start is null ? null : start + Path.DirectorySeparatorChar) is string path) OpenPath(path);
    }

    private void OpenRecent()
    {
        var paths = _recent.Paths;
        if (paths.Count == 0) { Say("No recent plan files yet (Ctrl+O opens one)."); return; }
        if (!MayDiscard("Open", "The plan has changes that are not saved.\nOpen another and discard them?", "_Discard and open", "_Cancel")) return;
        if (_dialogs.Pick("Recent plan files", paths) is int i && i >= 0 && i < paths.Count) OpenPath(paths[i]);
    }

    private void OpenPath(string path)
    {
        try
        {
            _vm.Open(path);
            _recent.Add(path);
            Say($"Opened {path}");
        }
        catch (DistillPlanException e) { Say(e.Message); }
        FocusSearch();
    }

    private void Export()
    {
        bool ramp = CurrentPane == _ramp;
        string what = ramp ? "ramp report" : "plan report";
        string folder = _vm.FilePath is string f ? Path.GetDirectoryName(f)! : Environment.CurrentDirectory;
        string stem = _vm.FilePath is string g ? Path.GetFileNameWithoutExtension(g) : "plan";
        string? path = _dialogs.SavePath($"Export {what} (.md .csv .json .txt .svg .png)",
            Path.Combine(folder, stem + (ramp ? "-ramp" : "") + ".md"));
        if (path is null) return;
        try
        {
            var outcome = _vm.Export(path, ramp, ConfirmReplace);
            Say(outcome == SaveOutcome.Saved ? $"Exported the {what} to {path}" : "Not exported: the existing file was kept.");
        }
        catch (DistillPlanException e) { Say(e.Message); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or DllNotFoundException or TypeInitializationException)
        {
            Say($"Not exported: {e.GetType().Name}: {e.Message.Split('\n')[0]}");
        }
    }
}
