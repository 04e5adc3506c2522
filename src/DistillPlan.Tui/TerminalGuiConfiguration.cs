using Terminal.Gui.Configuration;

namespace DistillPlan.Tui;

/// <summary>
/// Terminal.Gui applies its theme configuration in a module initializer. The native binary
/// empties that initializer, because a native program runs every module initializer at start
/// and the command line would pay for a screen it never opens; the build sets the switch
/// below, and the planner applies the configuration itself before the screen starts.
/// </summary>
internal static class TerminalGuiConfiguration
{
    const string DeferredSwitch = "DistillPlan.Tui.ApplyTerminalGuiConfiguration";

    public static void ApplyIfDeferred()
    {
        if (!AppContext.TryGetSwitch(DeferredSwitch, out bool deferred) || !deferred) return;
        try { TuiConfigurationBuilder.Shared.ApplyToStaticFacades(); }
        // As in Terminal.Gui's own initializer: a bad user configuration file must not stop the
        // planner; it runs on the library's defaults.
        catch (Exception) { }
    }
}
