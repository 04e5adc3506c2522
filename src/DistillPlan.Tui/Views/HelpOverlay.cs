using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Key help drawn over the panes rather than as a modal window, so it never blocks the plan
/// underneath and closes with the same key that opened it.
/// </summary>
internal sealed class HelpOverlay : FrameView
{
    public HelpOverlay()
    {
        Title = "Keys (F1 or Esc closes)";
        X = Pos.Center();
        Y = Pos.Center();
        Width = Dim.Fill(2);
        Height = Dim.Auto(minimumContentDim: 3);
        Visible = false;
        CanFocus = true;
        var lines = KeyMap.All.Select(k => $"{k.KeyText,-17} {k.What}");
        Add(new Label { X = 0, Y = 0, Width = Dim.Fill(), Text = string.Join("\n", lines) });
    }
}
