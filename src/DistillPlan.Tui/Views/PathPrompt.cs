using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>Asks for a file path in a small dialog; typing a path works the same locally and over SSH.</summary>
internal static class PathPrompt
{
    public static string? Ask(IApplication? app, string title, string prompt, string initial)
    {
        if (app is null) return null;
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(90) };
        var label = new Label { Text = prompt, X = 0, Y = 0 };
        var entry = new TextField { Text = initial, X = 0, Y = Pos.Bottom(label), Width = Dim.Fill() };
        dialog.Add(label, entry);
        dialog.AddButton(new Button { Text = "_Cancel" });
        dialog.AddButton(new Button { Text = "_OK", IsDefault = true });
        entry.SetFocus();
        app.Run(dialog);
        string path = entry.Text.Trim();
        return dialog.Result == 1 && path.Length > 0 ? path : null;
    }
}
