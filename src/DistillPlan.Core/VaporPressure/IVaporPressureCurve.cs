namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// One published vapour-pressure correlation of one substance, on SI values, with the range
/// its authors fitted it over. Outside that range it still evaluates (the model decides what
/// to do and flags it); it never refuses silently.
/// </summary>
public interface IVaporPressureCurve
{
    /// <summary>The equation form as written in the library: antoine-log10, antoine-ln, dippr101, wagner-3-6 …</summary>
    string Form { get; }
    /// <summary>The library's key for the published source the coefficients came from.</summary>
    string Source { get; }
    /// <summary>Lower end of the fitted range [K].</summary>
    double TMinK { get; }
    /// <summary>Upper end of the fitted range [K].</summary>
    double TMaxK { get; }
    /// <summary>Saturation pressure [Pa] at temperature <paramref name="temperatureK"/> [K].</summary>
    double PressurePa(double temperatureK);
    /// <summary>Saturation temperature [K] at pressure <paramref name="pressurePa"/> [Pa].</summary>
    double TemperatureK(double pressurePa);
    /// <summary>Set when the curve is an estimate rather than a fit to measured pressures; null for published curves.</summary>
    CurveEstimate? Estimate { get; }
    /// <summary>True when T lies inside the fitted range.</summary>
    bool Covers(double temperatureK) => temperatureK >= TMinK && temperatureK <= TMaxK;
}

/// <summary>
/// Base for curves without a closed-form inverse: T(P) is found with Brent's method on
/// ln P(T) − ln P, bracketed around the fitted range.
/// </summary>
public abstract class NumericallyInvertedCurve : IVaporPressureCurve
{
    /// <inheritdoc />
    public abstract string Form { get; }
    /// <inheritdoc />
    public required string Source { get; init; }
    /// <inheritdoc />
    public required double TMinK { get; init; }
    /// <inheritdoc />
    public required double TMaxK { get; init; }
    /// <inheritdoc />
    public CurveEstimate? Estimate { get; init; }
    /// <inheritdoc />
    public abstract double PressurePa(double temperatureK);

    /// <summary>Highest temperature the equation can be evaluated at (Tc for Wagner) [K].</summary>
    protected virtual double UpperBoundK => TMaxK * 1.5;

    /// <inheritdoc />
    public double TemperatureK(double pressurePa)
    {
        double target = Math.Log(pressurePa);
        double f(double t) => Math.Log(PressurePa(t)) - target;
        double lo = TMinK * 0.5, hi = UpperBoundK;
        if (!(f(lo) < 0 && f(hi) > 0))
            throw new OutOfRangeException(Source, Form,
                $"no saturation temperature for {pressurePa:G4} Pa between {lo:F1} K and {hi:F1} K");
        return MathNet.Numerics.RootFinding.Brent.FindRoot(f, lo, hi, 1e-10, 200);
    }
}
