using System.Collections.ObjectModel;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// The whole plan as text: setpoints, approach steps, checks with what to do, assumptions and
/// cautions. A list of wrapped lines, so it scrolls with the arrow keys and Page Up/Down.
/// </summary>
internal sealed class PlanPane : View
{
    private readonly ListView _lines = new() { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
    private readonly ObservableCollection<string> _items = [];
    private string _report = "";

    public PlanPane()
    {
        Title = "Plan";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _lines.SetSource(_items);
        _lines.ViewportChanged += (_, _) => Rewrap();
        Add(_lines);
    }

    public void Show(PlannerViewModel vm)
    {
        _report = vm.PlanReport();
        Rewrap();
    }

    private int _wrappedAt = -1;

    private void Rewrap()
    {
        int width = _lines.Viewport.Width > 0 ? _lines.Viewport.Width - 1 : 78;
        var lines = TextWrap.Lines(_report, width);
        if (width == _wrappedAt && lines.SequenceEqual(_items)) return;
        _wrappedAt = width;
        _items.Clear();
        foreach (var l in lines) _items.Add(l);
    }
}
