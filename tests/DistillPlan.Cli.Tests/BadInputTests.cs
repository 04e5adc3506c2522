namespace DistillPlan.Cli.Tests;

/// <summary>Bad input: one clear line on stderr, exit code 2, never a stack trace.</summary>
public class BadInputTests
{
    [Theory]
    [InlineData("solvent", "setpoints", "unobtainium")]
    [InlineData("nearest names", "setpoints", "ethanoll")]
    [InlineData("--temp", "curve", "water", "--temp", "12 parsecs")]
    [InlineData("--temp", "curve", "water", "--temp", "abc")]
    [InlineData("--at", "curve", "water", "--at", "0")]
    [InlineData("--at", "curve", "water", "--at", "-20 mbar")]
    [InlineData("--temp", "curve", "water", "--temp", "-300C")]
    [InlineData("critical temperature", "curve", "water", "--temp", "400C")]
    [InlineData("--pump-limit", "setpoints", "water", "--pump-limit", "12 parsecs")]
    [InlineData("--coolant-temp", "setpoints", "water", "--coolant-temp", "abc")]
    [InlineData("--unit", "setpoints", "water", "--unit", "furlongs")]
    [InlineData("--basis", "setpoints", "water", "--basis", "weight")]
    [InlineData("--bogus", "setpoints", "water", "--bogus")]
    [InlineData("--library", "solvents", "--library", "/nonexistent/solvents.yaml")]
    public void Bad_input_gives_one_line_and_exit_code_2(string mentions, params string[] args)
    {
        var r = CliRunner.Run(args);
        Assert.Equal(2, r.ExitCode);
        Assert.Equal("", r.Output);
        string line = r.Error.TrimEnd('\n');
        Assert.DoesNotContain("\n", line);
        Assert.StartsWith("distillplan: ", line);
        Assert.Contains(mentions, line);
        Assert.DoesNotContain("   at ", line);
    }

    [Fact]
    public void A_broken_user_library_names_its_file_and_line()
    {
        string path = Path.Combine(Path.GetTempPath(), $"broken-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, "format: distillplan-solvents/1\nsolvents:\n  - name: x\n    cas: [unclosed\n");
        try
        {
            var r = CliRunner.Run("solvents", "--library", path);
            Assert.Equal(2, r.ExitCode);
            Assert.Contains(path + ":", r.Error);
            Assert.DoesNotContain("\n", r.Error.TrimEnd('\n'));
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void A_user_library_adds_a_solvent_and_overrides_by_CAS()
    {
        string path = Path.Combine(Path.GetTempPath(), $"mine-{Guid.NewGuid():N}.yaml");
        // Demo entry (invented product "DP-7" of a made-up lab); the curve is a Trouton estimate from its bp.
        File.WriteAllText(path, """
            format: distillplan-solvents/1
            sources:
              demo: invented demo data for a made-up compound
            solvents:
              - name: dp-7 intermediate
                cas: 50-00-0
                molar_mass_g_per_mol: {value: 150, source: demo}
                normal_boiling_point_k: {value: 420, source: demo}
                vapor_pressure:
                  - {form: clausius-clapeyron, t1_k: 420, p1_pa: 101325, dhvap_j_per_mol: 36960, t_min_k: 320, t_max_k: 450, source: demo}
            """);
        try
        {
            var r = CliRunner.Run("curve", "dp-7 intermediate", "--at", "1013.25", "--library", path, "--json");
            Assert.Equal(0, r.ExitCode);
            Assert.Contains("\"boiling_temperature_c\": 146.85", r.Output);
        }
        finally { File.Delete(path); }
    }
}
