// TextView is marked obsolete in Terminal.Gui 2.5 in favour of a separate editor package; it is
// still the library's own multi-line field, and notes need nothing more.
#pragma warning disable CS0618
using System.Collections.ObjectModel;
using DistillPlan.Core.Planning.Settings;
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
    private readonly Field _charge, _title;
    private readonly TextView _notes;
    private bool _showingNotes;
    private readonly List<(string Key, Field Field)> _settings = [];

    /// <summary>The settings shown under the charge.</summary>
    private static readonly string[] ChargeSettings = ["basis", "model", "product-mass", "product-molar-mass", "product-max"];

    public ChargePane(PlannerViewModel vm)
    {
        _vm = vm;
        Title = "Charge";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;

        var find = new Label { X = 0, Y = 0, Width = 16 };
        _search = new TextField { X = Pos.Right(find), Y = 0, Width = 22 };
        EntryLimit.Attach(_search, EntryLimit.Search);
        FocusMark.Attach(_search, find, "Find solvent:");
        var how = new Label { Text = "Enter use  Ctrl+A add  Down list", X = Pos.Right(_search) + 1, Y = 0, Width = Dim.Fill() };
        var listCaption = new Label { X = 0, Y = 1, Width = 13 };
        _matches = new ListView { X = 14, Y = Pos.Bottom(find), Width = Dim.Fill(), Height = 4 };
        FocusMark.Attach(_matches, listCaption, " matches");
        _matches.SetSource(_lines);
        Add(find, _search, how, listCaption, _matches);

        _charge = new Field(this, _matches, "Charge:", 15, 40, v => vm.Edit(d => d with { Charge = v }));
        _charge.Hint.Text = "NAME=AMOUNT,...";
        View above = _charge.Caption;
        // The charge's own settings, from Core's settings table (basis, model, product, its limit).
        foreach (string key in ChargeSettings)
        {
            var setting = PlanSettings.Get(key);
            var field = new Field(this, above, setting.Caption, 15, 10, v => vm.SetSetting(key, v));
            _settings.Add((key, field));
            above = field.Caption;
        }
        _title = new Field(this, above, "Title:", 15, 60, v => vm.Edit(d => d with { Title = v }));
        // Notes: free text saved in the plan file (batch numbers, observations); Tab leaves the field.
        var notesCaption = new Label { X = 0, Y = Pos.Bottom(_title.Caption), Width = 16 };
        _notes = new TextView { X = Pos.Right(notesCaption), Y = Pos.Top(notesCaption), Width = Dim.Fill(), Height = Dim.Fill(), TabKeyAddsTab = false, WordWrap = true };
        FocusMark.Attach(_notes, notesCaption, "Notes:");
        _notes.ContentsChanged += (_, _) =>
        {
            if (_showingNotes || _notes.ReadOnly) return;
            vm.SetNotes(_notes.Text);
            _notesShownFor = vm.Document.Notes;
        };
        Add(notesCaption, _notes);

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
        foreach (var (key, field) in _settings)
        {
            field.Show(d.Inputs.Get(key) ?? "");
            field.Hint.Text = _vm.DefaultFor(key);
        }
        _title.Show(d.Title);
        ShowNotes(d.Notes);
    }

    /// <summary>
    /// Notes longer than this are shown read-only, the start of them only: Terminal.Gui's wrapping
    /// text view takes minutes over a megabyte of text. The notes stay in the plan as they are.
    /// </summary>
    public const int NotesEditLimit = 20_000;

    private string? _notesShownFor;

    private void ShowNotes(string notes)
    {
        if (ReferenceEquals(notes, _notesShownFor) || notes == _notesShownFor) return;
        bool tooLong = notes.Length > NotesEditLimit;
        // The view's text ends lines its own way; compare as the document keeps notes.
        string shown = tooLong
            ? notes[..2000] + $"\n\n… {notes.Length} characters in all: too long to edit here, kept as they are in the plan file; edit them in a text editor."
            : notes;
        _notesShownFor = notes;
        _notes.ReadOnly = tooLong;
        if (!tooLong && _notes.Text.ReplaceLineEndings("\n").TrimEnd() == notes) return;
        _showingNotes = true;
        try { _notes.Text = shown; }
        finally { _showingNotes = false; }
    }

    /// <summary>The charge entry (tests read its cursor).</summary>
    internal TextField ChargeEntry => _charge.Entry;

    /// <summary>The notes field.</summary>
    internal TextView Notes => _notes;

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
        if (!add) { _vm.UseSolvent(hit.Solvent); Refresh(); return; }
        int cursor = _vm.AddSolvent(hit.Solvent);
        Refresh();
        _charge.Entry.SetFocus();
        _charge.Entry.InsertionPoint = cursor;
        // Focus selects the whole text; the amount typed next must not replace it.
        _charge.Entry.ClearAllSelection();
    }
}
