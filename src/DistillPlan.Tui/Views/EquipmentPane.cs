using System.Drawing;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Equipment, its size, the ΔT rule and the strip, one field per setting of Core's settings
/// table, as the same option strings the command line takes (so "15 Torr" or "-0.95barg" mean
/// the same here). Empty means the default, which is shown beside the field. There are more
/// fields than rows at 80×24, so the pane scrolls: the field with focus is always in view, and
/// PgUp/PgDn move a page of fields.
/// </summary>
internal sealed class EquipmentPane : View
{
    private readonly PlannerViewModel _vm;
    private readonly List<(PlanSetting Setting, Field Field)> _fields = [];
    private readonly int _rows;
    private const int NoteRows = 3;

    /// <summary>The settings this pane shows: equipment, size, rules (the product limit is on the charge pane) and the strip.</summary>
    public static IEnumerable<PlanSetting> Shown => PlanSettings.All.Where(s =>
        s.Group is SettingGroup.Equipment or SettingGroup.Size or SettingGroup.Strip || (s.Group == SettingGroup.Rules && s.Key != "product-max"));

    public EquipmentPane(PlannerViewModel vm)
    {
        _vm = vm;
        Title = "Equipment";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        View? above = null;
        foreach (var setting in Shown)
        {
            // 14 columns: the longest value a field takes by name ("liquid-ring", "-0.95barg") shows whole.
            var field = new Field(this, above, setting.Caption, 15, 14, v => vm.SetSetting(setting.Key, v));
            int row = _fields.Count;
            field.Entry.HasFocusChanged += (_, _) => { if (field.Entry.HasFocus) ScrollTo(row); };
            _fields.Add((setting, field));
            above = field.Caption;
        }
        var note = new Label
        {
            X = 0, Y = Pos.Bottom(above!), Width = Dim.Fill(), Height = NoteRows,
            Text = "Empty = default. Pressures: 25mbar, 15 Torr, 2.5kPa, -0.95barg (bare = mbar)\nTemperatures: 40, 40C, 313K, 104F (bare = °C).\nΔT steps in K: one for both (20), or bath→vapour,vapour→condenser (25,20).",
        };
        Add(note);
        _rows = _fields.Count + NoteRows;
        ViewportSettings |= ViewportSettingsFlags.HasVerticalScrollBar;
        ViewportChanged += (_, _) => SizeContent();
        KeyDown += OnKey;
        Refresh();
    }

    /// <summary>The entry of a setting (tests).</summary>
    internal TextField EntryOf(string key) => _fields.First(f => f.Setting.Key == key).Field.Entry;

    private void SizeContent()
    {
        var size = new Size(Math.Max(1, Viewport.Width), _rows);
        if (GetContentSize() != size) SetContentSize(size);
    }

    private void ScrollTo(int row)
    {
        int h = Viewport.Height;
        if (h <= 0) return;
        int top = Viewport.Y;
        // The last field brings the notes under it into view too.
        if (row == _fields.Count - 1) row = _rows - 1;
        if (row < top) top = row;
        else if (row >= top + h) top = row - h + 1;
        if (top != Viewport.Y) Viewport = Viewport with { Y = top };
    }

    private void OnKey(object? sender, Key key)
    {
        int step = key == Key.PageDown ? 1 : key == Key.PageUp ? -1 : 0;
        if (step == 0) return;
        int current = _fields.FindIndex(f => f.Field.Entry.HasFocus);
        int page = Math.Max(1, Viewport.Height - 1);
        int next = Math.Clamp((current < 0 ? 0 : current) + step * page, 0, _fields.Count - 1);
        _fields[next].Field.Entry.SetFocus();
        ScrollTo(next);
        key.Handled = true;
    }

    /// <summary>Puts the document's values in the fields and the current defaults beside them.</summary>
    public void Refresh()
    {
        foreach (var (setting, field) in _fields)
        {
            field.Show(_vm.Document.Inputs.Get(setting.Key) ?? "");
            field.Hint.Text = _vm.DefaultFor(setting.Key);
        }
    }
}
