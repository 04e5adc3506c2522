using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Scale;
using static DistillPlan.Core.Checks.F;

namespace DistillPlan.Core.Planning;

/// <summary>
/// Plans a solvent swap (docs/methods.md, Solvent swap): the charge's old solvents replaced by a
/// new one in its flask or vessel, by put-and-take and by constant volume, held at the setpoint
/// plan's vapour temperature (the pressure falling as the new solvent takes over, never below
/// what the pump can hold) or at a given pressure, within the minimum and maximum volumes, with
/// the heat-limited rate for the time. Both methods are compared and one recommended.
/// </summary>
public static class SwapPlanner
{
    /// <summary>A flask is stripped down to this share of its size in a put-and-take swap (rule of thumb: enough left to turn and to hold the product).</summary>
    public const double FlaskMinimumShare = 0.1;

    /// <summary>Plans the swap.</summary>
    /// <param name="charge">What is in the pot now (amounts with units).</param>
    /// <param name="newSolvent">The solvent to swap to.</param>
    /// <param name="setup">Equipment, rules and the model.</param>
    /// <param name="target">The residual of the old solvents to reach.</param>
    /// <param name="method">One method, or null for both compared.</param>
    /// <param name="pressure">A pressure to hold instead of the vapour temperature, or null.</param>
    public static SwapPlan Plan(Charge charge, Solvent newSolvent, PlanSetup setup, SwapTarget target, SwapMethod? method = null, Pressure? pressure = null)
    {
        if (charge.IsRelative)
            throw new InputException("charge", charge.Describe(), "amounts with units (150L, 200kg, 500mL) for a swap");
        if (charge.Components.All(c => c.Solvent.Name == newSolvent.Name))
            throw new InputException("--to", newSolvent.Name, "a solvent other than the charge's own");

        var plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, setup.Model), setup);
        if (plan.Scale is not PlanScale scale)
            throw new InputException("--vessel", "", "a flask or vessel the charge fits, and every solvent with a liquid density, for a swap");
        var sizing = scale.Setup;

        var solvents = charge.Components.Select(c => c.Solvent).ToList();
        if (!solvents.Any(s => s.Name == newSolvent.Name)) solvents.Add(newSolvent);
        if (newSolvent.MolarVolumeM3PerMol is null)
            throw new InputException("--to", newSolvent.Name, "a solvent with a liquid density in the library");
        int b = solvents.FindIndex(s => s.Name == newSolvent.Name);
        var system = new MixtureBoilingSystem(solvents, BoilingSystems.ParseModel(setup.Model));
        var chargeMol = solvents.Select(s => charge.Components.Where(c => c.Solvent.Name == s.Name).Sum(c => c.Moles)).ToArray();

        double minimum = sizing.MinimumM3 > 0 ? sizing.MinimumM3 : FlaskMinimumShare * sizing.ContainerM3;
        double maximum = Math.Max(sizing.MaximumM3, sizing.ChargeM3);
        if (minimum >= maximum)
            throw new InputException("--min-volume", ScaleUnits.Litres(minimum), $"a minimum volume below the highest fill ({ScaleUnits.Litres(maximum)})");

        var equipment = plan.Equipment;
        var hold = SetpointPlanner.PumpHold(equipment, plan.Rules);
        var hottest = plan.ProductMax is Temperature pm ? Temperature.Min(equipment.HeatingMax, pm) : equipment.HeatingMax;
        var step = plan.Bath - plan.Vapor;
        if (pressure is Pressure fixedP && (fixedP < hold || fixedP > equipment.Atmosphere))
            throw new InputException("--pressure", PressureUnits.Format(fixedP, PressureUnits.Millibar),
                $"a pressure from what the pump can hold ({hold}) to the local atmosphere ({equipment.Atmosphere})");

        SwapBoil? Boil(double[] x)
        {
            try
            {
                BubblePoint bp;
                if (pressure is Pressure fp) bp = system.BubbleTemperature(fp.Pascal, x);
                else
                {
                    bp = system.BubblePressure(plan.Vapor.Kelvin, x);
                    if (bp.PressurePa < hold.Pascal) bp = system.BubbleTemperature(hold.Pascal, x);
                    else if (bp.PressurePa > equipment.Atmosphere.Pascal) bp = system.BubbleTemperature(equipment.Atmosphere.Pascal, x);
                }
                // The bath follows the boiling temperature up to the heating and product limits.
                if (bp.TemperatureK + 1 > hottest.Kelvin) return null;
                return new SwapBoil(bp.TemperatureK, bp.PressurePa, bp.Vapor, bp.TwoLiquids);
            }
            catch (DistillPlanException) { return null; }
        }
        Temperature BathFor(double boilingK) => Temperature.Min(Temperature.FromKelvin(boilingK) + step, hottest);
        double Rate(double[] n, SwapBoil bp, double volumeM3) =>
            HeatBalance.At(sizing, system, bp.Vapor, volumeM3, Temperature.FromKelvin(bp.TemperatureK), BathFor(bp.TemperatureK),
                Pressure.FromPascal(bp.PressurePa), equipment.Coolant).EvaporationMolPerS;

        double[] mass = solvents.Select(s => s.MolarMassGPerMol).ToArray();
        double MassResidual(double[] n) => 1 - n[b] * mass[b] / n.Select((v, i) => v * mass[i]).Sum();
        double MoleResidual(double[] n) => 1 - n[b] / n.Sum();
        var problem = new SwapProblem
        {
            MolarVolumeM3 = solvents.Select(s => s.MolarVolumeM3PerMol!.Value).ToArray(),
            MolarMassG = mass,
            NewSolvent = b,
            ChargeMol = chargeMol,
            MinimumM3 = minimum,
            MaximumM3 = maximum,
            Target = target.Fraction,
            Residual = target.Kind == SwapTargetKind.MassFraction ? MassResidual : MoleResidual,
            Boil = Boil,
            RateMolPerS = Rate,
        };

        double heatUp = scale.HeatUp.NotEvaluatedReason is null ? scale.HeatUp.TimeS : 0;
        // Each reported step with its heat and gas balance, for the condenser and the pump.
        HeatState HeatAt(SwapPoint pt) => HeatBalance.At(sizing, system, pt.Boil.Vapor, SolventSwap.Volume(problem, pt.Moles),
            Temperature.FromKelvin(pt.Boil.TemperatureK), BathFor(pt.Boil.TemperatureK), Pressure.FromPascal(pt.Boil.PressurePa), equipment.Coolant);
        var methods = (method is SwapMethod only ? [only] : new[] { SwapMethod.ConstantVolume, SwapMethod.PutAndTake })
            .Select(m => Describe(SolventSwap.Run(problem, m), problem, solvents, MassResidual, MoleResidual, heatUp, HeatAt)).ToList();
        var (recommended, reason) = Recommend(methods, newSolvent.Name);

        var findings = Checks(plan, sizing, system, solvents, methods, b, hottest);
        string held = pressure is Pressure p0 ? $"pressure held at {p0}; the boiling temperature rises as {newSolvent.Name} takes over"
            : $"vapour temperature held at {plan.Vapor}; the pressure falls as {newSolvent.Name} takes over (never below {hold}, where the pump holds and the temperature rises)";
        return new SwapPlan
        {
            Setpoints = plan, NewSolvent = newSolvent.Name, NewSolventEntry = newSolvent, OldSolvents = solvents.Where((_, i) => i != b).Select(s => s.Name).ToList(),
            Target = target, Methods = methods, Recommended = recommended, Reason = reason,
            Volumes = (minimum * 1e3, maximum * 1e3), Held = held, Findings = findings, Model = system.Model,
        };
    }

    private static SwapMethodPlan Describe(SwapRun run, SwapProblem p, IReadOnlyList<Solvent> solvents,
        Func<double[], double> massResidual, Func<double[], double> moleResidual, double heatUpS, Func<SwapPoint, HeatState> heatAt)
    {
        double Litres(double[] n) => SolventSwap.Volume(p, n) * 1e3;
        var steps = run.Points.Select(pt => new SwapStepPlan(
            solvents.Select((s, i) => (s.Name, x: pt.Moles[i] / pt.Moles.Sum())).ToDictionary(t => t.Name, t => t.x),
            Temperature.FromKelvin(pt.Boil.TemperatureK), Pressure.FromPascal(pt.Boil.PressurePa), Litres(pt.Moles),
            pt.NewSolventMol * p.MolarVolumeM3[p.NewSolvent] * 1e3, Litres(pt.DistillateMol), massResidual(pt.Moles),
            double.IsNaN(pt.TimeS) ? null : heatUpS + pt.TimeS, pt.Cycle)
        {
            VaporComposition = solvents.Select((s, i) => (s.Name, y: pt.Boil.Vapor[i])).ToDictionary(t => t.Name, t => t.y),
            Heat = heatAt(pt),
        }).ToList();
        var last = run.Last;
        return new SwapMethodPlan
        {
            Method = run.Method, End = run.End,
            NewSolventL = last.NewSolventMol * p.MolarVolumeM3[p.NewSolvent] * 1e3,
            DistillateL = Litres(last.DistillateMol),
            ResidualMassFraction = massResidual(last.Moles), ResidualMoleFraction = moleResidual(last.Moles),
            TimeS = double.IsNaN(last.TimeS) ? null : heatUpS + last.TimeS,
            Refills = run.Method == SwapMethod.PutAndTake ? last.Cycle : 0,
            FinalVolumeL = Litres(last.Moles), Steps = steps,
            TwoLiquidsAt = run.Points.FirstOrDefault(pt => pt.Boil.TwoLiquids) is { } split ? split.NewSolventMol * p.MolarVolumeM3[p.NewSolvent] * 1e3 : null,
        };
    }

    /// <summary>
    /// The method that reaches the target with the least new solvent; within 10 % of each other
    /// the quicker one (common practice: solvent is the larger cost and waste, time the next).
    /// </summary>
    private static (SwapMethodPlan?, string) Recommend(IReadOnlyList<SwapMethodPlan> methods, string newSolvent)
    {
        var reached = methods.Where(m => m.Reached).ToList();
        if (reached.Count == 0) return (null, "neither method reaches the target within the limits: see the checks");
        if (reached.Count == 1)
            return (reached[0], methods.Count == 1 ? "the method asked for" : $"the only method that reaches the target ({methods.First(m => !m.Reached).Name} stops: {EndWords(methods.First(m => !m.Reached).End)})");
        var least = reached.MinBy(m => m.NewSolventL)!;
        var other = reached.First(m => m != least);
        if (other.NewSolventL <= least.NewSolventL * 1.1 && other.TimeS < least.TimeS)
            return (other, $"about as much {newSolvent} as {least.Name} ({Num(other.NewSolventL)} L against {Num(least.NewSolventL)} L) and quicker");
        return (least, $"{Num(other.NewSolventL - least.NewSolventL)} L less {newSolvent} than {other.Name} ({Num(least.NewSolventL)} L against {Num(other.NewSolventL)} L)");
    }

    /// <summary>Why a method stopped, in words.</summary>
    public static string EndWords(SwapEnd end) => end switch
    {
        SwapEnd.TargetReached => "target reached",
        SwapEnd.CannotBoil => "the pot no longer boils within the heating and product limits",
        _ => "the step cap was reached before the target",
    };

    private static IReadOnlyList<Finding> Checks(Plan plan, ScaleSetup sizing, MixtureBoilingSystem system, IReadOnlyList<Solvent> solvents,
        IReadOnlyList<SwapMethodPlan> methods, int b, Temperature hottest)
    {
        var found = new List<Finding>();
        var names = solvents.Select(s => s.Name).ToList();
        // The plan's rules at the start and where each method ends (the new solvent's own hazards appear there).
        foreach (var step in methods.SelectMany(m => new[] { m.Steps[0], m.Steps[^1] }))
        {
            double[] x = names.Select(n => step.Liquid[n]).ToArray();
            var bubble = system.BubblePressure(step.Vapor.Kelvin, x);
            var survey = system.Azeotropes(step.Pressure.Pascal);
            var bath = Temperature.Min(step.Vapor + (plan.Bath - plan.Vapor), hottest);
            var heat = HeatBalance.At(sizing, system, bubble.Vapor, step.VolumeL / 1e3, step.Vapor, bath, step.Pressure, plan.Equipment.Coolant);
            var context = new CheckContext(system, x, plan.Equipment, plan.Rules, step.Vapor, bath, step.Pressure,
                step.Vapor - plan.Rules.VaporToCondenser, bubble.Vapor, bubble.Extrapolated, plan.ProductMax, [], survey.Found, survey.Problem,
                bubble.LiquidPhases, bubble.LiquidPhaseBasis, heat);
            found.AddRange(PlanChecks.Evaluate(context));
        }
        // The old solvents leaving slower than the new one near the end: the swap works by dilution alone.
        foreach (var m in methods)
        {
            if (m.TwoLiquidsAt is double litres)
                found.Add(Make("swap", Severity.Caution, "two-liquids", ["to"], W("method", m.Name), N("added", litres, "L"), W("solvent", names[b])));
            var end = m.Steps[^1];
            double xOld = 1 - end.Liquid[names[b]], yOld = 1 - end.VaporComposition[names[b]];
            if (xOld > 1e-9 && yOld < xOld)
                found.Add(Make("swap", Severity.Caution, "dilution-only", ["to"], W("method", m.Name), W("solvent", names[b]),
                    X("liquid", xOld), X("vapor", yOld)));
            if (!m.Reached)
                found.Add(Make("swap", Severity.Warning, "not-reached", ["target"], W("method", m.Name), W("reason", EndWords(m.End)),
                    ("residual", Reports.Quantity.Percent(m.ResidualMassFraction))));
        }
        return found.GroupBy(f => f.Identity).Select(g => g.MaxBy(f => f.Severity)!).OrderByDescending(f => f.Severity).ToList();
    }

    private static string Num(double v) => Reports.DisplayFormat.Number(v);
}
