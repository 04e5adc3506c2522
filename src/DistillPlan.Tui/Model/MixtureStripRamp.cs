using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Planning;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The ramp of a mixture from Core's Rayleigh strip at the plan's vapour temperature: the
/// pressure follows the bubble pressure down as the light component leaves. The ends (pump
/// limit, 95 % evaporated, a residue for peroxide formers) are Core's <see cref="StripPlanner"/> defaults.
/// </summary>
public sealed class MixtureStripRamp : IRampSource
{
    /// <inheritdoc />
    public Ramp Compute(Charge charge, Plan plan)
    {
        if (plan.System is not MixtureBoilingSystem system)
            throw new ArgumentException("a mixture ramp needs a mixture plan", nameof(plan));
        // The planner already ran this strip for its ramp note; only a plan at atmospheric pressure has none.
        var strip = plan.Ramp ?? StripPlanner.RampAtVaporTemperature(system, charge, plan.Vapor, plan.Equipment, plan.Rules);
        if (strip is null)
            return new Ramp([], "The strip could not be computed for this charge; the setpoints above still stand.", "Rayleigh strip");
        var steps = strip.Steps.Select(s => new RampStep(s.EvaporatedMoleFraction, s.PressurePa, s.TemperatureK, plan.Bath.Kelvin, s.Liquid, s.Vapor)).ToList();
        return new Ramp(steps, $"Ends: {Words(strip.EndReason)}.",
            $"Rayleigh strip at {plan.Vapor} ({system.Model}); fractions are of the charge's moles.");
    }

    private static string Words(StripEndReason r) => r switch
    {
        StripEndReason.FractionLeftReached => "the planned fraction is left in the flask",
        StripEndReason.MinimumResidueReached => "minimum residue reached (peroxide former: never to dryness)",
        StripEndReason.PumpLimitReached => "the bubble pressure reached what the pump can hold",
        _ => r.ToString(),
    };
}
