using DistillPlan.Tui.Model;

namespace DistillPlan.Tui.Tests;

/// <summary>
/// Issue 11, item 2: plans are computed by a scheduler, never inside the edit. These tests hold the
/// requests and release them by hand (no threads, no clocks, no timing), then check the one real
/// scheduler hands results back through the UI's post function.
/// </summary>
[Collection(TerminalCollection.Name)]
public sealed class PlanningOffTheUiThreadTests
{
    [Fact]
    public void An_edit_does_not_plan_at_once_and_the_last_good_plan_stays_on_screen_marked_computing()
    {
        var held = new HeldScheduler();
        var vm = new PlannerViewModel(TestLibrary.Library, held);
        var before = vm.Outcome.Plan;
        vm.Edit(d => d with { Charge = "ethanol" });
        Assert.True(vm.IsComputing);
        Assert.Same(before, vm.Outcome.Plan);
        Assert.Single(held.Held);
        held.Release(0);
        Assert.False(vm.IsComputing);
        Assert.Equal("ethanol", vm.Outcome.Plan!.Charge.Describe());
    }

    [Fact]
    public void A_result_for_an_older_edit_is_dropped()
    {
        var held = new HeldScheduler();
        var vm = new PlannerViewModel(TestLibrary.Library, held);
        vm.Edit(d => d with { Charge = "ethanol" });
        vm.Edit(d => d with { Charge = "toluene" });
        held.Release(1);
        Assert.Equal("toluene", vm.Outcome.Plan!.Charge.Describe());
        held.Release(0);   // the ethanol plan arrives late: stale
        Assert.Equal("toluene", vm.Outcome.Plan!.Charge.Describe());
        Assert.False(vm.IsComputing);
    }

    [Fact]
    public void An_invalid_edit_shows_its_error_and_keeps_the_last_good_plan()
    {
        var held = new HeldScheduler();
        var vm = new PlannerViewModel(TestLibrary.Library, held);
        var good = vm.Outcome.Plan;
        vm.SetSetting("pump-limit", "5 bananas");
        held.Release(0);
        Assert.StartsWith("--pump-limit", vm.Error);
        Assert.Same(good, vm.Outcome.Plan);
        Assert.Throws<Core.InputException>(() => vm.Export(Path.Combine(Path.GetTempPath(), "never.md"), ramp: false, _ => true));
    }

    [Fact]
    public void The_window_shows_computing_and_then_the_new_setpoints()
    {
        var held = new HeldScheduler();
        using var h = new PlannerHarness(vm: new PlannerViewModel(TestLibrary.Library, held));
        string old = h.Vm.P(h.Vm.Outcome.Plan!.VacuumSetpoint);
        h.Vm.Edit(d => d with { Charge = "ethanol" });
        string screen = h.Screen();
        Assert.Contains("computing…", screen);
        Assert.Contains($"Vacuum {old}", screen);
        held.Release(0);
        screen = h.Screen();
        Assert.DoesNotContain("computing…", screen);
        Assert.Contains($"Vacuum {h.Vm.P(h.Vm.Outcome.Plan!.VacuumSetpoint)}", screen);
        Assert.Contains("| ethanol", screen);
    }

    [Fact]
    public void The_background_scheduler_computes_off_the_callers_thread_and_delivers_through_post_only_the_newest()
    {
        int caller = Environment.CurrentManagedThreadId;
        var posted = new System.Collections.Concurrent.BlockingCollection<Action>();
        var scheduler = new BackgroundPlanScheduler(posted.Add, TimeSpan.Zero);
        int computedOn = caller;
        var delivered = new List<string>();
        scheduler.Request(() => { computedOn = Environment.CurrentManagedThreadId; return PlanOutcome.Failed("first"); }, o => delivered.Add(o.Error!));
        // The test thread plays the UI loop: it runs what was posted (waiting for it is not a timing assertion).
        Assert.True(posted.TryTake(out var run, TimeSpan.FromMinutes(1)));
        Assert.Empty(delivered);
        run!();
        Assert.Equal(["first"], delivered);
        Assert.NotEqual(caller, computedOn);

        // A failure inside the computation becomes a one-line result, never a crash of the pool thread.
        scheduler.Request(() => throw new InvalidOperationException("boom\nstack"), o => delivered.Add(o.Error!));
        Assert.True(posted.TryTake(out run, TimeSpan.FromMinutes(1)));
        run!();
        Assert.Contains("internal error: InvalidOperationException: boom (please report it)", delivered[^1]);
    }
}
