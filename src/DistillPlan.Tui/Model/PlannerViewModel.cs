using System.Text;
using DistillPlan.Core;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Tui.Model;

/// <summary>A library match for type-to-search: the solvent and the line shown for it.</summary>
/// <param name="Solvent">The library entry.</param>
/// <param name="Line">Name, aliases and CAS number, e.g. "ethyl acetate  EtOAc  141-78-6".</param>
public sealed record SolventHit(Solvent Solvent, string Line);

/// <summary>
/// Everything behind the planner's screens: the plan document being edited, the plan computed
/// from it after every edit (the same Core calls as the command line), and the text the panes
/// show. Views hand it what the user typed and render what it says; it never touches a view.
/// </summary>
public sealed class PlannerViewModel
{
    /// <summary>The charge a new planner starts with, so the first screen already shows setpoints.</summary>
    public const string DefaultCharge = "ethyl-acetate";

    private readonly IRampSource _pureRamp = new PureSolventRamp();
    private PlanDocument _saved;

    /// <summary>A planner over a library; <paramref name="mixtureRamp"/> replaces the Rayleigh-strip ramp of mixtures when given.</summary>
    public PlannerViewModel(SolventLibrary library, IRampSource? mixtureRamp = null)
    {
        Library = library;
        MixtureRamp = mixtureRamp ?? new MixtureStripRamp();
        Document = new PlanDocument { Charge = DefaultCharge };
        _saved = Document;
        Outcome = Compute(Document);
    }

    /// <summary>The solvent library.</summary>
    public SolventLibrary Library { get; }
    /// <summary>Computes the ramp of a mixture.</summary>
    public IRampSource MixtureRamp { get; }
    /// <summary>What the user has entered.</summary>
    public PlanDocument Document { get; private set; }
    /// <summary>The latest plan, or why there is none.</summary>
    public PlanOutcome Outcome { get; private set; }
    /// <summary>The file the plan was opened from or saved to, if any.</summary>
    public string? FilePath { get; private set; }
    /// <summary>True when the document differs from what was last opened or saved.</summary>
    public bool IsDirty => Document != _saved;

    /// <summary>Raised after every change of document or outcome.</summary>
    public event Action? Changed;

    /// <summary>The pressure unit the plan is shown in (falls back to mbar if the document names an unknown one).</summary>
    public PressureUnit Unit =>
        PressureUnits.Display.FirstOrDefault(u => string.Equals(u.Symbol, Document.PressureUnit, StringComparison.OrdinalIgnoreCase))
        ?? PressureUnits.Millibar;

    /// <summary>Applies an edit and re-plans.</summary>
    public void Edit(Func<PlanDocument, PlanDocument> change)
    {
        var next = change(Document);
        if (next == Document) return;
        Document = next;
        Outcome = Compute(Document);
        Changed?.Invoke();
    }

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

    /// <summary>Plans a document: the same parser and planner as <c>distillplan setpoints</c>.</summary>
    public PlanOutcome Compute(PlanDocument doc)
    {
        Plan plan;
        try
        {
            var (equipment, rules) = doc.Inputs.Build();
            var charge = doc.BuildCharge(Library);
            var system = BoilingSystems.For(charge, doc.Model.Length == 0 ? null : doc.Model);
            plan = SetpointPlanner.Plan(charge, system, equipment, rules);
        }
        catch (DistillPlanException e) { return new PlanOutcome(null, e.Message, null, null, null); }
        catch (Exception e) when (e is ArithmeticException or ArgumentException or InvalidOperationException)
        {
            return new PlanOutcome(null, $"internal error: {e.GetType().Name}: {e.Message.Split('\n')[0]} (please report it)", null, null, null);
        }

        CurvePicture? curve = null;
        try { curve = CurvePicture.For(plan); } catch (DistillPlanException) { }

        var source = plan.Charge.IsPure ? _pureRamp : MixtureRamp;
        try { return new PlanOutcome(plan, null, curve, source.Compute(plan.Charge, plan), null); }
        catch (DistillPlanException e) { return new PlanOutcome(plan, null, curve, null, "No ramp: " + e.Message); }
    }

    // ---- Text the panes show. Kept here so it is tested without a terminal. ----

    /// <summary>A pressure in the chosen unit.</summary>
    public string P(Pressure p) => PressureUnits.Format(p, Unit);

    /// <summary>The always-visible setpoint strip: two lines, or the error in place of the second.</summary>
    public (string Setpoints, string Detail) Readout()
    {
        if (Outcome.Plan is not Plan p)
            return ("Bath  --    Vapour  --    Vacuum  --    Condenser  --", "Cannot plan: " + Outcome.Error);
        string vacuum = p.AtAtmosphericPressure ? P(p.VacuumSetpoint) + " (none needed)" : P(p.VacuumSetpoint);
        return ($"Bath {p.Bath}   Vapour {p.Vapor}   Vacuum {vacuum}   Condenser <= {p.CondenserMax}",
                // Checks first, charge last: on a narrow screen the long mixture description is what gets cut.
                $"{SeverityText.Summary(p.Checks)} | set by {p.LimitingConstraint} | {p.Charge.Describe()}");
    }

    /// <summary>The plan pane: setpoints, approach, notes, conflicts, checks with what to do, assumptions, cautions.</summary>
    public string PlanReport()
    {
        if (Outcome.Plan is not Plan p) return "Cannot plan this input:\n" + Outcome.Error + "\n\nFix the field named above; the last good plan is not shown so nothing stale is read as current.";
        var o = new StringBuilder();
        if (Document.Title.Length > 0) o.AppendLine(Document.Title);
        if (Document.Notes.Length > 0) o.AppendLine("Notes: " + Document.Notes).AppendLine();
        o.AppendLine($"{p.Charge.Describe()}" + (p.System.Model == "pure" ? "" : $"   model: {p.System.Model}"));
        o.AppendLine($"  Bath / jacket      {p.Bath}");
        o.AppendLine($"  Vapour temperature {p.Vapor}   (set by {p.LimitingConstraint})");
        o.AppendLine($"  Vacuum setpoint    {P(p.VacuumSetpoint)}" + (p.AtAtmosphericPressure ? "   (no vacuum needed)" : ""));
        o.AppendLine($"  Condenser at most  {p.CondenserMax}   (coolant {p.Equipment.Coolant})");
        o.AppendLine($"  Boils at ambient   {p.AtmosphericBoilingPoint} at {P(p.Equipment.Atmosphere)}");
        o.AppendLine($"  Step down through  {string.Join(" > ", p.Approach.Select(P))}");
        foreach (var n in p.Notes) o.AppendLine($"  Note: {n}");
        foreach (var c in p.Conflicts) o.AppendLine($"  CONFLICT: {c.Message} Resolve with: {string.Join("; or ", c.Remedies)}.");
        o.AppendLine();
        o.AppendLine(p.Checks.Count == 0 ? "CHECKS: none raised." : $"CHECKS ({SeverityText.Summary(p.Checks)}):");
        foreach (var c in p.Checks)
        {
            o.AppendLine($"{SeverityText.Label(c.Severity)}  {c.Code}: {c.Message}");
            o.AppendLine($"    What to do: {c.Action}");
        }
        o.AppendLine();
        o.AppendLine("ASSUMED (* = default, not set by you):");
        foreach (var a in p.Assumptions) o.AppendLine($"  {(a.IsDefault ? "*" : " ")} {a.Name}: {a.Value}  ({a.Basis})");
        o.AppendLine();
        o.AppendLine("CAUTIONS:");
        foreach (var c in Cautions.General) o.AppendLine($"  - {c}");
        return o.ToString();
    }

    /// <summary>The default a settings field falls back to, shown beside it.</summary>
    public string DefaultFor(string settingKey)
    {
        var e = Outcome.Plan?.Equipment ?? new Equipment();
        return settingKey switch
        {
            "vapor-temp" => "default 40 °C",
            "bath-max" => $"default {Equipment.TypicalLimit(e.Heating)} ({HeatingWord(e.Heating)})",
            "heating" => "default water-bath; oil-bath, jacket",
            "coolant-temp" => "default 10 °C",
            "pump" => "default diaphragm; rotary-vane aspirator liquid-ring",
            "pump-limit" => $"default {Equipment.TypicalUltimate(e.Pump)} ({PumpWord(e.Pump)})",
            "atmospheric" => "default 1013.25 mbar (sea level)",
            "altitude" => "metres; instead of atmospheric",
            "delta-t" => "default 20 (both); or bath,condenser 25,20",
            "product-max" => "none unless given",
            _ => "",
        };
    }

    private static string HeatingWord(HeatingMedium m) => m switch { HeatingMedium.OilBath => "oil bath", HeatingMedium.Jacket => "jacket", _ => "water bath" };
    private static string PumpWord(PumpKind k) => k switch
    {
        PumpKind.RotaryVane => "rotary-vane pump", PumpKind.Aspirator => "aspirator", PumpKind.LiquidRing => "liquid-ring pump", _ => "diaphragm pump",
    };

    /// <summary>Ramp table rows: fraction, pressure, vapour and bath temperature, liquid and vapour of the first solvent.</summary>
    public IReadOnlyList<RampRow> RampRows() => Outcome.Ramp is not Ramp r ? [] : r.Steps.Select(s => new RampRow(
        $"{s.EvaporatedFraction * 100:0}", Number(PressureUnits.Format(Pressure.FromPascal(s.PressurePa), Unit)),
        Temperature.FromKelvin(s.VaporK).Celsius.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture),
        Temperature.FromKelvin(s.BathK).Celsius.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture),
        Fraction(s.Liquid, RampKey), Fraction(s.Vapor, RampKey))).ToList();

    /// <summary>The solvent whose mole fractions the ramp table shows: the first of the charge (the one being stripped off, usually).</summary>
    public string RampKey => Outcome.Plan?.System.Components[0].Name ?? "";

    private static string Number(string formatted) => formatted.Split(' ')[0];

    private static string Fraction(IReadOnlyDictionary<string, double> x, string key) =>
        x.TryGetValue(key, out double v) ? v.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture) : "-";
}

/// <summary>One row of the ramp table, already formatted.</summary>
/// <param name="Evaporated">Per cent of the solvent evaporated, e.g. "30".</param>
/// <param name="Pressure">Pressure in the display unit (the unit is in the column header).</param>
/// <param name="Vapor">Vapour temperature [°C].</param>
/// <param name="Bath">Bath temperature [°C].</param>
/// <param name="Liquid">Liquid mole fraction of <see cref="PlannerViewModel.RampKey"/>.</param>
/// <param name="VaporComposition">Vapour mole fraction of the same solvent.</param>
public sealed record RampRow(string Evaporated, string Pressure, string Vapor, string Bath, string Liquid, string VaporComposition);
