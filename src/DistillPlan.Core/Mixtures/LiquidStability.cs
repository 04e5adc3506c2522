namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Liquid–liquid stability and the two-liquid (LLE) flash for an activity model at fixed T.
/// </summary>
/// <remarks>
/// <para>Stability: Michelsen's tangent-plane test. With d_i = ln z_i + ln γ_i(z), a trial phase W
/// (unnormalised) is iterated as ln W_i = d_i − ln γ_i(W/ΣW) from near-pure starts of each
/// component. At a stationary point the tangent-plane distance is tm = 1 − Σ W_i; ΣW &gt; 1
/// (tm &lt; 0) means the liquid lowers its Gibbs energy by splitting: it is unstable. For a binary
/// this is the same verdict as the sign of ∂²(ΔG_mix/RT)/∂x² inside the spinodal, and it also
/// catches the metastable band between spinodal and binodal.</para>
/// <para>Flash: equal activities, x_i^I γ_i^I = x_i^II γ_i^II, so x_i^I = K_i x_i^II with
/// K_i = γ_i^II/γ_i^I; the mole balance gives the Rachford–Rice equation
/// Σ z_i (K_i − 1)/(1 + β (K_i − 1)) = 0 for the share β of phase I, solved by bisection-safeguarded
/// Newton; K is updated by successive substitution from the stability test's trial phase.</para>
/// <para>Reference: Michelsen, Fluid Phase Equilib. 9 (1982) 1–19 and 21–40 (from memory);
/// docs/methods.md, Mixtures.</para>
/// </remarks>
internal static class LiquidStability
{
    private const double Trivial = 1e-5;        // phases closer than this (max |Δx|) are the same
    private const double UnstableMargin = 1e-7; // ΣW must exceed 1 by this much

    /// <summary>The trial phase (normalised) of the most negative tangent-plane distance, or null
    /// when the liquid z is stable at T.</summary>
    public static double[]? UnstableTrial(IActivityModel model, double temperatureK, double[] z)
    {
        if (model is IdealSolution) return null; // an ideal solution never splits
        int n = z.Length;
        int present = 0;
        for (int i = 0; i < n; i++) if (z[i] > 0) present++;
        if (present < 2) return null;

        Span<double> lnGamma = stackalloc double[n];
        var d = new double[n];
        model.LnActivityCoefficients(temperatureK, z, lnGamma);
        for (int i = 0; i < n; i++) d[i] = z[i] > 0 ? Math.Log(z[i]) + lnGamma[i] : double.NegativeInfinity;

        double[]? best = null;
        double bestSum = 1 + UnstableMargin;
        var w = new double[n];
        for (int k = 0; k < n; k++)
        {
            if (z[k] <= 0) continue;
            // Near-pure start: 0.999 of component k, the rest in the feed's proportions.
            for (int i = 0; i < n; i++) w[i] = z[i] > 0 ? (i == k ? 0.999 : 0.001 * z[i] / (1 - z[k] + 1e-300)) : 0;
            if (Iterate(model, temperatureK, z, d, w, lnGamma) is not { } sum) continue;
            if (sum <= bestSum) continue;
            var trial = Normalised(w);
            if (MaxDifference(trial, z) < Trivial) continue; // collapsed onto the feed
            best = trial;
            bestSum = sum;
        }
        return best;
    }

    /// <summary>Successive substitution of the stationarity condition; returns ΣW at convergence
    /// or null when it did not settle or is settling onto the feed itself (the trivial solution,
    /// which the caller discards in any case). Such a trial stops there instead of converging to
    /// 1e-10: for a liquid that does not split every start ends so, slowly, and that was most of
    /// a bubble point's cost. Settling means either within <see cref="CollapseDistance"/> of the
    /// feed with the steps still shrinking, or (sooner) a geometric approach to the feed: within
    /// <see cref="LinearRegimeDistance"/> of it, the distance shrinking by the same factor below
    /// 1 at every step (<see cref="IsGeometricApproach"/>). Near the trivial solution the
    /// substitution is linear, so a steady factor below 1 is the contraction of the iteration
    /// there and the trial converges onto the feed; an unstable feed repels the iteration, so
    /// its distance grows there instead.</summary>
    private static double? Iterate(IActivityModel model, double temperatureK, double[] z, double[] d, double[] w, Span<double> lnGamma)
    {
        int n = w.Length;
        Span<double> x = stackalloc double[n];
        double sum = 0, previousChange = double.PositiveInfinity;
        int shrinking = 0;
        Span<double> distances = stackalloc double[ApproachSteps + 1]; // the last few distances to the feed, newest last
        distances.Fill(double.PositiveInfinity);
        for (int iteration = 0; iteration < 300; iteration++)
        {
            double total = 0;
            for (int i = 0; i < n; i++) total += w[i];
            for (int i = 0; i < n; i++) x[i] = w[i] / total;
            model.LnActivityCoefficients(temperatureK, x, lnGamma);
            double change = 0;
            sum = 0;
            for (int i = 0; i < n; i++)
            {
                double next = double.IsNegativeInfinity(d[i]) ? 0 : Math.Exp(d[i] - lnGamma[i]);
                change = Math.Max(change, Math.Abs(next - w[i]) / Math.Max(next, 1e-12));
                w[i] = next;
                sum += next;
            }
            if (!double.IsFinite(sum)) return null;
            if (change < 1e-10) return sum;
            shrinking = change < previousChange ? shrinking + 1 : 0;
            previousChange = change;
            if (shrinking >= 3 && IsNearFeed(w, sum, z)) return null;
            distances[1..].CopyTo(distances);
            distances[^1] = DistanceToFeed(w, sum, z);
            if (IsGeometricApproach(distances)) return null;
        }
        return sum; // slow convergence near a plait point: use where it got to
    }

    /// <summary>Two-liquid flash of feed z at T from a first guess of phase I. Returns the phases
    /// (I, II) and the share β of phase I, or null when the feed is one liquid (no split with
    /// 0 &lt; β &lt; 1, or the phases collapse onto each other).</summary>
    public static (double[] PhaseI, double[] PhaseII, double ShareI)? Flash(IActivityModel model, double temperatureK,
        double[] z, double[] guessPhaseI, double[]? guessPhaseII = null, int maxIterations = 500)
    {
        int n = z.Length;
        Span<double> lnGammaI = stackalloc double[n];
        Span<double> lnGammaII = stackalloc double[n];
        var lnK = new double[n];
        var k = new double[n];
        var step = new double[n];
        var previousStep = new double[n];
        var xI = (double[])guessPhaseI.Clone();
        var xII = guessPhaseII is null ? (double[])z.Clone() : (double[])guessPhaseII.Clone();
        double beta = 0.5;
        for (int iteration = 0; iteration < maxIterations; iteration++)
        {
            model.LnActivityCoefficients(temperatureK, xI, lnGammaI);
            model.LnActivityCoefficients(temperatureK, xII, lnGammaII);
            double change = 0, stepStep = 0, previousSquare = 0;
            for (int i = 0; i < n; i++)
            {
                double next = z[i] > 0 ? lnGammaII[i] - lnGammaI[i] : 0.0;
                step[i] = next - lnK[i];
                if (iteration > 0) change = Math.Max(change, Math.Abs(step[i]));
                stepStep += step[i] * previousStep[i];
                previousSquare += previousStep[i] * previousStep[i];
                lnK[i] = next;
            }
            // Every fifth step, jump along the dominant eigenvector of the substitution
            // (Crowe and Nishio's acceleration, as Michelsen 1982 uses it): slow when a
            // component distributes between the layers, as ethanol does.
            if (iteration % 5 == 4 && previousSquare > 0)
            {
                double lambda = stepStep / previousSquare;
                if (lambda > 0 && lambda < 0.99)
                    for (int i = 0; i < n; i++) lnK[i] += step[i] * lambda / (1 - lambda);
            }
            for (int i = 0; i < n; i++) { k[i] = Math.Exp(lnK[i]); previousStep[i] = step[i]; }
            if (RachfordRice(z, k, beta) is not { } b) return null;
            beta = b;
            double sumI = 0, sumII = 0;
            for (int i = 0; i < n; i++)
            {
                xII[i] = z[i] / (1 + beta * (k[i] - 1));
                xI[i] = k[i] * xII[i];
                sumI += xI[i];
                sumII += xII[i];
            }
            for (int i = 0; i < n; i++) { xI[i] /= sumI; xII[i] /= sumII; }
            if (MaxDifference(xI, xII) < Trivial) return null;
            if (iteration > 0 && change < 1e-10) break;
        }
        if (!(beta > 0 && beta < 1)) return null;
        return (xI, xII, beta);
    }

    /// <summary>β in (0, 1) solving Σ z_i (K_i − 1)/(1 + β (K_i − 1)) = 0, or null when the root
    /// lies outside (the feed is outside the two-liquid region along this tie line).</summary>
    private static double? RachfordRice(double[] z, double[] k, double guess)
    {
        double F(double b)
        {
            double s = 0;
            for (int i = 0; i < z.Length; i++) if (z[i] > 0) s += z[i] * (k[i] - 1) / (1 + b * (k[i] - 1));
            return s;
        }
        double f0 = F(0), f1 = F(1);
        if (f0 <= 0 || f1 >= 0) return null; // F is decreasing; a root in (0, 1) needs F(0) > 0 > F(1)
        double lo = 0, hi = 1, b = Math.Clamp(guess, 1e-12, 1 - 1e-12);
        for (int iteration = 0; iteration < 200; iteration++)
        {
            double f = F(b), df = 0;
            for (int i = 0; i < z.Length; i++)
                if (z[i] > 0) { double t = k[i] - 1, den = 1 + b * t; df -= z[i] * t * t / (den * den); }
            if (f > 0) lo = b; else hi = b;
            double next = b - f / df;
            if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
            if (Math.Abs(next - b) < 1e-15) return next;
            b = next;
        }
        return b;
    }

    /// <summary>A settling trial this close to the feed (max |Δx|) is the trivial solution; well
    /// inside <see cref="Trivial"/>, the distance at which the caller discards a trial.</summary>
    private const double CollapseDistance = 1e-7;

    /// <summary>Below this distance to the feed (max |Δx|) the substitution is close enough to
    /// linear for its contraction factor to show (checked on the issue-12 ternaries: the factor
    /// drifts by 1 to 2 % a step there and settles to three figures by 1e-3; the property test
    /// StabilityTestProperties compares the verdicts with the plain test).</summary>
    private const double LinearRegimeDistance = 1e-2;

    /// <summary>How many successive distance ratios must agree.</summary>
    private const int ApproachSteps = 3;

    /// <summary>Ratios agreeing to this share count as one steady contraction factor (a trial
    /// leaving the feed shows a growing ratio at once).</summary>
    private const double SteadyRatio = 0.03;

    /// <summary>A contraction slower than this is too close to the spinodal to be read from a few steps.</summary>
    private const double MaximumContraction = 0.95;

    /// <summary>True when the trial approaches the feed geometrically: the newest distance is
    /// inside <see cref="LinearRegimeDistance"/> and the last <see cref="ApproachSteps"/> ratios of
    /// successive distances agree to <see cref="SteadyRatio"/> and are below
    /// <see cref="MaximumContraction"/>.</summary>
    private static bool IsGeometricApproach(ReadOnlySpan<double> distances)
    {
        if (!(distances[^1] < LinearRegimeDistance)) return false;
        double first = distances[1] / distances[0];
        if (!(first < MaximumContraction)) return false;
        for (int i = 2; i < distances.Length; i++)
        {
            double ratio = distances[i] / distances[i - 1];
            if (!(ratio < MaximumContraction) || Math.Abs(ratio - first) > SteadyRatio * first) return false;
        }
        return true;
    }

    private static double DistanceToFeed(double[] w, double sum, double[] z)
    {
        double m = 0;
        for (int i = 0; i < w.Length; i++) m = Math.Max(m, Math.Abs(w[i] / sum - z[i]));
        return m;
    }

    private static bool IsNearFeed(double[] w, double sum, double[] z)
    {
        for (int i = 0; i < w.Length; i++)
            if (Math.Abs(w[i] / sum - z[i]) >= CollapseDistance) return false;
        return true;
    }

    /// <summary>Largest |a_i − b_i|.</summary>
    public static double MaxDifference(double[] a, double[] b)
    {
        double m = 0;
        for (int i = 0; i < a.Length; i++) m = Math.Max(m, Math.Abs(a[i] - b[i]));
        return m;
    }

    private static double[] Normalised(double[] w)
    {
        double s = w.Sum();
        return w.Select(v => v / s).ToArray();
    }
}
