namespace DistillPlan.Cli.Tests;

/// <summary>
/// Approval tests: the text, Markdown and CSV of a handful of plans and strips, pinned against
/// checked-in files and reviewed by hand when they change. Regenerate after a deliberate change
/// with <c>DISTILLPLAN_UPDATE_GOLDEN=1 dotnet test tests/DistillPlan.Cli.Tests</c> and read the diff.
/// The report date is pinned with SOURCE_DATE_EPOCH (2026-01-01T00:00:00Z).
/// </summary>
public class GoldenOutputTests
{
    static GoldenOutputTests() => Environment.SetEnvironmentVariable("SOURCE_DATE_EPOCH", "1767225600");

    public static TheoryData<string, string[]> Cases => new()
    {
        { "setpoints-ethanol.txt", ["setpoints", "ethanol"] },
        { "setpoints-etoac-heptane-torr.txt", ["setpoints", "ethyl-acetate=100mL,heptane=100mL", "--unit", "Torr"] },
        { "setpoints-dmso-conflict.txt", ["setpoints", "dmso", "--heating", "jacket", "--bath-max", "90", "--pump", "liquid-ring", "--delta-t", "25,20"] },
        { "setpoints-thf.md", ["setpoints", "thf", "--format", "markdown"] },
        { "strip-thf.txt", ["strip", "thf=100mL"] },
        { "strip-etoac-heptane.csv", ["strip", "ethyl-acetate=100mL,heptane=100mL", "--format", "csv"] },
        { "strip-dmf-product.md", ["strip", "dmf=30mL", "--heating", "oil-bath", "--pump-limit", "0.5mbar", "--product-max", "70",
            "--product-mass", "3.2g", "--product-molar-mass", "455", "--pressure", "10mbar", "--end", "dry", "--format", "markdown"] },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Output_matches_the_reviewed_copy(string file, string[] args)
    {
        var r = CliRunner.Run(args);
        Assert.True(r.ExitCode == 0, r.Error);
        string actual = r.Output.Replace("\r\n", "\n");
        if (Environment.GetEnvironmentVariable("DISTILLPLAN_UPDATE_GOLDEN") == "1")
            File.WriteAllText(Path.Combine(TestPaths.SourceDir, "Golden", file), actual);
        string expected = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Golden", file)).Replace("\r\n", "\n");
        Assert.Equal(expected, actual);
    }

}
