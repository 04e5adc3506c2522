using System.Text.Json;

namespace DistillPlan.Cli.Tests;

/// <summary>The size side as scripts read it (docs/interface.md): scale fields, the swap verb, bad sizes.</summary>
public class ScaleVerbTests
{
    private static readonly string[] ScaleFields =
        ["heat_duty_w", "evaporation_rate_g_per_h", "evaporation_rate_ml_per_h", "condenser_capacity_w", "pump_gas_load_m3_per_h", "pump_speed_m3_per_h", "solvent_to_pump_g_per_h", "time_min"];

    [Fact]
    public void Setpoints_with_an_amount_carry_the_scale_fields()
    {
        var j = CliRunner.Json("setpoints", "water=250mL", "--area", "0.05m2", "--condenser-capacity", "2kW");
        foreach (var f in ScaleFields) Assert.True(j.TryGetProperty(f, out _), f);
        // 450 W/(m² K) × 0.05 m² × 20 K = 450 W; at 40 °C water's latent heat is 2406.0 kJ/kg (IAPWS-IF97, python3-iapws): 673 g/h.
        Assert.Equal(450, j.GetProperty("heat_duty_w").GetDouble(), 1e-3);
        Assert.Equal(450 / 2406.0 * 3600, j.GetProperty("evaporation_rate_g_per_h").GetDouble(), 0.01 * 673);
    }

    [Fact]
    public void Strip_steps_carry_cumulative_time_and_the_scale_fields()
    {
        var j = CliRunner.Json("strip", "toluene=200L", "--vessel", "250L");
        var steps = j.GetProperty("steps").EnumerateArray().ToList();
        foreach (var f in ScaleFields) Assert.True(steps[0].TryGetProperty(f, out _), f);
        var times = steps.Select(s => s.GetProperty("time_min").GetDouble()).ToList();
        Assert.True(times.Zip(times.Skip(1)).All(t => t.Second > t.First));
        Assert.Equal(times[^1], j.GetProperty("time_min").GetDouble(), 0.1);
    }

    [Fact]
    public void Swap_compares_both_methods_in_JSON()
    {
        var j = CliRunner.Json("swap", "thf=150L", "--to", "toluene", "--target", "1%", "--vessel", "250L");
        var methods = j.GetProperty("methods").EnumerateArray().ToList();
        Assert.Equal(new[] { "constant-volume", "put-and-take" }, methods.Select(m => m.GetProperty("method").GetString()!).Order().ToArray());
        foreach (var m in methods)
        {
            foreach (var f in new[] { "new_solvent_l", "distillate_l", "residual_mass_fraction", "residual_mole_fraction", "time_min" })
                Assert.True(m.TryGetProperty(f, out _), f);
            Assert.True(m.GetProperty("residual_mass_fraction").GetDouble() <= 0.01 + 1e-9);
            var step = m.GetProperty("steps").EnumerateArray().First();
            foreach (var f in new[] { "liquid", "vapor_temperature_c", "pressure_mbar" }) Assert.True(step.TryGetProperty(f, out _), f);
        }
        Assert.Contains(j.GetProperty("recommended").GetString(), new[] { "constant-volume", "put-and-take" });
    }

    [Theory]
    [InlineData("--area", "-0.5m2")]
    [InlineData("--vessel", "100L")]          // smaller than the 150 L charge
    [InlineData("--min-volume", "300L")]      // above the 250 L working volume
    [InlineData("--heat-transfer", "abc")]
    [InlineData("--pump-speed", "-2")]
    public void Bad_sizes_are_one_line_and_exit_2(string option, string value)
    {
        string[] args = option == "--vessel" ? ["setpoints", "toluene=150L", option, value] : ["setpoints", "toluene=150L", "--vessel", "250L", option, value];
        var r = CliRunner.Run(args);
        Assert.Equal(2, r.ExitCode);
        Assert.Single(r.Error.Trim().Split('\n'));
        Assert.Contains(option, r.Error);
    }

    [Theory]
    // Found by the generated command lines: a vapour colder than the coolant leaves the condenser no capacity at all.
    [InlineData("strip", "acetone=5g", "--vapor-temp", "-58.5", "--product-max", "5.497E-88")]
    [InlineData("setpoints", "acetone=5g", "--vapor-temp", "-58.5", "--product-max", "5.497E-88")]
    public void A_condenser_with_no_capacity_is_said_in_words_not_as_infinity(params string[] args)
    {
        foreach (var format in new[] { "text", "json" })
        {
            var r = CliRunner.Run([.. args, "--format", format]);
            Assert.True(r.ExitCode is 0 or 2, r.Error);
            Assert.DoesNotContain("Infinity", r.Output);
            Assert.DoesNotContain("NaN", r.Output);
        }
    }

    [Theory]
    [InlineData("--target", "2 furlongs")]
    [InlineData("--method", "sideways")]
    [InlineData("--to", "unobtainium")]
    public void Bad_swap_input_is_one_line_and_exit_2(string option, string value)
    {
        var args = new List<string> { "swap", "thf=150L", "--vessel", "250L", "--to", "toluene", "--target", "1%" };
        int i = args.IndexOf(option);
        if (i >= 0) args[i + 1] = value; else args.AddRange([option, value]);
        var r = CliRunner.Run([.. args]);
        Assert.Equal(2, r.ExitCode);
        Assert.Single(r.Error.Trim().Split('\n'));
    }
}
