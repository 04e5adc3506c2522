namespace DistillPlan.Core.Mixtures;

/// <summary>What "fraction" means in strip end conditions and reports.</summary>
public enum StripBasis
{
    /// <summary>Fraction of the charge's moles.</summary>
    Moles,

    /// <summary>Fraction of the charge's liquid volume (ideal mixing of the components'
    /// liquid molar volumes; every component needs a density).</summary>
    Volume,
}

/// <summary>Stop when a named component's liquid mole fraction has fallen to a target.</summary>
/// <param name="Component">Component name.</param>
/// <param name="MoleFraction">Target liquid mole fraction [mol/mol].</param>
public sealed record ResidualMoleFractionTarget(string Component, double MoleFraction);

/// <summary>
/// End conditions and reporting of a batch strip. Every end condition is optional; the first
/// one reached ends the strip, and without any the strip runs until the flask is practically
/// dry (less than 1 ppm of the volatile charge left).
/// </summary>
public sealed record StripOptions
{
    /// <summary>Basis of <see cref="StopAtFractionLeft"/>, <see cref="MinimumResidueFraction"/>
    /// and <see cref="ReportEveryEvaporatedFraction"/>.</summary>
    public StripBasis Basis { get; init; } = StripBasis.Moles;

    /// <summary>Stop when this fraction of the charge (on <see cref="Basis"/>) is left, or null.</summary>
    public double? StopAtFractionLeft { get; init; }

    /// <summary>Stop when one component's mole fraction in the liquid has fallen to a target, or null.</summary>
    public ResidualMoleFractionTarget? StopAtResidualMoleFraction { get; init; }

    /// <summary>Fixed-temperature strip: stop when the bubble pressure falls to what the pump
    /// can reach [Pa], or null.</summary>
    public double? PumpLimitPa { get; init; }

    /// <summary>Fixed-pressure strip: stop when the bubble temperature rises to this limit [K], or null.</summary>
    public double? TemperatureLimitK { get; init; }

    /// <summary>Never evaporate below this fraction of the charge (on <see cref="Basis"/>): a
    /// residue kept on purpose, e.g. for a peroxide former that must not go to dryness; or null.</summary>
    public double? MinimumResidueFraction { get; init; }

    /// <summary>Report a step each time this further fraction of the charge (on
    /// <see cref="Basis"/>) has evaporated; 0.05 (every 5 %) by default.</summary>
    public double ReportEveryEvaporatedFraction { get; init; } = 0.05;

    /// <summary>Fixed-temperature strip: also report each time the pressure has fallen by this
    /// ratio since the last report (e.g. 0.8 = every 20 % drop), or null.</summary>
    public double? ReportPressureRatio { get; init; }

    /// <summary>Fixed-pressure strip: also report each time the temperature has risen by this
    /// many kelvin since the last report, or null.</summary>
    public double? ReportTemperatureStepK { get; init; }

    /// <summary>Relative error tolerance per step of the integrator [-].</summary>
    public double RelativeTolerance { get; init; } = 1e-8;

    /// <summary>Cap on integrator steps (accepted and rejected).</summary>
    public int MaxSteps { get; init; } = 100_000;
}
