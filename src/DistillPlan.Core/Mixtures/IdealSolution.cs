namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Ideal solution: γ_i = 1, so modified Raoult's law becomes Raoult's law, y_i P = x_i Psat_i.
/// The fallback when UNIFAC lacks a parameter, and a fair model for close chemical relatives
/// (benzene–toluene, hexane–heptane).
/// </summary>
public sealed class IdealSolution : IActivityModel
{
    /// <summary>Creates the ideal model for <paramref name="componentCount"/> components.</summary>
    /// <param name="componentCount">Number of components, ≥ 1.</param>
    public IdealSolution(int componentCount) : this(componentCount, "ideal")
    {
    }

    // A single liquid has γ = 1 in every model: it is then named after the model asked for.
    private IdealSolution(int componentCount, string name)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(componentCount, 1);
        ComponentCount = componentCount;
        Name = name;
    }

    /// <summary>The model of one pure liquid (γ = 1 in every model), named as the model asked for
    /// ("dortmund", "unifac", "ideal"), so that no parameter table is read for it.</summary>
    /// <param name="name">The requested model's name.</param>
    public static IdealSolution PureLiquid(string name) => new(1, name);

    /// <inheritdoc />
    public string Name { get; }

    /// <inheritdoc />
    public int ComponentCount { get; }

    /// <inheritdoc />
    public double[] LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions)
    {
        if (moleFractions.Length != ComponentCount)
            throw new ArgumentException(
                $"expected {ComponentCount} mole fractions, got {moleFractions.Length}", nameof(moleFractions));
        return new double[ComponentCount];
    }

    /// <inheritdoc />
    public void LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions, Span<double> lnGamma)
        => lnGamma.Clear();
}
