using System.Collections.ObjectModel;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The swap form, drawn over the panes like the fit form: the new solvent, the residual and the
/// method; Enter (or the button) plans the swap of the current charge in the current flask or
/// vessel and shows both methods compared, in the text of <c>distillplan swap</c>. A swap is
/// planned on request only: it takes a fraction of a second, too long for every keystroke.
/// </summary>
internal sealed class SwapOverlay : Overlay
{
    private readonly SwapFormModel _model;
    private readonly Func<Core.Reports.DisplayFormat> _format;
    private readonly ListView _lines;
    private ObservableCollection<string> _items = [];
    private readonly Field _to;

    public SwapOverlay(SwapFormModel model, Func<Core.Reports.DisplayFormat> format) : base($"Solvent swap ({KeyMap.SwapKeyText} or Esc closes)")
    {
        _model = model;
        _format = format;

        _to = new Field(this, null, "Swap to:", 12, 24, t => _model.To = t);
        _to.Hint.Text = "the new solvent (toluene, 2-MeTHF)";
        var target = new Field(this, _to.Caption, "Down to:", 12, 12, t => _model.Target = t);
        target.Show(_model.Target);
        target.Hint.Text = "old solvent left: 1%, 0.5mol%, 1000ppm";
        var method = new Field(this, target.Caption, "Method:", 12, 18, t => _model.Method = t);
        method.Hint.Text = "empty: both compared";
        var plan = new Button { Text = "_Plan the swap", X = 0, Y = Pos.Bottom(method.Caption) };
        plan.Accepting += (_, e) => { PlanSwap(); e.Handled = true; };
        foreach (var entry in new[] { _to.Entry, target.Entry, method.Entry })
            entry.KeyDown += (_, k) => { if (k == Key.Enter) { PlanSwap(); k.Handled = true; } };
        _lines = new ListView { X = 0, Y = Pos.Bottom(plan), Width = Dim.Fill(), Height = Dim.Fill() };
        _lines.SetSource(_items);
        Add(plan, _lines);
        Show();
    }

    /// <summary>The lines shown, for tests.</summary>
    public IReadOnlyList<string> Lines => _items;

    /// <summary>Opens the form with the cursor in the new-solvent field.</summary>
    public void Open()
    {
        Visible = true;
        _to.Entry.SetFocus();
        Show();
    }

    /// <summary>Plans with the fields as they are and shows the result.</summary>
    public void PlanSwap()
    {
        _model.Plan();
        Show();
    }

    private void Show()
    {
        int width = Math.Max(20, _lines.Viewport.Width > 0 ? _lines.Viewport.Width : 78);
        // One new source, not an Add per line (the list lays itself out again on every change).
        _items = new ObservableCollection<string>(_model.Lines(_format(), width));
        _lines.SetSource(_items);
        SetNeedsDraw();
    }
}
