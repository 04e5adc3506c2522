using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The strip across the top that every pane shares: the four numbers a chemist sets on the
/// evaporator, what decided them (or why the input cannot be planned), and one line for what
/// the planner has to say (a file saved, a library that could not be read). Its title says the
/// file, whether it is saved, and "computing…" while a new plan is on its way.
/// </summary>
internal sealed class SetpointReadout : FrameView
{
    // One row each: a long line is cut at the edge, never wrapped over the next one.
    private readonly Label[] _lines = [.. Enumerable.Range(0, 3).Select(i => new Label { X = 0, Y = i, Width = Dim.Fill(), Height = 1 })];

    public SetpointReadout()
    {
        Title = "Setpoints";
        Height = 5;
        Width = Dim.Fill();
        CanFocus = false;
        Add(_lines);
    }

    public void Show(PlannerViewModel vm, string? notice)
    {
        int width = Viewport.Width > 0 ? Viewport.Width : 78;
        var lines = vm.Readout(width, notice);
        for (int i = 0; i < _lines.Length; i++) _lines[i].Text = i < lines.Length ? lines[i] : "";
        Title = "Setpoints" + (vm.FilePath is null ? "" : " - " + Path.GetFileName(vm.FilePath)) + (vm.IsDirty ? " (unsaved)" : "")
            + (vm.IsComputing ? " · computing…" : "");
    }
}
