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
        string[][] layouts =
        [
            [$"Bath {p.Bath}", $"Vapour {p.Vapor}", $"Vacuum {vacuum}", $"Condenser <= {p.CondenserMax}"],
            [$"Bath {p.Bath}", $"Vap. {p.Vapor}", $"Vac. {vacuum}", $"Cond. <= {p.CondenserMax}"],
            [$"Bath {p.Bath}", $"Vap. {p.Vapor}", $"Vac. {vacuum.Replace(" (none needed)", " (atm.)")}", $"Cond.<={p.CondenserMax}"],
        ];
        string line = "";
        foreach (var parts in layouts)
            foreach (string gap in new[] { "   ", "  ", " " })
                if ((line = prefix + string.Join(gap, parts)).Length <= width) return line;
        return line;
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
