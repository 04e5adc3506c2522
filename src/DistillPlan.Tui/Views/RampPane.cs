using System.Text;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The strip ramp: a table of steps on the left (every column of <c>distillplan strip</c>; Up/Down
/// and PgUp/PgDn move through the steps, Left/Right through the columns, scrolling sideways when
/// they do not all fit), and pressure against fraction evaporated on the right, which takes no keys.
/// </summary>
internal sealed class RampPane : View
{
    private readonly Label _caption = new() { X = 0, Y = 0, Width = Dim.Fill() };
    private readonly TableView _table = new() { X = 0, Y = 1, Width = Dim.Percent(60), Height = Dim.Fill(2), FullRowSelect = false };
    private readonly LogPressureGraph _graph;
    private readonly Label _note = new() { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Height = 2 };

    public RampPane()
    {
        Title = "Ramp";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _table.Style.ExpandLastColumn = false;
        _graph = new LogPressureGraph { X = Pos.Right(_table) + 1, Y = 1, Width = Dim.Fill(), Height = Dim.Fill(2), CanFocus = false };
        FocusMark.Attach(_table, _caption, () => " Steps: Up/Down, PgUp/PgDn; Left/Right: columns" + (_columns > 4 ? $" ({_columns} in all)" : ""));
        Add(_caption, _table, _graph, _note);
    }

    private int _columns;

    /// <summary>The steps table (tests).</summary>
    internal TableView Table => _table;

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
        _columns = columns.Count;
        _table.Table = new EnumerableTableSource<Core.Reports.TableRow>(table?.Rows ?? [], columns);
        _caption.Text = (_table.HasFocus ? FocusMark.Mark : " ") + " Steps: Up/Down, PgUp/PgDn; Left/Right: columns" + (_columns > 4 ? $" ({_columns} in all)" : "");
        _graph.Series.Clear();
        _graph.Annotations.Clear();
        if (vm.Outcome.Ramp is not Core.Planning.StripPlan ramp || ramp.Steps.Count == 0)
        {
            _note.Text = vm.Error is string e ? "No ramp: " + e : vm.Outcome.RampNote ?? "No ramp.";
            _graph.SetNeedsDraw();
            return;
        }
        var log = ramp.Steps.Select(s => (X: s.Evaporated, Y: Math.Log10(s.Pressure.Millibar))).ToList();
        _graph.SetRange(0, 1, log.Min(p => p.Y), log.Max(p => p.Y), $"evaporated (by {ramp.Basis})", vm.Unit);
        var points = log.Select(p => _graph.At(p.X, p.Y)).ToList();
        _graph.Series.Add(new ScatterSeries { Fill = new GraphCellToRender(new Rune('o')), Points = points });
        _graph.Annotations.Add(new PathAnnotation { LineRune = new Rune('-'), Points = points, BeforeSeries = true });
        _note.Text = $"Strip at {(ramp.Mode == Core.Mixtures.StripMode.FixedVaporTemperature ? ramp.Setpoints.Vapor + " vapour" : "fixed pressure")} ({ramp.Model}). Ends: {ramp.EndText(f)}.";
    }
}
