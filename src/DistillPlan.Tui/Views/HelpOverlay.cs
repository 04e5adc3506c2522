using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Key help drawn over the panes rather than as a modal window, so it never blocks the plan
/// underneath and closes with the same key that opened it.
/// </summary>
internal sealed class HelpOverlay : Overlay
{
    // The list scrolls when the terminal is short.
    public HelpOverlay() : base("Keys (F1 or Esc closes)")
    {
        int pad = KeyMap.All.Max(k => k.KeyText.Length);
        var lines = KeyMap.All.Select(k => k.KeyText.PadRight(pad) + " " + k.What);
        var list = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
        list.SetSource(new System.Collections.ObjectModel.ObservableCollection<string>(lines));
        Add(list);
    }
}
