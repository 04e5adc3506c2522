using DistillPlan.Core.Checks;

namespace DistillPlan.Reports;

/// <summary>
/// Severity as a word and a glyph, so it reads on a monochrome terminal, with NO_COLOR, and
/// on the Linux console (plain ASCII glyphs only).
/// </summary>
public static class SeverityText
{
    /// <summary>"[!!] DANGER", "[!] WARNING", "[~] CAUTION" or "[i] INFO".</summary>
    public static string Label(Severity s) => s switch
    {
        Severity.Danger => "[!!] DANGER",
        Severity.Warning => "[!] WARNING",
        Severity.Caution => "[~] CAUTION",
        _ => "[i] INFO",
    };

    /// <summary>Counts by severity, most severe first, e.g. "1 DANGER, 2 WARNING"; "no checks raised" when empty.</summary>
    public static string Summary(IEnumerable<Finding> checks)
    {
        var parts = checks.GroupBy(c => c.Severity).OrderByDescending(g => g.Key)
            .Select(g => $"{g.Count()} {g.Key.ToString().ToUpperInvariant()}").ToList();
        return parts.Count == 0 ? "no checks raised" : string.Join(", ", parts);
    }
}
