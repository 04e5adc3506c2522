namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// DIPPR equation 101, ln(P/Pa) = C1 + C2/T + C3·ln T + C4·T^C5, with T [K].
/// C1 [-], C2 [K], C3 [-], C4 [K^−C5], C5 [-]. Usually fitted from the triple point to the
/// critical point. Source of the form: DIPPR 801 database; coefficients as tabulated in
/// Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-8.
/// Example (Perry Table 2-8, water: 73.649, −7258.2, −7.3037, 4.1653e−6, 2): P(373.15 K) ≈ 101.3 kPa.
/// </summary>
public sealed class Dippr101 : NumericallyInvertedCurve
{
    /// <summary>C1 [-].</summary>
    public required double C1 { get; init; }
    /// <summary>C2 [K].</summary>
    public required double C2 { get; init; }
    /// <summary>C3 [-].</summary>
    public required double C3 { get; init; }
    /// <summary>C4 [K^−C5].</summary>
    public required double C4 { get; init; }
    /// <summary>C5 [-].</summary>
    public required double C5 { get; init; }
    /// <inheritdoc />
    public override string Form => "dippr101";

    /// <inheritdoc />
    public override double PressurePa(double temperatureK) =>
        Math.Exp(C1 + C2 / temperatureK + C3 * Math.Log(temperatureK) + C4 * Math.Pow(temperatureK, C5));

    // DIPPR-101 fits often turn over just above Tc; stay at the fitted upper end.
    /// <inheritdoc />
    protected override double UpperBoundK => TMaxK;
}
