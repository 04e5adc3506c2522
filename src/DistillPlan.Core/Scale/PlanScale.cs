using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Scale;

/// <summary>The size side of a setpoint plan: duty, rates, capacities and times at the setpoint.</summary>
public sealed record PlanScale
{
    /// <summary>Sizes and rules of thumb.</summary>
    public required ScaleSetup Setup { get; init; }
    /// <summary>The balance at the setpoint with the full charge.</summary>
    public required HeatState Start { get; init; }
    /// <summary>Warming the charge to its boiling temperature.</summary>
    public required HeatUp HeatUp { get; init; }
    /// <summary>Time to evaporate to the plan's end [s], after the heat-up; null when not worked out.</summary>
    public double? EvaporationTimeS { get; init; }
    /// <summary>What the time runs to ("95 % evaporated", "the ramp's end").</summary>
    public string EndText { get; init; } = "";
    /// <summary>The bath step the plan holds when the condenser made it lower than the ΔT rule's, else null.</summary>
    public TemperatureDifference? LoweredBathStep { get; init; }
    /// <summary>Heat-up plus evaporation [s] (evaporation alone when the heat-up could not be worked out); null when not worked out.</summary>
    public double? TotalTimeS => EvaporationTimeS is double e ? (HeatUp.NotEvaluatedReason is null ? HeatUp.TimeS : 0) + e : null;
    /// <summary>Heat-up energy plus latent heat over the evaporation [J], when known.</summary>
    public double? EnergyJ { get; init; }
}

/// <summary>
/// Decides the size side of a setpoint plan: the balance at the setpoint, the bath step the
/// condenser allows (the planner lowers the bath so the duty fits, and says so), the heat-up and
/// the time to the end.
/// </summary>
public static class ScalePlanner
{
    /// <summary>The condenser is loaded to at most this share of its capacity when the bath is lowered for it (rule of thumb: a margin for fouling and warm coolant).</summary>
    public const double CondenserLoadTarget = 0.9;

    /// <summary>The smallest bath step the planner lowers to [K]: below it the charge barely boils.</summary>
    public const double SmallestBathStepK = 2;

    /// <summary>
    /// The bath temperature the condenser allows at the setpoint: the ΔT rule's bath, or lower
    /// so that U·A·ΔT stays within <see cref="CondenserLoadTarget"/> of the condenser's capacity.
    /// <paramref name="state"/> is the balance at the bath returned, <paramref name="atRuleBath"/> at the rule's.
    /// </summary>
    public static Temperature CondenserLimitedBath(ScaleSetup setup, IBoilingSystem system, double[] vapor, Temperature boiling,
        Temperature bath, Pressure pressure, Temperature coolant, out HeatState state, out HeatState atRuleBath)
    {
        state = atRuleBath = HeatBalance.At(setup, system, vapor, setup.ChargeM3, boiling, bath, pressure, coolant);
        if (state.HeatDutyW <= state.CondenserCapacityW || state.CondenserCapacityW <= 0 || state.AreaM2 <= 0) return bath;
        double step = Math.Max(SmallestBathStepK, CondenserLoadTarget * state.CondenserCapacityW / (setup.UWPerM2K * state.AreaM2));
        if (step >= bath.Kelvin - boiling.Kelvin) return bath;
        var lowered = boiling + new TemperatureDifference(step);
        state = HeatBalance.At(setup, system, vapor, setup.ChargeM3, boiling, lowered, pressure, coolant);
        return lowered;
    }

    /// <summary>
    /// Time to evaporate a single solvent at a fixed boiling temperature and bath from the full
    /// charge to <paramref name="fractionLeft"/> of it, the wetted area falling with the level
    /// (40 steps of equal volume).
    /// </summary>
    public static double PureEvaporationTimeS(ScaleSetup setup, IBoilingSystem system, double[] vapor, Temperature boiling,
        Temperature bath, Pressure pressure, Temperature coolant, double fractionLeft)
    {
        const int steps = 40;
        var solvent = system.Components[0];
        double molarVolume = solvent.MolarVolumeM3PerMol!.Value;
        var evaporated = new double[steps + 1];
        var rate = new double[steps + 1];
        for (int k = 0; k <= steps; k++)
        {
            double left = 1 - (1 - fractionLeft) * k / steps;
            double v = setup.ChargeM3 * left;
            evaporated[k] = (setup.ChargeM3 - v) / molarVolume;
            rate[k] = HeatBalance.At(setup, system, vapor, v, boiling, bath, pressure, coolant).EvaporationMolPerS;
        }
        return EvaporationTime.Cumulative(evaporated, rate)[^1];
    }
}
