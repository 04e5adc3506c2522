using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Reports;

/// <summary>Builds the report of a setpoint plan and of a strip: the one place their content and order are decided.</summary>
public static class PlanReports
{
    /// <summary>The report of a setpoint plan.</summary>
    public static Report ForPlan(Plan p, ReportContext context)
    {
        var names = p.System.Components.Select(s => s.Name).ToList();
        bool mixture = names.Count > 1;
        var setpoints = new List<Row>
        {
            new(p.Equipment.IsVessel || p.Equipment.Heating == HeatingMedium.Jacket ? "Jacket" : "Bath", Quantity.Of(p.Bath), "bath_temperature"),
            new("Vapour temperature", Quantity.Of(p.Vapor), "vapor_temperature") { Note = "set by: " + p.LimitingConstraint },
            // A pressure the pump cannot hold is never presented as the setpoint (see the conflict).
            p.SetpointReachable
                ? new("Vacuum setpoint", Quantity.Of(p.VacuumSetpoint), "vacuum_setpoint") { Note = p.AtAtmosphericPressure ? "no vacuum needed" : null }
                : new("Vacuum needed", Quantity.Of(p.VacuumSetpoint), "vacuum_setpoint")
                {
                    Note = "NOT REACHABLE with this pump; see pump-limit and the conflict below",
                },
            new("Setpoint reachable", Quantity.Flag(p.SetpointReachable), "setpoint_reachable") { MachineOnly = true },
            new("Condenser at most", Quantity.Of(p.CondenserMax), "condenser_max") { Note = "coolant " + p.Equipment.Coolant },
            new("Boils at ambient", Quantity.Of(p.AtmosphericBoilingPoint), "atmospheric_boiling_temperature") { Note = null },
            new("Approach in steps", p.Approach.Select(Quantity.Of).ToList(), "approach") { Joiner = " → ", IsList = true },
            new("Feasible", Quantity.Flag(p.Feasible), "feasible") { MachineOnly = p.Feasible },
        };
        bool twoLiquids = p.StartLiquidPhases.Count > 1;
        setpoints.Add(new("Liquid phases", Quantity.Number(Math.Max(1, p.StartLiquidPhases.Count)), "liquid_phases")
        {
            MachineOnly = !twoLiquids,
            Note = twoLiquids ? "two liquid phases (layers) in the pot at the setpoint" : null,
        });
        var sections = new List<Section> { new("Setpoints", setpoints, []) };
        if (p.Scale is Scale.PlanScale scale) sections.Add(new Section("Heat and time", ScaleRows.ForPlan(p, scale), []));
        if (p.Ramp is StripPlan ramp && ramp.Steps.Count > 1)
            sections.Add(new Section("Pressure ramp", [], [StepsTable(ramp, "ramp")]));
        // After the ramp, so the ramp stays the report's main table (CSV).
        if (twoLiquids) sections.Add(new Section("Two liquid phases", [], [PhasesTable(p.StartLiquidPhases, names)]));

        var header = new List<Row>
        {
            new("Limiting constraint", Quantity.Words(p.LimitingConstraint), "limiting_constraint") { MachineOnly = true },
            new("Model", Quantity.Words(p.System.Model), "model") { MachineOnly = true },
            new("Model note", Quantity.Words(p.System.ModelNote ?? ""), "model_note") { MachineOnly = true },
            new("Liquid", p.Charge.MoleFractions().Select(Quantity.MoleFraction).ToList(), "liquid") { Names = names, MachineOnly = true },
            new("Vapour", p.StartVapor.Select(Quantity.MoleFraction).ToList(), "vapor") { Names = names, MachineOnly = true },
            new("At atmospheric pressure", Quantity.Flag(p.AtAtmosphericPressure), "at_atmospheric_pressure") { MachineOnly = true },
            new("Coolant", Quantity.Of(p.Equipment.Coolant), "coolant_temperature") { MachineOnly = true },
            new("Pump ultimate", Quantity.Of(p.Equipment.PumpUltimate), "pump_ultimate") { MachineOnly = true },
            new("Heating limit", Quantity.Of(p.Equipment.HeatingMax), "heating_max") { MachineOnly = true },
            new("Atmospheric", Quantity.Of(p.Equipment.Atmosphere), "atmospheric") { MachineOnly = true },
        };

        return new Report
        {
            Kind = "plan",
            Title = $"Plan for {p.Charge.Describe()}" + (mixture ? $"  [model: {p.System.Model}]" : ""),
            UserTitle = context.UserTitle,
            UserNotes = context.UserNotes,
            Program = context.Program,
            Made = context.Made,
            Inputs = context.Inputs,
            Header = header,
            Sections = sections,
            Checks = p.Checks,
            Notes = p.Notes,
            Assumptions = p.Assumptions,
            Sources = Sources(p, context),
            Cautions = Checks.Cautions.For(p.Equipment, p.System.Components),
            // Drawn only for --plot or an export: the curve is 61 bubble points that the text,
            // JSON and Markdown reports do not show.
            Plots = new DeferredList<Plot>(() => [CurvePlot(p), .. p.Ramp is StripPlan r && r.Steps.Count > 1 ? [RampPlot(r)] : Array.Empty<Plot>()]),
        };
    }

    /// <summary>The report of a strip.</summary>
    public static Report ForStrip(StripPlan s, ReportContext context)
    {
        var p = s.Setpoints;
        string held = s.Mode == Mixtures.StripMode.FixedVaporTemperature
            ? "vapour temperature held, pressure falls" : "pressure held, boiling temperature rises";
        var how = new List<Row>
        {
            new("Held", Quantity.Words(held), "mode_text") { MachineOnly = false },
            new("Mode", Quantity.Words(s.Mode == Mixtures.StripMode.FixedVaporTemperature ? "fixed-vapor-temperature" : "fixed-pressure"), "mode") { MachineOnly = true },
            new("Model", Quantity.Words(s.Model), "model"),
            new("Model note", Quantity.Words(s.ModelNote ?? ""), "model_note") { MachineOnly = true },
            new("Evaporated counts", Quantity.Words($"the charged solvent by {s.Basis}"), "evaporated_basis"),
            new("Ends", Quantity.Words(s.EndText(DisplayFormat.Default)), "end_message") { MachineOnly = true },
            new("End reason", Quantity.Words(EndCode(s.EndReason)), "end_reason") { MachineOnly = true },
            new("Charge", s.ChargeMol.Values.Select(v => Quantity.Number(v, "mol")).ToList(), "charge_mol") { Names = s.ChargeMol.Keys.ToList(), MachineOnly = true },
        };
        how.AddRange(ScaleRows.ForStrip(s));
        return new Report
        {
            Kind = "strip",
            Title = $"Strip of {p.Charge.Describe()}",
            UserTitle = context.UserTitle,
            UserNotes = context.UserNotes,
            Program = context.Program,
            Made = context.Made,
            Inputs = context.Inputs,
            Sections = [new("How it runs", how, []), new("Steps", [], [StepsTable(s, "steps")])],
            Checks = s.Findings,
            Notes = [.. p.Notes.Where(n => n.Code != "pressure-ramp"), s.End],
            Assumptions = p.Assumptions,
            Sources = Sources(p, context),
            Cautions = Checks.Cautions.For(p.Equipment, p.System.Components),
            Plots = [RampPlot(s)],
        };
    }

    /// <summary>The strip end as a stable code (fraction-left-reached, pump-limit-reached …).</summary>
    public static string EndCode(Mixtures.StripEndReason e) =>
        string.Concat(e.ToString().Select((ch, i) => i > 0 && char.IsUpper(ch) ? "-" + char.ToLowerInvariant(ch) : char.ToLowerInvariant(ch).ToString()));

    private static Table StepsTable(StripPlan s, string jsonKey)
    {
        var names = s.Setpoints.System.Components.Select(c => c.Name).ToList();
        bool mixture = names.Count > 1;
        var columns = new List<Column>
        {
            new($"Evaporated by {s.Basis}", QuantityKind.Percent, "evaporated_fraction") { ShortHeader = "Evap." },
            new("Pressure", QuantityKind.Pressure, "pressure") { ShortHeader = "P" },
            new("Vapour temperature", QuantityKind.Temperature, "vapor_temperature") { ShortHeader = "Vapour" },
            s.Setpoints.Equipment.Heating == HeatingMedium.Jacket || s.Setpoints.Equipment.IsVessel
                ? new("Jacket temperature", QuantityKind.Temperature, "bath_temperature") { ShortHeader = "Jacket" }
                : new("Bath temperature", QuantityKind.Temperature, "bath_temperature") { ShortHeader = "Bath" },
        };
        columns.AddRange(names.Select(n => new Column($"x {n}", QuantityKind.MoleFraction, "liquid", n) { ShortHeader = "x " + Short(n), MachineOnly = !mixture }));
        columns.AddRange(names.Select(n => new Column($"y {n}", QuantityKind.MoleFraction, "vapor", n) { ShortHeader = "y " + Short(n), MachineOnly = true }));
        var all = s.ChargeMol.Keys.ToList();
        columns.AddRange(all.Select(n => new Column($"distillate {n}", QuantityKind.Number, "distillate_mol", n) { NumberUnit = "mol", MachineOnly = true }));
        columns.AddRange(all.Select(n => new Column($"residue {n}", QuantityKind.Number, "residue_mol", n) { NumberUnit = "mol", MachineOnly = true }));
        bool timed = s.Steps.Count > 0 && s.Steps.All(st => st.Heat is not null);
        if (timed) columns.InsertRange(4, ScaleRows.StepColumns());
        var rows = s.Steps.Select(st => new TableRow(
            [
                Quantity.Percent(st.Evaporated), Quantity.Of(st.Pressure), Quantity.Of(st.Vapor), Quantity.Of(st.Bath),
                .. timed ? ScaleRows.StepCells(st) : [],
                .. names.Select(n => Quantity.MoleFraction(st.Liquid[n])),
                .. names.Select(n => Quantity.MoleFraction(st.VaporComposition[n])),
                .. all.Select(n => Quantity.Number(st.DistillateMol[n], "mol")),
                .. all.Select(n => Quantity.Number(st.ResidueMol[n], "mol")),
            ], st.Findings)).ToList();
        return new Table(jsonKey, columns, rows);
    }

    /// <summary>The pot's liquid layers: each one's share of the liquid and its mole fractions (JSON <c>phases</c>).</summary>
    public static Table PhasesTable(IReadOnlyList<Mixtures.LiquidPhase> phases, IReadOnlyList<string> names)
    {
        var columns = new List<Column> { new("Share of the liquid", QuantityKind.Percent, "share") { ShortHeader = "Share" } };
        columns.AddRange(names.Select(n => new Column($"x {n}", QuantityKind.MoleFraction, "mole_fractions", n) { ShortHeader = "x " + Short(n) }));
        var rows = phases.Select(ph => new TableRow(
            [Quantity.Percent(ph.Share), .. names.Select(n => Quantity.MoleFraction(ph.MoleFractions.GetValueOrDefault(n)))], [])).ToList();
        return new Table("phases", columns, rows);
    }

    private static string Short(string name) => name.Length <= 8 ? name : name[..7] + ".";

    private static Plot CurvePlot(Plan p)
    {
        double[] x = p.Charge.MoleFractions();
        double lo = Math.Min(p.Equipment.Coolant.Kelvin, p.Vapor.Kelvin) - 10, hi = Math.Max(p.Bath.Kelvin, p.AtmosphericBoilingPoint.Kelvin) + 5;
        var t = new List<Quantity>();
        var pr = new List<Quantity>();
        for (int i = 0; i <= 60; i++)
        {
            double k = lo + (hi - lo) * i / 60;
            try
            {
                pr.Add(Quantity.Pascal(p.System is MixtureBoilingSystem m ? m.BubblePressurePa(k, x) : p.System.BubblePressure(k, x).PressurePa));
                t.Add(Quantity.Kelvin(k));
            }
            catch (DistillPlanException) { /* a point outside every curve's reach is simply not drawn */ }
        }
        return new Plot("Vapour pressure of the charge", "Temperature", QuantityKind.Temperature, "Pressure", QuantityKind.Pressure, LogY: true,
            [
                new("bubble pressure", t, pr),
                new("setpoint", [Quantity.Of(p.Vapor)], [Quantity.Of(p.VacuumSetpoint)], MarkersOnly: true),
            ],
            [
                new("coolant", Quantity.Of(p.Equipment.Coolant), Vertical: true),
                new("bath", Quantity.Of(p.Bath), Vertical: true),
                new("pump can hold", Quantity.Of(SetpointPlanner.PumpHold(p.Equipment, p.Rules)), Vertical: false),
            ]);
    }

    private static Plot RampPlot(StripPlan s)
    {
        var x = s.Steps.Select(st => Quantity.Percent(st.Evaporated)).ToList();
        return new Plot("Strip: pressure and temperature", $"Evaporated by {s.Basis}", QuantityKind.Percent, "Pressure", QuantityKind.Pressure, LogY: true,
            [
                new("pressure", x, s.Steps.Select(st => Quantity.Of(st.Pressure)).ToList()),
                new("vapour temperature", x, s.Steps.Select(st => Quantity.Of(st.Vapor)).ToList(), OnRightAxis: true),
                new("bath", x, s.Steps.Select(st => Quantity.Of(st.Bath)).ToList(), OnRightAxis: true),
            ],
            [new("pump can hold", Quantity.Of(SetpointPlanner.PumpHold(s.Setpoints.Equipment, s.Setpoints.Rules)), Vertical: false)])
        { RightLabel = "Temperature" };
    }

    private static readonly Dictionary<string, string> ModelCitations = new()
    {
        ["unifac"] = "UNIFAC (original): Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975) 1086; parameters as revised by Hansen et al., Ind. Eng. Chem. Res. 30 (1991) 2352",
        ["dortmund"] = "modified UNIFAC (Dortmund): Weidlich, Gmehling, Ind. Eng. Chem. Res. 26 (1987) 1372; Gmehling, Li, Schiller, Ind. Eng. Chem. Res. 32 (1993) 178; parameters as published by DDBST (2016 set)",
    };

    /// <summary>The sources a plan relied on: its solvents' fields and the activity model.</summary>
    internal static IReadOnlyList<SourceCitation> SourcesOf(Plan p, ReportContext context) => Sources(p, context);

    private static IReadOnlyList<SourceCitation> Sources(Plan p, ReportContext context)
    {
        var keys = p.System.Components.SelectMany(s => s.Sources.Values).Distinct().OrderBy(k => k, StringComparer.Ordinal).ToList();
        var list = keys.Select(k => new SourceCitation(k, context.Cite(k))).ToList();
        if (p.System is MixtureBoilingSystem m && ModelCitations.TryGetValue(m.Model, out var cite))
            list.Add(new SourceCitation(m.Model, cite));
        return list;
    }
}
