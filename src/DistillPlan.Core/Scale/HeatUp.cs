using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Scale;

/// <summary>Warming the charge to its boiling temperature before anything evaporates.</summary>
/// <param name="TimeS">Time [s] (0 when the charge starts at or above its boiling temperature).</param>
/// <param name="EnergyJ">Heat taken up [J].</param>
/// <param name="NotEvaluatedReason">Why it was not worked out (a solvent without a heat capacity), or null.</param>
public sealed record HeatUp(double TimeS, double EnergyJ, string? NotEvaluatedReason)
{
    /// <summary>Solvents whose Cp was estimated (no curve in the library), or empty.</summary>
    public IReadOnlyList<string> EstimatedCpFor { get; init; } = [];

    /// <summary>Liquid Cp of organic solvents when none is tabulated [J/(g·K)]: most lie between 1.7 and 2.4 (rule of thumb, common practice, from memory).</summary>
    public const double TypicalOrganicCpJPerGK = 2.0;

    /// <summary>
    /// Heat-up at a constant bath: C·dT/dt = U·A·(T_bath − T), so
    /// t = C/(U·A)·ln((T_bath − T_start)/(T_bath − T_boil)) and the energy is C·(T_boil − T_start),
    /// C = Σ nᵢ·Cpᵢ at the mean temperature (docs/methods.md, Heat and time).
    /// </summary>
    public static HeatUp Estimate(ScaleSetup setup, Charge charge, Temperature boiling, Temperature bath)
    {
        double start = setup.Start.Kelvin, boil = boiling.Kelvin;
        if (start >= boil) return new HeatUp(0, 0, null);
        double mean = 0.5 * (start + boil);
        double c = 0;
        var estimated = new List<string>();
        foreach (var component in charge.Components)
        {
            double? tabulated = component.Solvent.LiquidHeatCapacityJPerMolK(mean); // DIPPR-100, Perry Table 2-153
            if (tabulated is null) estimated.Add(component.Solvent.Name);
            double cp = tabulated ?? TypicalOrganicCpJPerGK * component.Solvent.MolarMassGPerMol;
            c += component.Moles * setup.MolesScale * cp;
        }
        double ua = setup.UWPerM2K * setup.Geometry.WettedAreaM2(setup.ChargeM3);
        double energy = c * (boil - start);
        if (bath.Kelvin <= boil || ua <= 0) return new HeatUp(double.PositiveInfinity, energy, null) { EstimatedCpFor = estimated };
        return new HeatUp(c / ua * Math.Log((bath.Kelvin - start) / (bath.Kelvin - boil)), energy, null) { EstimatedCpFor = estimated };
    }
}
