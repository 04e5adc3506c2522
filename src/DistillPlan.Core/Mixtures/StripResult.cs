namespace DistillPlan.Core.Mixtures;

/// <summary>How the strip is held.</summary>
public enum StripMode
{
    /// <summary>Vapour (boiling) temperature fixed; the pressure follows the bubble pressure
    /// of the liquid and falls as the light component leaves (the pressure ramp).</summary>
    FixedVaporTemperature,

    /// <summary>Pressure fixed; the boiling temperature rises as the light component leaves.</summary>
    FixedPressure,
}

/// <summary>Why a strip ended.</summary>
public enum StripEndReason
{
    /// <summary>The requested fraction of the charge is left.</summary>
    FractionLeftReached,

    /// <summary>The minimum residue is reached (evaporating further is not allowed).</summary>
    MinimumResidueReached,

    /// <summary>The named component's mole fraction has fallen to its target.</summary>
    ResidualMoleFractionReached,

    /// <summary>The bubble pressure has fallen to the pump limit (fixed temperature).</summary>
    PumpLimitReached,

    /// <summary>The bubble temperature has risen to the temperature limit (fixed pressure).</summary>
    TemperatureLimitReached,

    /// <summary>Practically dry: less than 1 ppm of the volatile charge is left.</summary>
    Dry,

    /// <summary>The bubble point could not be found any more (e.g. boiling temperature out of
    /// the solvers' range near dryness of a product).</summary>
    EquilibriumFailed,

    /// <summary>The integrator's step cap was reached.</summary>
    StepLimitReached,
}

/// <summary>One reported point of a strip.</summary>
public sealed record StripStep
{
    /// <summary>Evaporated fraction of the charge's moles [-].</summary>
    public required double EvaporatedMoleFraction { get; init; }

    /// <summary>Evaporated fraction of the charge's liquid volume [-], or null when a density is missing.</summary>
    public required double? EvaporatedVolumeFraction { get; init; }

    /// <summary>Pressure [Pa] (the bubble pressure at fixed temperature).</summary>
    public required double PressurePa { get; init; }

    /// <summary>Vapour (boiling) temperature [K].</summary>
    public required double TemperatureK { get; init; }

    /// <summary>Liquid mole fractions [mol/mol] by name.</summary>
    public required IReadOnlyDictionary<string, double> Liquid { get; init; }

    /// <summary>Vapour mole fractions leaving at this point [mol/mol] by name.</summary>
    public required IReadOnlyDictionary<string, double> Vapor { get; init; }

    /// <summary>Cumulative distillate (receiver) [mol] by name.</summary>
    public required IReadOnlyDictionary<string, double> DistillateMol { get; init; }

    /// <summary>Liquid left in the flask [mol] by name.</summary>
    public required IReadOnlyDictionary<string, double> ResidueMol { get; init; }

    /// <summary>The pot's liquid phases at this point: one, or two layers (each composition and
    /// share) while the pot is in the two-liquid region and the vapour is the heteroazeotrope's.</summary>
    public IReadOnlyList<LiquidPhase> LiquidPhases { get; init; } = [];

    /// <summary>1 or 2 (0 when not computed).</summary>
    public int LiquidPhaseCount => LiquidPhases.Count;
}

/// <summary>Outcome of a batch strip.</summary>
public sealed record StripResult
{
    /// <summary>How the strip was held.</summary>
    public required StripMode Mode { get; init; }

    /// <summary>Charge [mol] by name.</summary>
    public required IReadOnlyDictionary<string, double> ChargeMol { get; init; }

    /// <summary>Reported points, from the charge to the end point.</summary>
    public required IReadOnlyList<StripStep> Steps { get; init; }

    /// <summary>Why the strip ended.</summary>
    public required StripEndReason EndReason { get; init; }

    /// <summary>The end reason in words, with the numbers behind it.</summary>
    public required string EndMessage { get; init; }

    /// <summary>Activity model used.</summary>
    public required string Model { get; init; }

    /// <summary>Why a less preferred model replaced the requested one, or null.</summary>
    public string? FallbackReason { get; init; }

    /// <summary>Remark on the model's treatment of the components, or null.</summary>
    public string? ModelNote { get; init; }

    /// <summary>Non-null when the answer is approximate (a carboxylic acid: vapour association not modelled).</summary>
    public string? ApproximationNote { get; init; }
}
