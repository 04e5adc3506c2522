namespace DistillPlan.Core.Library;

/// <summary>
/// DIPPR equation 100, a polynomial in T: Cp/(J/(mol·K)) = C1 + C2·T + C3·T² + C4·T³ + C5·T⁴,
/// with T [K]; used for the liquid heat capacity. C1 [J/(mol·K)], C2 [J/(mol·K²)], C3 [J/(mol·K³)],
/// C4 [J/(mol·K⁴)], C5 [J/(mol·K⁵)]. Valid from <see cref="TMinK"/> to <see cref="TMaxK"/> only:
/// a polynomial fit says nothing outside its range, so <see cref="At"/> holds the value of the
/// nearest end there. Coefficients as in Perry's Chemical Engineers' Handbook, 8th ed. (2008),
/// Table 2-153 (printed in J/(kmol·K); divided by 1000 in the library).
/// Example (Perry 2-153, ethanol: 102.64, −0.13963, −3.0341e−5, 2.0386e−6, 0; 159.05–390 K):
/// Cp(298.15 K) = 112.34 J/(mol·K).
/// </summary>
public sealed class Dippr100
{
    /// <summary>C1 [J/(mol·K)].</summary>
    public required double C1 { get; init; }
    /// <summary>C2 [J/(mol·K²)].</summary>
    public required double C2 { get; init; }
    /// <summary>C3 [J/(mol·K³)].</summary>
    public double C3 { get; init; }
    /// <summary>C4 [J/(mol·K⁴)].</summary>
    public double C4 { get; init; }
    /// <summary>C5 [J/(mol·K⁵)].</summary>
    public double C5 { get; init; }
    /// <summary>Lowest temperature of the fit [K].</summary>
    public required double TMinK { get; init; }
    /// <summary>Highest temperature of the fit [K].</summary>
    public required double TMaxK { get; init; }
    /// <summary>Library key of the source.</summary>
    public required string Source { get; init; }

    /// <summary>The polynomial at T [K], without regard to the range (the loader checks the range with it).</summary>
    public double Polynomial(double temperatureK)
    {
        double t = temperatureK;
        return C1 + t * (C2 + t * (C3 + t * (C4 + t * C5)));
    }

    /// <summary>
    /// Cp [J/(mol·K)] at T [K], clamped to the fitted range: below <see cref="TMinK"/> the value at
    /// TMinK, above <see cref="TMaxK"/> the value at TMaxK.
    /// </summary>
    public double At(double temperatureK) => Polynomial(Math.Clamp(temperatureK, TMinK, TMaxK));

    /// <summary>True when T lies inside the fitted range (so <see cref="At"/> is not clamped).</summary>
    public bool Covers(double temperatureK) => temperatureK >= TMinK && temperatureK <= TMaxK;
}
