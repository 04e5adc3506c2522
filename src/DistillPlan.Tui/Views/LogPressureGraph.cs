using System.Drawing;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A graph with a logarithmic pressure axis: values are plotted as log10(P/mbar) and the
/// ticks are labelled in mbar at whole decades. The ranges are refitted whenever the view is
/// resized, so the picture always fills the space it has.
/// </summary>
internal sealed class LogPressureGraph : GraphView
{
    private (double MinX, double MaxX, double MinY, double MaxY) _range = (0, 1, 0, 1);

    public LogPressureGraph()
    {
        MarginLeft = 7;
        MarginBottom = 2;
        AxisY.Increment = 1;
        AxisY.ShowLabelsEvery = 1;
        AxisY.LabelGetter = t => CurvePicture.DecadeLabel(t.Value);
        AxisY.Text = "mbar";
        AxisX.ShowLabelsEvery = 1;
        AxisX.LabelGetter = t => t.Value.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture);
        ViewportChanged += (_, _) => Fit();
    }

    /// <summary>Sets what the graph must show, in graph units (x as given, y in log10 mbar).</summary>
    public void SetRange(double minX, double maxX, double minY, double maxY, string xTitle)
    {
        _range = (minX, maxX, minY, maxY);
        AxisX.Text = xTitle;
        Fit();
    }

    private void Fit()
    {
        int w = Viewport.Width - (int)MarginLeft, h = Viewport.Height - (int)MarginBottom;
        if (w < 2 || h < 2) return;   // too small to draw anything meaningful; keep the last fit
        var (minX, maxX, minY, maxY) = _range;
        CellSize = new PointF((float)((maxX - minX) / (w - 1)), (float)((maxY - minY) / (h - 1)));
        ScrollOffset = new PointF((float)minX, (float)minY);
        AxisX.Increment = (float)NiceStep((maxX - minX) / Math.Max(1, w / 10));
        // One label per decade when there is room, every other decade when the pane is short.
        AxisY.ShowLabelsEvery = (uint)((maxY - minY) > h ? 2 : 1);
        SetNeedsDraw();
    }

    /// <summary>1, 2 or 5 times a power of ten, at least the raw step.</summary>
    internal static double NiceStep(double raw)
    {
        if (!(raw > 0)) return 1;
        double p = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        return new[] { 1.0, 2, 5, 10 }.Select(m => m * p).First(s => s >= raw - 1e-12);
    }
}
