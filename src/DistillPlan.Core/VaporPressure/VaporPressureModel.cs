namespace DistillPlan.Core.VaporPressure;

/// <summary>A vapour pressure and how it was obtained.</summary>
/// <param name="PressurePa">Saturation pressure [Pa].</param>
/// <param name="TemperatureK">The temperature it is for [K].</param>
/// <param name="Curve">The curve that answered.</param>
/// <param name="Extrapolated">True when T lies outside every curve's fitted range.</param>
public readonly record struct PsatResult(double PressurePa, double TemperatureK, IVaporPressureCurve Curve, bool Extrapolated);

/// <summary>A saturation (boiling) temperature and how it was obtained.</summary>
/// <param name="TemperatureK">Saturation temperature [K].</param>
/// <param name="PressurePa">The pressure it is for [Pa].</param>
/// <param name="Curve">The curve that answered.</param>
/// <param name="Extrapolated">True when the answer lies outside every curve's fitted range.</param>
public readonly record struct TsatResult(double TemperatureK, double PressurePa, IVaporPressureCurve Curve, bool Extrapolated);

/// <summary>
/// The ranked vapour-pressure curves of one substance. Inside a fitted range the first curve
/// (in library order) whose range covers T answers. Outside every range the nearest curve's
/// edge is extended with Clausius–Clapeyron (ln P linear in 1/T, slope taken at the edge),
/// which stays physical where Antoine fits can diverge, and the result is flagged extrapolated.
/// Above the critical temperature it refuses.
/// </summary>
public sealed class VaporPressureModel
{
    /// <summary>Builds the model of one substance.</summary>
    /// <param name="substance">Name used in messages.</param>
    /// <param name="curves">Curves in order of preference; at least one.</param>
    /// <param name="criticalTemperatureK">Tc [K] when known: no vapour pressure above it.</param>
    /// <param name="criticalPressurePa">Pc [Pa] when known.</param>
    public VaporPressureModel(string substance, IReadOnlyList<IVaporPressureCurve> curves,
        double? criticalTemperatureK = null, double? criticalPressurePa = null)
    {
        if (curves.Count == 0) throw new ArgumentException("at least one vapour-pressure curve is needed", nameof(curves));
        Substance = substance;
        Curves = curves;
        CriticalTemperatureK = criticalTemperatureK;
        CriticalPressurePa = criticalPressurePa;
        MinK = curves.Min(c => c.TMinK);
        MaxK = curves.Max(c => c.TMaxK);
    }

    /// <summary>Name of the substance, for messages.</summary>
    public string Substance { get; }
    /// <summary>The curves, most preferred first.</summary>
    public IReadOnlyList<IVaporPressureCurve> Curves { get; }
    /// <summary>Critical temperature [K], when known.</summary>
    public double? CriticalTemperatureK { get; }
    /// <summary>Critical pressure [Pa], when known.</summary>
    public double? CriticalPressurePa { get; }
    /// <summary>Lowest temperature any curve covers [K].</summary>
    public double MinK { get; }
    /// <summary>Highest temperature any curve covers [K].</summary>
    public double MaxK { get; }

    /// <summary>Saturation pressure at T; flagged when extrapolated; refuses above Tc.</summary>
    public PsatResult SaturationPressure(double temperatureK)
    {
        if (!(temperatureK > 0))
            throw new InputException("temperature", $"{temperatureK} K", "a temperature above absolute zero");
        if (CriticalTemperatureK is double tc && temperatureK > tc)
            throw new OutOfRangeException(Substance, "critical point",
                $"{temperatureK - PhysicalConstants.ZeroCelsiusK:F1} °C is above the critical temperature " +
                $"{tc - PhysicalConstants.ZeroCelsiusK:F1} °C; there is no liquid and no vapour pressure there");

        foreach (var curve in Curves)
            if (curve.Covers(temperatureK))
                return new PsatResult(curve.PressurePa(temperatureK), temperatureK, curve, false);

        // Outside every range: extend the nearest edge along ln P = a − b/T.
        var nearest = Curves.MinBy(c => DistanceOutside(c, temperatureK))!;
        double edge = temperatureK < nearest.TMinK ? nearest.TMinK : nearest.TMaxK;
        double slope = EdgeSlope(nearest, edge);               // d ln P / d(1/T) [K], negative
        double lnP = Math.Log(nearest.PressurePa(edge)) + slope * (1.0 / temperatureK - 1.0 / edge);
        return new PsatResult(Math.Exp(lnP), temperatureK, nearest, true);
    }

    /// <summary>Saturation (boiling) temperature at P; flagged when extrapolated; refuses above Pc.</summary>
    public TsatResult SaturationTemperature(double pressurePa)
    {
        if (!(pressurePa > 0))
            throw new InputException("pressure", $"{pressurePa} Pa", "an absolute pressure above zero");
        if (CriticalPressurePa is double pc && pressurePa > pc)
            throw new OutOfRangeException(Substance, "critical point",
                $"{pressurePa / 100:F0} mbar is above the critical pressure {pc / 100:F0} mbar; there is no boiling point there");

        // Prefer the answer of the first ranked curve that covers its own answer, as Psat does.
        foreach (var curve in Curves)
        {
            double t;
            try { t = curve.TemperatureK(pressurePa); }
            catch (OutOfRangeException) { continue; }
            if (curve.Covers(t) && ReferenceEquals(FirstCovering(t), curve))
                return new TsatResult(t, pressurePa, curve, false);
        }

        // Otherwise solve the whole model (extrapolation included) for P.
        double target = Math.Log(pressurePa);
        double f(double t) => Math.Log(SaturationPressure(t).PressurePa) - target;
        double lo = Math.Max(1.0, MinK * 0.3);
        double hi = CriticalTemperatureK ?? MaxK * 1.5;
        if (!(f(lo) < 0 && f(hi) > 0))
            throw new OutOfRangeException(Substance, "saturation temperature",
                $"no boiling temperature found for {pressurePa / 100:G4} mbar between {lo:F0} K and {hi:F0} K");
        double root = MathNet.Numerics.RootFinding.Brent.FindRoot(f, lo, hi, 1e-9, 200);
        var at = SaturationPressure(root);
        return new TsatResult(root, pressurePa, at.Curve, at.Extrapolated);
    }

    private IVaporPressureCurve? FirstCovering(double temperatureK) => Curves.FirstOrDefault(c => c.Covers(temperatureK));

    private static double DistanceOutside(IVaporPressureCurve c, double t) =>
        t < c.TMinK ? c.TMinK - t : t > c.TMaxK ? t - c.TMaxK : 0;

    /// <summary>Slope d ln P / d(1/T) at a range edge, from a central difference just inside.</summary>
    private static double EdgeSlope(IVaporPressureCurve c, double edgeK)
    {
        double h = Math.Min(1.0, (c.TMaxK - c.TMinK) / 10);
        double t1 = edgeK == c.TMinK ? edgeK : edgeK - h;
        double t2 = t1 + h;
        return (Math.Log(c.PressurePa(t2)) - Math.Log(c.PressurePa(t1))) / (1.0 / t2 - 1.0 / t1);
    }

    /// <summary>
    /// Enthalpy of vaporization implied by the curve, ΔHvap ≈ −R·d ln P / d(1/T) [J/mol]
    /// (Clausius–Clapeyron with ideal vapour and negligible liquid volume; a few per cent high
    /// near the normal boiling point, worse towards Tc). A fallback where no ΔHvap is tabulated.
    /// </summary>
    public double ImpliedEnthalpyJPerMol(double temperatureK)
    {
        const double h = 0.5;
        double p1 = SaturationPressure(temperatureK - h).PressurePa, p2 = SaturationPressure(temperatureK + h).PressurePa;
        double slope = (Math.Log(p2) - Math.Log(p1)) / (1.0 / (temperatureK + h) - 1.0 / (temperatureK - h));
        return -PhysicalConstants.GasConstant * slope;
    }
}
