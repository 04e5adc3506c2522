using System.CommandLine;
using System.Text.Json.Nodes;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Library;

namespace DistillPlan.Cli.Commands;

/// <summary><c>distillplan solvents [TEXT]</c>: the library, or the entries matching a name, alias or CAS.</summary>
internal static class SolventsCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var filter = new Argument<string?>("text") { Description = "Show only solvents whose name, alias or CAS contains this.", Arity = ArgumentArity.ZeroOrOne };
        var cmd = new Command("solvents", "List the solvent library with boiling and melting points, hazards and sources.");
        cmd.Arguments.Add(filter);
        common.AddOutput(cmd);
        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var list = r.GetValue(filter) is string f ? library.Search(f) : library.Solvents;
            var o = r.InvocationConfiguration.Output;
            static double? C(double? k) => k is double v ? Math.Round(v - PhysicalConstants.ZeroCelsiusK, 2) : null;
            if (common.IsJson(r))
            {
                J.Write(o, J.Obj(("files", J.Strings(library.Files)),
                    ("solvents", J.Arr(list.Select(s => (JsonNode)J.Obj(
                        ("name", s.Name), ("cas", s.Cas), ("aliases", J.Strings(s.Aliases)), ("formula", s.Formula),
                        ("molar_mass_g_per_mol", s.MolarMassGPerMol), ("liquid_density_kg_per_m3", J.N(s.LiquidDensityKgPerM3, 2)),
                        ("melting_point_c", J.N(C(s.MeltingPointK), 2)), ("normal_boiling_point_c", J.N(C(s.NormalBoilingPointK), 2)),
                        ("critical_temperature_c", J.N(C(s.CriticalTemperatureK), 2)), ("flash_point_c", J.N(C(s.FlashPointK), 2)),
                        ("autoignition_c", J.N(C(s.AutoignitionK), 2)),
                        ("peroxide_class", s.PeroxideClass.ToString()), ("flags", s.Flags.ToString()),
                        ("unifac_groups", s.UnifacGroups is null ? null : J.Map(s.UnifacGroups.Select(kv => new KeyValuePair<string, double>(kv.Key.ToString(System.Globalization.CultureInfo.InvariantCulture), kv.Value)), 0)),
                        ("curves", J.Arr(s.VaporPressure.Curves.Select(c => (JsonNode)J.Obj(("form", c.Form), ("source_key", c.Source),
                            ("range_c", J.Arr([J.N(C(c.TMinK), 2), J.N(C(c.TMaxK), 2)])))))),
                        ("sources", J.Obj([.. s.Sources.Select(kv => (kv.Key, J.S(kv.Value)))]))))))));
                return CliApp.Ok;
            }
            o.WriteLine($"{"name",-26} {"CAS",-11} {"bp °C",7} {"mp °C",7} {"flash °C",8}  notes");
            foreach (var s in list)
            {
                var notes = new List<string>();
                if (s.PeroxideClass != PeroxideClass.None) notes.Add("peroxides: " + s.PeroxideClass);
                if (s.Flags != SolventFlags.None) notes.Add(s.Flags.ToString());
                if (s.Aliases.Count > 0) notes.Add("aka " + string.Join(", ", s.Aliases.Take(3)));
                o.WriteLine($"{s.Name,-26} {s.Cas,-11} {C(s.NormalBoilingPointK),7:0.0} {C(s.MeltingPointK),7:0.0} {C(s.FlashPointK),8:0.0}  {string.Join("; ", notes)}");
            }
            o.WriteLine($"{list.Count} solvents from {string.Join(" + ", library.Files)}");
            return CliApp.Ok;
        });
        return cmd;
    }
}
