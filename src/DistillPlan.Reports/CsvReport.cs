using System.Text;
using DistillPlan.Core.Reports;

namespace DistillPlan.Reports;

/// <summary>
/// CSV of a report's main table (one row per strip or ramp step) for a spreadsheet or a batch
/// record: a header with units, RFC 4180 quoting, and the checks of each step in a last column.
/// A report without a table gives its setpoint rows as label, value, unit.
/// </summary>
public static class CsvReport
{
    /// <summary>The report as CSV in a display format.</summary>
    public static string Render(Report r, DisplayFormat f)
    {
        var o = new StringBuilder();
        if (r.MainTable is not Table t)
        {
            o.AppendLine("quantity,value,unit");
            foreach (var row in r.Sections.SelectMany(s => s.Rows).Where(x => !x.MachineOnly))
                for (int i = 0; i < row.Values.Count; i++)
                    o.AppendLine(string.Join(",", Quote(row.Label + (row.Values.Count > 1 ? $" {i + 1}" : "")), Quote(f.FormatBare(row.Values[i])), Quote(f.UnitOf(row.Values[i].Kind, row.Values[i].Unit))));
            return o.ToString();
        }
        o.AppendLine(string.Join(",", t.Columns.Select(c => Quote(Header(c, f))).Append("checks")));
        foreach (var row in t.Rows)
            o.AppendLine(string.Join(",", row.Cells.Select(c => Quote(f.FormatBare(c)))
                .Append(Quote(string.Join(" | ", row.Findings.Select(x => $"{x.SeverityWord} {x.Code}: {x.Message(f)}"))))));
        return o.ToString();
    }

    /// <summary>A column header with its unit in brackets: "Pressure (Torr)".</summary>
    public static string Header(Column c, DisplayFormat f)
    {
        string unit = f.UnitOf(c.Kind, c.NumberUnit);
        return unit.Length == 0 ? c.Header : $"{c.Header} ({unit})";
    }

    private static string Quote(string s) => s.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;
}
