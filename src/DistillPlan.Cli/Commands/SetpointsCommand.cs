using System.CommandLine;
using DistillPlan.Cli.Output;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Cli.Commands;

/// <summary><c>distillplan setpoints CHARGE</c>: bath, vapour, vacuum and condenser by the ΔT rule.</summary>
internal static class SetpointsCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var plan = new PlanOptions();
        var charge = new Argument<string>("charge") { Description = "A solvent (ethyl-acetate, THF, 141-78-6) or a mixture NAME=AMOUNT,… (ethanol=90,water=10; thf=12L,toluene=3L)." };
        var model = new Option<string?>("--model") { Description = "Activity model for mixtures: unifac (default where parameters exist) or ideal." };
        var cmd = new Command("setpoints", "Bath temperature, vacuum setpoint and condenser limit for a charge, with the checks.");
        cmd.Arguments.Add(charge);
        common.AddOutput(cmd);
        cmd.Options.Add(common.Basis);
        cmd.Options.Add(model);
        plan.AddTo(cmd);

        cmd.SetAction(r =>
        {
            var library = common.LoadLibrary(r);
            var unit = common.DisplayUnit(r);
            var (equipment, rules) = plan.Read(r).Build();
            var c = ChargeParser.Parse(r.GetValue(charge)!, common.ParseBasis(r), library);
            var system = BoilingSystems.For(c, r.GetValue(model));
            var result = SetpointPlanner.Plan(c, system, equipment, rules);
            var output = r.InvocationConfiguration.Output;
            if (r.GetValue(common.Json)) Json.Write(output, PlanJson.From(result));
            else PlanText.Write(output, result, unit);
            return CliApp.Ok;
        });
        return cmd;
    }
}

/// <summary>The JSON shape of a plan (DESIGN §5 fields first, then the rest).</summary>
internal static class PlanJson
{
    public static object From(Plan p) => new
    {
        vapor_temperature_c = Json.R(p.Vapor.Celsius, 2),
        bath_temperature_c = Json.R(p.Bath.Celsius, 2),
        vacuum_setpoint_mbar = Json.R(p.VacuumSetpoint.Millibar, 3),
        condenser_max_c = Json.R(p.CondenserMax.Celsius, 2),
        limiting_constraint = p.LimitingConstraint,
        checks = p.Checks.Select(CheckJson).ToList(),
        charge = p.Charge.Components.Select((c, i) => new { name = c.Solvent.Name, cas = c.Solvent.Cas, mole_fraction = Json.R(p.Charge.MoleFractions()[i], 5) }).ToList(),
        model = p.System.Model,
        model_note = p.System.ModelNote,
        vapor = Fractions(p, p.StartVapor),
        atmospheric_boiling_temperature_c = Json.R(p.AtmosphericBoilingPoint.Celsius, 2),
        at_atmospheric_pressure = p.AtAtmosphericPressure,
        approach_mbar = p.Approach.Select(a => Json.R(a.Millibar, 2)).ToList(),
        coolant_temperature_c = Json.R(p.Equipment.Coolant.Celsius, 2),
        pump_ultimate_mbar = Json.R(p.Equipment.PumpUltimate.Millibar, 3),
        heating_max_c = Json.R(p.Equipment.HeatingMax.Celsius, 2),
        atmospheric_mbar = Json.R(p.Equipment.Atmosphere.Millibar, 2),
        conflicts = p.Conflicts.Select(c => new { constraints = c.Constraints, message = c.Message, remedies = c.Remedies }).ToList(),
        assumptions = p.Assumptions.Select(a => new { name = a.Name, value = a.Value, is_default = a.IsDefault, basis = a.Basis }).ToList(),
        notes = p.Notes,
        cautions = Cautions.General,
    };

    public static object CheckJson(Check c) => new { code = c.Code, severity = c.SeverityWord, message = c.Message, action = c.Action, values = c.Values };

    public static Dictionary<string, double> Fractions(Plan p, double[] x) =>
        p.System.Components.Select((s, i) => (s.Name, x[i])).ToDictionary(t => t.Name, t => Json.R(t.Item2, 5));
}

/// <summary>The readable text shape of a plan.</summary>
internal static class PlanText
{
    public static void Write(TextWriter o, Plan p, PressureUnit unit)
    {
        o.WriteLine($"Plan for {p.Charge.Describe()}" + (p.System.Model == "pure" ? "" : $"  [model: {p.System.Model}]"));
        o.WriteLine();
        o.WriteLine($"  Bath                {p.Bath,-12}");
        o.WriteLine($"  Vapour temperature  {p.Vapor,-12} set by: {p.LimitingConstraint}");
        o.WriteLine($"  Vacuum setpoint     {PressureUnits.Format(p.VacuumSetpoint, unit),-12}" + (p.AtAtmosphericPressure ? " (no vacuum needed)" : ""));
        o.WriteLine($"  Condenser at most   {p.CondenserMax,-12} coolant {p.Equipment.Coolant}");
        o.WriteLine($"  Approach in steps   {string.Join(" → ", p.Approach.Select(a => PressureUnits.Format(a, unit)))}");
        foreach (var n in p.Notes) o.WriteLine($"  Note: {n}");
        foreach (var c in p.Conflicts) o.WriteLine($"  CONFLICT: {c.Message} Resolve with: {string.Join("; or ", c.Remedies)}.");
        o.WriteLine();
        o.WriteLine(p.Checks.Count == 0 ? "Checks: none raised." : "Checks:");
        foreach (var c in p.Checks) WriteCheck(o, c);
        o.WriteLine();
        o.WriteLine("Assumptions (* = default, not set by you):");
        foreach (var a in p.Assumptions) o.WriteLine($"  {(a.IsDefault ? "*" : " ")} {a.Name}: {a.Value}  ({a.Basis})");
        o.WriteLine();
        o.WriteLine("Cautions:");
        foreach (var c in Cautions.General) o.WriteLine($"  - {c}");
    }

    public static void WriteCheck(TextWriter o, Check c)
    {
        o.WriteLine($"  {c.SeverityWord.ToUpperInvariant(),-8} {c.Code}: {c.Message}");
        o.WriteLine($"           what to do: {c.Action}");
    }
}
