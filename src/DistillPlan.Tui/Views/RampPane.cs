using System.Drawing;
using System.Text;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>The strip ramp: a table of steps on the left, pressure against fraction evaporated on the right.</summary>
internal sealed class RampPane : View
{
    private readonly TableView _table = new() { X = 0, Y = 0, Width = Dim.Percent(58), Height = Dim.Fill(2), FullRowSelect = true };
    private readonly LogPressureGraph _graph;
    private readonly Label _note = new() { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Height = 2 };

    public RampPane()
    {
        Title = "Ramp";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _graph = new LogPressureGraph { X = Pos.Right(_table) + 1, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(2) };
        Add(_table, _graph, _note);
    }

    public void Show(PlannerViewModel vm)
    {
        var f = vm.Display;
        var table = vm.RampTable;
        var columns = new Dictionary<string, Func<Core.Reports.TableRow, object>>();
        if (table is not null)
            foreach (var (c, i) in table.Columns.Select((c, i) => (c, i)).Where(t => !t.c.MachineOnly))
            {
                string unit = c.Kind == Core.Reports.QuantityKind.MoleFraction ? "" : " " + f.UnitOf(c.Kind, c.NumberUnit);
                columns[(c.ShortHeader ?? c.Header) + unit] = r => f.FormatBare(r.Cells[i]);
            }
        _table.Table = new EnumerableTableSource<Core.Reports.TableRow>(table?.Rows ?? [], columns);
        _graph.Series.Clear();
        _graph.Annotations.Clear();
        if (vm.Outcome.Ramp is not Core.Planning.StripPlan ramp || ramp.Steps.Count == 0)
        {
            _note.Text = vm.Outcome.Error is string e ? "No ramp: " + e : vm.Outcome.RampNote ?? "No ramp.";
            _graph.SetNeedsDraw();
            return;
        }
        var points = ramp.Steps.Select(s => new PointF((float)s.Evaporated, (float)Math.Log10(s.Pressure.Millibar))).ToList();
        _graph.Series.Add(new ScatterSeries { Fill = new GraphCellToRender(new Rune('o')), Points = points });
        _graph.Annotations.Add(new PathAnnotation { LineRune = new Rune('-'), Points = points, BeforeSeries = true });
        double lo = points.Min(p => p.Y), hi = points.Max(p => p.Y);
        _graph.SetRange(0, 1, Math.Floor(lo - 0.01), Math.Max(Math.Ceiling(hi + 0.01), Math.Floor(lo - 0.01) + 1), $"evaporated (by {ramp.Basis})");
        _note.Text = $"Strip at {(ramp.Mode == Core.Mixtures.StripMode.FixedVaporTemperature ? ramp.Setpoints.Vapor + " vapour" : "fixed pressure")} ({ramp.Model}). Ends: {ramp.EndText(f)}.";
    }
}
