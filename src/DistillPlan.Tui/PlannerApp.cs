using DistillPlan.Core.Library;
using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.App;

namespace DistillPlan.Tui;

/// <summary>Entry point of the full-screen planner, opened by <c>distillplan</c> with no verb.</summary>
public static class PlannerApp
{
    /// <summary>
    /// Runs the planner until Ctrl+Q and returns the exit code (0). The library is loaded before
    /// the screen is taken over, so a broken library is reported as one line on a normal terminal.
    /// </summary>
    public static int Run(string[] args)
    {
        var library = SolventLibrary.LoadWithUser(null);
        var vm = new PlannerViewModel(library);
        if (args.Length > 0) vm.Open(args[0]);

        using IApplication app = Application.Create();
        app.Init();
        using var window = new PlannerWindow(vm);
        window.FocusSearch();
        app.Run(window);
        return 0;
    }
}
