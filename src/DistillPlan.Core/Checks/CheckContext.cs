using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Checks;

/// <summary>
/// Everything the checks look at, for the plan's setpoint or for one step of a strip: the pot,
/// the equipment and the state the pot is held at. One context type, so a strip step is checked
/// by exactly the rules (and physics) of the plan.
/// </summary>
/// <param name="System">The equilibrium model; its components are in composition order.</param>
/// <param name="Liquid">Pot liquid mole fractions (solvents only), in component order.</param>
/// <param name="Equipment">The equipment.</param>
/// <param name="Rules">The ΔT rule.</param>
/// <param name="Vapor">Vapour (boiling) temperature.</param>
/// <param name="Bath">Bath or jacket temperature.</param>
/// <param name="Pressure">System pressure (the setpoint, or the step's pressure).</param>
/// <param name="CondenserMax">Condenser limit by the ΔT rule.</param>
/// <param name="VaporComposition">Vapour mole fractions leaving the pot, in component order.</param>
/// <param name="Extrapolated">True when a curve was used outside its range.</param>
/// <param name="ProductMax">The product's maximum temperature, when one is set.</param>
/// <param name="Conflicts">Limits that could not all be met.</param>
/// <param name="Azeotropes">Azeotropes of the pot's pairs at the pressure.</param>
/// <param name="AzeotropeProblem">Why the azeotrope search failed, when it did (the check is then "not evaluated").</param>
/// <param name="LiquidPhases">The pot's liquid phases at this state (two when it has split into layers), or null when not known.</param>
/// <param name="LiquidPhaseBasis">What decided the number of liquids, or null.</param>
/// <param name="Heat">The heat and gas balance at this state, when the charge's size is known (condenser and pump capacity, solvent to the pump).</param>
public sealed record CheckContext(
    IBoilingSystem System, double[] Liquid, Equipment Equipment, Rules Rules,
    Temperature Vapor, Temperature Bath, Pressure Pressure, Temperature CondenserMax,
    double[] VaporComposition, bool Extrapolated, Temperature? ProductMax,
    IReadOnlyList<Conflict> Conflicts, IReadOnlyList<Mixtures.Azeotrope> Azeotropes, string? AzeotropeProblem = null,
    IReadOnlyList<Mixtures.LiquidPhase>? LiquidPhases = null, string? LiquidPhaseBasis = null,
    Scale.HeatState? Heat = null)
{
    /// <summary>The solvents of the pot in composition order.</summary>
    public IReadOnlyList<Solvent> Components => System.Components;
}
