using System.Collections.ObjectModel;
using DistillPlan.Core.Library;
using DistillPlan.Reports;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The fit form, drawn over the panes like the help (no modal loop, so the plan underneath is
/// never touched): name, molar mass, points and form, the fit refreshed on every edit in the same
/// text as <c>distillplan fit</c>, and a button that adds the compound to the user's library.
/// </summary>
internal sealed class FitOverlay : Overlay
{
    private readonly FitFormModel _model;
    private readonly ListView _lines;
    private ObservableCollection<string> _items = [];
    private readonly Field _name;
    private string? _message;

    /// <summary>Called with the reloaded library after a compound was added.</summary>
    public event Action<SolventLibrary>? Added;

    public FitOverlay(FitFormModel model, Func<Core.Quantities.PressureUnit> unit) : base($"Fit your own compound ({KeyMap.FitKeyText} or Esc closes)")
    {
        _model = model;
        _unit = unit;

        _name = new Field(this, null, "Name:", 12, 30, t => Edit(() => _model.Name = t));
        _name.Hint.Text = "as it will appear in the library";
        var mass = new Field(this, _name.Caption, "Molar mass:", 12, 12, t => Edit(() => _model.MolarMass = t));
        mass.Hint.Text = "g/mol (needed to add it)";
        var points = new Field(this, mass.Caption, "Points:", 12, 64, t => Edit(() => _model.Points = t));
        var form = new Field(this, points.Caption, "Form:", 12, 20, t => Edit(() => _model.Form = t));
        form.Hint.Text = CompoundFit.FormsText;
        var associating = new CheckBox { Text = "Alcohol-_like (Trouton 109)", X = 0, Y = Pos.Bottom(form.Caption) };
        associating.ValueChanged += (_, _) => Edit(() => _model.Associating = associating.Value == CheckState.Checked);
        var add = new Button { Text = "_Add to my library", X = Pos.Right(associating) + 2, Y = Pos.Top(associating) };
        add.Accepting += (_, e) => { AddToLibrary(); e.Handled = true; };
        _lines = new ListView { X = 0, Y = Pos.Bottom(associating), Width = Dim.Fill(), Height = Dim.Fill() };
        _lines.SetSource(_items);
        Add(associating, add, _lines);
        Show();
    }

    private readonly Func<Core.Quantities.PressureUnit> _unit;

    /// <summary>The last line of what adding did, for tests and the screen.</summary>
    public string? Message => _message;

    /// <summary>Opens the form with the cursor in the name field.</summary>
    public void Open()
    {
        Visible = true;
        _name.Entry.SetFocus();
        Show();
    }

    private void Edit(Action change)
    {
        change();
        _message = null;
        _model.Refit();
        Show();
    }

    private void AddToLibrary()
    {
        var (library, message) = _model.AddToLibrary();
        _message = message;
        if (library is not null) Added?.Invoke(library);
        Show();
    }

    private void Show()
    {
        // Wrapped at the list's width: an error line must be read whole.
        int width = Math.Max(20, _lines.Viewport.Width > 0 ? _lines.Viewport.Width : 78);
        var lines = _message is null ? _model.Lines(_unit()) : [_message, "", .. _model.Lines(_unit())];
        // One new source, not an Add per line (the list lays itself out again on every change).
        _items = new ObservableCollection<string>(lines.SelectMany(line => line.Length == 0 ? [""] : LineWrap.Wrap(line, width, hanging: 2)));
        _lines.SetSource(_items);
        SetNeedsDraw();
    }
}
