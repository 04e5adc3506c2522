using System.Collections.ObjectModel;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// What is in the flask: find a solvent by name, alias or CAS number, the charge as text (the
/// command-line syntax), its basis and model, and the optional product.
/// </summary>
internal sealed class ChargePane : View
{
    private readonly PlannerViewModel _vm;
    private readonly TextField _search;
    private readonly ListView _matches;
    private readonly ObservableCollection<string> _lines = [];
    private IReadOnlyList<SolventHit> _hits = [];
    private readonly Field _charge, _basis, _model, _mass, _molar, _productMax, _title;

    public ChargePane(PlannerViewModel vm)
    {
        _vm = vm;
        Title = "Charge";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;

        var find = new Label { Text = "Find solvent:", X = 0, Y = 0, Width = 15 };
        _search = new TextField { X = Pos.Right(find), Y = 0, Width = 22 };
        var how = new Label { Text = "Enter use  Ctrl+A add  Down list", X = Pos.Right(_search) + 1, Y = 0, Width = Dim.Fill() };
        _matches = new ListView { X = 13, Y = Pos.Bottom(find), Width = Dim.Fill(), Height = 4 };
        _matches.SetSource(_lines);
        Add(find, _search, how, _matches);

        _charge = new Field(this, _matches, "Charge:", 15, 40, v => vm.Edit(d => d with { Charge = v }));
        _charge.Hint.Text = "NAME=AMOUNT,...";
        _basis = new Field(this, _charge.Caption, "Basis:", 15, 10, v => vm.Edit(d => d with { Basis = SafeBasis(v, d.Basis) }));
        _basis.Hint.Text = "volume (default), mass, mole: what bare numbers mean";
        _model = new Field(this, _basis.Caption, "Model:", 15, 10, v => vm.Edit(d => d with { Model = v.Trim().ToLowerInvariant() }));
        _model.Hint.Text = "mixtures: unifac (default) or ideal";
        _mass = new Field(this, _model.Caption, "Product mass:", 15, 10, v => vm.Edit(d => d with { ProductMass = v.Trim() }));
        _mass.Hint.Text = "optional, non-volatile; g (or mg, kg)";
        _molar = new Field(this, _mass.Caption, " molar mass:", 15, 10, v => vm.Edit(d => d with { ProductMolarMass = v.Trim() }));
        _molar.Hint.Text = "g/mol";
        _productMax = new Field(this, _molar.Caption, " max temp:", 15, 10, v => vm.Edit(d => d with { Inputs = d.Inputs with { ProductMax = v } }));
        _productMax.Hint.Text = "highest temperature it may see; 60, 333K";
        _title = new Field(this, _productMax.Caption, "Title:", 15, 40, v => vm.Edit(d => d with { Title = v }));

        _search.TextChanged += (_, _) => ShowMatches();
        _search.KeyDown += OnSearchKey;
        _matches.KeyDown += OnListKey;
        _matches.ValueChanged += (_, _) => Mark();
        ShowMatches();
        Refresh();
    }

    /// <summary>The field a user types into first.</summary>
    public View SearchField => _search;

    /// <summary>Puts the document's values in the fields (after open, or an edit elsewhere).</summary>
    public void Refresh()
    {
        var d = _vm.Document;
        _charge.Show(d.Charge);
        _basis.Show(PlanDocument.BasisWord(d.Basis));
        _model.Show(d.Model);
        _mass.Show(d.ProductMass);
        _molar.Show(d.ProductMolarMass);
        _productMax.Show(d.Inputs.ProductMax ?? "");
        _title.Show(d.Title);
    }

    // A half-typed basis ("ma") keeps the previous one rather than erroring on every keystroke.
    private static DistillPlan.Core.Planning.Basis SafeBasis(string text, DistillPlan.Core.Planning.Basis current)
    {
        try { return PlanDocument.ParseBasis(text); } catch (DistillPlan.Core.InputException) { return current; }
    }

    private void ShowMatches()
    {
        _hits = _vm.Search(_search.Text);
        _lines.Clear();
        foreach (var h in _hits) _lines.Add("  " + h.Line);
        _marked = -1;
        if (_lines.Count > 0) { _matches.SelectedItem = 0; Mark(); }
    }

    private int _marked = -1;

    // Without colour the highlight is invisible, so the chosen match also carries a "> " mark.
    private void Mark()
    {
        int i = _matches.SelectedItem ?? 0;
        if (i == _marked || i < 0 || i >= _lines.Count) return;
        if (_marked >= 0 && _marked < _lines.Count) _lines[_marked] = "  " + _hits[_marked].Line;
        _lines[i] = "> " + _hits[i].Line;
        _marked = i;
    }

    private SolventHit? Selected() =>
        _matches.SelectedItem is int i && i >= 0 && i < _hits.Count ? _hits[i] : _hits.FirstOrDefault();

    private void OnSearchKey(object? sender, Key key)
    {
        if (key == Key.Enter) { Use(add: false); key.Handled = true; }
        else if (key == Key.A.WithCtrl) { Use(add: true); key.Handled = true; }
        else if (key == Key.CursorDown && _lines.Count > 0) { _matches.SetFocus(); key.Handled = true; }
    }

    private void OnListKey(object? sender, Key key)
    {
        if (key == Key.Enter) { Use(add: false); key.Handled = true; }
        else if (key == Key.A.WithCtrl) { Use(add: true); key.Handled = true; }
    }

    private void Use(bool add)
    {
        if (Selected() is not SolventHit hit) return;
        if (add) _vm.AddSolvent(hit.Solvent); else _vm.UseSolvent(hit.Solvent);
        Refresh();
        if (add) { _charge.Entry.SetFocus(); _charge.Entry.MoveEnd(); }
    }
}
