namespace DistillPlan.Tui.Model;

/// <summary>
/// Runs a plan computation and hands its result back. The planner asks for every edit; only the
/// newest request matters, so an implementation may drop requests that were overtaken.
/// </summary>
public interface IPlanScheduler
{
    /// <summary>Computes <paramref name="compute"/> and calls <paramref name="deliver"/> with the result on the UI thread.</summary>
    void Request(Func<PlanOutcome> compute, Action<PlanOutcome> deliver);
}

/// <summary>Computes at once on the caller's thread: tests, and the first plan before the screen opens.</summary>
public sealed class ImmediatePlanScheduler : IPlanScheduler
{
    /// <inheritdoc/>
    public void Request(Func<PlanOutcome> compute, Action<PlanOutcome> deliver) => deliver(compute());
}

/// <summary>
/// Plans off the UI thread: waits a short quiet spell after the last keystroke (a typed word is
/// planned once, not once per letter), computes one request at a time on the thread pool (two
/// cores are shared, so overtaken work is skipped rather than run in parallel), and posts the
/// result through <paramref name="post"/> (Terminal.Gui's <c>IApplication.Invoke</c>).
/// </summary>
public sealed class BackgroundPlanScheduler(Action<Action> post, TimeSpan debounce) : IPlanScheduler
{
    /// <summary>The quiet spell after a keystroke before planning starts.</summary>
    public static readonly TimeSpan DefaultDebounce = TimeSpan.FromMilliseconds(150);

    private readonly Lock _gate = new();
    private (Func<PlanOutcome> Compute, Action<PlanOutcome> Deliver)? _pending;
    private bool _running;
    private Timer? _timer;

    /// <inheritdoc/>
    public void Request(Func<PlanOutcome> compute, Action<PlanOutcome> deliver)
    {
        lock (_gate)
        {
            _pending = (compute, deliver);
            _timer ??= new Timer(_ => Start());
            _timer.Change(debounce, Timeout.InfiniteTimeSpan);
        }
    }

    private void Start()
    {
        (Func<PlanOutcome> Compute, Action<PlanOutcome> Deliver) job;
        lock (_gate)
        {
            if (_running || _pending is null) return;   // the running job starts the pending one when it ends
            job = _pending.Value;
            _pending = null;
            _running = true;
        }
        Task.Run(() =>
        {
            PlanOutcome result;
            try { result = job.Compute(); }
            catch (Exception e) { result = PlanOutcome.Failed($"internal error: {e.GetType().Name}: {e.Message.Split('\n')[0]} (please report it)"); }
            post(() => job.Deliver(result));
            lock (_gate) _running = false;
            Start();
        });
    }
}
