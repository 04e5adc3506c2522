namespace DistillPlan.Core.VaporPressure;

/// <summary>A vapour pressure and how it was obtained.</summary>
/// <param name="PressurePa">Saturation pressure [Pa].</param>
/// <param name="TemperatureK">The temperature it is for [K].</param>
/// <param name="Curve">The curve that answered (inside a hand-over band: the one with the larger weight).</param>
/// <param name="Extrapolated">True when T lies outside every curve's fitted range.</param>
/// <param name="BlendedWith">Inside a hand-over band: the other curve blended in; otherwise null.</param>
public readonly record struct PsatResult(double PressurePa, double TemperatureK, IVaporPressureCurve Curve, bool Extrapolated,
    IVaporPressureCurve? BlendedWith = null)
{
    /// <summary>True when the answering curve is an estimate rather than a fit to measured pressures.</summary>
    public bool Estimated => Curve.Estimate is not null || BlendedWith?.Estimate is not null;
}

/// <summary>A saturation (boiling) temperature and how it was obtained.</summary>
/// <param name="TemperatureK">Saturation temperature [K].</param>
/// <param name="PressurePa">The pressure it is for [Pa].</param>
/// <param name="Curve">The curve that answered.</param>
/// <param name="Extrapolated">True when the answer lies outside every curve's fitted range.</param>
public readonly record struct TsatResult(double TemperatureK, double PressurePa, IVaporPressureCurve Curve, bool Extrapolated);

/// <summary>
/// The ranked vapour-pressure curves of one substance, as one continuous P(T).
/// Inside a fitted range the first curve (in library order) whose range covers T answers.
/// Where the answering curve changes, published curves disagree by a few per cent; so that
/// P(T) has no step there, ln P is blended over a hand-over band on the side where both curves
/// are valid, with a smooth weight in 1/T (<see cref="HandOverBand"/>; docs/methods.md,
/// Vapour pressure). Outside every range the nearest curve's edge is extended
/// with Clausius–Clapeyron (ln P linear in 1/T, slope taken at the edge) and the result is
/// flagged extrapolated. Above the critical temperature it refuses. T(P) is the exact inverse
/// of P(T), which rises strictly.
/// </summary>
public sealed class VaporPressureModel
{
    private readonly IReadOnlyList<HandOverBand> _bands;
    private readonly IReadOnlyList<CurveSegment> _segments;

    /// <summary>Builds the model of one substance.</summary>
    /// <param name="substance">Name used in messages.</param>
    /// <param name="curves">Curves in order of preference; at least one.</param>
    /// <param name="criticalTemperatureK">Tc [K] when known: no vapour pressure above it.</param>
    /// <param name="criticalPressurePa">Pc [Pa] when known.</param>
    /// <param name="estimatedCriticalTemperatureK">Without a published Tc: an estimate of it [K]
    /// (Watson's Tc of an estimated curve, or Guldberg's 1.5 Tb), above which no vapour pressure is given either.</param>
    public VaporPressureModel(string substance, IReadOnlyList<IVaporPressureCurve> curves,
        double? criticalTemperatureK = null, double? criticalPressurePa = null, double? estimatedCriticalTemperatureK = null)
    {
        EstimatedCriticalTemperatureK = criticalTemperatureK is null ? estimatedCriticalTemperatureK : null;
        if (curves.Count == 0) throw new ArgumentException("at least one vapour-pressure curve is needed", nameof(curves));
        Substance = substance;
        Curves = curves;
        CriticalTemperatureK = criticalTemperatureK;
        CriticalPressurePa = criticalPressurePa;
        MinK = curves.Min(c => c.TMinK);
        MaxK = curves.Max(c => c.TMaxK);
        (_segments, _bands) = HandOverBand.Build(curves, MinK, Math.Min(MaxK, criticalTemperatureK ?? double.MaxValue));
    }

    /// <summary>Name of the substance, for messages.</summary>
    public string Substance { get; }
    /// <summary>The curves, most preferred first.</summary>
    public IReadOnlyList<IVaporPressureCurve> Curves { get; }
    /// <summary>Critical temperature [K], when known.</summary>
    public double? CriticalTemperatureK { get; }
    /// <summary>An estimate of Tc [K] when none is published: the model refuses above it too, rather than extrapolate without end.</summary>
    public double? EstimatedCriticalTemperatureK { get; }
    /// <summary>Critical pressure [Pa], when known.</summary>
    public double? CriticalPressurePa { get; }
    /// <summary>Lowest temperature any curve covers [K].</summary>
    public double MinK { get; }
    /// <summary>Highest temperature any curve covers [K].</summary>
    public double MaxK { get; }
    /// <summary>The hand-over bands where two curves are blended, in rising temperature.</summary>
    public IReadOnlyList<HandOverBand> HandOverBands => _bands;
    /// <summary>The stretches each answered by one curve, in rising temperature (the bands lie at their ends).</summary>
    public IReadOnlyList<CurveSegment> Segments => _segments;

    /// <summary>
    /// Null when every curve is published; otherwise one line saying the vapour pressure is an
    /// estimate, what it rests on and the expected size of its error (the largest among the
    /// estimated curves). Front ends show it, and the <c>estimated-curve</c> check quotes it.
    /// </summary>
    public string? EstimatedCurveNote =>
        Curves.Where(c => c.Estimate is not null).MaxBy(c => c.Estimate!.ExpectedErrorPercent) is { } worst
            ? $"{Substance}: vapour pressure {worst.Estimate!.Describe()}"
            : null;

    /// <summary>Largest expected error of an estimated curve [%]; null when every curve is published.</summary>
    public double? EstimatedErrorPercent =>
        Curves.Where(c => c.Estimate is not null).Select(c => (double?)c.Estimate!.ExpectedErrorPercent).Max();

    /// <summary>Saturation pressure at T; flagged when extrapolated; refuses above Tc.</summary>
    public PsatResult SaturationPressure(double temperatureK)
    {
        double p = Answer(temperatureK, out var major, out var minor);
        return new PsatResult(p, temperatureK, major, IsExtrapolated(temperatureK), minor);
    }

    /// <summary>
    /// Saturation pressure [Pa] at T [K], as <see cref="SaturationPressure"/> gives it, without
    /// the account of which curve answered: a mixture's bubble points ask for it thousands of
    /// times, and the account cost as much as the number.
    /// </summary>
    public double SaturationPressurePa(double temperatureK) => Answer(temperatureK, out _, out _);

    /// <summary>Whether <paramref name="temperatureK"/> lies outside every curve's range.</summary>
    public bool IsExtrapolated(double temperatureK)
    {
        for (int i = 0; i < Curves.Count; i++)
            if (Curves[i].Covers(temperatureK)) return false;
        return true;
    }

    // Loops, not LINQ: no allocation on a path a strip runs hundreds of thousands of times.
    private double Answer(double temperatureK, out IVaporPressureCurve major, out IVaporPressureCurve? minor)
    {
        if (!(temperatureK > 0))
            throw new InputException("temperature", $"{temperatureK} K", "a temperature above absolute zero");
        if (CriticalTemperatureK is double tc && temperatureK > tc)
            throw new OutOfRangeException(Substance, "critical point",
                $"{temperatureK - PhysicalConstants.ZeroCelsiusK:F1} °C is above the critical temperature " +
                $"{tc - PhysicalConstants.ZeroCelsiusK:F1} °C; there is no liquid and no vapour pressure there");
        if (EstimatedCriticalTemperatureK is double etc && temperatureK > etc)
            throw new OutOfRangeException(Substance, "estimated critical point",
                $"{temperatureK - PhysicalConstants.ZeroCelsiusK:F1} °C is above the estimated critical temperature " +
                $"{etc - PhysicalConstants.ZeroCelsiusK:F1} °C (no Tc is published in the library); no vapour pressure is given there");

        for (int i = 0; i < _bands.Count; i++)
        {
            var band = _bands[i];
            if (!band.Contains(temperatureK)) continue;
            double s = band.Weight(temperatureK);
            double lnP = (1 - s) * ExtendedLnP(band.From, temperatureK) + s * ExtendedLnP(band.To, temperatureK);
            (major, minor) = s < 0.5 ? (band.From, band.To) : (band.To, band.From);
            return Math.Exp(lnP);
        }

        minor = null;
        if (SegmentCurve(temperatureK) is { } curve)
        {
            major = curve;
            return Math.Exp(ExtendedLnP(curve, temperatureK));
        }

        // Outside every range: extend along ln P = a − b/T the curve that answers at that edge of
        // the segments, so P(T) stays continuous and rising across the edge (extending another
        // curve that merely reaches a little further made cyclohexane's P drop by 1 % at 279.69 K).
        major = _segments.Count > 0
            ? (temperatureK < _segments[0].LoK ? _segments[0].Curve : _segments[^1].Curve)
            : Curves.MinBy(c => DistanceOutside(c, temperatureK))!;
        return Math.Exp(ExtendedLnP(major, temperatureK));
    }

    /// <summary>Saturation (boiling) temperature at P; flagged when extrapolated; refuses above Pc.</summary>
    public TsatResult SaturationTemperature(double pressurePa)
    {
        if (!(pressurePa > 0))
            throw new InputException("pressure", $"{pressurePa} Pa", "an absolute pressure above zero");
        if (CriticalPressurePa is double pc && pressurePa > pc)
            throw new OutOfRangeException(Substance, "critical point",
                $"{pressurePa / 100:F0} mbar is above the critical pressure {pc / 100:F0} mbar; there is no boiling point there");

        // Where one curve answers alone, its own inverse is exact.
        foreach (var curve in Curves)
        {
            double t;
            try { t = curve.TemperatureK(pressurePa); }
            catch (OutOfRangeException) { continue; }
            if (curve.Covers(t) && ReferenceEquals(SegmentCurve(t), curve) && !_bands.Any(b => b.Contains(t)))
                return new TsatResult(t, pressurePa, curve, false);
        }

        // Otherwise (a hand-over band, or beyond every range) solve the whole model for P.
        double target = Math.Log(pressurePa);
        double f(double t) => Math.Log(SaturationPressure(t).PressurePa) - target;
        double lo = Math.Max(1.0, MinK * 0.3);
        double hi = CriticalTemperatureK ?? EstimatedCriticalTemperatureK ?? MaxK * 1.5;
        if (!(f(lo) < 0 && f(hi) >= 0))
            throw new OutOfRangeException(Substance, "saturation temperature",
                $"no boiling temperature found for {pressurePa / 100:G4} mbar between {lo:F0} K and {hi:F0} K");
        double root = MathNet.Numerics.RootFinding.Brent.FindRoot(f, lo, hi, 1e-10, 200);
        var at = SaturationPressure(root);
        return new TsatResult(root, pressurePa, at.Curve, at.Extrapolated);
    }

    private IVaporPressureCurve? SegmentCurve(double temperatureK)
    {
        for (int i = 0; i < _segments.Count; i++)
            if (_segments[i].Contains(temperatureK)) return _segments[i].Curve;
        return null;
    }

    private static double DistanceOutside(IVaporPressureCurve c, double t) =>
        t < c.TMinK ? c.TMinK - t : t > c.TMaxK ? t - c.TMaxK : 0;

    /// <summary>ln P of one curve inside its range, or its Clausius–Clapeyron extension from the nearer edge outside it.</summary>
    internal static double ExtendedLnP(IVaporPressureCurve c, double temperatureK)
    {
        if (c.Covers(temperatureK)) return Math.Log(c.PressurePa(temperatureK));
        double edge = temperatureK < c.TMinK ? c.TMinK : c.TMaxK;
        return Math.Log(c.PressurePa(edge)) + EdgeSlope(c, edge) * (1.0 / temperatureK - 1.0 / edge);
    }

    /// <summary>Slope d ln P / d(1/T) at a range edge, from a central difference just inside.</summary>
    private static double EdgeSlope(IVaporPressureCurve c, double edgeK)
    {
        double h = Math.Min(1.0, (c.TMaxK - c.TMinK) / 10);
        double t1 = edgeK == c.TMinK ? edgeK : edgeK - h;
        double t2 = t1 + h;
        return (Math.Log(c.PressurePa(t2)) - Math.Log(c.PressurePa(t1))) / (1.0 / t2 - 1.0 / t1);
    }

    /// <summary>Slope d ln P / d(1/T) of one curve (extended outside its range) at T [K].</summary>
    internal static double CurveSlope(IVaporPressureCurve c, double temperatureK)
    {
        double h = 0.01;
        double lo = temperatureK - h, hi = temperatureK + h;
        // stay on one side of a range edge, where the extension has a kink
        if (c.Covers(temperatureK))
        {
            if (hi > c.TMaxK) { hi = c.TMaxK; lo = hi - 2 * h; }
            if (lo < c.TMinK) { lo = c.TMinK; hi = lo + 2 * h; }
        }
        return (ExtendedLnP(c, hi) - ExtendedLnP(c, lo)) / (1.0 / hi - 1.0 / lo);
    }

    /// <summary>
    /// Enthalpy of vaporization implied by the curves, ΔHvap ≈ −R·d ln P / d(1/T) [J/mol]
    /// (Clausius–Clapeyron with ideal vapour and negligible liquid volume; a few per cent high
    /// near the normal boiling point, worse towards Tc). A fallback where no ΔHvap is tabulated.
    /// In a hand-over band the curves' own slopes are blended, not the slope of the blend, which
    /// carries the small disagreement between the curves.
    /// </summary>
    public double ImpliedEnthalpyJPerMol(double temperatureK)
    {
        var r = SaturationPressure(temperatureK);
        double slope;
        var band = _bands.FirstOrDefault(b => b.Contains(temperatureK));
        if (band is not null)
        {
            double s = band.Weight(temperatureK);
            slope = (1 - s) * CurveSlope(band.From, temperatureK) + s * CurveSlope(band.To, temperatureK);
        }
        else slope = CurveSlope(r.Curve, temperatureK);
        return -PhysicalConstants.GasConstant * slope;
    }
}
