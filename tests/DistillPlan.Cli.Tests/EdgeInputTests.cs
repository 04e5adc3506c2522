using CsCheck;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// The concrete cases of issues 13 and 14 through the whole command line, then generated command
/// lines: every one ends in an answer (exit 0) or one line on stderr with exit 2, never "internal
/// error" (exit 1), a stack trace or an absurd number.
/// </summary>
public class EdgeInputTests
{
    private static void OneLineExit2(CliRunner.Result r, string mentions)
    {
        Assert.True(r.ExitCode == 2, $"exit {r.ExitCode}: {r.Error}{r.Output}");
        string line = r.Error.TrimEnd('\n');
        Assert.DoesNotContain("\n", line);
        Assert.StartsWith("distillplan: ", line);
        Assert.DoesNotContain("internal error", line);
        Assert.Contains(mentions, line);
    }

    [Theory]
    [InlineData("charge (ethanol)", "setpoints", "ethanol=1e308kmol,water=1mol")]
    [InlineData("charge (ethanol)", "setpoints", "ethanol=1e-320mol,water=1e-320mol")]
    [InlineData("charge (ethanol)", "setpoints", "ethanol=1e400,water=1")]
    [InlineData("--vapor-temp", "setpoints", "ethanol", "--vapor-temp", "1e308")]
    [InlineData("--bath-max", "setpoints", "ethanol", "--bath-max", "5000", "--vapor-temp", "4000")]
    [InlineData("--bath-max", "setpoints", "ethanol", "--bath-max", "10K")]
    [InlineData("estimated critical temperature", "curve", "diglyme", "--temp", "3000K")]
    [InlineData("frozen", "mixture", "ethanol=50,water=50", "--at", "1e-6mbar", "--json")]
    [InlineData("frozen", "azeotrope", "ethanol", "water", "--at", "1e-6mbar")]
    [InlineData("--temp", "curve", "water", "--temp", "0.01K")]
    [InlineData("--at", "curve", "water", "--at", "1e308")]
    [InlineData("--pump-limit", "setpoints", "dmso", "--pump-limit", "1e400mbar")]
    [InlineData("charge (ethanol)", "setpoints", "ethanol=101%")]
    public void An_edge_number_gives_one_line_naming_the_option(string mentions, params string[] args) =>
        OneLineExit2(CliRunner.Run(args), mentions);

    [Fact]
    public void A_400_digit_product_mass_gives_one_short_line()
    {
        var r = CliRunner.Run("setpoints", "ethanol", "--product-mass", new string('9', 400));
        OneLineExit2(r, "--product-mass");
        Assert.True(r.Error.Length < 300, r.Error);
    }

    [Theory]
    [InlineData("1,4-dioxane=30,water=70", "1,4-dioxane")]
    [InlineData("\"N,N-dimethylformamide\"=30,water=70", "N,N-dimethylformamide")]
    [InlineData("n,n-dimethylacetamide", "N,N-dimethylacetamide")]
    [InlineData("water=50,1,4-dioxane=50", "1,4-dioxane")]
    public void Names_with_commas_stay_one_solvent(string charge, string name)
    {
        var r = CliRunner.Run("setpoints", charge);
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains(name, r.Output.Split('\n')[0]);
    }

    [Fact]
    public void A_charge_volume_in_cubic_metres_parses()
    {
        // 1 m³ of ethanol and 0.5 m³ of water: a pilot-plant strip (demo amounts).
        var r = CliRunner.Run("setpoints", "ethanol=1m3,water=0.5m3");
        Assert.True(r.ExitCode == 0, r.Error);
    }

    private static readonly string[] Verbs = ["setpoints", "curve", "mixture", "strip"];
    private static readonly string[] Charges =
        ["ethanol", "water", "thf", "1,4-dioxane", "ethanol=50,water=50", "ethyl-acetate=1L,heptane=1L", "dmso", "ethanol=1m3", "acetone=5g"];
    private static readonly string[] Options =
        ["--at", "--temp", "--vapor-temp", "--bath-max", "--pump-limit", "--coolant-temp", "--product-max", "--product-mass", "--atmospheric", "--altitude"];
    private static readonly Gen<string> Value = Gen.OneOf(
        Gen.OneOf(new[] { "1e308", "1e400", "-1e400", "1e-320", "0", "-5", "NaN", "5000", "4000", "3000K", "0.01K", "1e-6mbar", "5000mPa",
            "5000MPa", "450mm", "-300C", "20", "40C", "5mbar", "0.0001mbar", "12 parsecs", "", new string('9', 400) }.Select(Gen.Const).ToArray()),
        Gen.Double[-1e4, 1e4].Select(d => d.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)));

    [Fact]
    public void Generated_command_lines_answer_or_refuse_in_one_line()
    {
        Gen.Select(Gen.OneOf(Verbs.Select(Gen.Const).ToArray()), Gen.OneOf(Charges.Select(Gen.Const).ToArray()),
                Gen.Select(Gen.OneOf(Options.Select(Gen.Const).ToArray()), Value).Array[0, 2])
            .Sample((verb, charge, options) =>
            {
                string[] args = [verb, verb == "curve" ? charge.Split('=')[0].Split(',')[0] : charge, .. options.SelectMany(o => new[] { o.Item1, o.Item2 })];
                var r = CliRunner.Run(args);
                string cmd = string.Join(' ', args);
                Assert.True(r.ExitCode is 0 or 2, $"{cmd}: exit {r.ExitCode}: {r.Error}");
                Assert.DoesNotContain("internal error", r.Error);
                Assert.DoesNotContain("   at ", r.Error);
                if (r.ExitCode == 2) Assert.Single(r.Error.TrimEnd('\n').Split('\n'));
                Assert.DoesNotContain("NaN", r.Output);
                Assert.DoesNotContain("Infinity", r.Output);
            }, iter: 150, threads: 1);
    }
}
