using System.Drawing;
using DistillPlan.Core.Quantities;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A graph with a logarithmic pressure axis in the display unit: values are plotted as
/// log10(P/unit), ticks are labelled at whole decades of that unit, so the axis and the legend
/// say the same unit. GraphView draws its axes through graph zero, so the graph's origin is put
/// at the bottom-left corner of the range (every point is plotted relative to it): the axes stay
/// at the edges even below 1 mbar or 0 °C. It has no keys: there is nothing to pan, and arrow
/// keys stay with the views that use them. The ranges are refitted on resize.
/// </summary>
internal sealed class LogPressureGraph : GraphView
{
    private double _minX, _maxX = 1, _minY, _maxY = 1, _shift, _stepX = 0.2;

    public LogPressureGraph()
    {
        // Focusable, so a pane showing only a graph has somewhere for focus to rest (not the tab
        // header), but with no keys of its own: GraphView's arrow-key panning is removed.
        CanFocus = true;
        KeyBindings.Clear();
        MarginLeft = 7;
        MarginBottom = 2;
        AxisY.Increment = 1;
        AxisY.ShowLabelsEvery = 1;
        AxisY.LabelGetter = t => CurvePicture.DecadeLabel(t.Value + _minY);
        AxisY.Text = "mbar";
        AxisX.ShowLabelsEvery = 1;
        AxisX.LabelGetter = t => (t.Value + _minX).ToString("0.##", System.Globalization.CultureInfo.InvariantCulture);
        ViewportChanged += (_, _) => Fit();
    }

    /// <summary>The pressure axis: whole decades of the display unit.</summary>
    public (double Min, double Max) PressureDecades => (_minY, _maxY);

    /// <summary>Sets what the graph must show: x as given, pressures as log10(P/mbar), shown in <paramref name="unit"/>.</summary>
    public void SetRange(double minX, double maxX, double minLog10Mbar, double maxLog10Mbar, string xTitle, PressureUnit unit)
    {
        _shift = Math.Log10(100 / unit.Pascal);
        // A decade of room below the lowest point when it is near a decade: GraphView draws the x axis
        // on the bottom row of the data, and a pump line there would merge with it.
        double low = minLog10Mbar + _shift;
        _minY = Math.Floor(low + 1e-9);
        if (low - _minY < 0.75) _minY -= 1;
        _maxY = Math.Max(Math.Ceiling(maxLog10Mbar + _shift - 1e-9), _minY + 1);
        if (!(maxX > minX)) maxX = minX + 1;
        // About six ticks, the left edge on a round one, so tick labels are round numbers.
        _stepX = NiceStep((maxX - minX) / 6);
        (_minX, _maxX) = (Math.Floor(minX / _stepX + 1e-9) * _stepX, maxX);
        AxisX.Text = xTitle;
        AxisY.Text = unit.Symbol;
        Fit();
    }

    /// <summary>Where a point goes: relative to the bottom-left corner, pressure in decades of the display unit.</summary>
    public PointF At(double x, double log10Mbar) => new((float)(x - _minX), (float)(log10Mbar + _shift - _minY));

    private void Fit()
    {
        int w = Viewport.Width - (int)MarginLeft, h = Viewport.Height - (int)MarginBottom;
        if (w < 2 || h < 2) return;   // too small to draw anything meaningful; keep the last fit
        CellSize = new PointF((float)((_maxX - _minX) / (w - 1)), (float)((_maxY - _minY) / (h - 1)));
        ScrollOffset = new PointF(0, 0);
        AxisX.Increment = (float)_stepX;
        // One label per decade when there is room, every other decade when the pane is short.
        AxisY.ShowLabelsEvery = (uint)((_maxY - _minY) > h ? 2 : 1);
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
