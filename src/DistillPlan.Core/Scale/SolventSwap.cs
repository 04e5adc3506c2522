namespace DistillPlan.Core.Scale;

/// <summary>The two ways a solvent is swapped in a vessel (docs/methods.md, Solvent swap).</summary>
public enum SwapMethod
{
    /// <summary>Strip down to the minimum volume, refill with the new solvent to the maximum, repeat.</summary>
    PutAndTake,
    /// <summary>After a first strip to the minimum volume, feed the new solvent as fast as distillate leaves.</summary>
    ConstantVolume,
}

/// <summary>The boiling pot at one composition: where it boils and what vapour leaves.</summary>
/// <param name="TemperatureK">Boiling temperature [K].</param>
/// <param name="PressurePa">Pressure [Pa].</param>
/// <param name="Vapor">Vapour mole fractions in component order.</param>
/// <param name="TwoLiquids">True when the pot has split into two liquid layers.</param>
public readonly record struct SwapBoil(double TemperatureK, double PressurePa, double[] Vapor, bool TwoLiquids = false);

/// <summary>One reported point of a swap.</summary>
/// <param name="Moles">Pot contents [mol] by component.</param>
/// <param name="Boil">Where it boils.</param>
/// <param name="NewSolventMol">New solvent added so far [mol].</param>
/// <param name="DistillateMol">Distillate so far [mol] by component.</param>
/// <param name="TimeS">Time so far [s], or NaN without a rate.</param>
/// <param name="Cycle">Put-and-take: the refill count so far; constant-volume: 0 in the first strip, 1 while feeding.</param>
public sealed record SwapPoint(double[] Moles, SwapBoil Boil, double NewSolventMol, double[] DistillateMol, double TimeS, int Cycle);

/// <summary>Why a swap stopped.</summary>
public enum SwapEnd
{
    /// <summary>The residual of the old solvents fell to the target.</summary>
    TargetReached,
    /// <summary>The pot cannot boil any more within the heating limit.</summary>
    CannotBoil,
    /// <summary>The step cap was reached (a very low target or a slow approach).</summary>
    StepLimit,
}

/// <summary>The outcome of one swap method.</summary>
/// <param name="Method">Which method.</param>
/// <param name="End">Why it stopped.</param>
/// <param name="Points">Reported points from the charge to the end.</param>
public sealed record SwapRun(SwapMethod Method, SwapEnd End, IReadOnlyList<SwapPoint> Points)
{
    /// <summary>The last point.</summary>
    public SwapPoint Last => Points[^1];
}

/// <summary>What a swap needs: components, which one is new, volumes, the target, and how the pot boils.</summary>
public sealed record SwapProblem
{
    /// <summary>Liquid molar volume of each component [m³/mol].</summary>
    public required double[] MolarVolumeM3 { get; init; }
    /// <summary>Molar mass of each component [g/mol].</summary>
    public required double[] MolarMassG { get; init; }
    /// <summary>Index of the new solvent.</summary>
    public required int NewSolvent { get; init; }
    /// <summary>The charge [mol] by component (the new solvent may already be in it).</summary>
    public required double[] ChargeMol { get; init; }
    /// <summary>Lowest pot volume [m³].</summary>
    public required double MinimumM3 { get; init; }
    /// <summary>Highest pot volume [m³] (put-and-take refills to it).</summary>
    public required double MaximumM3 { get; init; }
    /// <summary>The residual of the old solvents at which to stop, as measured by <see cref="Residual"/>.</summary>
    public required double Target { get; init; }
    /// <summary>The residual measure of a pot (mass fraction, mole fraction …) from its moles.</summary>
    public required Func<double[], double> Residual { get; init; }
    /// <summary>How the pot boils at a liquid composition (mole fractions); null when it cannot boil any more.</summary>
    public required Func<double[], SwapBoil?> Boil { get; init; }
    /// <summary>Evaporation rate [mol/s] of a pot (its moles, where it boils, its volume [m³]); null: no time.</summary>
    public Func<double[], SwapBoil, double, double>? RateMolPerS { get; init; }
}

/// <summary>
/// The solvent swap as a Rayleigh balance with a feed term, integrated step by step (docs/methods.md,
/// Solvent swap): while boiling, dnᵢ = −yᵢ·dN; at constant volume the new solvent is fed at the
/// volume rate the distillate leaves. Each step removes a small share of the pot (second-order
/// midpoint rule); time is dN over the heat-limited rate.
/// </summary>
public static class SolventSwap
{
    /// <summary>Each step evaporates this share of the pot's moles.</summary>
    public const double StepShare = 0.002;

    /// <summary>Cap on integration steps.</summary>
    public const int MaxSteps = 400_000;

    /// <summary>Runs one method.</summary>
    public static SwapRun Run(SwapProblem p, SwapMethod method)
    {
        int count = p.ChargeMol.Length;
        var n = (double[])p.ChargeMol.Clone();
        var distillate = new double[count];
        double fed = 0, time = 0;
        int cycle = 0, steps = 0;
        var points = new List<SwapPoint>();
        SwapBoil? boil = p.Boil(Fractions(n));
        if (boil is not SwapBoil first) return new SwapRun(method, SwapEnd.CannotBoil, []);
        points.Add(new SwapPoint((double[])n.Clone(), first, 0, (double[])distillate.Clone(), p.RateMolPerS is null ? double.NaN : 0, 0));
        double lastReported = p.Residual(n);
        bool feeding = false;

        while (true)
        {
            double residual = p.Residual(n);
            if (residual <= p.Target) return Finish(SwapEnd.TargetReached);
            if (steps++ >= MaxSteps) return Finish(SwapEnd.StepLimit);
            double volume = Volume(p, n);
            if (!feeding && volume <= p.MinimumM3 * (1 + 1e-9))
            {
                if (method == SwapMethod.ConstantVolume) { feeding = true; cycle = 1; Report(); }
                else
                {
                    // Refill with the new solvent up to the maximum volume.
                    double add = (p.MaximumM3 - volume) / p.MolarVolumeM3[p.NewSolvent];
                    n[p.NewSolvent] += add;
                    fed += add;
                    cycle++;
                    if (p.Boil(Fractions(n)) is not SwapBoil refilled) return Finish(SwapEnd.CannotBoil);
                    boil = refilled;
                    Report();
                }
            }

            // One midpoint step of dN, shortened so a strip lands on the minimum volume.
            double total = n.Sum();
            double dN = StepShare * total;
            var b0 = boil.Value;
            if (!feeding)
            {
                double vaporVolume = Dot(b0.Vapor, p.MolarVolumeM3);
                dN = Math.Min(dN, Math.Max((volume - p.MinimumM3) / vaporVolume, 1e-12 * total));
            }
            var mid = Advance(p, n, b0.Vapor, 0.5 * dN, feeding);
            if (p.Boil(Fractions(mid)) is not SwapBoil bm) return Finish(SwapEnd.CannotBoil);
            double rate = p.RateMolPerS?.Invoke(n, b0, volume) ?? double.NaN;
            for (int i = 0; i < count; i++) distillate[i] += bm.Vapor[i] * dN;
            double feed = feeding ? dN * Dot(bm.Vapor, p.MolarVolumeM3) / p.MolarVolumeM3[p.NewSolvent] : 0;
            n = Advance(p, n, bm.Vapor, dN, feeding);
            fed += feed;
            if (p.Boil(Fractions(n)) is not SwapBoil next) return Finish(SwapEnd.CannotBoil);
            if (p.RateMolPerS is not null)
            {
                double rateEnd = p.RateMolPerS(n, next, Volume(p, n));
                time += dN * 0.5 * (1 / rate + 1 / rateEnd);
            }
            boil = next;
            // Report each time the residual has fallen by a further factor of 1.5 (and at refills).
            if (p.Residual(n) < lastReported / 1.5) Report();
        }

        void Report()
        {
            points.Add(new SwapPoint((double[])n.Clone(), boil!.Value, fed, (double[])distillate.Clone(), p.RateMolPerS is null ? double.NaN : time, cycle));
            lastReported = p.Residual(n);
        }

        SwapRun Finish(SwapEnd end)
        {
            if (points[^1].Moles.SequenceEqual(n) is false) Report();
            return new SwapRun(method, end, points);
        }
    }

    // n after evaporating dN of vapour y (and, while feeding, the new solvent to keep the volume).
    private static double[] Advance(SwapProblem p, double[] n, double[] y, double dN, bool feeding)
    {
        var next = new double[n.Length];
        for (int i = 0; i < n.Length; i++) next[i] = Math.Max(0, n[i] - y[i] * dN);
        if (feeding) next[p.NewSolvent] += dN * Dot(y, p.MolarVolumeM3) / p.MolarVolumeM3[p.NewSolvent];
        return next;
    }

    /// <summary>Liquid volume of the pot [m³] (ideal mixing).</summary>
    public static double Volume(SwapProblem p, double[] n) => Dot(n, p.MolarVolumeM3);

    /// <summary>Mole fractions of a pot.</summary>
    public static double[] Fractions(double[] n)
    {
        double total = n.Sum();
        return n.Select(v => total > 0 ? v / total : 0).ToArray();
    }

    private static double Dot(IReadOnlyList<double> a, IReadOnlyList<double> b)
    {
        double s = 0;
        for (int i = 0; i < a.Count; i++) s += a[i] * b[i];
        return s;
    }
}
