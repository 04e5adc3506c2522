using Terminal.Gui.Input;

namespace DistillPlan.Tui;

/// <summary>One key and what it does; the help overlay and the status bar are built from this list.</summary>
/// <param name="Key">The key, or null for keys that belong to a field (shown by their text).</param>
/// <param name="KeyText">How the key is written in help.</param>
/// <param name="What">What it does.</param>
/// <param name="InStatusBar">Short label when it is one of the main keys shown at the bottom.</param>
public sealed record KeyBinding(Key? Key, string KeyText, string What, string? InStatusBar = null);

/// <summary>Every key binding of the planner, in one place so help can never miss one.</summary>
public static class KeyMap
{
    /// <summary>Help.</summary>
    public static readonly Key Help = Key.F1;
    /// <summary>Panes, in tab order.</summary>
    public static readonly Key[] Panes = [Key.F2, Key.F3, Key.F4, Key.F5, Key.F6];
    /// <summary>Next pressure unit.</summary>
    public static readonly Key Unit = Key.F7;
    /// <summary>Fit your own compound from measured points.</summary>
    public static readonly Key Fit = Key.F8;
    /// <summary>How <see cref="Fit"/> is written.</summary>
    public const string FitKeyText = "F8";
    /// <summary>Plan a solvent swap of the charge.</summary>
    public static readonly Key Swap = Key.F9;
    /// <summary>How <see cref="Swap"/> is written.</summary>
    public const string SwapKeyText = "F9";
    /// <summary>Open a plan file.</summary>
    public static readonly Key Open = Key.O.WithCtrl;
    /// <summary>Open one of the recent plan files.</summary>
    public static readonly Key Recent = Key.R.WithCtrl;
    /// <summary>Save the plan.</summary>
    public static readonly Key Save = Key.S.WithCtrl;
    /// <summary>Export the report or the plot.</summary>
    public static readonly Key Export = Key.E.WithCtrl;
    /// <summary>Quit.</summary>
    public static readonly Key Quit = Key.Q.WithCtrl;
    /// <summary>Close what is open over the panes, or back to the solvent search; never discards anything.</summary>
    public static readonly Key Back = Key.Esc;

    /// <summary>All bindings, for the help overlay.</summary>
    public static IReadOnlyList<KeyBinding> All { get; } =
    [
        new(Help, "F1", "Show or hide this help", "Help"),
        new(Panes[0], "F2", "Charge: find a solvent, amounts, basis, product, notes"),
        new(Panes[1], "F3", "Equipment: heating, coolant, pump, size, delta T, strip"),
        new(Panes[2], "F4", "Plan: setpoints, checks, assumptions, cautions"),
        new(Panes[3], "F5", "Curve: vapour pressure; O setpoint, C condenser, P pump"),
        new(Panes[4], "F6", "Ramp: strip ramp as a table and a plot; Ctrl+E exports it"),
        new(Unit, "F7", "Next pressure unit (mbar, hPa, Pa, kPa, bar, Torr ...)", "Unit"),
        new(Fit, FitKeyText, "Fit your own compound from measured points", "Fit"),
        new(Swap, SwapKeyText, "Solvent swap of the charge: new solvent, residual, both methods"),
        new(Save, "Ctrl+S", "Save the plan file (asks before replacing a file)", "Save"),
        new(Open, "Ctrl+O", "Open a plan file (asks first if changes are unsaved)", "Open"),
        new(Recent, "Ctrl+R", "Open a recent plan file"),
        new(Export, "Ctrl+E", "Export: report .md .csv .json .txt, plot .svg .png", "Export"),
        new(Quit, "Ctrl+Q", "Quit (asks first if there are unsaved changes)", "Quit"),
        new(Back, "Esc", "Close help, fit or swap form, else back to Find; never quits"),
        new(null, "Tab / Shift+Tab", "Next / previous field (the one marked > has the keys)"),
        new(null, "Enter (find)", "Use the marked (>) solvent as the whole charge"),
        new(null, "Ctrl+A (find)", "Add the marked solvent as NAME=, then type its amount"),
        new(null, "Down (find)", "Into the list of matches; Up/Down choose"),
        new(null, "PgUp / PgDn", "Scroll the pane with focus: plan, ramp steps, fields"),
        new(null, "Left / Right (ramp)", "Move through the ramp table's columns"),
    ];
}
