namespace DistillPlan.Cli.Tests;

/// <summary>Bad input is one line that names what is missing or wrong and what is allowed.</summary>
public class InputMessageTests
{
    [Theory]
    [InlineData(new[] { "curve" }, "distillplan: missing <name>")]
    [InlineData(new[] { "azeotrope", "ethanol" }, "<second>")]
    [InlineData(new[] { "setpoints" }, "charge")]
    public void A_missing_argument_is_named(string[] args, string fragment)
    {
        var r = CliRunner.Run(args);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains(fragment, r.Error);
        Assert.DoesNotContain("Required argument missing", r.Error);
        Assert.Single(r.Error.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Millipascal_and_megapascal_are_told_apart_by_case()
    {
        // 5000 mPa = 5 Pa = 0.05 mbar (SI prefixes, BIPM SI brochure).
        var j = CliRunner.Json("curve", "toluene", "--at", "5000mPa");
        Assert.Equal(0.05, j.GetProperty("pressure_mbar").GetDouble(), 9);
        var r = CliRunner.Run("curve", "toluene", "--at", "5000mpa");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("written with that case", r.Error);
    }

    [Fact]
    public void A_long_value_is_shortened_in_the_message()
    {
        var r = CliRunner.Run("setpoints", new string('x', 100_000));
        Assert.Equal(2, r.ExitCode);
        Assert.True(r.Error.Length < 300, $"{r.Error.Length} characters");
        Assert.Contains("(100000 characters)", r.Error);
    }
}
