using System.Text.Json;

namespace DistillPlan.Cli.Tests;

/// <summary>The mixture verbs (docs/interface.md) against published data.</summary>
public class MixtureVerbTests
{
    [Fact]
    public void Ethanol_water_has_its_minimum_boiling_azeotrope_near_the_handbook_point()
    {
        var j = CliRunner.Json("azeotrope", "ethanol", "water");
        Assert.True(j.GetProperty("azeotrope").GetBoolean());
        Assert.Equal("minimum-boiling", j.GetProperty("kind").GetString());
        // CRC Handbook, "Azeotropic Data for Binary Mixtures" (after Horsley): 78.2 °C, 0.894 mole fraction ethanol (from memory).
        Assert.Equal(78.2, j.GetProperty("temperature_c").GetDouble(), 1.5);
        Assert.Equal(0.894, j.GetProperty("mole_fraction").GetProperty("ethanol").GetDouble(), 0.05);
        Assert.Equal("dortmund", j.GetProperty("model").GetString());
    }

    [Fact]
    public void Chloroform_acetone_has_a_maximum_boiling_azeotrope()
    {
        var j = CliRunner.Json("azeotrope", "chloroform", "acetone");
        Assert.Equal("maximum-boiling", j.GetProperty("kind").GetString());
        // CRC Handbook azeotrope table (after Horsley): 64.5 °C, 0.66 mole fraction chloroform (from memory).
        Assert.Equal(64.5, j.GetProperty("temperature_c").GetDouble(), 1.5);
        Assert.Equal(0.66, j.GetProperty("mole_fraction").GetProperty("chloroform").GetDouble(), 0.05);
    }

    [Fact]
    public void Benzene_toluene_bubble_point_matches_published_VLE()
    {
        var j = CliRunner.Json("mixture", "benzene=50,toluene=50", "--basis", "mole", "--at", "1013.25mbar");
        // Benzene–toluene at 101.325 kPa, x_benzene = 0.5: bubble point 92.2 °C (textbook isobaric data, e.g. Geankoplis; from memory).
        Assert.Equal(92.2, j.GetProperty("bubble_temperature_c").GetDouble(), 1.0);
        Assert.True(j.GetProperty("dew_temperature_c").GetDouble() > j.GetProperty("bubble_temperature_c").GetDouble());
        double ySum = j.GetProperty("vapor").EnumerateObject().Sum(p => p.Value.GetDouble());
        Assert.Equal(1.0, ySum, 1e-4);
    }

    [Fact]
    public void The_strip_of_column_fractions_falls_in_pressure_and_ends_rich_in_heptane()
    {
        var j = CliRunner.Json("strip", "ethyl-acetate=100mL,heptane=100mL");
        var steps = j.GetProperty("steps").EnumerateArray().ToList();
        Assert.True(steps.Count > 5);
        var p = steps.Select(s => s.GetProperty("pressure_mbar").GetDouble()).ToList();
        for (int i = 1; i < p.Count; i++) Assert.True(p[i] <= p[i - 1], $"pressure rose at step {i}: {p[i - 1]} → {p[i]}");
        var first = steps[0].GetProperty("liquid");
        var last = steps[^1].GetProperty("liquid");
        Assert.True(last.GetProperty("heptane").GetDouble() > first.GetProperty("heptane").GetDouble());
        Assert.False(string.IsNullOrEmpty(j.GetProperty("end_reason").GetString()));
    }

    [Fact]
    public void Strip_keeps_distillate_plus_residue_equal_to_the_charge()
    {
        var j = CliRunner.Json("strip", "thf=12L,toluene=3L");
        var charge = j.GetProperty("charge_mol");
        foreach (var step in j.GetProperty("steps").EnumerateArray())
            foreach (var c in charge.EnumerateObject())
            {
                double sum = step.GetProperty("distillate_mol").GetProperty(c.Name).GetDouble() + step.GetProperty("residue_mol").GetProperty(c.Name).GetDouble();
                Assert.Equal(c.Value.GetDouble(), sum, c.Value.GetDouble() * 1e-5);
            }
        // THF is a peroxide former: the strip keeps a residue.
        Assert.Equal("minimum-residue-reached", CliRunner.Json("strip", "thf=12L,toluene=3L", "--end", "dry").GetProperty("end_reason").GetString());
    }

    [Fact]
    public void Aqueous_ethanol_setpoints_carry_the_azeotrope_check()
    {
        var j = CliRunner.Json("setpoints", "ethanol=90,water=10");
        var az = j.GetProperty("checks").EnumerateArray().Single(c => c.GetProperty("code").GetString() == "azeotrope");
        Assert.Contains("ethanol", az.GetProperty("message").GetString());
        Assert.Contains("water", az.GetProperty("action").GetString());
    }

    [Theory]
    [InlineData("percentages", "setpoints", "ethanol=90%,water=5%")]
    [InlineData("above zero", "setpoints", "ethanol=-5,water=10")]
    [InlineData("not in the library", "mixture", "ethanol=5,kryptonite=5")]
    [InlineData("azeotrope", "azeotrope", "ethanol")]
    [InlineData("two or more", "mixture", "ethanol")]
    [InlineData("--model", "mixture", "ethanol=1,water=1", "--model", "nrtl")]
    [InlineData("--end", "strip", "ethanol=1,water=1", "--end", "someday")]
    public void Bad_charges_give_one_line_and_exit_code_2(string mentions, params string[] args)
    {
        var r = CliRunner.Run(args);
        Assert.Equal(2, r.ExitCode);
        Assert.DoesNotContain("\n", r.Error.TrimEnd('\n'));
        Assert.Contains(mentions, r.Error);
    }
}

/// <summary>A strip with a dissolved product (demo amounts of an invented product).</summary>
public class StripWithProductTests
{
    [Fact]
    public void A_non_volatile_product_stays_in_the_residue_and_lowers_the_pressure()
    {
        var with = CliRunner.Json("strip", "water=100mL,ethanol=50mL", "--product-mass", "20g", "--product-molar-mass", "350", "--end", "left=10%");
        var steps = with.GetProperty("steps").EnumerateArray().ToList();
        foreach (var s in steps) Assert.Equal(0.0, s.GetProperty("distillate_mol").GetProperty("product").GetDouble(), 1e-12);
        Assert.Equal(20.0 / 350, steps[^1].GetProperty("residue_mol").GetProperty("product").GetDouble(), 1e-6);
    }
}
