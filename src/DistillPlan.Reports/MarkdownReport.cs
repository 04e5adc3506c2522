using System.Text;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Reports;

namespace DistillPlan.Reports;

/// <summary>
/// Markdown for an electronic lab notebook or a batch record: headings, tables, the checks with
/// what to do, assumptions, inputs, sources and the cautions.
/// </summary>
public static class MarkdownReport
{
    /// <summary>The report as Markdown in a display format.</summary>
    public static string Render(Report r, DisplayFormat f)
    {
        var o = new StringBuilder();
        o.Append("# ").AppendLine(Escape(r.UserTitle is { Length: > 0 } t ? t : r.Title));
        if (r.UserTitle is { Length: > 0 }) o.AppendLine().AppendLine(Escape(r.Title));
        o.AppendLine().AppendLine($"*{r.Program}, {r.Made.UtcDateTime:yyyy-MM-dd HH:mm} UTC*");
        if (r.UserNotes is { Length: > 0 } notes) o.AppendLine().AppendLine("> " + Escape(notes).Replace("\n", "\n> "));
        foreach (var section in r.Sections)
        {
            o.AppendLine().Append("## ").AppendLine(section.Heading).AppendLine();
            var rows = section.Rows.Where(x => !x.MachineOnly).ToList();
            if (rows.Count > 0)
            {
                o.AppendLine("| | |").AppendLine("|---|---|");
                foreach (var row in rows)
                    o.AppendLine($"| {Escape(row.Label)} | {Escape(string.Join(row.Joiner, row.Values.Select(f.Format)))}{(row.Note is null ? "" : " (" + Escape(row.Note) + ")")} |");
            }
            foreach (var table in section.Tables) WriteTable(o, table, f);
        }
        if (r.Notes.Count > 0)
        {
            o.AppendLine().AppendLine("## Notes").AppendLine();
            foreach (var n in r.Notes) o.AppendLine("- " + Escape(n.Message(f)));
        }
        o.AppendLine().AppendLine("## Checks").AppendLine();
        if (r.Checks.Count == 0) o.AppendLine("None raised.");
        foreach (var c in r.Checks) WriteFinding(o, c, f, "");
        o.AppendLine().AppendLine("## Assumptions").AppendLine();
        o.AppendLine("| setting | value | default? | basis |").AppendLine("|---|---|---|---|");
        foreach (var a in r.Assumptions)
            o.AppendLine($"| {Escape(a.Label)} | {Escape(f.Format(a.Value))} | {(a.IsDefault ? "default" : "given")} | {Escape(a.Basis)} |");
        o.AppendLine().AppendLine("## Inputs").AppendLine();
        foreach (var (k, v) in r.Inputs) o.AppendLine($"- `{k}`: `{v.Replace("`", "'")}`");
        if (r.Sources.Count > 0)
        {
            o.AppendLine().AppendLine("## Sources").AppendLine();
            foreach (var s in r.Sources) o.AppendLine($"- **{Escape(s.Key)}**: {Escape(s.Citation)}");
        }
        o.AppendLine().AppendLine("## Cautions").AppendLine();
        foreach (var c in r.Cautions) o.AppendLine("- " + Escape(c));
        return o.ToString();
    }

    private static void WriteFinding(StringBuilder o, Finding c, DisplayFormat f, string indent)
    {
        o.AppendLine($"{indent}- **{c.Severity.ToString().ToUpperInvariant()}** `{c.Code}`: {Escape(c.Message(f))}");
        string action = c.Action(f);
        if (action.Length > 0) o.AppendLine($"{indent}  What to do: {Escape(action)}");
    }

    private static void WriteTable(StringBuilder o, Table t, DisplayFormat f)
    {
        var columns = t.Columns.Select((c, i) => (c, i)).Where(x => !x.c.MachineOnly).ToList();
        o.AppendLine("| " + string.Join(" | ", columns.Select(x => Escape(CsvReport.Header(x.c, f)))) + " |");
        o.AppendLine("|" + string.Concat(columns.Select(_ => "---:|")));
        foreach (var row in t.Rows)
            o.AppendLine("| " + string.Join(" | ", columns.Select(x => f.FormatBare(row.Cells[x.i]))) + " |");
        var flagged = t.Rows.Select((row, k) => (row, k)).Where(x => x.row.Findings.Count > 0).ToList();
        if (flagged.Count == 0) return;
        o.AppendLine().AppendLine("Checks at these steps:").AppendLine();
        foreach (var (row, k) in flagged)
        {
            o.AppendLine($"- step {k + 1} ({f.Format(row.Cells[0])}):");
            foreach (var c in row.Findings) WriteFinding(o, c, f, "  ");
        }
    }

    /// <summary>Escapes the characters that would break a table or start markup.</summary>
    private static string Escape(string s) => s.Replace("\\", "\\\\").Replace("|", "\\|").Replace("*", "\\*").Replace("_", "\\_").Replace("<", "&lt;");
}
