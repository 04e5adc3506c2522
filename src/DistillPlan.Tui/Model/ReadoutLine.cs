using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;
using DistillPlan.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>The setpoint readout's lines, laid out to fit a width without cutting a value.</summary>
public static class ReadoutLine
{
    /// <summary>
    /// Bath, vapour, vacuum and condenser limit on one line: full labels and wide gaps when there
    /// is room, then narrower gaps, then short labels, so each value is always whole.
    /// </summary>
    public static string Setpoints(Plan p, Func<Pressure, string> pressure, int width, string prefix = "")
    {
        string vacuum = p.AtAtmosphericPressure ? pressure(p.VacuumSetpoint) + " (none needed)"
            : p.SetpointReachable ? pressure(p.VacuumSetpoint)
            : "NOT REACHABLE";
        string heat = p.Equipment.IsVessel || p.Equipment.Heating == HeatingMedium.Jacket ? "Jacket" : "Bath";
        string[][] layouts =
        [
            [$"{heat} {p.Bath}", $"Vapour {p.Vapor}", $"Vacuum {vacuum}", $"Condenser <= {p.CondenserMax}"],
            [$"{heat} {p.Bath}", $"Vap. {p.Vapor}", $"Vac. {vacuum}", $"Cond. <= {p.CondenserMax}"],
            [$"{heat} {p.Bath}", $"Vap. {p.Vapor}", $"Vac. {vacuum.Replace(" (none needed)", " (atm.)")}", $"Cond.<={p.CondenserMax}"],
        ];
        string line = "";
        foreach (var parts in layouts)
            foreach (string gap in new[] { "   ", "  ", " " })
                if ((line = prefix + string.Join(gap, parts)).Length <= width) return line;
        return line;
    }

    /// <summary>
    /// Duty, time, condenser and pump load on one line ("Duty 137 W | about 18 min for 250 mL |
    /// condenser 34 % | pump 0.4 %"), the pump dropped first, then the charge size, to fit.
    /// </summary>
    public static string Scale(Core.Scale.PlanScale s, bool atmospheric, int width)
    {
        var h = s.Start;
        string duty = s.Setup.Vessel ? $"{h.HeatDutyW / 1000:0.0} kW" : $"{h.HeatDutyW:0} W";
        string litres = s.Setup.ChargeM3 < 1e-3 ? $"{s.Setup.ChargeM3 * 1e6:0} mL" : $"{s.Setup.ChargeM3 * 1e3:0.#} L";
        string time = s.TotalTimeS is double t ? "about " + Core.Reports.ScaleRows.Duration(t) : "time not worked out";
        string condenser = h.CondenserCapacityW > 0 ? $"condenser {100 * h.CondenserShare:0} %" : "NOTHING CONDENSES";
        string pump = atmospheric ? "" : $" | pump {100 * h.PumpShare:0.#} %";
        foreach (string line in new[]
        {
            $"Duty {duty} | {time} for {litres} | {condenser}{pump}",
            $"Duty {duty} | {time} for {litres} | {condenser}",
            $"Duty {duty} | {time} | {condenser}",
        })
            if (line.Length <= width) return line;
        return $"Duty {duty} | {time}";
    }

    /// <summary>
    /// A message wrapped to at most <paramref name="lines"/> lines; when it needs more, the last line
    /// shows its end, which in an input message says what is expected ("… is given twice").
    /// </summary>
    public static string[] KeepEnd(string message, int width, int lines)
    {
        width = Math.Max(width, 10);
        var wrapped = LineWrap.Wrap(message, width, hanging: 2).ToList();
        if (wrapped.Count <= lines) return [.. wrapped, .. Enumerable.Repeat("", lines - wrapped.Count)];
        var kept = wrapped.Take(lines - 1).ToList();
        kept.Add("  …" + message.ReplaceLineEndings(" ")[^(width - 3)..]);
        return [.. kept];
    }
}
