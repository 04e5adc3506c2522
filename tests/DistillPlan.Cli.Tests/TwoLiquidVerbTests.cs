using System.Text.Json;

namespace DistillPlan.Cli.Tests;

/// <summary>Two liquid phases and the condensate rule as scripts see them (liquid_phases, phases, kind heterogeneous).</summary>
public class TwoLiquidVerbTests
{
    [Fact]
    public void Toluene_water_is_a_heteroazeotrope_near_the_handbook_temperature()
    {
        var j = CliRunner.Json("azeotrope", "toluene", "water");
        Assert.Equal("heterogeneous", j.GetProperty("kind").GetString());
        // CRC Handbook, "Azeotropic Data for Binary Mixtures" (after Horsley): toluene–water boils at 84.1 °C (from memory).
        Assert.Equal(84.1, j.GetProperty("temperature_c").GetDouble(), 1.5);
        Assert.Equal(2, j.GetProperty("liquid_phases").GetInt32());
        var phases = j.GetProperty("phases").EnumerateArray().ToList();
        Assert.Equal(2, phases.Count);
        Assert.Equal(1.0, phases.Sum(p => p.GetProperty("share").GetDouble()), 1e-4);
        // One layer nearly pure water, one nearly pure toluene (water dissolves < 0.1 wt % toluene; solubility tables, from memory).
        Assert.Contains(phases, p => p.GetProperty("mole_fractions").GetProperty("water").GetDouble() > 0.99);
        Assert.Contains(phases, p => p.GetProperty("mole_fractions").GetProperty("toluene").GetDouble() > 0.9);
    }

    [Fact]
    public void Wet_toluene_setpoints_carry_liquid_phases_and_phases()
    {
        var j = CliRunner.Json("setpoints", "toluene=50,water=50", "--basis", "mole");
        Assert.Equal(2, j.GetProperty("liquid_phases").GetInt32());
        Assert.Equal(2, j.GetProperty("phases").GetArrayLength());
        Assert.Equal("dortmund", j.GetProperty("model").GetString());
        // IAPWS-IF97 water (73.85 mbar) + toluene by the NIST WebBook Antoine (78.83 mbar) at 40 °C = 152.7 mbar; not 317.7.
        Assert.Equal(152.7, j.GetProperty("vacuum_setpoint_mbar").GetDouble(), 1.6);
        Assert.Contains(j.GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "two-liquids");
        var text = CliRunner.Run("setpoints", "toluene=50,water=50", "--basis", "mole");
        Assert.Contains("two liquid phases", text.Output);
    }

    [Fact]
    public void A_one_liquid_plan_says_liquid_phases_1_without_phases()
    {
        var j = CliRunner.Json("setpoints", "ethanol=50,water=50");
        Assert.Equal(1, j.GetProperty("liquid_phases").GetInt32());
        Assert.False(j.TryGetProperty("phases", out _));
    }

    [Fact]
    public void The_mixture_verb_reports_the_two_layers_of_wet_toluene()
    {
        var j = CliRunner.Json("mixture", "toluene=50,water=50", "--basis", "mole", "--at", "100mbar");
        Assert.Equal(2, j.GetProperty("liquid_phases").GetInt32());
        Assert.Equal(2, j.GetProperty("phases").GetArrayLength());
        // Psat,water(IAPWS-IF97) + Psat,toluene(NIST WebBook Antoine) = 100 mbar at about 31.7 °C (issue 8's check value).
        Assert.Equal(31.7, j.GetProperty("bubble_temperature_c").GetDouble(), 0.5);
    }

    [Theory]
    [InlineData("diethyl-ether=10,dmso=90")]
    [InlineData("dichloromethane=10,dmf=90")]
    public void Ether_or_DCM_in_a_high_boiler_is_not_sent_uncondensed_to_the_pump(string charge)
    {
        var j = CliRunner.Json("setpoints", charge);
        Assert.Equal("condensate-capture", j.GetProperty("limiting_constraint").GetString());
        Assert.DoesNotContain(j.GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "condenser-breakthrough");
        foreach (var step in j.GetProperty("ramp").EnumerateArray())
            Assert.DoesNotContain(step.GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "condenser-breakthrough");
    }
}
