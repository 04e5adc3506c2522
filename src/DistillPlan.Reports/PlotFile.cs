using DistillPlan.Core.Reports;
using ScottPlot;
using Plot = DistillPlan.Core.Reports.Plot;

namespace DistillPlan.Reports;

/// <summary>
/// Writes a report's plots to an SVG or PNG file with ScottPlot (headless): pressures on a
/// logarithmic axis in the display unit, temperatures in °C, reference lines for the coolant,
/// the bath and what the pump can hold. Several plots go side by side in one image.
/// </summary>
public static class PlotFile
{
    /// <summary>The file kinds a plot can be written as.</summary>
    public static readonly string[] Extensions = [".svg", ".png"];

    /// <summary>Writes the plots to <paramref name="path"/> as <paramref name="kind"/> (".svg" or ".png").</summary>
    public static void Save(IReadOnlyList<Plot> plots, DisplayFormat f, string path, string kind, int width = 800, int height = 500)
    {
        if (plots.Count == 0) throw new ArgumentException("no plot to write", nameof(plots));
        string ext = kind;
        var multi = new ScottPlot.Multiplot();
        while (multi.Subplots.Count > 0) multi.Subplots.RemoveAt(0);
        foreach (var p in plots) multi.Subplots.Add(Build(p, f));
        multi.Layout = new ScottPlot.MultiplotLayouts.Columns();
        int w = width * plots.Count;
        if (ext == ".png")
        {
            multi.SavePng(path, w, height);
            return;
        }
        using var stream = File.Create(path);
        using (var canvas = SkiaSharp.SKSvgCanvas.Create(new SkiaSharp.SKRect(0, 0, w, height), stream))
            multi.Render(canvas, new ScottPlot.PixelRect(0, w, height, 0));
    }

    private static ScottPlot.Plot Build(Plot p, DisplayFormat f)
    {
        var plt = new ScottPlot.Plot();
        plt.Title(p.Title);
        // A plain-number axis takes its unit from its values (L of new solvent).
        string xUnit = f.UnitOf(p.XKind, p.Series.SelectMany(s => s.X).FirstOrDefault().Unit);
        string yUnit = f.UnitOf(p.YKind, p.Series.SelectMany(s => s.Y).FirstOrDefault().Unit);
        plt.XLabel(xUnit.Length > 0 ? $"{p.XLabel} ({xUnit})" : p.XLabel);
        plt.YLabel(yUnit.Length > 0 ? $"{p.YLabel} ({yUnit})" : p.YLabel);
        var palette = new ScottPlot.Palettes.Category10();
        int k = 0;
        foreach (var s in p.Series)
        {
            double[] xs = s.X.Select(q => Number(q, f)).ToArray();
            double[] ys = s.Y.Select(q => s.OnRightAxis ? Number(q, f) : Y(p, q, f)).ToArray();
            var sc = plt.Add.Scatter(xs, ys, palette.GetColor(k++));
            sc.LegendText = s.Name;
            if (s.MarkersOnly) { sc.LineWidth = 0; sc.MarkerSize = 10; sc.MarkerShape = ScottPlot.MarkerShape.FilledDiamond; }
            else sc.MarkerSize = s.X.Count > 30 ? 0 : 5;
            if (s.OnRightAxis) sc.Axes.YAxis = plt.Axes.Right;
        }
        foreach (var line in p.Lines)
        {
            var color = palette.GetColor(k++);
            ScottPlot.Plottables.AxisLine l = line.Vertical ? plt.Add.VerticalLine(Number(line.At, f), 1, color) : plt.Add.HorizontalLine(Y(p, line.At, f), 1, color);
            l.LinePattern = ScottPlot.LinePattern.Dashed;
            l.LegendText = $"{line.Label} {f.Format(line.At)}";
        }
        if (p.RightLabel is string right) plt.Axes.Right.Label.Text = $"{right} ({f.UnitOf(p.RightKind)})";
        if (p.LogY)
        {
            // Pressures span decades: plot log10 and label the ticks with the pressure itself.
            plt.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
            {
                MinorTickGenerator = new ScottPlot.TickGenerators.LogMinorTickGenerator(),
                IntegerTicksOnly = true,
                LabelFormatter = y => DisplayFormat.Number(Math.Pow(10, y)),
            };
        }
        plt.ShowLegend(ScottPlot.Alignment.UpperRight);
        return plt;
    }

    private static double Y(Plot p, Quantity q, DisplayFormat f) => p.LogY ? Math.Log10(Number(q, f)) : Number(q, f);

    /// <summary>A value as a number in the unit the axis shows.</summary>
    private static double Number(Quantity q, DisplayFormat f) => q.Kind switch
    {
        QuantityKind.Temperature => q.Value - Core.PhysicalConstants.ZeroCelsiusK,
        QuantityKind.Pressure => q.Value / f.PressureUnit.Pascal,
        QuantityKind.Percent => 100 * q.Value,
        _ => q.Value,
    };
}
