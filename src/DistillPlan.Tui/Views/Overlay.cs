using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A frame drawn over the panes (help, the fit form, the swap form): the whole pane area above the
/// key line, so its title is always on screen, hidden until opened. No modal loop, so the plan
/// underneath is never touched.
/// </summary>
internal abstract class Overlay : FrameView
{
    protected Overlay(string title)
    {
        Title = title;
        X = 0;
        Y = 0;
        Width = Dim.Fill();
        Height = Dim.Fill(1);
        Visible = false;
        CanFocus = true;
    }
}
