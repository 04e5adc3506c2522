using System.CommandLine;
using System.Text.Json.Nodes;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// <c>distillplan curve NAME</c>: the vapour-pressure curve of one solvent; <c>--at P</c> gives
/// the boiling temperature, <c>--temp T</c> the vapour pressure, neither a table.
/// </summary>
internal static class CurveCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var name = new Argument<string>("name") { Description = "Solvent name, alias or CAS number." };
        var at = new Option<string?>("--at") { Description = "Pressure to give the boiling temperature at (25mbar, 15 Torr, -0.9barg; bare number = mbar)." };
        var temp = new Option<string?>("--temp") { Description = "Temperature to give the vapour pressure at (60, 60C, 333K, 140F; bare number = °C)." };
        var atmospheric = SettingOptions.Of("atmospheric");
        var cmd = new Command("curve", "Vapour pressure at a temperature, or boiling temperature at a pressure, with the source of the curve.");
        cmd.Arguments.Add(name);
        cmd.Options.Add(at);
        cmd.Options.Add(temp);
        atmospheric.AddTo(cmd);
        common.AddOutput(cmd);

        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var unit = common.DisplayUnit(r);
            var solvent = library.Find(r.GetValue(name)!);
            string? atText = r.GetValue(at), tempText = r.GetValue(temp);
            var o = r.InvocationConfiguration.Output;
            bool json = common.IsJson(r);
            if (atText is not null && tempText is not null)
                throw new InputException("--at", atText, "either --at (a pressure) or --temp (a temperature), not both");

            if (atText is not null)
            {
                var atmosphere = atmospheric.Read(r).Build().Equipment.Atmosphere;
                var p = PressureUnits.Parse(atText, "--at", atmosphere);
                var t = solvent.VaporPressure.SaturationTemperature(p.Pascal);
                // Below the melting point the liquid is frozen: the solid sublimes, nothing boils.
                bool frozen = solvent.MeltingPointK is double tm && t.TemperatureK < tm;
                if (json)
                    J.Write(o, J.Obj(("solvent", solvent.Name), ("boiling_temperature_c", frozen ? null : J.N(t.TemperatureK - PhysicalConstants.ZeroCelsiusK)),
                        ("pressure_mbar", J.N(p.Millibar, 4)), ("source", library.Cite(t.Curve.Source)), ("source_key", t.Curve.Source),
                        ("form", t.Curve.Form), ("extrapolated", t.Extrapolated), ("range_c", Range(t.Curve)),
                        ("frozen", frozen), ("melting_point_c", J.N(solvent.MeltingPointK - PhysicalConstants.ZeroCelsiusK, 2))));
                else if (frozen)
                    o.WriteLine($"{solvent.Name} would be frozen at {PressureUnits.Format(p, unit)}: the liquid's curve reaches it only at " +
                                $"{Temperature.FromKelvin(t.TemperatureK)}, below the melting point {Temperature.FromKelvin(solvent.MeltingPointK!.Value)}; the solid sublimes, nothing boils.");
                else
                    o.WriteLine($"{solvent.Name} boils at {Temperature.FromKelvin(t.TemperatureK)} at {PressureUnits.Format(p, unit)}" +
                                $"{(t.Extrapolated ? "  (EXTRAPOLATED beyond the fitted range)" : "")}\n  curve: {t.Curve.Form}, {library.Cite(t.Curve.Source)}");
                return CliApp.Ok;
            }
            if (tempText is not null)
            {
                var t = TemperatureUnits.Parse(tempText, "--temp");
                var p = solvent.VaporPressure.SaturationPressure(t.Kelvin);
                bool frozen = solvent.MeltingPointK is double tm && t.Kelvin < tm;
                // So far below the curves the pressure underflows to zero: say so for the option typed, not as a "pressure" error.
                if (!(p.PressurePa > 0))
                    throw new InputException("--temp", tempText, frozen
                        ? $"a temperature near or above the melting point of {solvent.Name}, {Temperature.FromKelvin(solvent.MeltingPointK!.Value)} (at {t} it is frozen and its vapour pressure is too small to state)"
                        : $"a temperature at which {solvent.Name} has a vapour pressure to state (the curves cover {Temperature.FromKelvin(solvent.VaporPressure.MinK)} and up)");
                if (json)
                    J.Write(o, J.Obj(("solvent", solvent.Name), ("vapor_pressure_mbar", J.N(p.PressurePa / 100, 5)), ("temperature_c", J.N(t.Celsius)),
                        ("source", library.Cite(p.Curve.Source)), ("source_key", p.Curve.Source), ("form", p.Curve.Form),
                        ("extrapolated", p.Extrapolated), ("range_c", Range(p.Curve)),
                        ("frozen", frozen), ("melting_point_c", J.N(solvent.MeltingPointK - PhysicalConstants.ZeroCelsiusK, 2))));
                else if (frozen)
                    o.WriteLine($"{solvent.Name} is frozen at {t} (melting point {Temperature.FromKelvin(solvent.MeltingPointK!.Value)}): " +
                                $"the liquid's vapour pressure there would be {PressureUnits.Format(Pressure.FromPascal(p.PressurePa), unit)} (supercooled liquid, an extrapolation); the solid's is lower.");
                else
                    o.WriteLine($"{solvent.Name} vapour pressure at {t}: {PressureUnits.Format(Pressure.FromPascal(p.PressurePa), unit)}" +
                                $"{(p.Extrapolated ? "  (EXTRAPOLATED beyond the fitted range)" : "")}\n  curve: {p.Curve.Form}, {library.Cite(p.Curve.Source)}");
                return CliApp.Ok;
            }
            WriteTable(o, solvent, library, unit, json);
            return CliApp.Ok;
        });
        return cmd;
    }

    private static JsonArray Range(IVaporPressureCurve c) =>
        J.Arr([J.N(c.TMinK - PhysicalConstants.ZeroCelsiusK, 2), J.N(c.TMaxK - PhysicalConstants.ZeroCelsiusK, 2)]);

    /// <summary>Boiling temperatures at the pressures people set on a controller.</summary>
    private static readonly double[] TablePressuresMbar = [1, 2, 5, 10, 20, 50, 100, 200, 300, 500, 700, 1013.25];

    private static void WriteTable(TextWriter o, Solvent s, SolventLibrary library, PressureUnit unit, bool json)
    {
        var rows = new List<(double Mbar, TsatResult? T)>();
        foreach (double mbar in TablePressuresMbar)
        {
            try { rows.Add((mbar, s.VaporPressure.SaturationTemperature(mbar * 100))); }
            catch (DistillPlanException) { rows.Add((mbar, null)); }
        }
        if (json)
        {
            J.Write(o, J.Obj(("solvent", s.Name),
                ("points", J.Arr(rows.Where(r => r.T is not null).Select(r => (JsonNode)J.Obj(
                    ("pressure_mbar", J.N(r.Mbar, 2)), ("boiling_temperature_c", J.N(r.T!.Value.TemperatureK - PhysicalConstants.ZeroCelsiusK, 2)),
                    ("source_key", r.T.Value.Curve.Source), ("extrapolated", r.T.Value.Extrapolated))))),
                ("curves", J.Arr(s.VaporPressure.Curves.Select(c => (JsonNode)J.Obj(("form", c.Form), ("source", library.Cite(c.Source)), ("source_key", c.Source), ("range_c", Range(c))))))));
            return;
        }
        o.WriteLine($"{s.Name}: boiling temperature by pressure");
        foreach (var (mbar, t) in rows)
            o.WriteLine($"  {PressureUnits.Format(Pressure.FromMillibar(mbar), unit),14}  " +
                        (t is null ? "—" : $"{Temperature.FromKelvin(t.Value.TemperatureK),9}{(t.Value.Extrapolated ? "  extrapolated" : "")}"));
        o.WriteLine("Curves, in the order they are tried:");
        foreach (var c in s.VaporPressure.Curves)
            o.WriteLine($"  {c.Form,-18} {Temperature.FromKelvin(c.TMinK)} to {Temperature.FromKelvin(c.TMaxK)}  {library.Cite(c.Source)}");
    }
}
