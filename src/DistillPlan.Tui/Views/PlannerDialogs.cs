using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The questions and file choosers the planner asks. The terminal's own (Terminal.Gui dialogs)
/// in the program; tests answer them without a modal loop.
/// </summary>
public interface IPlannerDialogs
{
    /// <summary>Asks a question. The LAST button is the default (Enter) and must be the safe answer; null when dismissed (Esc).</summary>
    int? Ask(string title, string message, params string[] buttons);
    /// <summary>A plan file to open, or null.</summary>
    string? OpenPath(string title, string? startFolder);
    /// <summary>A file to write, or null. <paramref name="suggested"/> is the path proposed.</summary>
    string? SavePath(string title, string suggested);
    /// <summary>One of <paramref name="items"/> (its index), or null.</summary>
    int? Pick(string title, IReadOnlyList<string> items);
}

/// <summary>Terminal.Gui's dialogs: MessageBox, OpenDialog, SaveDialog and a list.</summary>
internal sealed class TerminalDialogs(Func<IApplication?> app) : IPlannerDialogs
{
    public int? Ask(string title, string message, params string[] buttons) =>
        app() is IApplication a ? MessageBox.Query(a, title, message, buttons) : null;

    public string? OpenPath(string title, string? startFolder)
    {
        if (app() is not IApplication a) return null;
        using var d = new OpenDialog { Title = title, OpenMode = OpenMode.File, AllowsMultipleSelection = false, MustExist = true };
        if (startFolder is not null) d.Path = startFolder;
        a.Run(d);
        return d.Canceled || d.FilePaths.Count == 0 ? null : d.FilePaths[0];
    }

    public string? SavePath(string title, string suggested)
    {
        if (app() is not IApplication a) return null;
        using var d = new SaveDialog { Title = title };
        d.Path = suggested;
        a.Run(d);
        return d.Canceled ? null : d.FileName;
    }

    public int? Pick(string title, IReadOnlyList<string> items)
    {
        if (app() is not IApplication a) return null;
        using var d = new Dialog { Title = title, Width = Dim.Percent(90), Height = Math.Min(items.Count, 10) + 5 };
        var list = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(1) };
        list.SetSource(new System.Collections.ObjectModel.ObservableCollection<string>(items.Select(i => "  " + i)));
        int? chosen = null;
        list.Accepting += (_, e) => { chosen = list.SelectedItem; e.Handled = true; a.RequestStop(d); };
        d.Add(list);
        d.AddButton(new Button { Text = "_Cancel" });
        list.SetFocus();
        a.Run(d);
        return chosen;
    }
}
