using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;
using DistillPlan.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>A library match for type-to-search: the solvent and the line shown for it.</summary>
/// <param name="Solvent">The library entry.</param>
/// <param name="Line">Name, aliases and CAS number, e.g. "ethyl acetate  EtOAc  141-78-6".</param>
public sealed record SolventHit(Solvent Solvent, string Line);

/// <summary>
/// Everything behind the planner's screens: the plan document being edited, the plan computed
/// from it after every edit (the same Core calls as the command line), and its report, which
/// the panes render with the same renderer as the CLI. It never touches a view.
/// </summary>
public sealed class PlannerViewModel
{
    /// <summary>The charge a new planner starts with, so the first screen already shows setpoints.</summary>
    public const string DefaultCharge = "ethyl-acetate";

    private string _savedText;
    private long _generation;

    /// <summary>A planner over a library; the first plan is computed at once, so the first screen already shows setpoints.</summary>
    public PlannerViewModel(SolventLibrary library, IPlanScheduler? scheduler = null)
    {
        Library = library;
        Scheduler = scheduler ?? new ImmediatePlanScheduler();
        Document = new PlanDocument { Charge = DefaultCharge };
        _savedText = PlanFileWriter.Format(Document);
        Outcome = Compute(Document);
    }

    /// <summary>Where plans are computed: at once (tests, start-up) or off the UI thread (the running planner).</summary>
    public IPlanScheduler Scheduler { get; set; }

    /// <summary>The solvent library.</summary>
    public SolventLibrary Library { get; private set; }

    /// <summary>Why the user's own library was not used (it is broken), shown as one line; null when all is well.</summary>
    public string? LibraryProblem { get; init; }

    /// <summary>Plans with a reloaded library (after the user added a compound to theirs), keeping the document.</summary>
    public void UseLibrary(SolventLibrary library)
    {
        Library = library;
        Replan();
    }
    /// <summary>What the user has entered.</summary>
    public PlanDocument Document { get; private set; }
    /// <summary>
    /// The plan on screen: the latest plan that could be computed. While a new one computes, and
    /// when the current input cannot be planned (<see cref="Error"/>), it is the last good one.
    /// </summary>
    public PlanOutcome Outcome { get; private set; }
    /// <summary>Why the current input cannot be planned (one line), or null when <see cref="Outcome"/> is its plan.</summary>
    public string? Error { get; private set; }
    /// <summary>True while the plan of the current input is being computed.</summary>
    public bool IsComputing { get; private set; }
    /// <summary>True when <see cref="Outcome"/> is the plan of what is on screen now (not computing, no error).</summary>
    public bool IsCurrent => !IsComputing && Error is null && Outcome.Plan is not null;
    /// <summary>The file the plan was opened from or saved to, if any.</summary>
    public string? FilePath { get; private set; }
    /// <summary>True when the document differs from what was last opened or saved (compared as the file it would write, so the order settings were typed in does not count).</summary>
    public bool IsDirty => PlanFileWriter.Format(Document) != _savedText;
    /// <summary>Pins the report date (tests); null means now.</summary>
    public DateTimeOffset? Clock { get; init; }

    /// <summary>Raised after every change of document or outcome.</summary>
    public event Action? Changed;

    /// <summary>The pressure unit the plan is shown in (the reader refuses unknown units, so this always resolves).</summary>
    public PressureUnit Unit =>
        PressureUnits.Display.FirstOrDefault(u => string.Equals(u.Symbol, Document.PressureUnit, StringComparison.OrdinalIgnoreCase))
        ?? PressureUnits.Millibar;

    /// <summary>The display format of every pane.</summary>
    public DisplayFormat Display => new(Unit);

    /// <summary>Applies an edit and asks for a new plan (the last good plan stays on screen meanwhile).</summary>
    public void Edit(Func<PlanDocument, PlanDocument> change)
    {
        var next = change(Document);
        if (next == Document) return;
        Document = next;
        Replan();
    }

    // Every request carries its generation: a result for an older document is stale and dropped.
    private void Replan()
    {
        long generation = ++_generation;
        var doc = Document;
        var library = Library;
        IsComputing = true;
        Changed?.Invoke();
        Scheduler.Request(() => Compute(doc, library), outcome => Deliver(generation, outcome));
    }

    private void Deliver(long generation, PlanOutcome outcome)
    {
        if (generation != _generation) return;
        IsComputing = false;
        if (outcome.Plan is null && Outcome.Plan is not null) Error = outcome.Error;
        else { Outcome = outcome; Error = outcome.Error; }
        Changed?.Invoke();
    }

    /// <summary>Sets one plan setting's text (blank: back to the default).</summary>
    public void SetSetting(string key, string text) => Edit(d => d with { Inputs = d.Inputs.With(key, text) });

    /// <summary>Shows pressures in the next unit of the display list.</summary>
    public void CycleUnit()
    {
        var units = PressureUnits.Display;
        int i = units.ToList().IndexOf(Unit);
        Edit(d => d with { PressureUnit = units[(i + 1) % units.Count].Symbol });
    }

    /// <summary>Library matches for what the user is typing, best first.</summary>
    public IReadOnlyList<SolventHit> Search(string text) =>
        Library.Search(text).Select(s => new SolventHit(s,
            string.Join("  ", new[] { s.Name }.Concat(s.Aliases.Take(2)).Append(s.Cas)))).ToList();

    /// <summary>The charge becomes this solvent alone.</summary>
    public void UseSolvent(Solvent s) => Edit(d => d with { Charge = ChargeName(s) });

    /// <summary>
    /// Adds a solvent to the charge as <c>NAME=</c>, ready for its amount; a solvent already in
    /// the charge is not added again. Returns where the cursor goes: after that solvent's "=".
    /// </summary>
    public int AddSolvent(Solvent s)
    {
        var (charge, cursor) = ChargeText.Add(Document.Charge, s, Library);
        Edit(d => d with { Charge = charge });
        return cursor;
    }

    /// <summary>Sets the free-text notes saved with the plan.</summary>
    public void SetNotes(string notes) => Edit(d => d with { Notes = notes.ReplaceLineEndings("\n").TrimEnd() });

    /// <summary>How a solvent is written in a charge: its name with hyphens for spaces.</summary>
    public static string ChargeName(Solvent s) => SolventLibrary.Normalise(s.Name);

    /// <summary>Opens a plan file; bad files throw <see cref="PlanFileException"/> and leave the current plan alone.</summary>
    public void Open(string path)
    {
        var doc = PlanFileReader.Load(path);
        FilePath = Path.GetFullPath(path);
        _savedText = PlanFileWriter.Format(doc);
        Document = doc;
        Replan();
    }

    /// <summary>Saves to a file; an existing file is replaced only when <paramref name="confirmOverwrite"/> says yes.</summary>
    public SaveOutcome Save(string path, Func<string, bool> confirmOverwrite)
    {
        var doc = Document;
        var result = PlanFileWriter.Save(path, doc, confirmOverwrite);
        if (result == SaveOutcome.Saved)
        {
            FilePath = Path.GetFullPath(path);
            _savedText = PlanFileWriter.Format(doc);
            Changed?.Invoke();
        }
        return result;
    }

    /// <summary>
    /// Writes the plan's report (or, with <paramref name="ramp"/>, the strip's) the way
    /// <c>distillplan setpoints|strip -o FILE</c> and <c>--plot</c> do, by the file's extension.
    /// Only the plan of the current input is exported, never a stale one.
    /// </summary>
    public SaveOutcome Export(string path, bool ramp, Func<string, bool> confirmOverwrite)
    {
        if (!IsCurrent)
            throw new InputException("export", path, "a plan of the current input (" + (IsComputing ? "still computing; try again in a moment" : "fix: " + Error) + ")");
        var report = ramp ? Outcome.RampReport ?? throw new InputException("export", path, "a plan with a ramp (" + (Outcome.RampNote ?? "none") + ")")
            : Outcome.Report!;
        return ReportExport.Save(report, Display, path, confirmOverwrite);
    }

    /// <summary>Plans a document with the current library.</summary>
    public PlanOutcome Compute(PlanDocument doc) => Compute(doc, Library);

    /// <summary>Plans a document: the same parser, planner, strip planner and report as the command line. Safe off the UI thread.</summary>
    public PlanOutcome Compute(PlanDocument doc, SolventLibrary library)
    {
        Plan plan;
        PlanSetup setup;
        ReportContext context;
        try
        {
            (var charge, setup) = doc.Build(library);
            plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, setup.Model), setup);
            context = new ReportContext(doc.InputList(), library.Cite) { UserTitle = doc.Title, UserNotes = doc.Notes, Made = Clock ?? ReportContext.Now() };
        }
        catch (DistillPlanException e) { return PlanOutcome.Failed(e.Message); }
        catch (Exception e) when (e is ArithmeticException or ArgumentException or InvalidOperationException)
        {
            return PlanOutcome.Failed($"internal error: {e.GetType().Name}: {e.Message.Split('\n')[0]} (please report it)");
        }

        var report = PlanReports.ForPlan(plan, context);
        CurvePicture? curve = null;
        try { curve = CurvePicture.For(plan); } catch (DistillPlanException) { /* the plan pane still says everything */ }
        try
        {
            var ramp = StripPlanner.Plan(plan, setup.Strip, setup.Model, reportEvery: 0.1);
            return new PlanOutcome(plan, report, null, curve, ramp, PlanReports.ForStrip(ramp, context), null);
        }
        catch (DistillPlanException e) { return new PlanOutcome(plan, report, null, curve, null, null, "No ramp: " + e.Message); }
    }

    // ---- Text the panes show. Kept here so it is tested without a terminal. ----

    /// <summary>A pressure in the chosen unit.</summary>
    public string P(Pressure p) => PressureUnits.Format(p, Unit);

    /// <summary>
    /// The always-visible setpoint strip, three lines of at most <paramref name="width"/>: the
    /// setpoints, what decided them, and <paramref name="notice"/>. When the input cannot be
    /// planned, the setpoints are marked as the last good ones and the error takes the last two
    /// lines, its end (what is expected) kept when it is too long.
    /// </summary>
    public string[] Readout(int width = 78, string? notice = null)
    {
        string first = Outcome.Plan is Plan p ? ReadoutLine.Setpoints(p, P, width, Error is null ? "" : "Last good: ")
            : "Bath --   Vapour --   Vacuum --   Condenser --";
        if (Error is string error) return [first, .. ReadoutLine.KeepEnd("Cannot plan: " + error, width, 2)];
        if (Outcome.Plan is not Plan plan) return [first, "", notice ?? ""];
        string feasible = plan.Feasible ? "" : "NOT FEASIBLE: see the conflict | ";
        // Checks first, charge last: on a narrow screen the long mixture description is what gets cut.
        return [first, $"{feasible}{SeverityText.Summary(plan.Checks)} | set by {plan.LimitingConstraint} | {plan.Charge.Describe()}",
            notice ?? (plan.Scale is Core.Scale.PlanScale scale ? ReadoutLine.Scale(scale, plan.AtAtmosphericPressure, width) : "")];
    }

    /// <summary>The plan pane: the plan's report rendered by the same text renderer as the CLI, at the pane's width.</summary>
    public string PlanReport(int width = 78)
    {
        string Wrapped(string text) => string.Join("\n", LineWrap.Wrap(text, width, hanging: 2));
        if (Outcome.Report is not Report r)
            return Wrapped("Cannot plan this input: " + (Error ?? Outcome.Error)) + "\n\nFix the field named above.";
        string report = TextReport.Render(r, Display, width);
        if (Error is string error)
            return Wrapped("Cannot plan this input: " + error) + "\n\n" + Wrapped("Below: the LAST GOOD PLAN, for the input before the edit that failed.") + "\n\n" + report;
        return IsComputing ? "(computing the plan of the new input; below: the plan before it)\n\n" + report : report;
    }

    /// <summary>What a settings field left empty would mean, shown beside it.</summary>
    public string DefaultFor(string settingKey)
    {
        string hint = PlanSettings.DefaultHint(PlanSettings.Get(settingKey), Document.Inputs, Display);
        // Two numbers side by side need their names: which step is which.
        if (settingKey != "delta-t") return hint;
        var steps = hint.StartsWith("default ", StringComparison.Ordinal) ? hint["default ".Length..].Split(", ") : [];
        return steps.Length == 2 ? $"default {steps[0]} bath→vapour, {steps[1]} vapour→cond." : hint + " (bath→vapour, vapour→condenser)";
    }

    /// <summary>The ramp table: the strip report's steps table (the same columns as <c>distillplan strip</c>).</summary>
    public Table? RampTable => Outcome.RampReport?.MainTable;
}
