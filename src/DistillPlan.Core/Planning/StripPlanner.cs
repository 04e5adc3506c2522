using DistillPlan.Core.Library;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>Turns a charge and the equipment into a Rayleigh strip with the ends a person would choose.</summary>
public static class StripPlanner
{
    /// <summary>Peroxide formers are never taken below this fraction of the charge (keep a residue; DESIGN §3).</summary>
    public const double PeroxideMinimumResidue = 0.10;

    /// <summary>
    /// The pressure ramp of a plan: fixed vapour temperature, pressure following the bubble
    /// pressure, ending at what the pump can hold, at 95 % evaporated, or at the minimum residue
    /// for peroxide formers. Null when the strip cannot be computed (the plan still stands).
    /// </summary>
    public static StripResult? RampAtVaporTemperature(MixtureBoilingSystem system, Charge charge, Temperature vapor, Equipment equipment, Rules rules)
    {
        try
        {
            return BatchStrip.AtFixedVaporTemperature(system.Equilibrium, charge.Components.Select(c => c.Moles).ToList(), vapor.Kelvin,
                DefaultOptions(charge, equipment, rules) with { ReportEveryEvaporatedFraction = 0.1 });
        }
        catch (DistillPlanException) { return null; }
    }

    /// <summary>The default ends: the pump's holdable pressure, 95 % evaporated, and a residue for peroxide formers.</summary>
    public static StripOptions DefaultOptions(Charge charge, Equipment equipment, Rules rules)
    {
        bool peroxide = charge.Components.Any(c => c.Solvent.PeroxideClass != PeroxideClass.None);
        bool volumes = charge.Components.All(c => c.Solvent.LiquidDensityKgPerM3 is not null);
        return new StripOptions
        {
            Basis = volumes ? StripBasis.Volume : StripBasis.Moles,
            PumpLimitPa = equipment.PumpUltimate.Pascal * rules.PumpMarginFactor,
            StopAtFractionLeft = 0.05,
            MinimumResidueFraction = peroxide ? PeroxideMinimumResidue : null,
        };
    }
}
