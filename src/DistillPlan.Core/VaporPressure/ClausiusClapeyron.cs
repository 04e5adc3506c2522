namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// Clausius–Clapeyron through one point, d ln P / dT = ΔHvap(T)/(R·T²). T1 [K], P1 [Pa], ΔHvap [J/mol].
/// With a constant ΔHvap: ln(P/P1) = −(ΔHvap/R)·(1/T − 1/T1), closed form both ways.
/// With <see cref="WatsonTcK"/> set, ΔHvap varies by Watson's rule,
/// ΔHvap(T) = ΔHvap(T1)·((1 − T/Tc)/(1 − T1/Tc))^0.38 (Watson, Ind. Eng. Chem. 35 (1943) 398), and
/// ln P is integrated numerically: far below T1 a constant ΔHvap over-predicts P because ΔHvap
/// grows as T falls, and Watson's rule removes most of that bias (measured in docs/solvents-schema.md,
/// Estimated curves).
/// Good for a short distance from the known point. With Trouton's rule it estimates the curve
/// of a compound known by its normal boiling point alone.
/// Example: ethanol, T1 = 351.39 K, P1 = 101325 Pa, ΔHvap = 38.6 kJ/mol gives P(313.15 K) = 20.19 kPa;
/// measured is about 17.9 kPa: the estimate is some 13 % high because ΔHvap grows as T falls.
/// </summary>
public sealed class ClausiusClapeyron : IVaporPressureCurve
{
    /// <summary>Temperature of the known point [K].</summary>
    public required double T1K { get; init; }
    /// <summary>Pressure of the known point [Pa].</summary>
    public required double P1Pa { get; init; }
    /// <summary>Enthalpy of vaporization at <see cref="T1K"/>; constant unless <see cref="WatsonTcK"/> is set [J/mol].</summary>
    public required double EnthalpyJPerMol { get; init; }
    /// <summary>Critical temperature for Watson's rule [K]; null keeps ΔHvap constant.</summary>
    public double? WatsonTcK { get; init; }
    /// <inheritdoc />
    public string Form => "clausius-clapeyron";
    /// <inheritdoc />
    public required string Source { get; init; }
    /// <inheritdoc />
    public required double TMinK { get; init; }
    /// <inheritdoc />
    public required double TMaxK { get; init; }
    /// <inheritdoc />
    public CurveEstimate? Estimate { get; init; }

    /// <summary>Watson's exponent (Watson 1943).</summary>
    public const double WatsonExponent = 0.38;

    /// <summary>ΔHvap the curve assumes at T [J/mol].</summary>
    public double EnthalpyAt(double temperatureK)
    {
        if (WatsonTcK is not double tc) return EnthalpyJPerMol;
        if (temperatureK >= tc) return 0;
        return EnthalpyJPerMol * Math.Pow((1 - temperatureK / tc) / (1 - T1K / tc), WatsonExponent);
    }

    /// <inheritdoc />
    public double PressurePa(double temperatureK)
    {
        if (WatsonTcK is null)
            return P1Pa * Math.Exp(-EnthalpyJPerMol / PhysicalConstants.GasConstant * (1.0 / temperatureK - 1.0 / T1K));
        return P1Pa * Math.Exp(IntegralOfSlope(T1K, temperatureK));
    }

    /// <inheritdoc />
    public double TemperatureK(double pressurePa)
    {
        if (WatsonTcK is not double tc)
            return 1.0 / (1.0 / T1K - PhysicalConstants.GasConstant / EnthalpyJPerMol * Math.Log(pressurePa / P1Pa));
        double target = Math.Log(pressurePa / P1Pa);
        double f(double t) => IntegralOfSlope(T1K, t) - target;
        double lo = T1K * 0.25, hi = tc * (1 - 1e-9);
        if (!(f(lo) < 0 && f(hi) > 0))
            throw new OutOfRangeException(Source, Form, $"no saturation temperature for {pressurePa:G4} Pa between {lo:F1} K and {hi:F1} K");
        return MathNet.Numerics.RootFinding.Brent.FindRoot(f, lo, hi, 1e-10, 200);
    }

    // ∫ ΔHvap(T)/(R T²) dT from a to b by 24-point Gauss–Legendre; the integrand is smooth below Tc.
    private double IntegralOfSlope(double a, double b) =>
        MathNet.Numerics.Integration.GaussLegendreRule.Integrate(t => EnthalpyAt(t) / (PhysicalConstants.GasConstant * t * t), a, b, 24);

    /// <summary>Trouton's rule entropy of vaporization at the normal boiling point, non-associated liquids [J/(mol·K)] (common practice).</summary>
    public const double TroutonEntropy = 88.0;
    /// <summary>Trouton's rule entropy for hydrogen-bonded liquids such as water and alcohols [J/(mol·K)] (common practice).</summary>
    public const double TroutonEntropyAssociated = 109.0;

    /// <summary>
    /// An estimated curve from the normal boiling point alone, ΔHvap = ΔSvap·Tb by Trouton's rule,
    /// held constant. The result is an estimate; say so wherever it is shown.
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
        Estimate = new CurveEstimate(EstimateBasis.Trouton, TroutonConstantErrorPercent, "trouton-error-measured"),
    };

    /// <summary>
    /// Median over-prediction of Psat at 40 °C [%] by the constant-ΔHvap Trouton recipe (88, or 109 for
    /// water and alcohols) on the library solvents with published curves; measured by
    /// EstimateErrorTests (tests/DistillPlan.Core.Tests/VaporPressure), which pins this figure.
    /// </summary>
    public const double TroutonConstantErrorPercent = 18;
}
