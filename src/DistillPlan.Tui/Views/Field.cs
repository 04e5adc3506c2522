using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A labelled text entry with a hint to its right: the building block of the input panes.
/// Laid out below <paramref name="above"/> so panes stack fields by relationship. The caption
/// carries the focus marker (">"), so the field being typed in is visible without colour.
/// </summary>
internal sealed class Field
{
    public Label Caption { get; }
    public TextField Entry { get; }
    public Label Hint { get; }

    public Field(View parent, View? above, string caption, int labelWidth, int entryWidth, Action<string> changed)
    {
        Caption = new Label { X = 0, Y = above is null ? 0 : Pos.Bottom(above), Width = labelWidth + 1 };
        Entry = new TextField { X = Pos.Right(Caption), Y = Pos.Top(Caption), Width = entryWidth };
        Hint = new Label { X = Pos.Right(Entry) + 1, Y = Pos.Top(Caption), Width = Dim.Fill() };
        FocusMark.Attach(Entry, Caption, caption);
        EntryLimit.Attach(Entry, EntryLimit.Field, message => Hint.Text = message);
        Entry.TextChanged += (_, _) => { if (!_showing) changed(Entry.Text); };
        parent.Add(Caption, Entry, Hint);
    }

    private bool _showing;

    /// <summary>Shows a value without echoing it back as an edit.</summary>
    public void Show(string value)
    {
        if (Entry.Text == value) return;
        _showing = true;
        try { Entry.Text = value; }
        finally { _showing = false; }
    }
}
