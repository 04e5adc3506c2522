namespace DistillPlan.Cli.Tests;

/// <summary>The --help text is part of the interface: pinned against checked-in files.</summary>
public class HelpTextTests
{
    [Theory]
    [InlineData("setpoints")]
    [InlineData("curve")]
    [InlineData("solvents")]
    [InlineData("mixture")]
    [InlineData("azeotrope")]
    [InlineData("strip")]
    [InlineData("swap")]
    [InlineData("fit")]
    public void Help_text_matches_the_checked_in_copy(string verb)
    {
        var r = CliRunner.Run(verb, "--help");
        Assert.Equal(0, r.ExitCode);
        string expectedPath = Path.Combine(AppContext.BaseDirectory, "HelpText", verb + ".txt");
        string actual = r.Output.Replace("\r\n", "\n").Replace("testhost", "distillplan");
        if (Environment.GetEnvironmentVariable("DISTILLPLAN_UPDATE_HELP") == "1")
            File.WriteAllText(Path.Combine(TestPaths.SourceDir, "HelpText", verb + ".txt"), actual);
        Assert.Equal(File.ReadAllText(expectedPath).Replace("\r\n", "\n"), actual);
    }

}
