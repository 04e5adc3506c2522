namespace DistillPlan.Cli.Tests;

/// <summary>No boiling point below the melting point, and small pressures keep their figures.</summary>
public class FrozenAndPrecisionTests
{
    [Theory]
    // Water: triple point 611.657 Pa (IAPWS R7-97(2012)); below it ice sublimes. CRC melting point 0 °C.
    [InlineData("water", "5mbar", 0.0)]
    // DMSO: CRC melting point 18.5 °C; at 0.0001 mbar the liquid curve lies far below it.
    [InlineData("dmso", "0.0001mbar", 18.5)]
    // tert-Butanol: CRC melting point 25.8 °C; its liquid boils near 20 °C at about 40 mbar (Perry 2-8, by hand).
    [InlineData("tert-butanol", "20mbar", 25.8)]
    public void A_pressure_below_the_melting_point_gives_frozen_not_a_boiling_point(string solvent, string pressure, double meltingC)
    {
        var j = CliRunner.Json("curve", solvent, "--at", pressure);
        Assert.True(j.GetProperty("frozen").GetBoolean());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, j.GetProperty("boiling_temperature_c").ValueKind);
        Assert.Equal(meltingC, j.GetProperty("melting_point_c").GetDouble(), 0.3);
        var text = CliRunner.Run("curve", solvent, "--at", pressure).Output;
        Assert.Contains("would be frozen", text);
        Assert.DoesNotContain(" boils at ", text);
    }

    [Fact]
    public void Water_above_its_triple_point_still_boils()
    {
        // IAPWS-IF97: Psat(7.0 °C) = 10.02 mbar.
        var j = CliRunner.Json("curve", "water", "--at", "10mbar");
        Assert.False(j.GetProperty("frozen").GetBoolean());
        Assert.Equal(7.0, j.GetProperty("boiling_temperature_c").GetDouble(), 0.1);
    }

    [Fact]
    public void A_tiny_pump_pressure_keeps_its_significant_figures()
    {
        var j = CliRunner.Json("setpoints", "dmso", "--pump-limit", "0.0001mbar");
        Assert.Equal(0.0001, j.GetProperty("pump_ultimate_mbar").GetDouble(), 12);
        var text = CliRunner.Run("setpoints", "dmso", "--pump-limit", "0.0001mbar").Output;
        Assert.Contains("0.000100 mbar", text);
        Assert.DoesNotContain(" 0.000 mbar", text);
    }
}
