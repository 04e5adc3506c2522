namespace DistillPlan.Core.Mixtures;

/// <summary>
/// A liquid-phase activity-coefficient model for a fixed, ordered list of components:
/// ln γ_i as a function of temperature and liquid composition.
/// </summary>
public interface IActivityModel
{
    /// <summary>Short model name as the interface shows it ("ideal", "unifac").</summary>
    string Name { get; }

    /// <summary>Number of components, in the order the model was built for.</summary>
    int ComponentCount { get; }

    /// <summary>
    /// Natural logarithms of the activity coefficients, ln γ_i [-].
    /// </summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="moleFractions">Liquid mole fractions x_i [mol/mol] in component order,
    /// summing to 1; zeros are allowed (infinite dilution).</param>
    /// <returns>ln γ_i in component order.</returns>
    double[] LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions);

    /// <summary>ln γ_i written into <paramref name="lnGamma"/> (solvers' inner loops use this to
    /// avoid allocating; models override it when they can).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="moleFractions">Liquid mole fractions in component order.</param>
    /// <param name="lnGamma">Destination, one entry per component.</param>
    void LnActivityCoefficients(double temperatureK, ReadOnlySpan<double> moleFractions, Span<double> lnGamma)
        => LnActivityCoefficients(temperatureK, moleFractions).CopyTo(lnGamma);
}
