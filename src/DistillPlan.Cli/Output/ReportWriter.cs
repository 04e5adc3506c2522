using System.CommandLine;
using System.Text;
using DistillPlan.Cli.Commands;
using DistillPlan.Core;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Reports;
using DistillPlan.Reports;

namespace DistillPlan.Cli.Output;

/// <summary>Writes a report as the user asked: format, display unit, to the terminal or a file, and the plot file.</summary>
internal static class ReportWriter
{
    public static void Write(ParseResult r, CommonOptions common, Report report, string? unitFallback)
    {
        var display = common.Display(r, unitFallback);
        string format = common.FormatOf(r);
        // Check every path before writing anything, so a bad --plot does not leave a half-done --output.
        string? plot = r.GetValue(common.Plot);
        string plotKind = plot is null ? "" : Path.GetExtension(plot).ToLowerInvariant();
        if (plot is not null && !PlotFile.Extensions.Contains(plotKind))
            throw new InputException("--plot", plot, "a file name ending in .svg or .png");
        if (plot is not null && report.Plots.Count == 0)
            throw new InputException("--plot", plot, "a verb with a curve or a ramp to draw");

        string text = format switch
        {
            "json" => JsonReport.Render(report) + "\n",
            "markdown" => MarkdownReport.Render(report, display),
            "csv" => CsvReport.Render(report, display),
            _ => TextReport.Render(report, display),
        };
        bool force = r.GetValue(common.Force);
        if (r.GetValue(common.Output) is string path)
            Save(path, "--output", force, temp => File.WriteAllText(temp, text, new UTF8Encoding(false)));
        else r.InvocationConfiguration.Output.Write(text);
        if (plot is not null) Save(plot, "--plot", force, temp => SavePlot(report, display, temp, plotKind, plot));
    }

    // The native binary cannot embed SkiaSharp's drawing library (README, "Install"): say so in
    // one line instead of an internal error when it was not copied beside the program.
    private static void SavePlot(Report report, DisplayFormat display, string temp, string kind, string plot)
    {
        try { PlotFile.Save(report.Plots, display, temp, kind); }
        catch (Exception e) when (MissingNativeLibrary(e))
        {
            throw new InputException("--plot", plot, "", "--plot: drawing a plot file needs libSkiaSharp.so in the folder of distillplan, and it is not there (README, Install)");
        }
    }

    // SkiaSharp's loader failure arrives wrapped in one or more type-initializer exceptions.
    private static bool MissingNativeLibrary(Exception? e)
    {
        for (; e is not null; e = e.InnerException)
            if (e is DllNotFoundException) return true;
        return false;
    }

    private static void Save(string path, string option, bool force, Action<string> write)
    {
        if (SafeFile.Replace(path, write, _ => force, option) == SaveOutcome.Declined)
            throw new InputException(option, path, "a new file name, or --force to replace the existing file");
    }
}
