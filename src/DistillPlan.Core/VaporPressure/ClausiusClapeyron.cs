namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// Clausius–Clapeyron through one point with a constant enthalpy of vaporization:
/// ln(P/P1) = −(ΔHvap/R)·(1/T − 1/T1). T1 [K], P1 [Pa], ΔHvap [J/mol].
/// Good for a short distance from the known point (ΔHvap falls with T, so far away it
/// over-predicts P at high T). With Trouton's rule it estimates the curve of a compound known
/// by its normal boiling point alone.
/// Example: ethanol, T1 = 351.39 K, P1 = 101325 Pa, ΔHvap = 38.6 kJ/mol gives P(313.15 K) = 20.19 kPa;
/// measured is about 17.9 kPa: the estimate is some 13 % high because ΔHvap grows as T falls.
/// </summary>
public sealed class ClausiusClapeyron : IVaporPressureCurve
{
    /// <summary>Temperature of the known point [K].</summary>
    public required double T1K { get; init; }
    /// <summary>Pressure of the known point [Pa].</summary>
    public required double P1Pa { get; init; }
    /// <summary>Enthalpy of vaporization, taken as constant [J/mol].</summary>
    public required double EnthalpyJPerMol { get; init; }
    /// <inheritdoc />
    public string Form => "clausius-clapeyron";
    /// <inheritdoc />
    public required string Source { get; init; }
    /// <inheritdoc />
    public required double TMinK { get; init; }
    /// <inheritdoc />
    public required double TMaxK { get; init; }

    /// <inheritdoc />
    public double PressurePa(double temperatureK) =>
        P1Pa * Math.Exp(-EnthalpyJPerMol / PhysicalConstants.GasConstant * (1.0 / temperatureK - 1.0 / T1K));

    /// <inheritdoc />
    public double TemperatureK(double pressurePa) =>
        1.0 / (1.0 / T1K - PhysicalConstants.GasConstant / EnthalpyJPerMol * Math.Log(pressurePa / P1Pa));

    /// <summary>Trouton's rule entropy of vaporization at the normal boiling point, non-associated liquids [J/(mol·K)] (common practice).</summary>
    public const double TroutonEntropy = 88.0;
    /// <summary>Trouton's rule entropy for hydrogen-bonded liquids such as water and alcohols [J/(mol·K)] (common practice).</summary>
    public const double TroutonEntropyAssociated = 109.0;

    /// <summary>
    /// An estimated curve from the normal boiling point alone, ΔHvap = ΔSvap·Tb by Trouton's rule.
    /// The result is an estimate; say so wherever it is shown.
    /// </summary>
    /// <param name="normalBoilingPointK">Boiling point at 101325 Pa [K].</param>
    /// <param name="hydrogenBonded">True for water, alcohols, acids (ΔSvap ≈ 109 rather than 88).</param>
    public static ClausiusClapeyron FromTrouton(double normalBoilingPointK, bool hydrogenBonded) => new()
    {
        T1K = normalBoilingPointK,
        P1Pa = PhysicalConstants.StandardAtmospherePa,
        EnthalpyJPerMol = (hydrogenBonded ? TroutonEntropyAssociated : TroutonEntropy) * normalBoilingPointK,
        Source = "trouton-estimate",
        TMinK = normalBoilingPointK - 100,
        TMaxK = normalBoilingPointK + 30,
    };
}
