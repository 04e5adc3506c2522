using DistillPlan.Core.Planning.Settings;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Equipment, the ΔT rule and the strip, one field per setting of Core's settings table, as the
/// same option strings the command line takes (so "15 Torr" or "-0.95barg" mean the same here).
/// Empty means the default, which is shown beside the field.
/// </summary>
internal sealed class EquipmentPane : View
{
    private readonly PlannerViewModel _vm;
    private readonly List<(PlanSetting Setting, Field Field)> _fields = [];

    /// <summary>The settings this pane shows: equipment, rules (the product limit is on the charge pane) and the strip.</summary>
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
            var field = new Field(this, above, setting.Caption, 15, 11, v => vm.SetSetting(setting.Key, v));
            _fields.Add((setting, field));
            above = field.Caption;
        }
        var note = new Label
        {
            X = 0, Y = Pos.Bottom(above!), Width = Dim.Fill(), Height = 2,
            Text = "Empty = default. Pressures: 25mbar, 15 Torr, 2.5kPa, -0.95barg (bare = mbar)\nTemperatures: 40, 40C, 313K, 104F (bare = °C). ΔT steps: bath,condenser in K.",
        };
        Add(note);
        Refresh();
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
