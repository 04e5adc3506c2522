using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>
/// The swap integrator against the analytic Rayleigh results for a constant relative volatility α
/// (equal molar volumes; worked by hand below). A is the old solvent (index 0), B the new one.
/// </summary>
public class SolventSwapTests
{
    private static SwapProblem ConstantAlpha(double alpha, double target, double chargeA = 100) => new()
    {
        MolarVolumeM3 = [1e-4, 1e-4],
        MolarMassG = [50, 50],
        NewSolvent = 1,
        ChargeMol = [chargeA, 0],
        MinimumM3 = 20 * 1e-4,
        MaximumM3 = 100 * 1e-4,
        Target = target,
        Residual = n => n[0] / (n[0] + n[1]),
        Boil = x =>
        {
            double y = alpha * x[0] / (1 + (alpha - 1) * x[0]);
            return new SwapBoil(330, 20000, [y, 1 - y]);
        },
    };

    [Fact]
    public void Constant_volume_uses_the_analytic_amount_of_new_solvent()
    {
        // Strip 100 mol of pure A to the 20 mol minimum (no change in composition), then feed B at constant holdup H = 20:
        // H·dx = −y·dD → D/H = (1/α)·[ln(x0/x1) + (α − 1)(x0 − x1)]; α = 3, x0 = 1, x1 = 0.01:
        // D = 20/3 × (ln 100 + 2 × 0.99) = 43.90 mol of distillate while feeding, and as much B fed.
        var run = SolventSwap.Run(ConstantAlpha(3, 0.01), SwapMethod.ConstantVolume);
        Assert.Equal(SwapEnd.TargetReached, run.End);
        double expected = 20.0 / 3 * (Math.Log(100) + 2 * 0.99);
        Assert.Equal(expected, run.Last.NewSolventMol, 0.005 * expected);
        Assert.Equal(80 + expected, run.Last.DistillateMol.Sum(), 0.005 * (80 + expected));
        Assert.Equal(20, run.Last.Moles.Sum(), 1e-4);
    }

    [Fact]
    public void Put_and_take_strips_by_the_Rayleigh_equation()
    {
        // Strip to 20 mol, refill with 80 mol of B (x0 = 0.2), then Rayleigh for constant α:
        // ln(L0/L1) = [ln(x0/x1) + α·ln((1 − x1)/(1 − x0))]/(α − 1); x1 = 0.05, α = 3:
        // = [ln 4 + 3 ln(0.95/0.8)]/2 = 0.95092 → L1 = 100/e^0.95092 = 38.64 mol, reached within the first refill.
        var run = SolventSwap.Run(ConstantAlpha(3, 0.05), SwapMethod.PutAndTake);
        Assert.Equal(SwapEnd.TargetReached, run.End);
        Assert.Equal(80, run.Last.NewSolventMol, 1e-9);
        Assert.Equal(1, run.Last.Cycle);
        double l1 = 100 / Math.Exp((Math.Log(4) + 3 * Math.Log(0.95 / 0.8)) / 2);
        Assert.Equal(l1, run.Last.Moles.Sum(), 0.005 * l1);
        Assert.Equal(0.05, run.Last.Moles[0] / run.Last.Moles.Sum(), 1e-3);
    }

    [Fact]
    public void Put_and_take_refills_until_the_target_and_uses_more_solvent_than_constant_volume()
    {
        var pt = SolventSwap.Run(ConstantAlpha(3, 0.001), SwapMethod.PutAndTake);
        var cv = SolventSwap.Run(ConstantAlpha(3, 0.001), SwapMethod.ConstantVolume);
        Assert.Equal(SwapEnd.TargetReached, pt.End);
        Assert.True(pt.Last.Cycle >= 2, $"refills: {pt.Last.Cycle}");
        // Constant volume at the minimum volume is the least new solvent for a given residual (the classic result).
        Assert.True(cv.Last.NewSolventMol < pt.Last.NewSolventMol, $"{cv.Last.NewSolventMol} vs {pt.Last.NewSolventMol}");
        // Every point's residual falls (or holds, at the first strip of pure A) along the way.
        var residuals = pt.Points.Select(p => p.Moles[0] / p.Moles.Sum()).ToList();
        Assert.True(residuals.Zip(residuals.Skip(1)).All(t => t.Second <= t.First + 1e-12));
    }

    [Fact]
    public void A_pot_that_cannot_boil_stops_the_swap_and_says_so()
    {
        var p = ConstantAlpha(3, 0.01) with { Boil = x => x[0] < 0.5 ? null : new SwapBoil(330, 20000, [x[0], x[1]]) };
        var run = SolventSwap.Run(p, SwapMethod.ConstantVolume);
        Assert.Equal(SwapEnd.CannotBoil, run.End);
    }
}
