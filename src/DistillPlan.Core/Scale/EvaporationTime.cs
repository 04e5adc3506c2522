namespace DistillPlan.Core.Scale;

/// <summary>Time along a strip from the evaporation rate at each reported point (docs/methods.md, Heat and time).</summary>
public static class EvaporationTime
{
    /// <summary>
    /// Cumulative time [s] at each point, from the cumulative moles evaporated and the rate there:
    /// Δt = Δn·(1/r₁ + 1/r₂)/2, the trapezoidal rule on dt = dn/r (a rate of zero gives infinity).
    /// </summary>
    public static double[] Cumulative(IReadOnlyList<double> evaporatedMol, IReadOnlyList<double> rateMolPerS)
    {
        var t = new double[evaporatedMol.Count];
        for (int k = 1; k < t.Length; k++)
        {
            double dn = Math.Max(0, evaporatedMol[k] - evaporatedMol[k - 1]);
            double inv = 0.5 * (Inverse(rateMolPerS[k]) + Inverse(rateMolPerS[k - 1]));
            t[k] = t[k - 1] + (dn == 0 ? 0 : dn * inv);
        }
        return t;
    }

    private static double Inverse(double rate) => rate > 0 ? 1 / rate : double.PositiveInfinity;
}
