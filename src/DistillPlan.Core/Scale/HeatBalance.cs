using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Scale;

/// <summary>The heat and gas balance of a boiling charge at one moment (one setpoint, one strip step).</summary>
/// <param name="LiquidM3">Liquid in the pot [m³].</param>
/// <param name="AreaM2">Wetted heated area [m²].</param>
/// <param name="HeatDutyW">Heat into the boiling liquid, U·A·(T_bath − T_boil) [W].</param>
/// <param name="EvaporationMolPerS">Vapour made [mol/s] = duty / ΔHvap of the vapour.</param>
/// <param name="EvaporationGPerH">The same as mass [g/h].</param>
/// <param name="EvaporationMLPerH">The same as condensed liquid [mL/h].</param>
/// <param name="LatentHeatJPerMol">ΔHvap of the vapour [J/mol] (mole-weighted by its composition).</param>
/// <param name="CondenserCapacityW">What the condenser can take [W].</param>
/// <param name="GasLoadM3PerS">Gas the pump must carry, at the pressure and the coolant temperature [m³/s].</param>
/// <param name="PumpSpeedM3PerS">Its pumping speed [m³/s].</param>
/// <param name="SolventToPumpGPerH">Solvent leaving with the gas (saturated at the coolant, plus any uncondensed vapour) [g/h].</param>
/// <param name="Breakthrough">True when nothing condenses at the coolant temperature (all vapour goes to the pump).</param>
public sealed record HeatState(double LiquidM3, double AreaM2, double HeatDutyW, double EvaporationMolPerS, double EvaporationGPerH,
    double EvaporationMLPerH, double LatentHeatJPerMol, double CondenserCapacityW, double GasLoadM3PerS, double PumpSpeedM3PerS,
    double SolventToPumpGPerH, bool Breakthrough)
{
    /// <summary>Condenser duty as a share of its capacity (∞ with no capacity).</summary>
    public double CondenserShare => CondenserCapacityW > 0 ? HeatDutyW / CondenserCapacityW : double.PositiveInfinity;
    /// <summary>Gas load as a share of the pumping speed.</summary>
    public double PumpShare => GasLoadM3PerS / PumpSpeedM3PerS;
    /// <summary>Solvent lost to the pump as a share of what evaporates, or null when nothing evaporates.</summary>
    public double? LossShare => EvaporationGPerH > 0 ? SolventToPumpGPerH / EvaporationGPerH : null;
}

/// <summary>
/// Heat in, vapour out, what the condenser and the pump see (docs/methods.md, Heat and time):
/// Q = U·A·(T_bath − T_boil); the evaporation rate is Q/ΔHvap at the boiling temperature with
/// ΔHvap weighted by the vapour's composition; the condenser takes the rated figure or
/// U_c·A_c·ΔT_lm; the gas leaving it is saturated with the condensate at the coolant temperature
/// (m_solvent per mol of air = p_s/(P − p_s)), and the pump carries leak air, that vapour and
/// whatever the condenser could not take, as n·R·T/P.
/// </summary>
public static class HeatBalance
{
    /// <summary>The balance at one moment.</summary>
    /// <param name="setup">Sizes and rules of thumb.</param>
    /// <param name="system">Equilibrium model (for the condensate's vapour pressure at the coolant).</param>
    /// <param name="vapor">Vapour mole fractions in component order.</param>
    /// <param name="liquidM3">Liquid in the pot [m³].</param>
    /// <param name="boiling">Boiling (vapour) temperature.</param>
    /// <param name="bath">Bath or jacket temperature.</param>
    /// <param name="pressure">System pressure.</param>
    /// <param name="coolant">Coolant inlet temperature.</param>
    public static HeatState At(ScaleSetup setup, IBoilingSystem system, IReadOnlyList<double> vapor, double liquidM3,
        Temperature boiling, Temperature bath, Pressure pressure, Temperature coolant)
    {
        var solvents = system.Components;
        double area = setup.Geometry.WettedAreaM2(liquidM3);
        double duty = setup.UWPerM2K * area * Math.Max(0, bath.Kelvin - boiling.Kelvin);
        double latent = 0, molarMassG = 0, molarVolume = 0;
        for (int i = 0; i < solvents.Count; i++)
        {
            latent += vapor[i] * solvents[i].EnthalpyJPerMol(boiling.Kelvin);
            molarMassG += vapor[i] * solvents[i].MolarMassGPerMol;
            molarVolume += vapor[i] * (solvents[i].MolarVolumeM3PerMol ?? 0);
        }
        if (!(latent > 0)) throw new InvalidOperationException($"no enthalpy of vaporization at {boiling}");
        double evaporation = duty / latent;
        double capacity = setup.Condenser.CapacityW(boiling, coolant);
        double uncondensed = Math.Max(0, duty - capacity) / latent;

        double air = setup.LeakAirKgPerS / (PhysicalConstants.AirMolarMassGPerMol / 1000);
        double p = pressure.Pascal;
        double ps;
        try { ps = system.BubblePressure(coolant.Kelvin, [.. vapor]).PressurePa; }
        catch (DistillPlanException) { ps = double.NaN; }
        bool breakthrough = !(ps < p);
        double saturated = breakthrough ? 0 : air * ps / (p - ps);
        double toPump = breakthrough ? evaporation : Math.Min(evaporation, saturated + uncondensed);
        double gas = (air + toPump) * PhysicalConstants.GasConstant * coolant.Kelvin / p;
        return new HeatState(liquidM3, area, duty, evaporation, evaporation * molarMassG * 3600, evaporation * molarVolume * 1e6 * 3600,
            latent, capacity, gas, setup.PumpSpeedM3PerS, toPump * molarMassG * 3600, breakthrough);
    }

    /// <summary>Liquid volume of these amounts [m³] (tabulated densities, ideal mixing; a product's own volume is left out).</summary>
    public static double LiquidM3(IReadOnlyList<Library.Solvent> solvents, Func<string, double> molesOf) =>
        solvents.Sum(s => molesOf(s.Name) * (s.MolarVolumeM3PerMol ?? 0));
}
