using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>Whole swap plans on the library's solvents (invented vessel sizes, as a demo).</summary>
public class SwapPlanTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static SwapPlan Swap(string charge, string to, string target, params (string Key, string Text)[] settings)
    {
        var setup = PlanInputs.Of(settings).Build();
        var c = ChargeParser.Parse(charge, setup.Basis, Library);
        return SwapPlanner.Plan(c, Library.Find(to), setup, SwapTarget.Parse(target));
    }

    [Fact]
    public void THF_to_toluene_compares_both_methods_and_recommends_the_one_using_less_toluene()
    {
        var s = Swap("thf=150L", "toluene", "1%", ("vessel", "250L"));
        Assert.Equal(2, s.Methods.Count);
        Assert.All(s.Methods, m => Assert.True(m.Reached));
        Assert.All(s.Methods, m => Assert.True(m.ResidualMassFraction <= 0.01 + 1e-9));
        var least = s.Methods.MinBy(m => m.NewSolventL)!;
        Assert.Equal(least.Method, s.Recommended!.Method);
        // Mass balance: what is in the pot at the end plus the distillate is the charge plus the toluene fed (volumes, ideal mixing).
        foreach (var m in s.Methods) Assert.Equal(150 + m.NewSolventL, m.FinalVolumeL + m.DistillateL, 0.01 * 150);
        Assert.All(s.Methods, m => Assert.True(m.FinalVolumeL >= s.Volumes.MinimumL * 0.999 && m.FinalVolumeL <= s.Volumes.MaximumL * 1.001));
        Assert.All(s.Methods, m => Assert.True(m.TimeS > 0));
        // THF is a peroxide former: the plan's checks carry it.
        Assert.Contains(s.Findings, f => f.Code == "peroxide-former");
    }

    [Theory]
    [InlineData("1%", SwapTargetKind.MassFraction, 0.01)]
    [InlineData("1wt%", SwapTargetKind.MassFraction, 0.01)]
    [InlineData("0.5mol%", SwapTargetKind.MoleFraction, 0.005)]
    [InlineData("1000ppm", SwapTargetKind.MassFraction, 0.001)]
    public void Targets_are_read_as_specifications_are_written(string text, SwapTargetKind kind, double fraction)
    {
        var t = SwapTarget.Parse(text);
        Assert.Equal(kind, t.Kind);
        Assert.Equal(fraction, t.Fraction, 1e-12);
    }

    [Theory]
    [InlineData("0%")]
    [InlineData("60%")]
    [InlineData("1")]
    [InlineData("one percent")]
    public void Bad_targets_name_the_option(string text) =>
        Assert.Equal("--target", Assert.Throws<InputException>(() => SwapTarget.Parse(text)).Field);

    [Fact]
    public void A_swap_needs_real_amounts() =>
        Assert.Equal("charge", Assert.Throws<InputException>(() => Swap("thf", "toluene", "1%", ("vessel", "250L"))).Field);
}
