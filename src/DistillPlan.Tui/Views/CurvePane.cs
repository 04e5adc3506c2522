using System.Text;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Vapour pressure against temperature on a log scale, with the setpoint (O), the condenser
/// (C) and the pump's limit (a row of dots ending in P). Letters and glyphs, not colours, tell
/// them apart; the legend underneath says which is which, in the same unit as the axis.
/// </summary>
internal sealed class CurvePane : View
{
    private readonly Label _caption = new() { X = 0, Y = 0, Width = Dim.Fill() };
    private readonly LogPressureGraph _graph = new() { X = 0, Y = 1, Width = Dim.Fill(), Height = Dim.Fill(2) };
    private readonly Label _legend = new() { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Height = 2 };

    public CurvePane()
    {
        Title = "Curve";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        FocusMark.Attach(this, _caption, " Vapour pressure against temperature (a picture: no keys here)");
        Add(_caption, _graph, _legend);
    }

    /// <summary>The graph (tests read its axis).</summary>
    internal LogPressureGraph Graph => _graph;

    public void Show(PlannerViewModel vm)
    {
        _graph.Series.Clear();
        _graph.Annotations.Clear();
        if (vm.Outcome.Curve is not CurvePicture c || vm.Outcome.Plan is not { } plan)
        {
            _legend.Text = "No curve: " + (vm.Error ?? vm.Outcome.Error ?? "the vapour pressure cannot be computed here.");
            _graph.SetNeedsDraw();
            return;
        }
        _graph.SetRange(c.MinCelsius, c.MaxCelsius, c.MinLog10, c.MaxLog10, "°C", vm.Unit);
        // The pump line first, so the curves and marks are drawn over its dots.
        _graph.Annotations.Add(new PathAnnotation
        {
            LineRune = new Rune('.'),
            Points = [_graph.At(c.MinCelsius, c.PumpLog10Mbar), _graph.At(c.MaxCelsius, c.PumpLog10Mbar)],
            BeforeSeries = true,
        });
        foreach (var line in c.Lines)
            _graph.Series.Add(Scatter(line.Glyph, line.Points.Select(p => _graph.At(p.Celsius, p.Log10Mbar))));
        _graph.Annotations.Add(new TextAnnotation { Text = "P", GraphPosition = _graph.At(c.MaxCelsius, c.PumpLog10Mbar) });
        if (c.Condenser is CurvePoint k) _graph.Series.Add(Scatter('C', [_graph.At(k.Celsius, k.Log10Mbar)]));
        _graph.Series.Add(Scatter('O', [_graph.At(c.Operating.Celsius, c.Operating.Log10Mbar)]));

        string curves = string.Join("  ", c.Lines.Select(l => $"{l.Glyph} {l.Name}"));
        string cond = c.Condenser is CurvePoint q ? $"C condenser {plan.Equipment.Coolant}, {vm.P(Core.Quantities.Pressure.FromMillibar(Math.Pow(10, q.Log10Mbar)))}" : "C condenser: n/a";
        _legend.Text = $"{curves}   O setpoint {vm.P(plan.VacuumSetpoint)} at {plan.Vapor}\n{cond}   ...P pump limit {vm.P(plan.Equipment.PumpUltimate)}";
    }

    private static ScatterSeries Scatter(char glyph, IEnumerable<System.Drawing.PointF> points) =>
        new() { Fill = new GraphCellToRender(new Rune(glyph)), Points = points.ToList() };
}
