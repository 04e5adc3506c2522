namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The latent heat the heat model divides by (<c>Solvent.EnthalpyJPerMol</c>: Perry's Table 2-150
/// DIPPR-106 curve, or the vapour-pressure slope where the library has none) at the normal
/// boiling point, against IAPWS-IF97 for water and the CRC Handbook for organic solvents.
/// </summary>
public class LatentHeatAtBoilingPointTests
{
    [Fact]
    public void Water_latent_heat_at_100_C_agrees_with_IAPWS_IF97_within_half_a_percent()
    {
        // IAPWS-IF97 Region 4 at 373.15 K: h'' − h' = 2256.47 kJ/kg (python3-iapws 1.5,
        // IAPWS97(T=373.15, x=1).h − IAPWS97(T=373.15, x=0).h), × 18.015268 g/mol = 40.651 kJ/mol.
        var water = ShippedLibrary.Instance.Find("water");
        Assert.InRange(water.EnthalpyJPerMol(373.15) / (2256.47 * 18.015268) - 1, -0.005, 0.005);
    }

    [Theory]
    // IAPWS-IF97 saturated liquid and vapour (python3-iapws 1.5), kJ/kg: 25 °C 2441.7, 60 °C 2357.7.
    [InlineData(298.15, 2441.7)]
    [InlineData(333.15, 2357.7)]
    public void Water_latent_heat_below_the_boiling_point_agrees_with_IAPWS_IF97(double temperatureK, double kJPerKg)
    {
        var water = ShippedLibrary.Instance.Find("water");
        Assert.InRange(water.EnthalpyJPerMol(temperatureK) / (kJPerKg * 18.015268) - 1, -0.005, 0.005);
    }

    // CRC Handbook of Chemistry and Physics, "Enthalpy of Vaporization", ΔvapH at the normal
    // boiling point, kJ/mol — values FROM MEMORY, not re-checked against a printed copy; each is
    // evaluated at the CRC Tb the library carries. Tolerance 2 %: calorimetric ΔHvap at Tb is
    // usually known to better than 1 %, and Perry's DIPPR-106 fits are smoothed over the whole
    // liquid range.
    [Theory]
    [InlineData("water", 40.65)]
    [InlineData("ethanol", 38.56)]
    [InlineData("methanol", 35.21)]
    [InlineData("acetone", 29.10)]
    [InlineData("toluene", 33.18)]
    [InlineData("hexane", 28.85)]
    [InlineData("heptane", 31.77)]
    [InlineData("pentane", 25.79)]
    [InlineData("octane", 34.41)]
    [InlineData("tetrahydrofuran", 29.81)]
    [InlineData("ethyl acetate", 31.94)]
    [InlineData("dichloromethane", 28.06)]
    [InlineData("diethyl ether", 26.52)]
    [InlineData("benzene", 30.72)]
    [InlineData("chloroform", 29.24)]
    [InlineData("carbon tetrachloride", 29.82)]
    [InlineData("cyclohexane", 29.97)]
    [InlineData("acetonitrile", 29.75)]
    [InlineData("1-propanol", 41.44)]
    [InlineData("2-propanol", 39.85)]
    [InlineData("1-butanol", 43.29)]
    [InlineData("p-xylene", 35.67)]
    [InlineData("chlorobenzene", 35.19)]
    [InlineData("1,4-dioxane", 34.16)]
    [InlineData("pyridine", 35.09)]
    [InlineData("methyl acetate", 30.32)]
    [InlineData("2-butanone", 31.30)]
    [InlineData("carbon disulfide", 26.74)]
    [InlineData("triethylamine", 31.01)]
    public void Latent_heat_at_the_normal_boiling_point_agrees_with_the_CRC_within_2_percent(string solvent, double crcKJPerMol)
    {
        var s = ShippedLibrary.Instance.Find(solvent);
        double dh = s.EnthalpyJPerMol(s.NormalBoilingPointK);
        Assert.InRange(dh / (crcKJPerMol * 1000) - 1, -0.02, 0.02);
    }
}
