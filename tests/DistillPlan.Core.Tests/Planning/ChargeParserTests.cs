using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;

namespace DistillPlan.Core.Tests.Planning;

public class ChargeParserTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    [Theory]
    [InlineData("ethyl-acetate")]
    [InlineData("ethyl acetate")]
    [InlineData("Ethyl_Acetate")]
    [InlineData("EtOAc")]
    [InlineData("141-78-6")]
    public void Names_aliases_and_CAS_numbers_all_find_ethyl_acetate(string text) =>
        Assert.Equal("141-78-6", ChargeParser.Parse(text, Basis.Volume, Library).Components[0].Solvent.Cas);

    [Fact]
    public void Volumes_become_moles_with_density_and_molar_mass()
    {
        var c = ChargeParser.Parse("water=18.015mL", Basis.Volume, Library);
        var water = c.Components[0].Solvent;
        // n = V·ρ/M with the library's CRC density and molar mass.
        Assert.Equal(18.015e-6 * water.LiquidDensityKgPerM3!.Value / (water.MolarMassGPerMol / 1000), c.Components[0].Moles, 1e-9);
        Assert.False(c.IsRelative);
    }

    [Fact]
    public void Bare_numbers_are_parts_on_the_basis_and_are_normalised()
    {
        var c = ChargeParser.Parse("benzene=1,toluene=1", Basis.Mole, Library);
        Assert.Equal([0.5, 0.5], c.MoleFractions());
        var m = ChargeParser.Parse("ethanol=50,water=50", Basis.Mass, Library);
        // 50 g ethanol (46.07 g/mol) and 50 g water (18.015 g/mol): x_EtOH = 1.0853/(1.0853 + 2.7755) = 0.281.
        Assert.Equal(0.281, m.MoleFractions()[0], 0.001);
    }

    [Theory]
    [InlineData("ethanol=90%,water=5%", "add to 95")]
    [InlineData("ethanol=-5,water=10", "above zero")]
    [InlineData("ethanol=abc", "a number of parts")]
    [InlineData("ethanol=5 parsecs", "a number of parts")]
    [InlineData("ethanol,water", "an amount for every solvent")]
    [InlineData("ethanol=1,ethanol=2", "each solvent once")]
    [InlineData("unobtainium=5", "not in the library")]
    [InlineData("ethanol=10%,water=20", "do not mix")]
    public void Bad_charges_say_what_is_wrong(string text, string fragment)
    {
        var e = Assert.ThrowsAny<InputException>(() => ChargeParser.Parse(text, Basis.Volume, Library));
        Assert.Contains(fragment, e.Message);
    }

    [Fact]
    public void An_unknown_name_suggests_the_nearest_ones()
    {
        var e = Assert.Throws<UnknownSolventException>(() => Library.Find("ethyl acetat"));
        Assert.Equal("ethyl acetate", e.Suggestions[0]);
        var t = Assert.Throws<UnknownSolventException>(() => Library.Find("tolune"));
        Assert.Contains("toluene", t.Suggestions);
    }
}
