using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using static DistillPlan.Core.Checks.F;

namespace DistillPlan.Core.Planning;

/// <summary>
/// Plans a batch strip (docs/methods.md, Batch strip) beside the setpoint planner: the Rayleigh
/// strip held at the plan's vapour temperature (the pressure ramp) or at a fixed pressure, with
/// the ends a person would choose, never below what the pump can hold, never hotter than the
/// heating medium and the product allow, and the plan's checks at every step. The one strip
/// implementation behind the CLI, the text UI and plan files.
/// </summary>
public static class StripPlanner
{
    /// <summary>Peroxide formers are never taken below this fraction of the charge (keep a residue; docs/methods.md, Safety checks).</summary>
    public const double PeroxideMinimumResidue = 0.10;

    /// <summary>Without an end given, stop with this fraction of the charge left (a residue protects the product; common practice).</summary>
    public const double DefaultFractionLeft = 0.05;

    /// <summary>Plans the strip of a setpoint plan's charge.</summary>
    /// <param name="plan">The setpoint plan (its charge, equipment, rules and vapour temperature).</param>
    /// <param name="request">Fixed pressure or fixed vapour temperature, and the end.</param>
    /// <param name="model">The activity model asked for (null: the default).</param>
    /// <param name="reportEvery">Report a step each time this further fraction has evaporated.</param>
    public static StripPlan Plan(Plan plan, StripRequest request, string? model = null, double reportEvery = DefaultReportEvery)
    {
        // The setpoint planner already planned a mixture's ramp with these very inputs: the text UI
        // asks for it again after every edit, and it is the costliest part of a plan.
        if (plan.Ramp is { } known && IsRampRequest(request) && known.ReportEvery == reportEvery
            && BoilingSystems.ParseModel(model ?? ModelOf(plan)) == BoilingSystems.ParseModel(ModelOf(plan)))
            return known with { Setpoints = plan };
        var charge = plan.Charge;
        var solvents = charge.Components.Select(c => c.Solvent).ToList();
        var components = solvents.Select(MixtureComponent.FromSolvent).ToList();
        var amounts = charge.Components.Select(c => c.Moles).ToList();
        if (charge.Product is Product product)
        {
            // A product's mass means something only beside real solvent amounts.
            if (charge.IsRelative)
                throw new InputException("charge", charge.Describe(), "amounts with units (mL, L, g, mol) when a product is given");
            components.Add(MixtureComponent.NonVolatile("product", product.MolarMassGPerMol));
            amounts.Add(product.Moles);
        }
        var requested = BoilingSystems.ParseModel(model ?? ModelOf(plan));
        var equilibrium = components.Count == 1
            ? new PhaseEquilibrium(components, Mixtures.ActivityModelChoice.PureLiquid(requested))
            : PhaseEquilibrium.Create(components, requested);
        bool volumes = solvents.All(s => s.MolarVolumeM3PerMol is not null);
        var peroxide = solvents.Where(s => s.PeroxideClass != PeroxideClass.None).Select(s => s.Name).ToList();

        var options = new StripOptions
        {
            Basis = volumes ? StripBasis.Volume : StripBasis.Moles,
            ReportEveryEvaporatedFraction = reportEvery,
            RelativeTolerance = 1e-6,
            MinimumResidueFraction = peroxide.Count > 0 ? PeroxideMinimumResidue : null,
        };
        options = request.End.Kind switch
        {
            StripEndKind.Default => options with { StopAtFractionLeft = DefaultFractionLeft },
            StripEndKind.FractionLeft => options with { StopAtFractionLeft = request.End.Fraction },
            StripEndKind.Residual => options with { StopAtResidualMoleFraction = new(ResolveComponent(request.End.Component!, solvents).Name, request.End.Fraction!.Value) },
            _ => options,
        };

        var equipment = plan.Equipment;
        var hold = SetpointPlanner.PumpHold(equipment, plan.Rules);
        var hottestBath = plan.ProductMax is Temperature pm ? Temperature.Min(equipment.HeatingMax, pm) : equipment.HeatingMax;
        StripResult result;
        // A plan whose setpoint the condensate decided holds that pressure: at its vapour
        // temperature the pressure would fall below what the condenser can capture.
        var fixedPressure = request.FixedPressure ?? (plan.LimitingConstraint == "condensate-capture" ? plan.VacuumSetpoint : null);
        if (fixedPressure is Pressure p)
        {
            if (p < hold)
                throw new InputException("--pressure", PressureUnits.Format(p, PressureUnits.Millibar),
                    $"a pressure the pump can hold: at least {hold} (twice its ultimate pressure, {equipment.PumpUltimate})");
            if (p > equipment.Atmosphere)
                throw new InputException("--pressure", PressureUnits.Format(p, PressureUnits.Millibar), $"a pressure at or below the local atmosphere ({equipment.Atmosphere})");
            result = BatchStrip.AtFixedPressure(equilibrium, amounts, p.Pascal, options with
            {
                TemperatureLimitK = (hottestBath - plan.Rules.BathToVapor).Kelvin,
                ReportTemperatureStepK = 5,
            });
        }
        else
        {
            result = BatchStrip.AtFixedVaporTemperature(equilibrium, amounts, plan.Vapor.Kelvin, options with
            {
                PumpLimitPa = hold.Pascal,
                ReportPressureRatio = 0.7,
            });
        }
        return Describe(plan, result, solvents, volumes, peroxide, hold, hottestBath, options);
    }

    /// <summary>The report interval of a mixture plan's own ramp (the text UI's ramp pane).</summary>
    public const double RampReportEvery = 0.1;

    /// <summary>The report interval of <c>distillplan strip</c>.</summary>
    public const double DefaultReportEvery = 0.05;

    // What the setpoint planner asks for a mixture's ramp: held at the vapour temperature, default end.
    private static bool IsRampRequest(StripRequest request)
        => request.FixedPressure is null && request.End.Kind == StripEndKind.Default;

    private static string? ModelOf(Plan plan) => plan.System is MixtureBoilingSystem m ? Mixtures.ActivityModelChoice.NameOf(m.Equilibrium.Model.Requested) : null;

    private static Solvent ResolveComponent(string typed, IReadOnlyList<Solvent> solvents)
    {
        string key = SolventLibrary.Normalise(typed);
        return solvents.FirstOrDefault(s => SolventLibrary.Normalise(s.Name) == key || s.Cas == typed.Trim()
                                            || s.Aliases.Any(a => SolventLibrary.Normalise(a) == key))
            ?? throw new InputException("--end", "residual=" + typed, "residual= one of the charge's components: " + string.Join(", ", solvents.Select(s => s.Name)));
    }

    private static StripPlan Describe(Plan plan, StripResult result, IReadOnlyList<Solvent> solvents, bool volumes,
        IReadOnlyList<string> peroxide, Pressure hold, Temperature hottestBath, StripOptions options)
    {
        var names = solvents.Select(s => s.Name).ToList();
        double[] weight = solvents.Select(s => volumes ? s.MolarVolumeM3PerMol!.Value : 1.0).ToArray();
        double charged = names.Select((n, i) => result.ChargeMol[n] * weight[i]).Sum();
        bool fixedT = result.Mode == StripMode.FixedVaporTemperature;

        StripStepPlan ToStep(StripStep s)
        {
            double evaporated = names.Select((n, i) => s.DistillateMol[n] * weight[i]).Sum() / charged;
            var vapor = Temperature.FromKelvin(s.TemperatureK);
            // The plan's bath step, which the condenser may have made smaller than the ΔT rule's.
            var bath = fixedT ? plan.Bath : vapor + (plan.Bath - plan.Vapor);
            return new StripStepPlan(evaporated, Pressure.FromPascal(s.PressurePa), vapor, bath,
                Renormalised(s.Liquid, names), Renormalised(s.Vapor, names),
                s.DistillateMol, s.ResidueMol, []) { LiquidPhases = s.LiquidPhases };
        }
        var steps = result.Steps.Select(ToStep).ToList();
        var heatUp = plan.Scale is Scale.PlanScale sized && steps.Count > 0 ? WithTimes(plan, sized.Setup, steps) : null;

        // The strip as a whole is checked where it starts; each step then shows only what is new there.
        var overall = steps.Count == 0 ? plan.Checks
            : fixedT ? plan.Checks
            : Check(plan, steps[0], withAzeotropes: true);
        var seen = overall.GroupBy(f => f.Identity).ToDictionary(g => g.Key, g => g.Max(f => f.Severity));
        for (int k = 0; k < steps.Count; k++)
        {
            var found = Check(plan, steps[k], withAzeotropes: false).ToList();
            if (k > 0 && PlanChecks.PressureStep(steps[k - 1].Pressure, steps[k].Pressure) is Finding jump) found.Add(jump);
            var fresh = found.Where(f => !seen.TryGetValue(f.Identity, out var sev) || f.Severity > sev).ToList();
            foreach (var f in fresh) seen[f.Identity] = f.Severity;
            steps[k] = steps[k] with { Findings = fresh };
        }

        return new StripPlan
        {
            Setpoints = plan,
            Mode = result.Mode,
            Basis = volumes ? "volume" : "mole",
            Steps = steps,
            EndReason = result.EndReason,
            End = EndFinding(result, steps, volumes, peroxide, hold, hottestBath, plan, options),
            Findings = overall,
            Model = result.Model,
            ModelNote = result.FallbackReason ?? result.ModelNote,
            ChargeMol = result.ChargeMol,
            HeatUp = heatUp,
            ReportEvery = options.ReportEveryEvaporatedFraction,
        };
    }

    /// <summary>
    /// Puts the heat balance and the cumulative time on every step (docs/methods.md, Heat and time):
    /// the wetted area at the step's level, the rate at its temperatures, the trapezoidal rule
    /// between steps, after the heat-up to the first boiling temperature.
    /// </summary>
    private static Scale.HeatUp WithTimes(Plan plan, Scale.ScaleSetup setup, List<StripStepPlan> steps)
    {
        var solvents = plan.System.Components;
        var rate = new double[steps.Count];
        var evaporated = new double[steps.Count];
        for (int k = 0; k < steps.Count; k++)
        {
            var st = steps[k];
            double liquid = setup.MolesScale * Scale.HeatBalance.LiquidM3(solvents, n => st.ResidueMol.GetValueOrDefault(n));
            double[] y = solvents.Select(c => st.VaporComposition.GetValueOrDefault(c.Name)).ToArray();
            var heat = Scale.HeatBalance.At(setup, plan.System, y, liquid, st.Vapor, st.Bath, st.Pressure, plan.Equipment.Coolant);
            steps[k] = st with { Heat = heat };
            rate[k] = heat.EvaporationMolPerS;
            evaporated[k] = setup.MolesScale * solvents.Sum(c => st.DistillateMol.GetValueOrDefault(c.Name));
        }
        var heatUp = Scale.HeatUp.Estimate(setup, plan.Charge, steps[0].Vapor, steps[0].Bath);
        var times = Scale.EvaporationTime.Cumulative(evaporated, rate);
        for (int k = 0; k < steps.Count; k++) steps[k] = steps[k] with { TimeS = (heatUp.NotEvaluatedReason is null ? heatUp.TimeS : 0) + times[k] };
        return heatUp;
    }

    private static IReadOnlyList<Finding> Check(Plan plan, StripStepPlan step, bool withAzeotropes)
    {
        var components = plan.System.Components;
        double[] x = components.Select(s => step.Liquid.GetValueOrDefault(s.Name)).ToArray();
        double[] y = components.Select(s => step.VaporComposition.GetValueOrDefault(s.Name)).ToArray();
        var survey = withAzeotropes && plan.System is MixtureBoilingSystem m ? m.Azeotropes(step.Pressure.Pascal) : AzeotropeSurvey.None;
        var context = new CheckContext(plan.System, x, plan.Equipment, plan.Rules, step.Vapor, step.Bath, step.Pressure,
            step.Vapor - plan.Rules.VaporToCondenser, y, false, plan.ProductMax, [], survey.Found, survey.Problem,
            step.LiquidPhases.Count > 0 ? step.LiquidPhases : null, Heat: step.Heat);
        return PlanChecks.Evaluate(context);
    }

    private static Dictionary<string, double> Renormalised(IReadOnlyDictionary<string, double> x, IReadOnlyList<string> names)
    {
        double sum = names.Sum(n => x.GetValueOrDefault(n));
        return names.ToDictionary(n => n, n => sum > 0 ? x.GetValueOrDefault(n) / sum : 0);
    }

    private static Finding EndFinding(StripResult r, IReadOnlyList<StripStepPlan> steps, bool volumes, IReadOnlyList<string> peroxide,
        Pressure hold, Temperature hottestBath, Plan plan, StripOptions options)
    {
        string basis = volumes ? "by volume" : "by moles";
        double left = steps.Count > 0 ? 1 - steps[^1].Evaporated : 1;
        var last = steps.Count > 0 ? steps[^1] : null;
        return r.EndReason switch
        {
            StripEndReason.FractionLeftReached => Make("strip-end", Severity.Info, "fraction-left", ["end"], (("left"), Reports.Quantity.Percent(left)), W("basis", basis)),
            StripEndReason.MinimumResidueReached => Make("strip-end", Severity.Info, "minimum-residue", ["end"],
                (("left"), Reports.Quantity.Percent(left)), W("basis", basis), W("solvents", string.Join(" and ", peroxide))),
            StripEndReason.ResidualMoleFractionReached => Make("strip-end", Severity.Info, "residual", ["end"],
                W("component", options.StopAtResidualMoleFraction!.Component),
                X("reached", last?.Liquid.GetValueOrDefault(options.StopAtResidualMoleFraction.Component) ?? 0),
                X("target", options.StopAtResidualMoleFraction.MoleFraction)),
            StripEndReason.PumpLimitReached => Make("strip-end", Severity.Info, "pump-limit", ["pump", "pump-limit"], P("floor", hold), P("pump_ultimate", plan.Equipment.PumpUltimate)),
            StripEndReason.TemperatureLimitReached => Make("strip-end", Severity.Info, "temperature-limit", ["bath-max", "product-max"],
                T("vapor", hottestBath - plan.Rules.BathToVapor), T("bath", hottestBath),
                W("limit", plan.ProductMax is Temperature pm && pm <= plan.Equipment.HeatingMax ? "the product's maximum temperature" : "the heating limit")),
            StripEndReason.Dry => Make("strip-end", Severity.Info, "dry", ["end"]),
            _ => Make("strip-end", Severity.Warning, "failed", [], W("reason", r.EndMessage)),
        };
    }
}
