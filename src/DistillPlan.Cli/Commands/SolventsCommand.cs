using System.CommandLine;
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
            static double? C(double? k) => k is double v ? Json.R(v - PhysicalConstants.ZeroCelsiusK, 2) : null;
            if (r.GetValue(common.Json))
            {
                Json.Write(o, new
                {
                    files = library.Files,
                    solvents = list.Select(s => new
                    {
                        name = s.Name, cas = s.Cas, aliases = s.Aliases, formula = s.Formula,
                        molar_mass_g_per_mol = s.MolarMassGPerMol, liquid_density_kg_per_m3 = s.LiquidDensityKgPerM3,
                        melting_point_c = C(s.MeltingPointK), normal_boiling_point_c = C(s.NormalBoilingPointK),
                        critical_temperature_c = C(s.CriticalTemperatureK), flash_point_c = C(s.FlashPointK), autoignition_c = C(s.AutoignitionK),
                        peroxide_class = s.PeroxideClass.ToString(), flags = s.Flags.ToString(),
                        unifac_groups = s.UnifacGroups,
                        curves = s.VaporPressure.Curves.Select(c => new { form = c.Form, source_key = c.Source, range_c = new[] { C(c.TMinK), C(c.TMaxK) } }).ToList(),
                        sources = s.Sources,
                    }).ToList(),
                });
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
