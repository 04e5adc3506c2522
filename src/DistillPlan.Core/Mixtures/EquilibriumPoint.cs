namespace DistillPlan.Core.Mixtures;

/// <summary>Which saturation point was computed.</summary>
public enum SaturationKind
{
    /// <summary>Liquid given; first bubble of vapour.</summary>
    BubblePoint,

    /// <summary>Vapour given; first drop of liquid.</summary>
    DewPoint,
}

/// <summary>Relative volatility α = K_first / K_second of one pair of volatile components.</summary>
/// <param name="First">Name of the first component.</param>
/// <param name="Second">Name of the second component.</param>
/// <param name="Alpha">K_first / K_second [-].</param>
public sealed record RelativeVolatility(string First, string Second, double Alpha);

/// <summary>
/// A vapour–liquid equilibrium point by modified Raoult's law, y_i P = x_i γ_i Psat_i(T).
/// </summary>
public sealed record EquilibriumPoint
{
    /// <summary>Bubble or dew point.</summary>
    public required SaturationKind Kind { get; init; }

    /// <summary>Temperature [K].</summary>
    public required double TemperatureK { get; init; }

    /// <summary>Pressure [Pa].</summary>
    public required double PressurePa { get; init; }

    /// <summary>Liquid mole fractions x_i [mol/mol] by component name (overall, when two liquids are present).</summary>
    public required IReadOnlyDictionary<string, double> Liquid { get; init; }

    /// <summary>Vapour mole fractions y_i [mol/mol] by component name (0 for a non-volatile one).</summary>
    public required IReadOnlyDictionary<string, double> Vapor { get; init; }

    /// <summary>Activity coefficients γ_i [-] by component name.</summary>
    public required IReadOnlyDictionary<string, double> ActivityCoefficients { get; init; }

    /// <summary>K-values K_i = y_i/x_i = γ_i Psat_i / P [-] by component name.</summary>
    public required IReadOnlyDictionary<string, double> KValues { get; init; }

    /// <summary>Relative volatility of each pair of volatile components, in component order.</summary>
    public required IReadOnlyList<RelativeVolatility> RelativeVolatilities { get; init; }

    /// <summary>Components whose vapour pressure at this temperature is extrapolated beyond
    /// the validity range of their curve (empty when none, or when the curves cannot tell).</summary>
    public IReadOnlyList<string> ExtrapolatedComponents { get; init; } = [];

    /// <summary>Activity model used ("dortmund", "unifac" or "ideal").</summary>
    public required string Model { get; init; }

    /// <summary>Why a less preferred model replaced the requested one, or null.</summary>
    public string? FallbackReason { get; init; }

    /// <summary>Which model answered and why, in one sentence.</summary>
    public string ModelReason { get; init; } = "";

    /// <summary>Non-null when the answer is approximate whatever the model (a carboxylic acid:
    /// vapour association not modelled).</summary>
    public string? ApproximationNote { get; init; }

    /// <summary>The liquid phases: one (the whole liquid, share 1) or two. With two liquids of a
    /// bubble point the pot boils at the three-phase point: <see cref="Vapor"/> is in equilibrium
    /// with both, and <see cref="ActivityCoefficients"/> and <see cref="KValues"/> refer to the first
    /// phase (the second has the same activities).</summary>
    public IReadOnlyList<LiquidPhase> LiquidPhases { get; init; } = [];

    /// <summary>1 or 2 (0 only for a point built without phase information).</summary>
    public int LiquidPhaseCount => LiquidPhases.Count;

    /// <summary>What decided the number of liquids (models that agreed, or a published fact
    /// that overruled them), or null for a plain one-liquid answer.</summary>
    public string? LiquidPhaseBasis { get; init; }

    /// <summary>Liquid mole fractions in component order (for solvers built on this one).</summary>
    internal double[] X { get; init; } = [];

    /// <summary>Vapour mole fractions in component order.</summary>
    internal double[] Y { get; init; } = [];
}
