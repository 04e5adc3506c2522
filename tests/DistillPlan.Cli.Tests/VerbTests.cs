using System.Text.Json;

namespace DistillPlan.Cli.Tests;

/// <summary>The verbs (docs/interface.md), run as a script would, against outside values.</summary>
public class VerbTests
{
    private static string[] Codes(JsonElement plan) => plan.GetProperty("checks").EnumerateArray().Select(c => c.GetProperty("code").GetString()!).ToArray();

    [Fact]
    public void Setpoints_for_ethanol_follow_the_20_40_60_rule()
    {
        var j = CliRunner.Json("setpoints", "ethanol");
        Assert.Equal(60.0, j.GetProperty("bath_temperature_c").GetDouble(), 1e-6);
        Assert.Equal(40.0, j.GetProperty("vapor_temperature_c").GetDouble(), 1e-6);
        Assert.True(j.GetProperty("condenser_max_c").GetDouble() <= 20.0);
        // Ethanol at 40 °C: 17.88 kPa (Ambrose and Sprake, J. Chem. Thermodyn. 2 (1970) 631; from memory).
        Assert.Equal(178.8, j.GetProperty("vacuum_setpoint_mbar").GetDouble(), 178.8 * 0.02);
        Assert.Equal("preferred-vapor-temperature", j.GetProperty("limiting_constraint").GetString());
    }

    [Theory]
    [InlineData("dmso", "condenser-freeze", "--coolant-temp", "10")]
    [InlineData("thf", "peroxide-former", null, null)]
    [InlineData("water", "bumping-risk", null, null)]
    public void Setpoints_carry_the_checks_a_chemist_needs(string solvent, string code, string? option, string? value)
    {
        string[] args = option is null ? ["setpoints", solvent] : ["setpoints", solvent, option, value!];
        var plan = CliRunner.Json(args);
        Assert.Contains(code, Codes(plan));
        foreach (var c in plan.GetProperty("checks").EnumerateArray())
            Assert.Contains(c.GetProperty("severity").GetString(), new[] { "info", "caution", "warning", "danger" });
    }

    [Theory]
    // IAPWS-IF97 Region 4 (IAPWS R7-97(2012)): 60 °C → 19.946 kPa; 20 °C → 2.3393 kPa; 100 °C → 101.42 kPa.
    [InlineData("60C", 199.46)]
    [InlineData("20", 23.393)]
    [InlineData("373.15K", 1014.18)]
    public void Curve_for_water_agrees_with_IAPWS_IF97(string temp, double mbar)
    {
        var j = CliRunner.Json("curve", "water", "--temp", temp);
        Assert.Equal(mbar, j.GetProperty("vapor_pressure_mbar").GetDouble(), mbar * 0.002);
        Assert.False(j.GetProperty("extrapolated").GetBoolean());
        Assert.Contains("Wagner", j.GetProperty("source").GetString());
    }

    [Fact]
    public void Curve_at_a_pressure_gives_the_boiling_temperature()
    {
        // IAPWS-IF97: water saturates at 45.81 °C at 10 kPa.
        var j = CliRunner.Json("curve", "water", "--at", "100mbar");
        Assert.Equal(45.81, j.GetProperty("boiling_temperature_c").GetDouble(), 0.05);
        Assert.Equal(100.0, j.GetProperty("pressure_mbar").GetDouble(), 1e-9);
        // A gauge reading: −0.9 barg at 1013.25 mbar is 113.25 mbar absolute.
        var g = CliRunner.Json("curve", "water", "--at", "-0.9barg");
        Assert.Equal(113.25, g.GetProperty("pressure_mbar").GetDouble(), 1e-6);
    }

    [Fact]
    public void Solvents_lists_the_library_with_names_and_CAS()
    {
        var j = CliRunner.Json("solvents");
        var list = j.GetProperty("solvents").EnumerateArray().ToList();
        Assert.True(list.Count >= 60);
        Assert.Contains(list, s => s.GetProperty("cas").GetString() == "7732-18-5" && s.GetProperty("name").GetString() == "water");
    }

    [Fact]
    public void Text_output_honours_the_pressure_unit()
    {
        var r = CliRunner.Run("setpoints", "water", "--unit", "Torr");
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Torr", r.Output);
        Assert.Contains("Cautions:", r.Output);
        Assert.Contains("SDS", r.Output);
    }
}
