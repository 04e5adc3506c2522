using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Checks;

/// <summary>Everything the checks look at: the charge, the equipment and the chosen setpoints.</summary>
/// <param name="Charge">What is evaporated.</param>
/// <param name="System">The equilibrium model.</param>
/// <param name="Equipment">The equipment.</param>
/// <param name="Rules">The ΔT rule.</param>
/// <param name="Vapor">Chosen vapour temperature.</param>
/// <param name="Bath">Chosen bath temperature.</param>
/// <param name="Setpoint">Chosen vacuum setpoint.</param>
/// <param name="CondenserMax">Condenser limit by the ΔT rule.</param>
/// <param name="StartVapor">Vapour mole fractions at the setpoint.</param>
/// <param name="Extrapolated">True when a curve was used outside its range.</param>
/// <param name="Conflicts">Limits that could not all be met.</param>
/// <param name="Azeotropes">Azeotropes of the charge's pairs at the setpoint pressure.</param>
public sealed record CheckContext(
    Charge Charge, IBoilingSystem System, Equipment Equipment, Rules Rules,
    Temperature Vapor, Temperature Bath, Pressure Setpoint, Temperature CondenserMax,
    double[] StartVapor, bool Extrapolated, IReadOnlyList<Conflict> Conflicts,
    IReadOnlyList<Mixtures.Azeotrope> Azeotropes);
