using System.Text;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Reports;

namespace DistillPlan.Reports;

/// <summary>
/// The readable text of a report, for a terminal (the CLI) and the text UI's plan pane alike:
/// setpoints, notes, checks with what to do, steps, assumptions, sources and cautions, wrapped
/// to the width given. Severity is always a word, never colour.
/// </summary>
public static class TextReport
{
    /// <summary>The report as text at <paramref name="width"/> columns in a display format.</summary>
    public static string Render(Report r, DisplayFormat f, int width = 80)
    {
        var o = new List<string>();
        void Line(string s = "", int hanging = 0) => o.AddRange(LineWrap.Wrap(s, width, hanging));

        if (r.UserTitle is { Length: > 0 } t) Line(t);
        if (r.UserNotes is { Length: > 0 } n)
        {
            Line("Notes:");
            foreach (var l in n.Split('\n')) Line("  " + l, 2);
        }
        Line(r.Title);
        foreach (var (section, k) in r.Sections.Select((s, k) => (s, k)))
        {
            Line();
            // The first section is the headline under the title; later ones carry their heading.
            if (k > 0) Line(section.Heading + ":");
            var rows = section.Rows.Where(x => !x.MachineOnly).ToList();
            int labelWidth = rows.Count == 0 ? 0 : rows.Max(x => x.Label.Length) + 2;
            foreach (var row in rows)
            {
                string value = string.Join(row.Joiner, row.Values.Select(f.Format));
                string text = $"  {row.Label.PadRight(labelWidth)}{value}" + (row.Note is null ? "" : "   (" + row.Note + ")");
                Line(text, labelWidth);
            }
            foreach (var table in section.Tables) WriteTable(table, f, Line);
        }
        foreach (var note in r.Notes) Line($"  Note: {note.Message(f)}", 8);
        Line();
        var checks = r.Checks;
        Line(checks.Count == 0 ? "Checks: none raised." : $"Checks ({SeverityText.Summary(checks)}):");
        foreach (var c in checks) WriteFinding(c, f, Line, "  ");
        Line();
        Line("Assumptions (* = default, not set by you):");
        foreach (var a in r.Assumptions)
            Line($"  {(a.IsDefault ? "*" : " ")} {a.Label}: {f.Format(a.Value)}  ({a.Basis})", 4);
        if (r.Sources.Count > 0)
        {
            Line();
            Line("Sources:");
            foreach (var s in r.Sources) Line($"  [{s.Key}] {s.Citation}", 4);
        }
        Line();
        Line("Cautions:");
        foreach (var c in r.Cautions) Line($"  - {c}", 4);
        Line();
        Line($"Made by {r.Program} on {r.Made.UtcDateTime:yyyy-MM-dd HH:mm} UTC from: " +
             string.Join("; ", r.Inputs.Select(kv => kv.Key == "charge" ? kv.Value : $"--{kv.Key} {kv.Value}")), 2);
        return string.Join("\n", o) + "\n";
    }

    /// <summary>One finding: severity word, code and message, then what to do.</summary>
    public static void WriteFinding(Finding c, DisplayFormat f, Action<string, int> line, string indent)
    {
        line($"{indent}{SeverityText.Label(c.Severity)} {c.Code}: {c.Message(f)}", 4);
        string action = c.Action(f);
        if (action.Length > 0) line($"{indent}    what to do: {action}", 2);
    }

    private static void WriteTable(Table table, DisplayFormat f, Action<string, int> line)
    {
        var columns = table.Columns.Select((c, i) => (c, i)).Where(t => !t.c.MachineOnly).ToList();
        var headers = columns.Select(t => Header(t.c, f)).ToList();
        var cells = table.Rows.Select(r => columns.Select(t => f.FormatBare(r.Cells[t.i])).ToList()).ToList();
        var widths = headers.Select((h, k) => Math.Max(h.Length, cells.Count == 0 ? 0 : cells.Max(c => c[k].Length))).ToList();
        line("  " + string.Join("  ", headers.Select((h, k) => h.PadLeft(widths[k]))), 0);
        for (int r = 0; r < table.Rows.Count; r++)
        {
            line("  " + string.Join("  ", cells[r].Select((c, k) => c.PadLeft(widths[k]))), 0);
            foreach (var finding in table.Rows[r].Findings) WriteFinding(finding, f, line, "      ");
        }
    }

    private static string Header(Column c, DisplayFormat f)
    {
        string unit = c.Kind is QuantityKind.MoleFraction ? "" : f.UnitOf(c.Kind, c.NumberUnit);
        return (c.ShortHeader ?? c.Header) + (unit.Length > 0 ? " " + unit : "");
    }
}
