using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Scale;
using static DistillPlan.Core.Checks.F;

namespace DistillPlan.Core.Planning;

/// <summary>
/// Chooses the vapour temperature, bath temperature, vacuum setpoint and condenser limit by
/// the ΔT rule (docs/methods.md, Setpoints by the ΔT rule): start from the preferred vapour
/// temperature, raise it to clear the coolant and the pump, lower it to respect the heating
/// limit and the product, cap it at the boiling point at the local atmospheric pressure. This
/// class is the one place each setpoint is decided.
/// </summary>
public static partial class SetpointPlanner
{
    /// <summary>Builds the plan for a charge from parsed settings.</summary>
    /// <param name="charge">What is evaporated.</param>
    /// <param name="system">Its equilibrium model.</param>
    /// <param name="setup">The parsed settings.</param>
    /// <param name="rampReportEvery">Report interval of a mixture's ramp: the strip verb asks for its
    /// own, so that <see cref="StripPlanner"/> can hand back this ramp instead of planning it again.</param>
    public static Plan Plan(Charge charge, IBoilingSystem system, PlanSetup setup, double rampReportEvery = StripPlanner.RampReportEvery) =>
        Plan(charge, system, setup.Equipment, setup.Rules, setup.Assumptions, rampReportEvery);

    /// <summary>Builds the plan for a charge.</summary>
    /// <param name="charge">What is evaporated.</param>
    /// <param name="system">Its equilibrium model.</param>
    /// <param name="equipment">The equipment.</param>
    /// <param name="rules">The ΔT rule and limits.</param>
    /// <param name="assumptions">The settings behind equipment and rules, as the settings table listed them.</param>
    /// <param name="rampReportEvery">Report interval of a mixture's ramp.</param>
    public static Plan Plan(Charge charge, IBoilingSystem system, Equipment equipment, Rules rules, IReadOnlyList<Assumption>? assumptions = null,
        double rampReportEvery = StripPlanner.RampReportEvery)
    {
        double[] x = charge.MoleFractions();
        var atmosphericBoil = system.BubbleTemperature(equipment.Atmosphere.Pascal, x);
        var tbAtm = Temperature.FromKelvin(atmosphericBoil.TemperatureK);

        // The bounds on the vapour temperature, each with the code of its constraint.
        var lower = new List<(string Code, Temperature T)>
        {
            ("coolant", equipment.Coolant + rules.VaporToCondenser),
        };
        var pumpHold = PumpHold(equipment, rules);
        if (pumpHold < equipment.Atmosphere)
            lower.Add(("pump-limit", Temperature.FromKelvin(system.BubbleTemperature(pumpHold.Pascal, x).TemperatureK)));
        // A frozen pot stops evaporating and can crack the flask: keep the boiling pot above its freezing limit.
        var freezing = PotFreezing.Limit(system.Components, x);
        if (freezing is not null)
            lower.Add(("pot-freezing", Temperature.FromKelvin(freezing.LimitK + PotFreezing.MarginK)));

        var productMax = ProductMax(charge, rules);
        var upper = new List<(string Code, Temperature T)>
        {
            ("bath-limit", equipment.HeatingMax - rules.BathToVapor),
            ("atmospheric-boiling-point", tbAtm),
        };
        if (productMax is Temperature pm) upper.Add(("product-limit", pm - rules.BathToVapor));

        var (lowCode, low) = lower.MaxBy(b => b.T.Kelvin);
        var (highCode, high) = upper.MinBy(b => b.T.Kelvin);

        var conflicts = new List<Conflict>();
        Temperature vapor;
        string limiting;
        if (low > high)
        {
            // Safety limits (bath, product) and physics (atmospheric boiling) win over capture and pump reach.
            (vapor, limiting) = (high, highCode);
            conflicts.Add(new Conflict(lowCode, low, highCode, high, high));
        }
        else if (rules.PreferredVapor < low) (vapor, limiting) = (low, lowCode);
        else if (rules.PreferredVapor > high) (vapor, limiting) = (high, highCode);
        else (vapor, limiting) = (rules.PreferredVapor, "preferred-vapor-temperature");

        // The condenser sees the vapour: for a mixture the first vapour may be far more volatile
        // than the pot (a little ether in DMSO boils off as nearly pure ether). Raise the vapour
        // temperature, and so the pressure, until that condensate is captured at coolant + margin.
        var capture = system is MixtureBoilingSystem && conflicts.Count == 0
            ? CondensateCapture.Decide(system, x, equipment.Coolant, vapor, high)
            : null;
        if (capture is { Captured: true, Raised: true }) (vapor, limiting) = (capture.Vapor, "condensate-capture");
        else if (capture is { Captured: false }) (vapor, limiting) = (high, highCode);

        bool atmospheric = limiting == "atmospheric-boiling-point";
        var bubble = atmospheric ? atmosphericBoil : system.BubblePressure(vapor.Kelvin, x);
        var setpoint = atmospheric ? equipment.Atmosphere : Pressure.FromPascal(Math.Min(bubble.PressurePa, equipment.Atmosphere.Pascal));
        var bath = vapor + rules.BathToVapor;
        var condenserMax = vapor - rules.VaporToCondenser;
        var mixture = system as MixtureBoilingSystem;
        // The condensate, not the pot, sets how cold the condenser must be: below its bubble
        // temperature at the setpoint, with the capture margin (docs/methods.md, Condenser capture).
        if (mixture is not null) condenserMax = Temperature.Min(condenserMax, CondensateCapture.CondenserLimit(system, setpoint, bubble.Vapor) ?? condenserMax);

        var notes = new List<Finding>();
        // The size side (docs/methods.md, Heat and time): the condenser may hold the bath below the ΔT rule's.
        var sizing = ScaleSetup.Resolve(charge, equipment, out string? sizeUnknown);
        HeatState? heat = null;
        var scaleNotes = new List<Finding>();
        if (sizing is not null)
        {
            var ruleBath = bath;
            bath = ScalePlanner.CondenserLimitedBath(sizing, system, bubble.Vapor, vapor, bath, setpoint, equipment.Coolant, out var state, out var full);
            heat = state;
            if (bath < ruleBath)
            {
                bool tooSmall = state.HeatDutyW > state.CondenserCapacityW;
                scaleNotes.Add(tooSmall
                    ? Make("condenser-capacity", Severity.Warning, "too-small", ["condenser-area", "condenser-capacity", "coolant-temp"],
                        N("capacity", state.CondenserCapacityW, "W"), DT("step", bath.Kelvin - vapor.Kelvin), N("duty", state.HeatDutyW, "W"))
                    : Make("condenser-capacity", Severity.Caution, "bath-lowered", ["condenser-area", "condenser-capacity", "coolant-temp", "delta-t"],
                        N("capacity", state.CondenserCapacityW, "W"), T("rule_bath", ruleBath), N("rule_duty", full.HeatDutyW, "W"),
                        T("bath", bath), N("duty", state.HeatDutyW, "W")));
            }
            scaleNotes.AddRange(FillLevel(sizing, equipment));
        }
        else if (sizeUnknown is not null)
            notes.Add(Make("scale", Severity.Info, "not-computed", ["flask", "vessel"], W("reason", sizeUnknown)));

        var survey = mixture?.Azeotropes(setpoint.Pascal) ?? AzeotropeSurvey.None;
        var context = new CheckContext(system, x, equipment, rules, vapor, bath, setpoint, condenserMax, bubble.Vapor,
            bubble.Extrapolated || atmosphericBoil.Extrapolated, productMax, conflicts, survey.Found, survey.Problem,
            bubble.LiquidPhases, bubble.LiquidPhaseBasis, heat);
        var checks = PlanChecks.Evaluate(context).Where(f => !(f.Code == "condenser-capacity" && scaleNotes.Any(n => n.Code == f.Code))).ToList();
        checks.AddRange(scaleNotes);
        if (capture is { Captured: false })
            checks.Add(CondensateCapture.ColderCoolantFinding(system, equipment.Coolant, setpoint, vapor, bubble.Vapor));
        checks = [.. checks.OrderByDescending(f => f.Severity)];

        if (system.ModelNote is string note) notes.Add(Make("model", Severity.Info, "", ["model"], W("note", note)));
        if (mixture?.ApproximationNote is string approximate) notes.Add(Make("model", Severity.Info, "approximate", ["model"], W("note", approximate)));
        foreach (var published in survey.PublishedNotes) notes.Add(Make("published-azeotrope", Severity.Info, "", ["model"], W("note", published)));
        if (!bubble.TwoLiquids && bubble.LiquidPhaseBasis is string oneLiquid)
            notes.Add(Make("liquid-phases", Severity.Info, "one", ["model"], W("basis", oneLiquid)));
        if (capture is { Captured: true, Raised: true })
            notes.Add(CondensateCapture.RaisedNote(system, capture, equipment.Coolant, setpoint, bubble.Vapor));
        if (atmospheric)
            notes.Add(Make("no-vacuum-needed", Severity.Info, "", ["vapor-temp"], T("boiling", tbAtm), P("atmosphere", equipment.Atmosphere)));

        var plan = new Plan
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
            CondensateCaptured = capture?.Captured ?? true,
            StartLiquidPhases = bubble.LiquidPhases ?? [],
            StartLiquidPhaseBasis = bubble.LiquidPhaseBasis,
            Checks = checks,
            Assumptions = [.. assumptions ?? [], .. sizing?.Assumptions ?? [], .. FixedRules(rules)],
            Notes = notes,
            Equipment = equipment,
            Rules = rules,
            ProductMax = productMax,
        };
        if (sizing is not null)
            plan = plan with { Scale = new PlanScale { Setup = sizing, Start = heat!, HeatUp = HeatUp.Estimate(sizing, charge, vapor, bath), LoweredBathStep = bath < vapor + rules.BathToVapor ? bath - vapor : null } };
        if (mixture is null || atmospheric) return WithPureTime(plan);

        // A mixture's pressure ramp at the plan's vapour temperature, with the strip's own ends;
        // held at the setpoint pressure instead when the condensate decided it (StripPlanner).
        // The setpoints stand without it; a failure is said, not dropped.
        StripPlan ramp;
        try { ramp = StripPlanner.Plan(plan, new StripRequest(null, StripEnd.Default), reportEvery: rampReportEvery); }
        catch (DistillPlanException e)
        {
            return plan with { Notes = [.. notes, Make("strip-not-computed", Severity.Caution, "", [], W("reason", e.Message))] };
        }
        if (ramp.Steps.Count > 1) notes.Add(RampNote(ramp));
        plan = plan with { Ramp = ramp, Notes = notes };
        if (plan.Scale is PlanScale scale && ramp.Steps.Count > 0 && ramp.Steps[^1].TimeS is double end)
        {
            // Latent heat step by step (trapezoidal in the evaporated moles), after the heat-up.
            double energy = scale.HeatUp.EnergyJ;
            double MolOf(StripStepPlan st) => scale.Setup.MolesScale * st.DistillateMol.Values.Sum();
            for (int k = 1; k < ramp.Steps.Count; k++)
                energy += (MolOf(ramp.Steps[k]) - MolOf(ramp.Steps[k - 1])) * 0.5 * (ramp.Steps[k].Heat!.LatentHeatJPerMol + ramp.Steps[k - 1].Heat!.LatentHeatJPerMol);
            double heatUp = scale.HeatUp.NotEvaluatedReason is null ? scale.HeatUp.TimeS : 0;
            plan = plan with { Scale = scale with { EvaporationTimeS = end - heatUp, EndText = "the end of the pressure ramp below", EnergyJ = energy } };
        }
        return plan;
    }

    /// <summary>
    /// A single solvent (or a mixture boiling at atmospheric pressure, taken as its start) evaporated
    /// at the setpoint to the strip's default end: 5 % left, 10 % for a peroxide former.
    /// </summary>
    private static Plan WithPureTime(Plan plan)
    {
        if (plan.Scale is not PlanScale scale) return plan;
        if (plan.System is MixtureBoilingSystem) return WithAtmosphericStripTime(plan, scale);
        bool peroxide = plan.System.Components.Any(s => s.PeroxideClass != Library.PeroxideClass.None);
        double left = peroxide ? StripPlanner.PeroxideMinimumResidue : StripPlanner.DefaultFractionLeft;
        double t = ScalePlanner.PureEvaporationTimeS(scale.Setup, plan.System, plan.StartVapor, plan.Vapor, plan.Bath, plan.VacuumSetpoint, plan.Equipment.Coolant, left);
        string end = $"{100 * (1 - left):0} % evaporated" + (peroxide ? " (a peroxide former keeps 10 %)" : "");
        // Heat taken up: warming the charge, then the latent heat of what evaporates.
        double evaporatedMol = (1 - left) * scale.Setup.ChargeM3 / plan.System.Components[0].MolarVolumeM3PerMol!.Value;
        double energy = scale.HeatUp.EnergyJ + evaporatedMol * scale.Start.LatentHeatJPerMol;
        return plan with { Scale = scale with { EvaporationTimeS = t, EndText = end, EnergyJ = energy } };
    }

    /// <summary>
    /// A mixture that boils at ambient pressure: the time is that of a strip held at the local
    /// atmosphere, its boiling temperature rising as the light component leaves.
    /// </summary>
    private static Plan WithAtmosphericStripTime(Plan plan, PlanScale scale)
    {
        StripPlan strip;
        try { strip = StripPlanner.Plan(plan, new StripRequest(plan.Equipment.Atmosphere, StripEnd.Default)); }
        catch (DistillPlanException) { return plan; }
        if (strip.TotalTimeS is not double end) return plan;
        double heatUp = scale.HeatUp.NotEvaluatedReason is null ? scale.HeatUp.TimeS : 0;
        return plan with { Scale = scale with { EvaporationTimeS = end - heatUp, EndText = strip.EndText(Reports.DisplayFormat.Default) } };
    }

    /// <summary>fill-level: a flask over half full, or a vessel charged below its minimum stirred volume.</summary>
    private static IEnumerable<Finding> FillLevel(ScaleSetup s, Equipment e)
    {
        static Reports.Quantity L(double m3) => Reports.Quantity.Number(m3 * 1e3, "L");
        if (!s.Vessel && s.ChargeM3 > 0.5 * s.ContainerM3 * (1 + 1e-9))
            yield return Make("fill-level", Severity.Caution, "flask", ["flask"], ("charge", L(s.ChargeM3)), ("share", Reports.Quantity.Percent(s.ChargeM3 / s.ContainerM3)),
                ("flask", L(s.ContainerM3)), ("needed", L(FlaskGeometry.SmallestHolding(s.ChargeM3) ?? 2 * s.ChargeM3)));
        if (s.Vessel && s.ChargeM3 < s.MinimumM3 * (1 - 1e-9))
            yield return Make("fill-level", Severity.Warning, "below-minimum", ["min-volume", "vessel"], ("charge", L(s.ChargeM3)), ("minimum", L(s.MinimumM3)));
    }

    /// <summary>
    /// The ramp in one sentence: how the pressure (or, held at a pressure, the boiling temperature)
    /// moves, which component leaves first (the largest share of its charge in the receiver) and
    /// what remains.
    /// </summary>
    private static Finding RampNote(StripPlan ramp)
    {
        var start = ramp.Steps[0];
        var end = ramp.Steps[^1];
        var heavy = end.Liquid.MaxBy(kv => kv.Value);
        string first = ramp.Setpoints.System.Components.Select(c => c.Name)
            .MaxBy(n => end.DistillateMol.GetValueOrDefault(n) / Math.Max(ramp.ChargeMol.GetValueOrDefault(n), 1e-300))!;
        string variant = ramp.Mode == Mixtures.StripMode.FixedPressure ? "held-pressure"
            : start.LiquidPhases.Count > 1 ? (end.LiquidPhases.Count > 1 ? "two-liquids" : "two-liquids-then-one") : "";
        return Make("pressure-ramp", Severity.Info, variant, [], T("vapor", start.Vapor), T("end_vapor", end.Vapor), P("from", start.Pressure), P("to", end.Pressure),
            W("end", ramp.EndText(Reports.DisplayFormat.Default)), W("first", first),
            (("residue_share"), Reports.Quantity.Percent(heavy.Value)), W("residue", heavy.Key));
    }

    /// <summary>The lowest pressure the pump can hold: twice its ultimate (common practice).</summary>
    public static Pressure PumpHold(Equipment equipment, Rules rules) => Pressure.FromPascal(equipment.PumpUltimate.Pascal * rules.PumpMarginFactor);

    /// <summary>The product limit: the lower of the rule's and the product's own.</summary>
    public static Temperature? ProductMax(Charge charge, Rules rules)
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

    /// <summary>Rules the planner applies that are not settings, listed so the reader sees them.</summary>
    private static IEnumerable<Assumption> FixedRules(Rules r) =>
    [
        new("pump-margin", "lowest setpoint, as a multiple of the pump's ultimate pressure", Reports.Quantity.Number(r.PumpMarginFactor, "times"), true,
            "a pump cannot hold a pressure near its ultimate; common practice"),
    ];
}
