using System.Collections.ObjectModel;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The whole plan as text: setpoints, approach steps, checks with what to do, assumptions and
/// cautions. A list of wrapped lines, the pane's only focusable view, so Up/Down and PgUp/PgDn
/// scroll it whenever the pane is on show.
/// </summary>
internal sealed class PlanPane : View
{
    private readonly Label _caption = new() { X = 0, Y = 0, Width = Dim.Fill() };
    private readonly ListView _lines = new() { X = 0, Y = 1, Width = Dim.Fill(), Height = Dim.Fill() };
    private ObservableCollection<string> _items = [];
    private PlannerViewModel? _vm;

    public PlanPane()
    {
        Title = "Plan";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _lines.SetSource(_items);
        _lines.ViewportChanged += (_, _) => Rewrap();
        FocusMark.Attach(_lines, _caption, " Plan report: Up/Down, PgUp/PgDn scroll; Ctrl+E exports it");
        Add(_caption, _lines);
    }

    /// <summary>The report lines (tests read the scroll position).</summary>
    internal ListView Lines => _lines;

    public void Show(PlannerViewModel vm)
    {
        _vm = vm;
        Rewrap();
    }

    private object? _wrappedFor;

    private void Rewrap()
    {
        if (_vm is null) return;
        int width = _lines.Viewport.Width > 0 ? _lines.Viewport.Width - 1 : 78;
        // Scrolling changes the viewport too: lay out again only for a new plan, state or width.
        var key = (width, _vm.Outcome, _vm.Error, _vm.IsComputing, _vm.Unit, _vm.Document.Title, _vm.Document.Notes);
        if (Equals(key, _wrappedFor)) return;
        _wrappedFor = key;
        // The report is laid out at the pane's width by the same renderer as the CLI.
        var lines = _vm.PlanReport(width).TrimEnd('\n').Split('\n');
        if (lines.SequenceEqual(_items)) return;
        // One new source, not an Add per line: the list redoes its layout on every change, which
        // made a report with long notes (thousands of lines) take minutes.
        _items = new ObservableCollection<string>(lines);
        _lines.SetSource(_items);
    }
}
