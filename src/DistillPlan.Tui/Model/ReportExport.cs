using System.Text;
using DistillPlan.Core;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Reports;
using DistillPlan.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>
/// A report written to a file by its extension, with the renderers the command line uses
/// (<c>--format</c> and <c>-o</c>, <c>--plot</c>): Markdown, CSV, JSON, text, or the plot as SVG/PNG.
/// An existing file is replaced only after a yes.
/// </summary>
public static class ReportExport
{
    /// <summary>The extensions offered, with what each writes.</summary>
    public static readonly IReadOnlyList<(string Extension, string What)> Kinds =
    [
        (".md", "Markdown report"), (".csv", "CSV tables"), (".json", "JSON (the --json fields)"),
        (".txt", "text report"), (".svg", "plot, SVG"), (".png", "plot, PNG"),
    ];

    /// <summary>Writes <paramref name="report"/> to <paramref name="path"/>; the extension picks the renderer.</summary>
    public static SaveOutcome Save(Report report, DisplayFormat display, string path, Func<string, bool> confirmOverwrite)
    {
        string kind = Path.GetExtension(path).ToLowerInvariant();
        if (PlotFile.Extensions.Contains(kind))
        {
            if (report.Plots.Count == 0) throw new InputException("export", path, "a report with a plot");
            return SafeFile.Replace(path, temp => PlotFile.Save(report.Plots, display, temp, kind), confirmOverwrite, "export");
        }
        string text = kind switch
        {
            ".md" or ".markdown" => MarkdownReport.Render(report, display),
            ".csv" => CsvReport.Render(report, display),
            ".json" => JsonReport.Render(report) + "\n",
            ".txt" => TextReport.Render(report, display),
            _ => throw new InputException("export", path, "a file name ending in " + string.Join(", ", Kinds.Select(k => k.Extension))),
        };
        return SafeFile.Replace(path, temp => File.WriteAllText(temp, text, new UTF8Encoding(false)), confirmOverwrite, "export");
    }
}
