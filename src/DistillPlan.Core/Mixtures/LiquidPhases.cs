namespace DistillPlan.Core.Mixtures;

/// <summary>One liquid phase of a liquid that may have split into two layers.</summary>
/// <param name="MoleFractions">The phase's mole fractions [mol/mol] by component name.</param>
/// <param name="Share">This phase's share of the liquid's moles [mol/mol]; 1 for a single liquid.</param>
public sealed record LiquidPhase(IReadOnlyDictionary<string, double> MoleFractions, double Share)
{
    /// <summary>Mole fractions in component order (for solvers built on this one).</summary>
    internal double[] X { get; init; } = [];
}

/// <summary>
/// How many liquid phases a liquid forms at a temperature, their compositions and shares, and on
/// what basis that was decided (which models agreed, or which published fact overruled them).
/// </summary>
public sealed record LiquidPhaseSplit
{
    /// <summary>Temperature [K] the split was computed at.</summary>
    public required double TemperatureK { get; init; }

    /// <summary>The liquid phases: one (the whole liquid) or two.</summary>
    public required IReadOnlyList<LiquidPhase> Phases { get; init; }

    /// <summary>1 or 2.</summary>
    public int Count => Phases.Count;

    /// <summary>True when two liquids are present.</summary>
    public bool IsSplit => Phases.Count > 1;

    /// <summary>What decided the answer, in one sentence (e.g. "two liquids: modified UNIFAC
    /// (Dortmund) and UNIFAC-LLE agree"), or null for a plain one-liquid answer that no model or
    /// fact questioned.</summary>
    public string? Basis { get; init; }

    /// <summary>The published miscibility fact that overruled a predicted split, or null.</summary>
    public MiscibilityFact? OverrulingFact { get; init; }
}
