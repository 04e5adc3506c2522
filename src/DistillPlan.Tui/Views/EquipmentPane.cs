using DistillPlan.Core.Planning;
using DistillPlan.Tui.Model;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// Equipment and the ΔT rule, as the same option strings the command line takes (so "15 Torr"
/// or "-0.95barg" mean the same here). Empty means the default, which is shown beside the field.
/// </summary>
internal sealed class EquipmentPane : View
{
    private readonly PlannerViewModel _vm;
    private readonly List<(string Key, Field Field, Func<PlanInputs, string?> Get)> _fields = [];

    private static readonly (string Key, string Caption, Func<PlanInputs, string?> Get, Func<PlanInputs, string, PlanInputs> Set)[] Rows =
    [
        ("heating", "Heating:", i => i.Heating, (i, v) => i with { Heating = v }),
        ("bath-max", "Heating limit:", i => i.BathMax, (i, v) => i with { BathMax = v }),
        ("coolant-temp", "Coolant temp:", i => i.CoolantTemp, (i, v) => i with { CoolantTemp = v }),
        ("pump", "Pump:", i => i.Pump, (i, v) => i with { Pump = v }),
        ("pump-limit", "Pump ultimate:", i => i.PumpLimit, (i, v) => i with { PumpLimit = v }),
        ("atmospheric", "Atmospheric:", i => i.Atmospheric, (i, v) => i with { Atmospheric = v }),
        ("altitude", " or altitude:", i => i.Altitude, (i, v) => i with { Altitude = v }),
        ("delta-t", "Delta T steps:", i => i.DeltaT, (i, v) => i with { DeltaT = v }),
        ("vapor-temp", "Vapour pref.:", i => i.VaporTemp, (i, v) => i with { VaporTemp = v }),
    ];

    public EquipmentPane(PlannerViewModel vm)
    {
        _vm = vm;
        Title = "Equipment";
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        View? above = null;
        foreach (var (key, caption, get, set) in Rows)
        {
            var field = new Field(this, above, caption, 15, 11, v => vm.Edit(d => d with { Inputs = set(d.Inputs, v) }));
            _fields.Add((key, field, get));
            above = field.Caption;
        }
        var note = new Label
        {
            X = 0, Y = Pos.Bottom(above!) + 1, Width = Dim.Fill(), Height = 2,
            Text = "Empty field = default. Pressures: 25mbar, 15 Torr, 2.5kPa, -0.95barg (bare = mbar)\nTemperatures: 40, 40C, 313K, 104F (bare = °C). Delta T: bath,condenser in K.",
        };
        Add(note);
        Refresh();
    }

    /// <summary>Puts the document's values in the fields and the current defaults beside them.</summary>
    public void Refresh()
    {
        foreach (var (key, field, get) in _fields)
        {
            field.Show(get(_vm.Document.Inputs) ?? "");
            field.Hint.Text = _vm.DefaultFor(key);
        }
    }
}
