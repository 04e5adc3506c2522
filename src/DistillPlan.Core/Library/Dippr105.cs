namespace DistillPlan.Core.Library;

/// <summary>
/// DIPPR equation 105 for the saturated liquid's molar density:
/// ρ/(mol/m³) = C1 / C2^(1 + (1 − T/C3)^C4), with T [K]. C1 [mol/m³], C2 [-], C3 [K] (usually Tc),
/// C4 [-]. Valid from <see cref="TMinK"/> to <see cref="TMaxK"/> (at most C3); <see cref="At"/>
/// holds the value of the nearest end outside it. Coefficients as in Perry's Chemical Engineers'
/// Handbook, 8th ed. (2008), Table 2-32 (printed in mol/dm³; C1 multiplied by 1000 in the library).
/// Example (Perry 2-32, ethanol: 1628.8, 0.27469, 514, 0.23178; 159.05–514 K):
/// ρ(293.15 K) = 17155 mol/m³, 790.3 kg/m³ with M = 46.069 g/mol.
/// </summary>
public sealed class Dippr105
{
    /// <summary>C1 [mol/m³].</summary>
    public required double C1 { get; init; }
    /// <summary>C2 [-].</summary>
    public required double C2 { get; init; }
    /// <summary>C3 [K].</summary>
    public required double C3 { get; init; }
    /// <summary>C4 [-].</summary>
    public required double C4 { get; init; }
    /// <summary>Lowest temperature of the fit [K].</summary>
    public required double TMinK { get; init; }
    /// <summary>Highest temperature of the fit [K].</summary>
    public required double TMaxK { get; init; }
    /// <summary>Library key of the source.</summary>
    public required string Source { get; init; }

    /// <summary>The equation at T [K], without regard to the range; NaN above C3, where it has no value.</summary>
    public double Equation(double temperatureK)
    {
        // At T = C3 rounding can leave 1 − T/C3 a hair below zero; that is still the end point.
        double tau = 1 - temperatureK / C3;
        if (tau < 0 && tau > -1e-12) tau = 0;
        return C1 / Math.Pow(C2, 1 + Math.Pow(tau, C4));
    }

    /// <summary>
    /// Molar density [mol/m³] at T [K], clamped to the fitted range: below <see cref="TMinK"/> the
    /// value at TMinK, above <see cref="TMaxK"/> the value at TMaxK.
    /// </summary>
    public double At(double temperatureK) => Equation(Math.Clamp(temperatureK, TMinK, TMaxK));

    /// <summary>True when T lies inside the fitted range (so <see cref="At"/> is not clamped).</summary>
    public bool Covers(double temperatureK) => temperatureK >= TMinK && temperatureK <= TMaxK;
}
