using System.CommandLine;
using System.Text.Json.Nodes;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Cli.Commands;

/// <summary><c>distillplan mixture CHARGE --at P</c> (or <c>--temp T</c>): bubble and dew points, compositions, γ, α.</summary>
internal static class MixtureCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var charge = new Argument<string>("charge") { Description = "Components with amounts: benzene=50,toluene=50 (see --basis)." };
        var at = new Option<string?>("--at") { Description = "Pressure for bubble and dew temperatures (default 1013.25 mbar)." };
        var temp = new Option<string?>("--temp") { Description = "Temperature for bubble and dew pressures, instead of --at." };
        var settings = SettingOptions.Of("model", "basis");
        var cmd = new Command("mixture", "Bubble and dew points of a mixture, vapour composition, activity coefficients and relative volatility.");
        cmd.Arguments.Add(charge);
        cmd.Options.Add(at);
        cmd.Options.Add(temp);
        settings.AddTo(cmd);
        common.AddOutput(cmd);
        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var unit = common.DisplayUnit(r);
            var setup = settings.Read(r).Build();
            var c = ChargeParser.Parse(r.GetValue(charge)!, setup.Basis, library);
            var system = Mixture(c, setup.Model);
            double[] x = c.MoleFractions();
            EquilibriumPoint bubble, dew;
            if (r.GetValue(temp) is string tt)
            {
                if (r.GetValue(at) is string a) throw new InputException("--at", a, "either --at or --temp, not both");
                var t = TemperatureUnits.Parse(tt, "--temp");
                bubble = system.Equilibrium.BubblePressure(t.Kelvin, x);
                dew = system.Equilibrium.DewPressure(t.Kelvin, x);
            }
            else
            {
                var p = AtOrStandard(r.GetValue(at));
                PotFreezing.RequireLiquidAt(system.Components, p.Pascal, "--at", r.GetValue(at) ?? "");
                bubble = system.Equilibrium.BubbleTemperature(p.Pascal, x);
                dew = system.Equilibrium.DewTemperature(p.Pascal, x);
            }
            var o = r.InvocationConfiguration.Output;
            static JsonObject F(IReadOnlyDictionary<string, double> d) => J.Map(d, 5);
            if (common.IsJson(r))
            {
                J.Write(o, J.Obj(
                    ("bubble_temperature_c", J.N(bubble.TemperatureK - PhysicalConstants.ZeroCelsiusK)),
                    ("dew_temperature_c", J.N(dew.TemperatureK - PhysicalConstants.ZeroCelsiusK)),
                    ("bubble_pressure_mbar", J.N(bubble.PressurePa / 100)),
                    ("dew_pressure_mbar", J.N(dew.PressurePa / 100)),
                    ("model", bubble.Model),
                    ("model_note", system.ModelNote),
                    ("liquid", F(bubble.Liquid)),
                    ("vapor", F(bubble.Vapor)),
                    ("dew_liquid", F(dew.Liquid)),
                    ("activity_coefficients", F(bubble.ActivityCoefficients)),
                    ("relative_volatility", J.Arr(bubble.RelativeVolatilities.Select(a => (JsonNode)J.Obj(("first", a.First), ("second", a.Second), ("alpha", J.N(a.Alpha, 4)))))),
                    ("extrapolated", J.Strings(bubble.ExtrapolatedComponents)),
                    ("liquid_phases", Math.Max(1, bubble.LiquidPhaseCount)),
                    ("phases", bubble.LiquidPhaseCount > 1 ? Phases(bubble.LiquidPhases) : null),
                    ("liquid_phase_basis", bubble.LiquidPhaseBasis),
                    ("approximate", bubble.ApproximationNote)));
                return CliApp.Ok;
            }
            o.WriteLine($"{c.Describe()}  [model: {bubble.Model}]");
            if (system.ModelNote is string n) o.WriteLine($"  Note: {n}");
            o.WriteLine($"  Bubble point  {Temperature.FromKelvin(bubble.TemperatureK)} at {PressureUnits.Format(Pressure.FromPascal(bubble.PressurePa), unit)}");
            o.WriteLine($"  Dew point     {Temperature.FromKelvin(dew.TemperatureK)} at {PressureUnits.Format(Pressure.FromPascal(dew.PressurePa), unit)}");
            o.WriteLine($"  {"component",-24} {"liquid x",9} {"vapour y",9} {"γ",7}");
            foreach (var s in system.Components)
                o.WriteLine($"  {s.Name,-24} {bubble.Liquid[s.Name],9:0.0000} {bubble.Vapor[s.Name],9:0.0000} {bubble.ActivityCoefficients[s.Name],7:0.000}");
            foreach (var a in bubble.RelativeVolatilities) o.WriteLine($"  α({a.First}/{a.Second}) = {a.Alpha:0.###}");
            if (bubble.LiquidPhaseCount > 1)
            {
                o.WriteLine("  Two liquid phases at the bubble point (the pot boils at the three-phase point):");
                WritePhases(o, bubble.LiquidPhases);
            }
            if (bubble.LiquidPhaseBasis is string basis) o.WriteLine($"  Liquid phases: {basis}");
            if (bubble.ApproximationNote is string approx) o.WriteLine($"  Note: {approx}");
            return CliApp.Ok;
        });
        return cmd;
    }

    /// <summary>The pressure given to --at, or one standard atmosphere.</summary>
    internal static Pressure AtOrStandard(string? text)
    {
        var standard = Pressure.FromPascal(PhysicalConstants.StandardAtmospherePa);
        return text is null ? standard : PressureUnits.Parse(text, "--at", standard);
    }

    /// <summary>JSON <c>phases</c>: each liquid layer's share and mole fractions.</summary>
    internal static JsonArray Phases(IReadOnlyList<LiquidPhase> phases) =>
        J.Arr(phases.Select(ph => (JsonNode)J.Obj(("share", J.N(ph.Share, 5)), ("mole_fractions", J.Map(ph.MoleFractions, 5)))));

    /// <summary>One text line per liquid layer.</summary>
    internal static void WritePhases(TextWriter o, IReadOnlyList<LiquidPhase> phases)
    {
        for (int i = 0; i < phases.Count; i++)
            o.WriteLine($"    layer {i + 1} ({phases[i].Share * 100:0.#} % of the liquid): " +
                        string.Join(", ", phases[i].MoleFractions.Select(kv => $"{kv.Key} {kv.Value:0.000}")) + " (mole fraction)");
    }

    internal static MixtureBoilingSystem Mixture(Charge c, string? model)
    {
        if (c.IsPure) throw new InputException("charge", c.Describe(), "two or more components, e.g. benzene=50,toluene=50");
        return (MixtureBoilingSystem)BoilingSystems.For(c, model);
    }
}

/// <summary><c>distillplan azeotrope A B [--at P]</c>: minimum-boiling, maximum-boiling and heterogeneous azeotropes of a pair.</summary>
internal static class AzeotropeCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var first = new Argument<string>("first") { Description = "First solvent of the pair." };
        var second = new Argument<string>("second") { Description = "Second solvent of the pair." };
        var at = new Option<string?>("--at") { Description = "Pressure to search at (default 1013.25 mbar)." };
        var model = SettingOptions.Of("model");
        var cmd = new Command("azeotrope", "Search a pair for minimum-boiling, maximum-boiling and heterogeneous (two-liquid) azeotropes at a pressure.");
        cmd.Arguments.Add(first);
        cmd.Arguments.Add(second);
        cmd.Options.Add(at);
        model.AddTo(cmd);
        common.AddOutput(cmd);
        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var unit = common.DisplayUnit(r);
            Solvent a = library.Find(r.GetValue(first)!), b = library.Find(r.GetValue(second)!);
            if (ReferenceEquals(a, b)) throw new InputException("second", r.GetValue(second)!, "a solvent other than the first");
            var p = MixtureCommand.AtOrStandard(r.GetValue(at));
            PotFreezing.RequireLiquidAt([a, b], p.Pascal, "--at", r.GetValue(at) ?? "");
            var kind = BoilingSystems.ParseModel(model.Read(r).Build().Model);
            var result = AzeotropeSearch.Find(MixtureComponent.FromSolvent(a), MixtureComponent.FromSolvent(b), p.Pascal, kind);
            var az = result.Azeotropes.FirstOrDefault();
            var o = r.InvocationConfiguration.Output;
            string KindWord(AzeotropeKind k) => k switch
            {
                AzeotropeKind.MinimumBoiling => "minimum-boiling",
                AzeotropeKind.Heterogeneous => "heterogeneous",
                _ => "maximum-boiling",
            };
            if (common.IsJson(r))
            {
                J.Write(o, J.Obj(
                    ("azeotrope", result.Found),
                    ("temperature_c", az is null ? null : J.N(az.TemperatureK - PhysicalConstants.ZeroCelsiusK)),
                    ("mole_fraction", az is null ? null : J.Map(az.MoleFractions, 4)),
                    ("kind", az is null ? null : KindWord(az.Kind)),
                    ("model", result.Model),
                    ("fallback_reason", result.FallbackReason),
                    ("pressure_mbar", J.N(p.Millibar)),
                    ("pure_boiling_points_c", J.Map(result.PureBoilingPointsK.Select(kv => new KeyValuePair<string, double>(kv.Key, kv.Value - PhysicalConstants.ZeroCelsiusK)), 3)),
                    ("liquid_phases", az is null ? null : Math.Max(1, az.LiquidPhases.Count)),
                    ("phases", az is { LiquidPhases.Count: > 1 } ? MixtureCommand.Phases(az.LiquidPhases) : null),
                    ("source", az?.Source),
                    ("published_note", result.Note),
                    ("uses_published_value", result.UsesPublishedValue),
                    ("approximate", result.ApproximationNote),
                    ("all", J.Arr(result.Azeotropes.Select(x => (JsonNode)J.Obj(("temperature_c", J.N(x.TemperatureK - PhysicalConstants.ZeroCelsiusK)),
                        ("mole_fraction", J.Map(x.MoleFractions, 5)), ("kind", KindWord(x.Kind)),
                        ("liquid_phases", Math.Max(1, x.LiquidPhases.Count)),
                        ("phases", x.LiquidPhases.Count > 1 ? MixtureCommand.Phases(x.LiquidPhases) : null),
                        ("source", x.Source)))))));
                return CliApp.Ok;
            }
            o.WriteLine($"{a.Name} + {b.Name} at {PressureUnits.Format(p, unit)}  [model: {result.Model}]");
            if (result.FallbackReason is string f) o.WriteLine($"  Note: {f} (an ideal solution has no azeotrope)");
            if (!result.Found) o.WriteLine("  No azeotrope found: the pair is zeotropic at this pressure.");
            foreach (var x in result.Azeotropes)
            {
                o.WriteLine($"  {KindWord(x.Kind)} azeotrope at {Temperature.FromKelvin(x.TemperatureK)}: " +
                            string.Join(", ", x.MoleFractions.Select(kv => $"{kv.Key} {kv.Value:0.###}")) + " (mole fraction)" +
                            (x.Source is string src ? $"; published: {src}" : ""));
                if (x.LiquidPhases.Count > 1)
                {
                    o.WriteLine("  two liquid phases: the vapour lies between the layers");
                    MixtureCommand.WritePhases(o, x.LiquidPhases);
                }
            }
            if (result.Note is string pub) o.WriteLine($"  Note: {pub}");
            if (result.ApproximationNote is string approx) o.WriteLine($"  Note: {approx}");
            return CliApp.Ok;
        });
        return cmd;
    }
}
