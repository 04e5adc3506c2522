namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Batch evaporation (a rotary-evaporator run or a vacuum strip in a vessel) by the Rayleigh
/// equation: the vapour leaving is in equilibrium with the liquid at its bubble point, and
/// dN_i = y_i dN for each component (binary form: d ln L = dx/(y − x)).
/// </summary>
/// <remarks>
/// <para>Held at a fixed vapour temperature, the pressure is the liquid's bubble pressure and
/// falls as the light component leaves (the pressure ramp a vacuum controller follows); held at
/// a fixed pressure, the boiling temperature rises. A non-volatile product stays in the flask
/// and lowers the solvents' mole fractions, which matters near dryness.</para>
/// <para>The equations are integrated in the evaporated fraction of the charge's moles with an
/// adaptive Dormand–Prince 5(4) method. Liquid and distillate amounts are both integrated, so
/// the balance distillate + residue = charge is a check of the bookkeeping, not an identity.
/// Reports and end conditions are located exactly (Brent's method on the step length).</para>
/// </remarks>
public static class BatchStrip
{
    /// <summary>Strips at a fixed vapour temperature; the pressure follows the bubble pressure.</summary>
    /// <param name="equilibrium">Phase equilibrium of the charge's components.</param>
    /// <param name="chargeMol">Charge [mol] in component order.</param>
    /// <param name="vaporTemperatureK">Vapour (boiling) temperature [K].</param>
    /// <param name="options">End conditions and reporting; defaults run to dryness, reporting every 5 %.</param>
    public static StripResult AtFixedVaporTemperature(PhaseEquilibrium equilibrium, IReadOnlyList<double> chargeMol,
        double vaporTemperatureK, StripOptions? options = null)
    {
        if (!(vaporTemperatureK > 0) || !double.IsFinite(vaporTemperatureK))
            throw new ArgumentOutOfRangeException(nameof(vaporTemperatureK), vaporTemperatureK, "must be > 0 K");
        return new RayleighStrip(equilibrium, chargeMol, StripMode.FixedVaporTemperature, vaporTemperatureK,
            options ?? new StripOptions()).Run();
    }

    /// <summary>Strips at a fixed pressure; the temperature follows the bubble temperature.</summary>
    /// <param name="equilibrium">Phase equilibrium of the charge's components.</param>
    /// <param name="chargeMol">Charge [mol] in component order.</param>
    /// <param name="pressurePa">System pressure [Pa].</param>
    /// <param name="options">End conditions and reporting; give a <see cref="StripOptions.TemperatureLimitK"/>
    /// when a non-volatile product is present, or the boiling point runs away near dryness.</param>
    public static StripResult AtFixedPressure(PhaseEquilibrium equilibrium, IReadOnlyList<double> chargeMol,
        double pressurePa, StripOptions? options = null)
    {
        if (!(pressurePa > 0) || !double.IsFinite(pressurePa))
            throw new ArgumentOutOfRangeException(nameof(pressurePa), pressurePa, "must be > 0 Pa");
        return new RayleighStrip(equilibrium, chargeMol, StripMode.FixedPressure, pressurePa,
            options ?? new StripOptions()).Run();
    }
}
