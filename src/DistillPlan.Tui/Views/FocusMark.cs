using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A focus marker that needs no colour: the caption of a view reads "&gt; Caption" while the view
/// (or anything inside it) has focus and "  Caption" otherwise, so NO_COLOR terminals and
/// monochrome plant screens show where the keys go.
/// </summary>
internal static class FocusMark
{
    /// <summary>The marker in front of the caption of the view with focus.</summary>
    public const string Mark = ">";

    /// <summary>Keeps <paramref name="caption"/> showing whether <paramref name="target"/> has focus.</summary>
    public static void Attach(View target, Label caption, Func<string> text)
    {
        void Show() => caption.Text = (target.HasFocus ? Mark : " ") + text();
        target.HasFocusChanged += (_, _) => Show();
        Show();
    }

    /// <summary>The same, for a fixed caption text.</summary>
    public static void Attach(View target, Label caption, string text) => Attach(target, caption, () => text);
}
