using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The strip across the top that every pane shares: the four numbers a chemist sets on the
/// evaporator, and on the second line what decided them or why there is no plan.
/// </summary>
internal sealed class SetpointReadout : FrameView
{
    private readonly Label _setpoints = new() { X = 0, Y = 0, Width = Dim.Fill() };
    private readonly Label _detail = new() { X = 0, Y = 1, Width = Dim.Fill() };

    public SetpointReadout()
    {
        Title = "Setpoints";
        Height = 4;
        Width = Dim.Fill();
        CanFocus = false;
        Add(_setpoints, _detail);
    }

    public void Show(PlannerViewModel vm)
    {
        var (setpoints, detail) = vm.Readout();
        _setpoints.Text = setpoints;
        _detail.Text = detail;
        Title = "Setpoints" + (vm.FilePath is null ? "" : " - " + Path.GetFileName(vm.FilePath)) + (vm.IsDirty ? " (unsaved)" : "");
    }
}
