namespace DistillPlan.Core.Mixtures;

/// <summary>
/// One step of the Dormand–Prince 5(4) embedded Runge–Kutta pair (Dormand, Prince, J. Comput.
/// Appl. Math. 6 (1980) 19): a fifth-order solution and, from the same seven stages, a
/// fourth-order one whose difference estimates the local error.
/// </summary>
/// <remarks>
/// Chosen for the batch strip because the liquid composition changes slowly for most of a
/// strip and quickly near the end (a light component running out, a product near dryness):
/// a step-size controller driven by the free error estimate takes long steps where it can
/// and short ones where it must. MathNet's Runge–Kutta solvers are fixed-step.
/// </remarks>
internal static class DormandPrince45
{
    private static readonly double[] C = [0, 1.0 / 5, 3.0 / 10, 4.0 / 5, 8.0 / 9, 1, 1];

    private static readonly double[][] A =
    [
        [],
        [1.0 / 5],
        [3.0 / 40, 9.0 / 40],
        [44.0 / 45, -56.0 / 15, 32.0 / 9],
        [19372.0 / 6561, -25360.0 / 2187, 64448.0 / 6561, -212.0 / 729],
        [9017.0 / 3168, -355.0 / 33, 46732.0 / 5247, 49.0 / 176, -5103.0 / 18656],
        [35.0 / 384, 0, 500.0 / 1113, 125.0 / 192, -2187.0 / 6784, 11.0 / 84],
    ];

    // Fifth-order weights (equal to the last row of A) minus fourth-order weights.
    private static readonly double[] B5 = [35.0 / 384, 0, 500.0 / 1113, 125.0 / 192, -2187.0 / 6784, 11.0 / 84, 0];
    private static readonly double[] B5MinusB4 =
        [71.0 / 57600, 0, -71.0 / 16695, 71.0 / 1920, -17253.0 / 339200, 22.0 / 525, -1.0 / 40];

    // Dense output (Hairer, Nørsett, Wanner, Solving ODEs I, 2nd ed., §II.6, the dopri5 code; from memory):
    // a fourth-order interpolant over the step from the same seven stages.
    private static readonly double[] D =
    [
        -12715105075.0 / 11282082432, 0, 87487479700.0 / 32700410799, -10690763975.0 / 1880347072,
        701980252875.0 / 199316789632, -1453857185.0 / 822651844, 69997945.0 / 29380423,
    ];

    /// <summary>Advances u' = f(t, u) from t by h.</summary>
    /// <returns>The fifth-order solution at t + h and the local error estimate.</returns>
    public static (double[] Next, double[] Error) Step(Func<double, double[], double[]> f, double t, double[] u, double h)
    {
        var (next, error, _) = StepWithStages(f, t, u, h);
        return (next, error);
    }

    /// <summary>The state at t + θh, 0 ≤ θ ≤ 1, inside a step from t by h (fourth order), from the
    /// step's start <paramref name="u"/>, result <paramref name="next"/> and stages <paramref name="k"/>.</summary>
    public static double[] Interpolate(double[] u, double[] next, double[][] k, double h, double theta)
    {
        var result = new double[u.Length];
        double rest = 1 - theta;
        for (int i = 0; i < u.Length; i++)
        {
            double r2 = next[i] - u[i];
            double r3 = h * k[0][i] - r2;
            double r4 = r2 - h * k[6][i] - r3;
            double r5 = 0;
            for (int stage = 0; stage < 7; stage++) r5 += D[stage] * k[stage][i];
            r5 *= h;
            result[i] = u[i] + theta * (r2 + rest * (r3 + theta * (r4 + rest * r5)));
        }
        return result;
    }

    /// <summary>As <see cref="Step"/>, also returning the seven stages (for <see cref="Interpolate"/>).</summary>
    public static (double[] Next, double[] Error, double[][] Stages) StepWithStages(Func<double, double[], double[]> f, double t, double[] u, double h)
    {
        int n = u.Length;
        var k = new double[7][];
        for (int stage = 0; stage < 7; stage++)
        {
            var arg = (double[])u.Clone();
            for (int j = 0; j < stage; j++)
                for (int i = 0; i < n; i++)
                    arg[i] += h * A[stage][j] * k[j][i];
            k[stage] = f(t + C[stage] * h, arg);
        }

        var next = (double[])u.Clone();
        var error = new double[n];
        for (int stage = 0; stage < 7; stage++)
            for (int i = 0; i < n; i++)
            {
                next[i] += h * B5[stage] * k[stage][i];
                error[i] += h * B5MinusB4[stage] * k[stage][i];
            }
        return (next, error, k);
    }
}
