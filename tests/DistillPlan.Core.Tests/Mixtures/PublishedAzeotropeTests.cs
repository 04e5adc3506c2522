using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// Where the models contradict published azeotrope data, the search uses and cites the published
/// value. Published values: CRC Handbook, "Azeotropic Data for Binary Mixtures", after Horsley,
/// Adv. Chem. Ser. 116 (1973) - from memory; mass fractions converted with the library's molar masses.
/// </summary>
public class PublishedAzeotropeTests
{
    private const double OneAtmospherePa = 101325.0;

    [Fact]
    public void Thf_water_reports_the_published_azeotrope_and_says_the_model_disagrees()
    {
        // Published: 63.8 °C, about 95 wt % THF (x_THF = 0.826).
        var result = AzeotropeSearch.Find(TestSolvents.ByName("tetrahydrofuran"), TestSolvents.Water, OneAtmospherePa);

        var azeotrope = Assert.Single(result.Azeotropes);
        Assert.True(result.UsesPublishedValue);
        Assert.Equal(63.8 + 273.15, azeotrope.TemperatureK, 0.01);
        Assert.Equal(0.826, azeotrope.MoleFractions["tetrahydrofuran"], 0.002);
        Assert.Equal(AzeotropeKind.MinimumBoiling, azeotrope.Kind);
        Assert.NotNull(azeotrope.Source);
        Assert.Contains("disagrees", result.Note);
        Assert.NotEmpty(result.ModelAzeotropes); // what Dortmund said is kept for the record
    }

    [Fact]
    public void Dioxane_water_is_computed_by_the_model_where_it_agrees_with_the_handbook()
    {
        // Published: 87.8 °C, about 82 wt % 1,4-dioxane (x_dioxane = 0.482).
        var result = AzeotropeSearch.Find(TestSolvents.ByName("1,4-dioxane"), TestSolvents.Water, OneAtmospherePa);

        var azeotrope = Assert.Single(result.Azeotropes);
        Assert.False(result.UsesPublishedValue);
        Assert.NotNull(result.PublishedFact);
        Assert.Equal(87.8 + 273.15, azeotrope.TemperatureK, 1.0);
        Assert.Equal(0.482, azeotrope.MoleFractions["1,4-dioxane"], 0.03);
    }

    [Theory]
    [InlineData("acetone")]
    [InlineData("acetic acid")]
    public void Published_zeotropes_with_water_have_no_azeotrope(string solvent)
    {
        var result = AzeotropeSearch.Find(TestSolvents.ByName(solvent), TestSolvents.Water, OneAtmospherePa);

        Assert.False(result.Found);
        Assert.NotNull(result.PublishedFact);
        Assert.True(result.PublishedFact!.IsZeotropic);
    }

    [Fact]
    public void Acetic_acid_water_overrules_the_spurious_model_azeotrope_and_is_flagged_approximate()
    {
        var result = AzeotropeSearch.Find(TestSolvents.ByName("acetic acid"), TestSolvents.Water, OneAtmospherePa);

        Assert.True(result.UsesPublishedValue);
        Assert.NotEmpty(result.ModelAzeotropes);
        Assert.Contains("water the more volatile", result.Note);
        Assert.Contains("approximate", result.ApproximationNote);
    }

    [Fact]
    public void Under_vacuum_a_one_atmosphere_azeotrope_fact_is_mentioned_but_not_imposed()
    {
        var result = AzeotropeSearch.Find(TestSolvents.ByName("tetrahydrofuran"), TestSolvents.Water, 20000.0);

        Assert.False(result.UsesPublishedValue);
        Assert.Contains("other pressures", result.Note);
    }
}
