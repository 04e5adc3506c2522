using DistillPlan.Core.Library;
using DistillPlan.Tui.Model;
using DistillPlan.Tui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>Questions answered like a user pressing Enter (the default, last button) unless told otherwise; paths from a queue.</summary>
internal sealed class FakeDialogs : IPlannerDialogs
{
    public List<(string Title, string[] Buttons)> Asked { get; } = [];
    /// <summary>Chooses a button; the default is what Enter picks: the last one.</summary>
    public Func<string[], int?> Answer { get; set; } = buttons => buttons.Length - 1;
    public Queue<string?> Paths { get; } = new();
    public List<string> PathTitles { get; } = [];
    public int? Picked { get; set; } = 0;

    public int? Ask(string title, string message, params string[] buttons)
    {
        Asked.Add((title, buttons));
        return Answer(buttons);
    }

    public string? OpenPath(string title, string? startFolder) { PathTitles.Add(title); return Paths.Count > 0 ? Paths.Dequeue() : null; }
    public string? SavePath(string title, string suggested) { PathTitles.Add(title); return Paths.Count > 0 ? Paths.Dequeue() : null; }
    public int? Pick(string title, IReadOnlyList<string> items) => Picked;
}

/// <summary>Requests held until the test releases them, in any order: planning "off the UI thread" without threads or clocks.</summary>
internal sealed class HeldScheduler : IPlanScheduler
{
    public List<(Func<PlanOutcome> Compute, Action<PlanOutcome> Deliver)> Held { get; } = [];
    public void Request(Func<PlanOutcome> compute, Action<PlanOutcome> deliver) => Held.Add((compute, deliver));

    public void Release(int index)
    {
        var (compute, deliver) = Held[index];
        deliver(compute());
    }
}

/// <summary>The planner window in Terminal.Gui's ANSI driver at a fixed size, with fake dialogs and a temporary folder.</summary>
internal sealed class PlannerHarness : IDisposable
{
    public IApplication App { get; }
    public PlannerWindow Window { get; }
    public PlannerViewModel Vm { get; }
    public FakeDialogs Dialogs { get; } = new();
    public string Dir { get; } = Directory.CreateTempSubdirectory("dp-tui-").FullName;
    public RecentPlans Recent { get; }
    private readonly SessionToken _session;

    public PlannerHarness(int width = 80, int height = 24, PlannerViewModel? vm = null)
    {
        App = Application.Create();
        App.Init(DriverRegistry.Names.ANSI);
        App.Driver!.SetScreenSize(width, height);
        Vm = vm ?? new PlannerViewModel(TestLibrary.Library);
        Recent = new RecentPlans(Path.Combine(Dir, "config", "recent-plans.txt"));
        Window = new PlannerWindow(Vm, Path.Combine(Dir, "solvents.yaml"), Dialogs, Recent);
        Window.AttachTo(App);
        _session = App.Begin(Window)!;
        Window.FocusSearch();
        App.LayoutAndDraw();
    }

    public void Dispose()
    {
        // Nothing to keep: leaving must not ask (the test's own questions are over).
        Dialogs.Answer = _ => 0;
        App.End(_session);
        Window.Dispose();
        App.Dispose();
        Directory.Delete(Dir, recursive: true);
    }

    public string Screen()
    {
        App.LayoutAndDraw();
        return App.Driver!.ToString() ?? "";
    }

    public string[] Lines() => Screen().Split('\n');

    public void Type(string text)
    {
        var injector = App.GetInputInjector();
        foreach (char ch in text) injector.InjectKey(new Key(ch));
    }

    /// <summary>Inject a fresh Key (injecting marks the instance handled, so never the static KeyMap ones).</summary>
    public void Press(Key key) => App.GetInputInjector().InjectKey(new Key(key));

    public void Press(Key key, int times) { for (int i = 0; i < times; i++) Press(key); }
}
