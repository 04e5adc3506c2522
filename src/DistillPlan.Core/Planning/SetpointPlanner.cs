using DistillPlan.Core.Checks;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>
/// Chooses the vapour temperature, bath temperature, vacuum setpoint and condenser limit by
/// the ΔT rule (DESIGN §2, common practice): start from the preferred vapour temperature,
/// raise it to clear the coolant and the pump, lower it to respect the heating limit and the
/// product, cap it at the boiling point at the local atmospheric pressure. This class is the
/// one place each setpoint is decided.
/// </summary>
public static class SetpointPlanner
{
    /// <summary>Builds the plan for a charge.</summary>
    public static Plan Plan(Charge charge, IBoilingSystem system, Equipment equipment, Rules rules)
    {
        double[] x = charge.MoleFractions();
        var atmosphericBoil = system.BubbleTemperature(equipment.Atmosphere.Pascal, x);
        var tbAtm = Temperature.FromKelvin(atmosphericBoil.TemperatureK);

        // The bounds on the vapour temperature, each with the code of its constraint.
        var lower = new List<(string Code, Temperature T)>
        {
            ("coolant", equipment.Coolant + rules.VaporToCondenser),
        };
        var pumpHold = Pressure.FromPascal(equipment.PumpUltimate.Pascal * rules.PumpMarginFactor);
        if (pumpHold < equipment.Atmosphere)
            lower.Add(("pump-limit", Temperature.FromKelvin(system.BubbleTemperature(pumpHold.Pascal, x).TemperatureK)));

        var upper = new List<(string Code, Temperature T)>
        {
            ("bath-limit", equipment.HeatingMax - rules.BathToVapor),
            ("atmospheric-boiling-point", tbAtm),
        };
        if (ProductMax(charge, rules) is Temperature productMax)
            upper.Add(("product-limit", productMax - rules.BathToVapor));

        var (lowCode, low) = lower.MaxBy(b => b.T.Kelvin);
        var (highCode, high) = upper.MinBy(b => b.T.Kelvin);

        var conflicts = new List<Conflict>();
        Temperature vapor;
        string limiting;
        if (low > high)
        {
            // Safety limits (bath, product) and physics (atmospheric boiling) win over capture and pump reach.
            vapor = high;
            limiting = highCode;
            conflicts.Add(DescribeConflict(lowCode, low, highCode, high, rules));
        }
        else if (rules.PreferredVapor < low) (vapor, limiting) = (low, lowCode);
        else if (rules.PreferredVapor > high) (vapor, limiting) = (high, highCode);
        else (vapor, limiting) = (rules.PreferredVapor, "preferred-vapor-temperature");

        bool atmospheric = limiting == "atmospheric-boiling-point";
        var bubble = atmospheric ? atmosphericBoil : system.BubblePressure(vapor.Kelvin, x);
        var setpoint = atmospheric ? equipment.Atmosphere : Pressure.FromPascal(Math.Min(bubble.PressurePa, equipment.Atmosphere.Pascal));
        var bath = vapor + rules.BathToVapor;
        var condenserMax = vapor - rules.VaporToCondenser;

        var mixture = system as MixtureBoilingSystem;
        var azeotropes = mixture?.Azeotropes(setpoint.Pascal) ?? [];
        var context = new CheckContext(charge, system, equipment, rules, vapor, bath, setpoint, condenserMax, bubble.Vapor,
            bubble.Extrapolated || atmosphericBoil.Extrapolated, conflicts, azeotropes);
        var checks = PlanChecks.Evaluate(context);

        var notes = new List<string>();
        if (system.ModelNote is string note) notes.Add(note);
        var ramp = mixture is null || atmospheric ? null : StripPlanner.RampAtVaporTemperature(mixture, charge, vapor, equipment, rules);
        if (ramp is { Steps.Count: > 1 })
        {
            var end = ramp.Steps[^1];
            string heavy = end.Liquid.MaxBy(kv => kv.Value).Key;
            notes.Add($"Hold the vapour at {vapor}: the pressure must fall from {setpoint} to {Pressure.FromPascal(end.PressurePa)} " +
                      $"as the light component leaves ({ramp.EndMessage}); the residue is then {100 * end.Liquid[heavy]:0} mol% {heavy}.");
        }
        if (atmospheric)
            notes.Add($"The charge boils at {tbAtm} at the local atmospheric pressure ({equipment.Atmosphere}), " +
                      "at or below the preferred vapour temperature: no vacuum is needed; use a mild bath.");

        return new Plan
        {
            Charge = charge,
            System = system,
            Vapor = vapor,
            Bath = bath,
            VacuumSetpoint = setpoint,
            CondenserMax = condenserMax,
            LimitingConstraint = limiting,
            AtmosphericBoilingPoint = tbAtm,
            AtAtmosphericPressure = atmospheric,
            Approach = ApproachSteps(equipment.Atmosphere, setpoint),
            StartVapor = bubble.Vapor,
            Conflicts = conflicts,
            Checks = checks,
            Assumptions = Assumptions(charge, equipment, rules),
            Notes = notes,
            Ramp = ramp,
            Equipment = equipment,
            Rules = rules,
        };
    }

    /// <summary>The product limit: the lower of the rule's and the product's own.</summary>
    private static Temperature? ProductMax(Charge charge, Rules rules)
    {
        Temperature? fromProduct = charge.Product?.MaxTemperatureK is double k ? Temperature.FromKelvin(k) : null;
        return (rules.ProductMax, fromProduct) switch
        {
            (Temperature a, Temperature b) => Temperature.Min(a, b),
            (Temperature a, null) => a,
            (null, Temperature b) => b,
            _ => null,
        };
    }

    /// <summary>
    /// Pressures from atmospheric down to the setpoint, each at most half the one before
    /// (a rule of thumb against bumping; common practice), at most six steps.
    /// </summary>
    public static IReadOnlyList<Pressure> ApproachSteps(Pressure atmosphere, Pressure setpoint)
    {
        if (setpoint >= atmosphere) return [setpoint];
        int n = Math.Clamp((int)Math.Ceiling(Math.Log(atmosphere.Pascal / setpoint.Pascal) / Math.Log(2)), 1, 6);
        double ratio = Math.Pow(setpoint.Pascal / atmosphere.Pascal, 1.0 / n);
        return Enumerable.Range(1, n).Select(i => Pressure.FromPascal(atmosphere.Pascal * Math.Pow(ratio, i))).ToList();
    }

    private static Conflict DescribeConflict(string lowCode, Temperature low, string highCode, Temperature high, Rules rules)
    {
        string why = lowCode switch
        {
            "coolant" => $"the coolant needs a vapour temperature of at least {low} (coolant + {rules.VaporToCondenser})",
            _ => $"the pump can only hold pressures that boil the charge at {low} or above",
        };
        string limit = highCode switch
        {
            "bath-limit" => $"the heating limit allows at most {high} (limit − {rules.BathToVapor})",
            "product-limit" => $"the product's maximum temperature allows at most {high} (limit − {rules.BathToVapor})",
            _ => $"the charge boils at {high} at atmospheric pressure",
        };
        var remedies = new List<string>();
        if (lowCode == "coolant") remedies.Add("colder coolant (a chiller, or dry ice in a cold-finger condenser)");
        else remedies.Add("a better pump (lower ultimate pressure)");
        if (highCode == "bath-limit") remedies.Add("a heating medium with a higher limit (oil bath or jacket)");
        if (highCode != "atmospheric-boiling-point") remedies.Add("smaller ΔT steps (--delta-t)");
        return new Conflict([lowCode, highCode], $"{why}, but {limit}.", remedies);
    }

    private static IReadOnlyList<Assumption> Assumptions(Charge charge, Equipment e, Rules r)
    {
        bool D(IReadOnlySet<string> set, string key) => !set.Contains(key);
        var list = new List<Assumption>
        {
            new("preferred vapour temperature", r.PreferredVapor.ToString(), D(r.UserSet, "vapor"), "ΔT rule 20/40/60 (common practice)"),
            new("ΔT bath → vapour", r.BathToVapor.ToString(), D(r.UserSet, "delta-t"), "ΔT rule (common practice)"),
            new("ΔT vapour → condenser", r.VaporToCondenser.ToString(), D(r.UserSet, "delta-t"), "ΔT rule (common practice)"),
            new("coolant temperature", e.Coolant.ToString(), D(e.UserSet, "coolant"), "recirculating chiller or cold tap water (common practice)"),
            new("pump ultimate pressure", e.PumpUltimate.ToString(), D(e.UserSet, "pump"), "chemistry diaphragm pump, 2–10 mbar (common practice)"),
            new("pump margin", $"setpoint ≥ {r.PumpMarginFactor:0.#} × ultimate", true, "a pump cannot hold a pressure near its ultimate (common practice)"),
            new("heating limit", e.HeatingMax.ToString(), D(e.UserSet, "bath-max"), "water bath, 95 °C (common practice)"),
            new("atmospheric pressure", e.Atmosphere.ToString(), D(e.UserSet, "atmospheric"), "ICAO standard atmosphere at sea level"),
            new("room temperature at the pump exhaust", e.Ambient.ToString(), true, "a laboratory at 20 °C (common practice)"),
        };
        if (r.ProductMax is Temperature pm) list.Add(new("product maximum temperature", pm.ToString(), false, "given by the user"));
        if (!charge.IsPure) list.Add(new("composition", charge.Describe(), false, "given by the user"));
        return list;
    }
}
