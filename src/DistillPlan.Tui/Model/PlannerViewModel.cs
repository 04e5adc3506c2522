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

    private PlanDocument _saved;

    /// <summary>A planner over a library.</summary>
    public PlannerViewModel(SolventLibrary library)
    {
        Library = library;
        Document = new PlanDocument { Charge = DefaultCharge };
        _saved = Document;
        Outcome = Compute(Document);
    }

    /// <summary>The solvent library.</summary>
    public SolventLibrary Library { get; private set; }

    /// <summary>Plans with a reloaded library (after the user added a compound to theirs), keeping the document.</summary>
    public void UseLibrary(SolventLibrary library)
    {
        Library = library;
        Outcome = Compute(Document);
        Changed?.Invoke();
    }
    /// <summary>What the user has entered.</summary>
    public PlanDocument Document { get; private set; }
    /// <summary>The latest plan, or why there is none.</summary>
    public PlanOutcome Outcome { get; private set; }
    /// <summary>The file the plan was opened from or saved to, if any.</summary>
    public string? FilePath { get; private set; }
    /// <summary>True when the document differs from what was last opened or saved.</summary>
    public bool IsDirty => Document != _saved;
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

    /// <summary>Applies an edit and re-plans.</summary>
    public void Edit(Func<PlanDocument, PlanDocument> change)
    {
        var next = change(Document);
        if (next == Document) return;
        Document = next;
        Outcome = Compute(Document);
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

    /// <summary>Adds a solvent to the charge, leaving "=" for its amount.</summary>
    public void AddSolvent(Solvent s) => Edit(d => d with
    {
        Charge = string.IsNullOrWhiteSpace(d.Charge) ? ChargeName(s) : d.Charge.TrimEnd(',', ' ') + "," + ChargeName(s) + "=",
    });

    /// <summary>How a solvent is written in a charge: its name with hyphens for spaces.</summary>
    public static string ChargeName(Solvent s) => SolventLibrary.Normalise(s.Name);

    /// <summary>Opens a plan file; bad files throw <see cref="PlanFileException"/> and leave the current plan alone.</summary>
    public void Open(string path)
    {
        var doc = PlanFileReader.Load(path);
        FilePath = Path.GetFullPath(path);
        _saved = doc;
        Document = doc;
        Outcome = Compute(doc);
        Changed?.Invoke();
    }

    /// <summary>Saves to a file; an existing file is replaced only when <paramref name="confirmOverwrite"/> says yes.</summary>
    public SaveOutcome Save(string path, Func<string, bool> confirmOverwrite)
    {
        var result = PlanFileWriter.Save(path, Document, confirmOverwrite);
        if (result == SaveOutcome.Saved)
        {
            FilePath = Path.GetFullPath(path);
            _saved = Document;
            Changed?.Invoke();
        }
        return result;
    }

    /// <summary>Plans a document: the same parser, planner, strip planner and report as the command line.</summary>
    public PlanOutcome Compute(PlanDocument doc)
    {
        Plan plan;
        PlanSetup setup;
        ReportContext context;
        try
        {
            (var charge, setup) = doc.Build(Library);
            plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, setup.Model), setup);
            context = new ReportContext(doc.InputList(), Library.Cite) { UserTitle = doc.Title, UserNotes = doc.Notes, Made = Clock ?? ReportContext.Now() };
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

    /// <summary>The always-visible setpoint strip: two lines, or the error in place of the second.</summary>
    public (string Setpoints, string Detail) Readout()
    {
        if (Outcome.Plan is not Plan p)
            return ("Bath  --    Vapour  --    Vacuum  --    Condenser  --", "Cannot plan: " + Outcome.Error);
        string vacuum = p.AtAtmosphericPressure ? P(p.VacuumSetpoint) + " (none needed)"
            : p.SetpointReachable ? P(p.VacuumSetpoint)
            : "NOT REACHABLE";
        string feasible = p.Feasible ? "" : "NOT FEASIBLE: see the conflict | ";
        return ($"Bath {p.Bath}   Vapour {p.Vapor}   Vacuum {vacuum}   Condenser <= {p.CondenserMax}",
                // Checks first, charge last: on a narrow screen the long mixture description is what gets cut.
                $"{feasible}{SeverityText.Summary(p.Checks)} | set by {p.LimitingConstraint} | {p.Charge.Describe()}");
    }

    /// <summary>The plan pane: the plan's report rendered by the same text renderer as the CLI, at the pane's width.</summary>
    public string PlanReport(int width = 78)
    {
        if (Outcome.Report is not Report r)
            return "Cannot plan this input:\n" + Outcome.Error + "\n\nFix the field named above; the last good plan is not shown so nothing stale is read as current.";
        return TextReport.Render(r, Display, width);
    }

    /// <summary>What a settings field left empty would mean, shown beside it.</summary>
    public string DefaultFor(string settingKey) => PlanSettings.DefaultHint(PlanSettings.Get(settingKey), Document.Inputs, Display);

    /// <summary>The ramp table: the strip report's steps table (the same columns as <c>distillplan strip</c>).</summary>
    public Table? RampTable => Outcome.RampReport?.MainTable;
}
