namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// A temperature band where the answering curve of a <see cref="VaporPressureModel"/> changes
/// from <see cref="From"/> (below) to <see cref="To"/> (above). Inside it
/// ln P = (1 − s)·ln P_from + s·ln P_to with the smooth weight s = x²(3 − 2x),
/// x = (1/T_lo − 1/T)/(1/T_lo − 1/T_hi), so P(T) and its slope are continuous at both ends.
/// The band lies where both curves are inside their fitted ranges (on the side of the curve whose
/// range ends); where the ranges only touch or leave a gap, the curves' Clausius–Clapeyron
/// extensions are blended instead. Its width grows with the disagreement it smooths
/// (at least <see cref="MinWidthK"/>, three times |Δ ln P| divided by d ln P/dT, at most
/// <see cref="MaxWidthK"/>), so the blend never makes P fall with rising T.
/// </summary>
public sealed class HandOverBand
{
    /// <summary>Narrowest band [K].</summary>
    public const double MinWidthK = 4;
    /// <summary>Widest band [K].</summary>
    public const double MaxWidthK = 60;

    /// <summary>Lower end of the band [K].</summary>
    public required double LoK { get; init; }
    /// <summary>Upper end of the band [K].</summary>
    public required double HiK { get; init; }
    /// <summary>The curve that answers below the band.</summary>
    public required IVaporPressureCurve From { get; init; }
    /// <summary>The curve that answers above the band.</summary>
    public required IVaporPressureCurve To { get; init; }

    /// <summary>True when T lies in the band (ends included; there the weight makes one curve answer alone).</summary>
    public bool Contains(double temperatureK) => temperatureK >= LoK && temperatureK <= HiK;

    /// <summary>Weight of <see cref="To"/> at T: 0 at the lower end, 1 at the upper end.</summary>
    public double Weight(double temperatureK)
    {
        double x = (1 / LoK - 1 / temperatureK) / (1 / LoK - 1 / HiK);
        x = Math.Clamp(x, 0, 1);
        return x * x * (3 - 2 * x);
    }

    /// <summary>Shortest stretch one curve answers alone; a shorter one is given to a neighbour [K].</summary>
    public const double MinSegmentK = 2 * MinWidthK;

    /// <summary>
    /// Splits [<paramref name="loK"/>, <paramref name="hiK"/>] into stretches answered by one curve (the first in
    /// rank that covers T; a stretch shorter than <see cref="MinSegmentK"/> goes to a neighbour that covers it, so
    /// that two published ranges a fraction of a kelvin apart do not make a sliver) and the bands between them.
    /// </summary>
    internal static (IReadOnlyList<CurveSegment> Segments, IReadOnlyList<HandOverBand> Bands) Build(
        IReadOnlyList<IVaporPressureCurve> curves, double loK, double hiK)
    {
        const double eps = 1e-9;
        var cuts = curves.SelectMany(c => new[] { c.TMinK, c.TMaxK }).Append(loK).Append(hiK)
            .Where(t => t >= loK && t <= hiK).Distinct().Order().ToList();

        // Stretches of one answering curve (null: no curve covers, a gap).
        var segments = new List<(double Lo, double Hi, IVaporPressureCurve? Curve)>();
        for (int i = 0; i + 1 < cuts.Count; i++)
        {
            double mid = (cuts[i] + cuts[i + 1]) / 2;
            var answering = curves.FirstOrDefault(c => c.Covers(mid));
            segments.Add((cuts[i], cuts[i + 1], answering));
        }
        MergeSame(segments);

        // Give slivers to a neighbour: one that covers the sliver, higher rank first.
        while (segments.Count > 1)
        {
            int k = Enumerable.Range(0, segments.Count).Where(i => segments[i].Hi - segments[i].Lo < MinSegmentK)
                .DefaultIfEmpty(-1).MinBy(i => i < 0 ? 0 : segments[i].Hi - segments[i].Lo);
            if (k < 0) break;
            var (lo, hi, _) = segments[k];
            var neighbours = new[] { k - 1, k + 1 }.Where(i => i >= 0 && i < segments.Count && segments[i].Curve is not null).ToList();
            if (neighbours.Count == 0) break;
            int pick = neighbours
                .OrderByDescending(i => segments[i].Curve!.TMinK <= lo + eps && segments[i].Curve!.TMaxK >= hi - eps)
                .ThenBy(i => IndexOf(curves, segments[i].Curve!)).First();
            segments[k] = (lo, hi, segments[pick].Curve);
            MergeSame(segments);
        }

        var bands = new List<HandOverBand>();
        for (int i = 0; i + 1 < segments.Count; i++)
        {
            var (aLo, aHi, a) = segments[i];
            var (bLo, bHi, b) = segments[i + 1];
            if (a is null) continue;                      // handled as the gap's left neighbour below
            if (b is null)
            {
                // a gap: blend the two extensions over the whole gap, when a curve follows it
                if (i + 2 < segments.Count && segments[i + 2].Curve is { } next)
                    bands.Add(new HandOverBand { LoK = bLo, HiK = bHi, From = a, To = next });
                continue;
            }

            double tb = aHi;
            double jump = Math.Abs(VaporPressureModel.ExtendedLnP(b, tb) - VaporPressureModel.ExtendedLnP(a, tb));
            if (jump < 1e-9) continue;
            double dLnPdT = -VaporPressureModel.CurveSlope(a, tb) / (tb * tb);
            double width = Math.Clamp(3 * jump / Math.Max(dLnPdT, 1e-6), MinWidthK, MaxWidthK);
            double roomLeft = (aHi - aLo) * (i == 0 ? 1.0 : 0.5);
            double roomRight = (bHi - bLo) * (i + 2 == segments.Count ? 1.0 : 0.5);

            double lo, hi;
            if (b.TMinK < tb - eps && tb - b.TMinK >= Math.Min(width, roomLeft) / 2)
            {
                // b is valid below the hand-over: blend where a still answers
                lo = tb - Math.Min(width, Math.Min(roomLeft, tb - b.TMinK));
                hi = tb;
            }
            else if (a.TMaxK > tb + eps && a.TMaxK - tb >= Math.Min(width, roomRight) / 2)
            {
                // a is valid above it: blend where b already answers
                lo = tb;
                hi = tb + Math.Min(width, Math.Min(roomRight, a.TMaxK - tb));
            }
            else
            {
                // the ranges only touch: straddle, on the extensions
                double half = Math.Min(width / 2, Math.Min(roomLeft, roomRight));
                lo = tb - half;
                hi = tb + half;
            }
            if (hi - lo > eps) bands.Add(new HandOverBand { LoK = lo, HiK = hi, From = a, To = b });
        }

        var stretches = segments.Where(s => s.Curve is not null).Select(s => new CurveSegment(s.Lo, s.Hi, s.Curve!)).ToList();
        return (stretches, bands);
    }

    private static int IndexOf(IReadOnlyList<IVaporPressureCurve> curves, IVaporPressureCurve c)
    {
        for (int i = 0; i < curves.Count; i++) if (ReferenceEquals(curves[i], c)) return i;
        return curves.Count;
    }

    private static void MergeSame(List<(double Lo, double Hi, IVaporPressureCurve? Curve)> segments)
    {
        for (int i = segments.Count - 1; i > 0; i--)
            if (ReferenceEquals(segments[i].Curve, segments[i - 1].Curve))
            {
                segments[i - 1] = (segments[i - 1].Lo, segments[i].Hi, segments[i].Curve);
                segments.RemoveAt(i);
            }
    }
}

/// <summary>A stretch of temperature [<paramref name="LoK"/>, <paramref name="HiK"/>] answered by one curve.</summary>
/// <param name="LoK">Lower end [K].</param>
/// <param name="HiK">Upper end [K].</param>
/// <param name="Curve">The curve that answers there (inside its range, or extended a little past it).</param>
public sealed record CurveSegment(double LoK, double HiK, IVaporPressureCurve Curve)
{
    /// <summary>True when T lies in the stretch (ends included).</summary>
    public bool Contains(double temperatureK) => temperatureK >= LoK && temperatureK <= HiK;
}
