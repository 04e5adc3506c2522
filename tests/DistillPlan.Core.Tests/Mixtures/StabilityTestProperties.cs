using CsCheck;
using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// The tangent-plane test's shortcut (a trial approaching the feed geometrically is stopped as
/// collapsing onto it) against the plain test: the same near-pure starts iterated by successive
/// substitution until they converge (1e-10) or reach the cap, as Michelsen (Fluid Phase Equilib. 9
/// (1982) 1–19) states it. Over random compositions and temperatures of the issue-12 ternaries and
/// of liquids that do split (ethyl acetate, butanol or toluene with water) the verdict must be the
/// same, and an unstable verdict must name the same trial phase. The compositions are generated
/// test input, not data; the reference is the textbook algorithm, not the code under test.
/// </summary>
public class StabilityTestProperties
{
    private static readonly string[][] Mixtures =
    [
        ["acetone", "ethanol", "toluene"],
        ["ethyl acetate", "ethanol", "water"],
        ["methanol", "dichloromethane", "toluene"],
        ["hexane", "ethyl acetate", "methanol"],
        ["1-butanol", "water"],
        ["toluene", "water"],
        ["ethyl acetate", "water"],
    ];

    private static readonly Gen<(int Mixture, double[] Z, double TemperatureK, bool Lle)> Case =
        Gen.Int[0, Mixtures.Length - 1].SelectMany(m =>
            Gen.Select(Gen.Double[0.005, 1.0].Array[Mixtures[m].Length], Gen.Double[280.0, 360.0], Gen.Bool,
                (raw, t, lle) => (m, raw.Select(v => v / raw.Sum()).ToArray(), t, lle)));

    [Fact]
    public void The_shortcut_gives_the_plain_tests_verdict_and_trial()
    {
        int unstable = 0, stable = 0;
        Case.Sample(c =>
        {
            var components = Mixtures[c.Mixture].Select(TestSolvents.ByName).ToList();
            // UNIFAC-LLE where its table covers the mixture (it lacks dichloromethane's pairs), else Dortmund.
            bool lle = c.Lle && Unifac.CheckCoverage(components, UnifacParameters.Lle).IsComplete;
            var model = new Unifac(components, lle ? UnifacParameters.Lle : UnifacParameters.Dortmund);
            var fast = LiquidStability.UnstableTrial(model, c.TemperatureK, c.Z);
            var plain = PlainUnstableTrial(model, c.TemperatureK, c.Z);
            if (plain is null) stable++; else unstable++;
            if (fast is null || plain is null) return fast is null && plain is null;
            return LiquidStability.MaxDifference(fast, plain) < 1e-8;
        }, iter: 1000, threads: 1);
        // Both verdicts must have been exercised, or the comparison proves nothing.
        Assert.True(stable > 100 && unstable > 20, $"{stable} stable and {unstable} unstable cases");
    }

    // The test as it stood before the shortcut, without any early stop: each start converges.
    private static double[]? PlainUnstableTrial(Unifac model, double temperatureK, double[] z)
    {
        int n = z.Length;
        var lnGamma = new double[n];
        model.LnActivityCoefficients(temperatureK, z, lnGamma);
        var d = z.Select((zi, i) => Math.Log(zi) + lnGamma[i]).ToArray();
        double[]? best = null;
        double bestSum = 1 + 1e-7;
        for (int k = 0; k < n; k++)
        {
            var w = z.Select((zi, i) => i == k ? 0.999 : 0.001 * zi / (1 - z[k])).ToArray();
            double sum = 0;
            for (int iteration = 0; iteration < 300; iteration++)
            {
                double total = w.Sum();
                model.LnActivityCoefficients(temperatureK, w.Select(v => v / total).ToArray(), lnGamma);
                double change = 0;
                sum = 0;
                for (int i = 0; i < n; i++)
                {
                    double next = Math.Exp(d[i] - lnGamma[i]);
                    change = Math.Max(change, Math.Abs(next - w[i]) / Math.Max(next, 1e-12));
                    w[i] = next;
                    sum += next;
                }
                if (change < 1e-10) break;
            }
            if (!double.IsFinite(sum) || sum <= bestSum) continue;
            var trial = w.Select(v => v / sum).ToArray();
            if (LiquidStability.MaxDifference(trial, z) < 1e-5) continue;
            best = trial;
            bestSum = sum;
        }
        return best;
    }
}
