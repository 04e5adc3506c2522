using DistillPlan.Core.Planning;

namespace DistillPlan.Core.Reports;

/// <summary>The report of a solvent swap: how it is held, each method with its totals and steps, the recommendation.</summary>
public static class SwapReport
{
    /// <summary>Builds the report.</summary>
    public static Report For(SwapPlan s, ReportContext context)
    {
        var p = s.Setpoints;
        string old = string.Join(" and ", s.OldSolvents);
        var how = new List<Row>
        {
            new("Swap", Quantity.Words($"{old} → {s.NewSolvent}")) { Note = $"down to {s.Target.Text} of {old} in the liquid" },
            new("Held", Quantity.Words(s.Held), "mode_text"),
            new("Volumes", Quantity.Words($"{Num(s.Volumes.MinimumL)} L to {Num(s.Volumes.MaximumL)} L")) { Note = "strip down to the first, refill to the second" },
            new("Recommended", Quantity.Words(s.Recommended?.Name ?? "none"), "recommended") { Note = s.Reason },
            new("Reason", Quantity.Words(s.Reason), "recommended_reason") { MachineOnly = true },
            new("New solvent", Quantity.Words(s.NewSolvent), "new_solvent") { MachineOnly = true },
            new("Old solvents", s.OldSolvents.Select(Quantity.Words).ToList(), "old_solvents") { IsList = true, MachineOnly = true },
            new("Target", Quantity.Number(s.Target.Fraction), s.Target.Kind == SwapTargetKind.MassFraction ? "target_mass_fraction" : "target_mole_fraction") { MachineOnly = true },
            new("Minimum volume", Quantity.Number(s.Volumes.MinimumL, "L"), "min_volume_l") { MachineOnly = true },
            new("Maximum volume", Quantity.Number(s.Volumes.MaximumL, "L"), "max_volume_l") { MachineOnly = true },
            new("Model", Quantity.Words(s.Model), "model"),
        };
        var sections = new List<Section> { new("How it runs", how, []) };
        foreach (var m in s.Methods) sections.Add(MethodSection(m, s));
        return new Report
        {
            Kind = "swap",
            Title = $"Solvent swap of {p.Charge.Describe()} to {s.NewSolvent}",
            UserTitle = context.UserTitle,
            UserNotes = context.UserNotes,
            Program = context.Program,
            Made = context.Made,
            Inputs = context.Inputs,
            Sections = sections,
            Checks = s.Findings,
            Notes = p.Notes.Where(n => n.Code != "pressure-ramp").ToList(),
            Assumptions = p.Assumptions,
            Sources = PlanReports.SourcesOf(p, context),
            Cautions = Checks.Cautions.For(p.Equipment, [.. p.System.Components, .. s.NewSolventEntry is { } n ? new[] { n } : []]),
            Plots = [ResidualPlot(s)],
        };
    }

    private static Section MethodSection(SwapMethodPlan m, SwapPlan s)
    {
        string words = m.Method == Scale.SwapMethod.ConstantVolume
            ? $"strip to {Num(s.Volumes.MinimumL)} L, then feed {s.NewSolvent} as fast as distillate leaves"
            : $"strip to {Num(s.Volumes.MinimumL)} L, refill to {Num(s.Volumes.MaximumL)} L with {s.NewSolvent}, repeat ({m.Refills} {(m.Refills == 1 ? "refill" : "refills")})";
        var rows = new List<Row>
        {
            new("Method", Quantity.Words(m.Name), "method") { Note = words },
            new($"{s.NewSolvent} used", Quantity.Number(m.NewSolventL, "L"), "new_solvent_l"),
            new("Distillate", Quantity.Number(m.DistillateL, "L"), "distillate_l"),
            new("Left of the old", Quantity.Words(ResidualWords(m)), null) { Note = SwapPlanner.EndWords(m.End) },
            new("Residual by mass", Quantity.Number(m.ResidualMassFraction), "residual_mass_fraction") { MachineOnly = true },
            new("Residual by moles", Quantity.Number(m.ResidualMoleFraction), "residual_mole_fraction") { MachineOnly = true },
            new("Residual ppm", Quantity.Number(m.ResidualMassFraction * 1e6, "ppm"), "residual_ppm") { MachineOnly = true },
            new("End", Quantity.Words(m.End == Scale.SwapEnd.TargetReached ? "target-reached" : m.End == Scale.SwapEnd.CannotBoil ? "cannot-boil" : "step-limit"), "end_reason") { MachineOnly = true },
            new("Final volume", Quantity.Number(m.FinalVolumeL, "L"), "final_volume_l"),
            new("Refills", Quantity.Number(m.Refills), "refills") { MachineOnly = true },
        };
        if (m.TimeS is double t)
        {
            rows.Add(new("Time", Quantity.Words("about " + ScaleRows.Duration(t))) { Note = "heat-up included; charging and sampling not" });
            rows.Add(new("Time", Quantity.Number(t / 60, "min"), "time_min") { MachineOnly = true });
        }
        var names = s.Setpoints.Charge.Components.Select(c => c.Solvent.Name).Append(s.NewSolvent).Distinct().ToList();
        var columns = new List<Column>
        {
            new("Time", QuantityKind.Number, "time_min") { NumberUnit = "min", ShortHeader = "Time" },
            new("Refill", QuantityKind.Number, "cycle") { ShortHeader = "Cyc." },
            new("Volume", QuantityKind.Number, "volume_l") { NumberUnit = "L", ShortHeader = "Vol." },
            new($"{s.NewSolvent} added", QuantityKind.Number, "new_solvent_l") { NumberUnit = "L", ShortHeader = "Added" },
            new("Distillate", QuantityKind.Number, "distillate_l") { NumberUnit = "L", ShortHeader = "Dist." },
            new("Pressure", QuantityKind.Pressure, "pressure") { ShortHeader = "P" },
            new("Vapour temperature", QuantityKind.Temperature, "vapor_temperature") { ShortHeader = "Vapour" },
            new("Old solvent by mass", QuantityKind.Percent, "residual_mass") { ShortHeader = "Old" },
        };
        columns.AddRange(names.Select(n => new Column($"x {n}", QuantityKind.MoleFraction, "liquid", n) { MachineOnly = true }));
        bool balanced = m.Steps.All(st => st.Heat is not null);
        if (balanced) columns.AddRange(ScaleRows.MachineColumns());
        var table = new Table("steps", columns, m.Steps.Select(st => new TableRow(
        [
            Quantity.Number(st.TimeS is double ts ? Math.Round(ts / 60, 1) : double.NaN, "min"), Quantity.Number(st.Cycle),
            Quantity.Number(Figures(st.VolumeL), "L"), Quantity.Number(Figures(st.NewSolventL), "L"), Quantity.Number(Figures(st.DistillateL), "L"),
            Quantity.Of(st.Pressure), Quantity.Of(st.Vapor), Quantity.Percent(st.ResidualMassFraction),
            .. names.Select(n => Quantity.MoleFraction(st.Liquid.GetValueOrDefault(n))),
            .. balanced ? ScaleRows.MachineCells(st.Heat!) : [],
        ], [])).ToList());
        return new Section(m.Method == Scale.SwapMethod.ConstantVolume ? "Constant volume" : "Put and take", rows, [table]) { JsonGroup = "methods" };
    }

    private static string ResidualWords(SwapMethodPlan m)
    {
        string ppm = m.ResidualMassFraction < 0.01 ? $", {Num(m.ResidualMassFraction * 1e6)} ppm" : "";
        return $"{Pct(m.ResidualMassFraction)} by mass ({Pct(m.ResidualMoleFraction)} by moles{ppm})";
    }

    private static Plot ResidualPlot(SwapPlan s) =>
        new("Old solvent left against new solvent used", $"{s.NewSolvent} added", QuantityKind.Number, "Old solvent by mass", QuantityKind.Percent, LogY: true,
            [.. s.Methods.Select(m => new PlotSeries(m.Name,
                m.Steps.Select(st => Quantity.Number(st.NewSolventL, "L")).ToList(),
                m.Steps.Select(st => Quantity.Percent(Math.Max(st.ResidualMassFraction, 1e-9))).ToList()))],
            [new("target", Quantity.Percent(s.Target.Fraction), Vertical: false)]);

    private static string Num(double v) => DisplayFormat.Number(v);
    // Volumes read off a gauge or a flow totaliser: four significant figures are plenty.
    private static double Figures(double v) => v == 0 || !double.IsFinite(v) ? v : Math.Round(v, Math.Max(0, 3 - (int)Math.Floor(Math.Log10(Math.Abs(v)))));
    private static string Pct(double f) => (100 * f).ToString(f < 0.001 ? "G2" : "0.##", System.Globalization.CultureInfo.InvariantCulture) + " %";
}
