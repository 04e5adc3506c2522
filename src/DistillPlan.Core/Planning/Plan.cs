using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>Limits that cannot all be met: the vapour temperature a lower bound needs and the one an upper bound allows.</summary>
/// <param name="LowerCode">The constraint that needs a warmer vapour (coolant, pump-limit).</param>
/// <param name="Lower">The vapour temperature it needs.</param>
/// <param name="UpperCode">The constraint that allows at most a cooler one (bath-limit, product-limit, atmospheric-boiling-point).</param>
/// <param name="Upper">The vapour temperature it allows.</param>
/// <param name="Chosen">The vapour temperature the plan holds (the upper bound: safety and physics win).</param>
public sealed record Conflict(string LowerCode, Temperature Lower, string UpperCode, Temperature Upper, Temperature Chosen);

/// <summary>The setpoints for one charge on one set of equipment, with everything behind them.</summary>
public sealed record Plan
{
    /// <summary>What was planned for.</summary>
    public required Charge Charge { get; init; }
    /// <summary>The equilibrium model used.</summary>
    public required IBoilingSystem System { get; init; }
    /// <summary>Vapour (boiling) temperature at the setpoint.</summary>
    public required Temperature Vapor { get; init; }
    /// <summary>Bath or jacket temperature.</summary>
    public required Temperature Bath { get; init; }
    /// <summary>Vacuum setpoint (absolute): the bubble pressure of the charge at the vapour temperature.</summary>
    public required Pressure VacuumSetpoint { get; init; }
    /// <summary>Highest condenser (coolant) temperature the ΔT rule allows.</summary>
    public required Temperature CondenserMax { get; init; }
    /// <summary>The constraint that decided the vapour temperature.</summary>
    public required string LimitingConstraint { get; init; }
    /// <summary>Boiling point of the charge at the local atmospheric pressure.</summary>
    public required Temperature AtmosphericBoilingPoint { get; init; }
    /// <summary>True when no vacuum is needed (the charge boils below the vapour temperature at ambient pressure).</summary>
    public bool AtAtmosphericPressure { get; init; }
    /// <summary>Pressures to step down through on the way to the setpoint (bumping).</summary>
    public required IReadOnlyList<Pressure> Approach { get; init; }
    /// <summary>Vapour composition at the start, mole fractions in component order.</summary>
    public required double[] StartVapor { get; init; }
    /// <summary>Limits that could not all be met (each is also a finding).</summary>
    public required IReadOnlyList<Conflict> Conflicts { get; init; }
    /// <summary>False when the coolant cannot capture the first vapour at any pressure the limits allow (a finding says which coolant would).</summary>
    public bool CondensateCaptured { get; init; } = true;
    /// <summary>False when no setpoint satisfies every limit; the findings say what to change.</summary>
    public bool Feasible => Conflicts.Count == 0 && CondensateCaptured;
    /// <summary>The pot's liquid phases at the setpoint: one, or two layers (each composition and share).</summary>
    public IReadOnlyList<Mixtures.LiquidPhase> StartLiquidPhases { get; init; } = [];
    /// <summary>What decided the number of liquids at the setpoint (models that agreed, a published fact), or null.</summary>
    public string? StartLiquidPhaseBasis { get; init; }
    /// <summary>True when the pump can hold the setpoint (at least twice its ultimate pressure).</summary>
    public bool SetpointReachable => VacuumSetpoint >= SetpointPlanner.PumpHold(Equipment, Rules) || AtAtmosphericPressure;
    /// <summary>The checks, most severe first.</summary>
    public required IReadOnlyList<Finding> Checks { get; init; }
    /// <summary>Every value the plan used, defaults marked.</summary>
    public required IReadOnlyList<Assumption> Assumptions { get; init; }
    /// <summary>Notes on the result (mixture ramp, model fallback …), as findings of severity info.</summary>
    public IReadOnlyList<Finding> Notes { get; init; } = [];
    /// <summary>For a mixture: the pressure ramp at the vapour temperature as the light component leaves.</summary>
    public StripPlan? Ramp { get; init; }
    /// <summary>The equipment planned on.</summary>
    public required Equipment Equipment { get; init; }
    /// <summary>The rules applied.</summary>
    public required Rules Rules { get; init; }
    /// <summary>Heat duty, rates, capacities and time, when the charge's size is known.</summary>
    public Scale.PlanScale? Scale { get; init; }
    /// <summary>The product's maximum temperature in force (the lower of the rule's and the product's own).</summary>
    public Temperature? ProductMax { get; init; }
}
