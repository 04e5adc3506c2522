using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.App;

namespace DistillPlan.Tui;

/// <summary>Entry point of the full-screen planner, opened by <c>distillplan</c> with no verb or with a plan file.</summary>
public static class PlannerApp
{
    /// <summary>
    /// Runs the planner until the user quits and returns the exit code (0). The plan file is read
    /// before the screen is taken over, so a bad file is one line on a normal terminal. A broken
    /// user library does not stop the planner: the shipped library answers and the screen says why.
    /// </summary>
    public static int Run(string[] args)
    {
        var (library, problem) = LibraryStartup.Load();
        var vm = new PlannerViewModel(library) { LibraryProblem = problem };
        if (args.Length > 0) vm.Open(args[0]);

        TerminalGuiConfiguration.ApplyIfDeferred();
        using IApplication app = Application.Create();
        app.Init();
        // From here on plans are computed off the UI thread and handed back through the main loop.
        vm.Scheduler = new BackgroundPlanScheduler(action => app.Invoke(action), BackgroundPlanScheduler.DefaultDebounce);
        using var window = new PlannerWindow(vm);
        window.AttachTo(app);
        window.FocusSearch();
        app.Run(window);
        return 0;
    }
}
