using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

public class UnifacTests
{
    [Fact]
    public void Acetone_in_pentane_matches_the_textbook_worked_example()
    {
        // Smith, Van Ness, Abbott, Introduction to Chemical Engineering Thermodynamics, UNIFAC
        // appendix example: acetone(1)/n-pentane(2), 307 K, x1 = 0.047 -> γ1 = 4.99, γ2 = 1.005
        // (from memory).
        var model = new Unifac([TestSolvents.Acetone, TestSolvents.Pentane]);
        var lnGamma = model.LnActivityCoefficients(307.0, [0.047, 0.953]);
        Assert.Equal(4.99, Math.Exp(lnGamma[0]), 0.02);
        Assert.Equal(1.005, Math.Exp(lnGamma[1]), 0.003);
    }
}
