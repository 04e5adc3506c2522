using System.CommandLine;
using System.Globalization;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// <c>distillplan strip CHARGE</c>: the Rayleigh batch evaporation of a charge, as steps a person
/// or a vacuum controller can follow, with the checks at each step.
/// </summary>
internal static class StripCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var plan = new PlanOptions();
        var charge = new Argument<string>("charge") { Description = "Components with amounts: ethyl-acetate=100mL,heptane=100mL; thf=12L,toluene=3L." };
        var model = MixtureCommand.ModelOption();
        var pressure = new Option<string?>("--pressure") { Description = "Hold this pressure and let the boiling temperature rise (default: hold the plan's vapour temperature and let the pressure fall)." };
        var end = new Option<string?>("--end") { Description = "Where to stop: left=10% (of the charge volume), residual=NAME:0.01 (mole fraction), pump (what the pump can hold), dry. Default: pump, or 5 % left." };
        var productMass = new Option<string?>("--product-mass") { Description = "Non-volatile product dissolved in the charge: its mass (20g, 1.5kg)." };
        var productMolar = new Option<string?>("--product-molar-mass") { Description = "Molar mass of the product in g/mol (with --product-mass)." };
        var cmd = new Command("strip", "Batch evaporation step by step: pressure ramp (or temperature rise), compositions, distillate and residue, checks.");
        cmd.Arguments.Add(charge);
        foreach (var o in new Option[] { model, pressure, end, productMass, productMolar, common.Basis }) cmd.Options.Add(o);
        common.AddOutput(cmd);
        plan.AddTo(cmd);

        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var unit = common.DisplayUnit(r);
            var (equipment, rules) = plan.Read(r).Build();
            var c = ChargeParser.Parse(r.GetValue(charge)!, common.ParseBasis(r), library);
            var product = ReadProduct(r.GetValue(productMass), r.GetValue(productMolar));
            var planned = SetpointPlanner.Plan(c, BoilingSystems.For(c, r.GetValue(model)), equipment, rules);

            var components = c.Components.Select(x => MixtureComponent.FromSolvent(x.Solvent)).ToList();
            var amounts = c.Components.Select(x => x.Moles).ToList();
            if (product is not null)
            {
                // A product's mass means something only beside real solvent amounts.
                if (c.IsRelative)
                    throw new InputException("charge", r.GetValue(charge)!, "amounts with units (mL, L, g, mol) when a product is given");
                components.Add(MixtureComponent.NonVolatile("product", product.MolarMassGPerMol));
                amounts.Add(product.Moles);
            }
            var equilibrium = PhaseEquilibrium.Create(components, BoilingSystems.ParseModel(r.GetValue(model)));
            var options = ReadEnd(r.GetValue(end), StripPlanner.DefaultOptions(c, equipment, rules), c, library);
            // The product has no liquid density: count fractions in moles then.
            if (product is not null) options = options with { Basis = StripBasis.Moles };

            StripResult result;
            string? pressureText = r.GetValue(pressure);
            if (pressureText is not null)
            {
                var p = PressureUnits.Parse(pressureText, "--pressure", equipment.Atmosphere);
                result = BatchStrip.AtFixedPressure(equilibrium, amounts, p.Pascal,
                    options with { PumpLimitPa = null, TemperatureLimitK = (equipment.HeatingMax - rules.BathToVapor).Kelvin });
            }
            else result = BatchStrip.AtFixedVaporTemperature(equilibrium, amounts, planned.Vapor.Kelvin, options);

            var rows = StepChecks(result, equipment, rules, c, library.Solvents).ToList();
            var o = r.InvocationConfiguration.Output;
            if (r.GetValue(common.Json)) Json.Write(o, ToJson(result, rows, rules, planned));
            else WriteText(o, result, rows, rules, unit, c);
            return CliApp.Ok;
        });
        return cmd;
    }

    private static Product? ReadProduct(string? mass, string? molar)
    {
        if (mass is null && molar is null) return null;
        if (mass is null || molar is null)
            throw new InputException(mass is null ? "--product-mass" : "--product-molar-mass", mass ?? molar!, "both --product-mass and --product-molar-mass");
        var m = System.Text.RegularExpressions.Regex.Match(mass.Trim(), @"^([0-9.]+)\s*(mg|g|kg)$");
        if (!m.Success || !double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !(v > 0))
            throw new InputException("--product-mass", mass, "a mass above zero with mg, g or kg (e.g. 20g)");
        double grams = v * m.Groups[2].Value switch { "mg" => 1e-3, "kg" => 1e3, _ => 1.0 };
        if (!double.TryParse(molar.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double mm) || !(mm > 0) || mm > 1e6)
            throw new InputException("--product-molar-mass", molar, "a molar mass in g/mol above zero (e.g. 350)");
        return new Product(grams, mm, null);
    }

    private static StripOptions ReadEnd(string? end, StripOptions defaults, Charge c, Core.Library.SolventLibrary library)
    {
        if (string.IsNullOrWhiteSpace(end)) return defaults;
        const string allowed = "left=10% (fraction of the charge left), residual=NAME:0.01, pump, or dry";
        string e = end.Trim().ToLowerInvariant();
        if (e == "pump") return defaults with { StopAtFractionLeft = null };
        if (e == "dry")
        {
            // Dryness is refused for peroxide formers: the minimum residue in the defaults stays.
            return defaults with { StopAtFractionLeft = null, PumpLimitPa = null };
        }
        if (e.StartsWith("left="))
        {
            string v = e[5..].TrimEnd('%');
            if (!double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out double pct) || !(pct > 0) || !(pct < 100))
                throw new InputException("--end", end, "left= a percentage between 0 and 100, e.g. left=10%");
            return defaults with { StopAtFractionLeft = pct / 100, PumpLimitPa = null };
        }
        if (e.StartsWith("residual="))
        {
            string[] parts = end.Trim()[9..].Split(':');
            if (parts.Length != 2 || !double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double x) || !(x > 0) || !(x < 1))
                throw new InputException("--end", end, "residual=NAME:FRACTION with a mole fraction between 0 and 1, e.g. residual=thf:0.01");
            var s = library.TryFind(parts[0], out var named) ? c.Components.FirstOrDefault(k => ReferenceEquals(k.Solvent, named)) : null;
            if (s is null)
                throw new InputException("--end", end, "residual= one of the charge's components: " + string.Join(", ", c.Components.Select(k => k.Solvent.Name)));
            return defaults with { StopAtResidualMoleFraction = new ResidualMoleFractionTarget(s.Solvent.Name, x), StopAtFractionLeft = null, PumpLimitPa = null };
        }
        throw new InputException("--end", end, allowed);
    }

    private sealed record Row(StripStep Step, double BathK, IReadOnlyList<Check> Checks);

    /// <summary>The checks a step needs: breakthrough as the pressure falls, condenser freeze, bumping on a large pressure step.</summary>
    private static IEnumerable<Row> StepChecks(StripResult result, Equipment eq, Rules rules, Charge c, IReadOnlyList<Core.Library.Solvent> library)
    {
        var solvents = c.Components.Select(x => x.Solvent).ToDictionary(s => s.Name);
        double? previousPa = null;
        foreach (var step in result.Steps)
        {
            var checks = new List<Check>();
            double tc = eq.Coolant.Kelvin;
            // Gas leaving the condenser: the distillate's partial pressures at the coolant temperature (ideal, a screening estimate).
            double pCond = step.Vapor.Where(kv => solvents.ContainsKey(kv.Key))
                .Sum(kv => kv.Value * SafePsat(solvents[kv.Key], tc));
            if (pCond >= step.PressurePa)
                checks.Add(new Check("condenser-breakthrough", Severity.Warning,
                    $"At {step.PressurePa / 100:0.0} mbar the condensate's vapour pressure at the coolant ({pCond / 100:0.0} mbar) is higher: vapour goes to the pump.",
                    "Stop lowering the pressure here or cool the condenser further; add a cold trap.", new Dictionary<string, double> { ["pressure_mbar"] = Json.R(step.PressurePa / 100) }));
            foreach (var s in solvents.Values)
                if (step.Vapor.TryGetValue(s.Name, out double y) && y > 0.01 && s.MeltingPointK is double tm && tm >= tc)
                    checks.Add(new Check("condenser-freeze", Severity.Warning, $"{s.Name} (melts at {Temperature.FromKelvin(tm)}) freezes on a coil at {eq.Coolant}.",
                        "Set the coolant above the melting point.", new Dictionary<string, double> { ["melting_point_c"] = Json.R(tm - PhysicalConstants.ZeroCelsiusK) }));
            if (previousPa is double prev && prev / step.PressurePa > 2)
                checks.Add(new Check("bumping-risk", Severity.Caution, $"The pressure halves or more in this step ({prev / 100:0.0} → {step.PressurePa / 100:0.0} mbar).",
                    "Lower the pressure gradually through this step; watch for bumping.", new Dictionary<string, double> { ["ratio"] = Json.R(prev / step.PressurePa) }));
            previousPa = step.PressurePa;
            yield return new Row(step, step.TemperatureK + rules.BathToVapor.Kelvin, checks);
        }
    }

    private static double SafePsat(Core.Library.Solvent s, double t)
    {
        try { return s.VaporPressure.SaturationPressure(t).PressurePa; }
        catch (DistillPlanException) { return 0; }
    }

    private static object ToJson(StripResult r, IReadOnlyList<Row> rows, Rules rules, Plan planned) => new
    {
        steps = rows.Select(x => new
        {
            evaporated_fraction = Json.R(x.Step.EvaporatedVolumeFraction ?? x.Step.EvaporatedMoleFraction, 4),
            evaporated_mole_fraction = Json.R(x.Step.EvaporatedMoleFraction, 4),
            liquid = x.Step.Liquid.ToDictionary(kv => kv.Key, kv => Json.R(kv.Value, 5)),
            vapor = x.Step.Vapor.ToDictionary(kv => kv.Key, kv => Json.R(kv.Value, 5)),
            pressure_mbar = Json.R(x.Step.PressurePa / 100, 3),
            vapor_temperature_c = Json.R(x.Step.TemperatureK - PhysicalConstants.ZeroCelsiusK, 2),
            bath_temperature_c = Json.R(x.BathK - PhysicalConstants.ZeroCelsiusK, 2),
            distillate_mol = x.Step.DistillateMol.ToDictionary(kv => kv.Key, kv => Json.R(kv.Value, 6)),
            residue_mol = x.Step.ResidueMol.ToDictionary(kv => kv.Key, kv => Json.R(kv.Value, 6)),
            checks = x.Checks.Select(PlanJson.CheckJson).ToList(),
        }).ToList(),
        end_reason = EndCode(r.EndReason),
        end_message = r.EndMessage,
        mode = r.Mode == StripMode.FixedVaporTemperature ? "fixed-vapor-temperature" : "fixed-pressure",
        model = r.Model,
        model_note = r.FallbackReason ?? r.ModelNote,
        charge_mol = r.ChargeMol,
        plan_checks = planned.Checks.Select(PlanJson.CheckJson).ToList(),
        cautions = Cautions.General,
    };

    private static string EndCode(StripEndReason e) => string.Concat(e.ToString().Select((ch, i) => i > 0 && char.IsUpper(ch) ? "-" + char.ToLowerInvariant(ch) : char.ToLowerInvariant(ch).ToString()));

    private static void WriteText(TextWriter o, StripResult r, IReadOnlyList<Row> rows, Rules rules, PressureUnit unit, Charge c)
    {
        o.WriteLine($"Strip of {c.Describe()}  [{(r.Mode == StripMode.FixedVaporTemperature ? "vapour temperature held, pressure falls" : "pressure held, temperature rises")}; model {r.Model}]");
        var names = c.Components.Select(x => x.Solvent.Name).ToList();
        o.WriteLine($"  {"evap.",6} {"pressure",13} {"vapour",8} {"bath",8}  liquid x ({string.Join(" / ", names)})");
        foreach (var x in rows)
        {
            o.WriteLine($"  {100 * (x.Step.EvaporatedVolumeFraction ?? x.Step.EvaporatedMoleFraction),5:0.0}% {PressureUnits.Format(Pressure.FromPascal(x.Step.PressurePa), unit),13} " +
                        $"{x.Step.TemperatureK - PhysicalConstants.ZeroCelsiusK,6:0.0}°C {x.BathK - PhysicalConstants.ZeroCelsiusK,6:0.0}°C  " +
                        string.Join(" / ", names.Select(n => x.Step.Liquid[n].ToString("0.000", CultureInfo.InvariantCulture))));
            foreach (var k in x.Checks) o.WriteLine($"         {k.SeverityWord.ToUpperInvariant()} {k.Code}: {k.Message}");
        }
        o.WriteLine($"  End: {r.EndMessage}");
        foreach (var caution in Cautions.General) o.WriteLine($"  - {caution}");
    }
}
