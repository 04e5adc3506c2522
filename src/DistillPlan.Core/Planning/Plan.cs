using DistillPlan.Core.Checks;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>One value the plan used, and whether the user set it or it is a default.</summary>
/// <param name="Name">What it is (coolant temperature …).</param>
/// <param name="Value">The value with its unit.</param>
/// <param name="IsDefault">True when the user did not set it.</param>
/// <param name="Basis">Where the default comes from (common practice, standard atmosphere …).</param>
public sealed record Assumption(string Name, string Value, bool IsDefault, string Basis);

/// <summary>Limits that cannot all be met, and what would resolve them.</summary>
/// <param name="Constraints">The constraint codes in conflict.</param>
/// <param name="Message">One line with the numbers.</param>
/// <param name="Remedies">What would resolve it.</param>
public sealed record Conflict(IReadOnlyList<string> Constraints, string Message, IReadOnlyList<string> Remedies);

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
    /// <summary>Limits that could not all be met.</summary>
    public required IReadOnlyList<Conflict> Conflicts { get; init; }
    /// <summary>The checks, most severe first.</summary>
    public required IReadOnlyList<Check> Checks { get; init; }
    /// <summary>Every value the plan used, defaults marked.</summary>
    public required IReadOnlyList<Assumption> Assumptions { get; init; }
    /// <summary>Notes on the result (mixture ramp, model fallback …).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
    /// <summary>For a mixture: the pressure ramp at the vapour temperature as the light component leaves.</summary>
    public Mixtures.StripResult? Ramp { get; init; }
    /// <summary>The equipment planned on.</summary>
    public required Equipment Equipment { get; init; }
    /// <summary>The rules applied.</summary>
    public required Rules Rules { get; init; }
}
