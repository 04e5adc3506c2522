using DistillPlan.Core;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Tests.Quantities;

public class ParsingTests
{
    private static readonly Pressure Standard = Pressure.FromPascal(101325);

    [Theory]
    // Unit sizes: BIPM SI brochure; torr = 101325/760 Pa; mmHg 133.322387415 Pa, inHg 3386.389 Pa, psi 6894.757 Pa (NIST SP 811).
    [InlineData("25mbar", 2500)]
    [InlineData("25", 2500)]
    [InlineData("15 Torr", 1999.8355)]
    [InlineData("15 mmHg", 1999.8358)]
    [InlineData("2.5kPa", 2500)]
    [InlineData("0.1 bar", 10000)]
    [InlineData("1 atm", 101325)]
    [InlineData("1 psia", 6894.757)]
    [InlineData("29.92 inHg", 101320.76)]
    [InlineData("-0.95barg", 6325)]          // 101325 − 95000
    [InlineData("-950 mbarg", 6325)]
    [InlineData("28 inHgV", 6506.1)]         // 101325 − 28·3386.389
    public void Pressures_parse_as_people_write_them(string text, double pascal) =>
        Assert.Equal(pascal, PressureUnits.Parse(text, "--at", Standard).Pascal, 0.05);

    [Theory]
    [InlineData("12 parsecs")]
    [InlineData("abc")]
    [InlineData("")]
    [InlineData("0")]
    [InlineData("-5 mbar")]
    [InlineData("-1.5barg")]
    public void Bad_pressures_are_refused_with_the_field_named(string text)
    {
        var e = Assert.ThrowsAny<InputException>(() => PressureUnits.Parse(text, "--pump-limit", Standard));
        Assert.StartsWith("--pump-limit:", e.Message);
        Assert.DoesNotContain("\n", e.Message);
    }

    [Theory]
    [InlineData("40", 313.15)]
    [InlineData("40C", 313.15)]
    [InlineData("40 °C", 313.15)]
    [InlineData("313.15K", 313.15)]
    [InlineData("104F", 313.15)]
    [InlineData("-40F", 233.15)]
    public void Temperatures_parse_in_C_K_and_F(string text, double kelvin) =>
        Assert.Equal(kelvin, TemperatureUnits.Parse(text, "--temp").Kelvin, 1e-9);

    [Theory]
    [InlineData("-300")]
    [InlineData("-1K")]
    [InlineData("40 X")]
    [InlineData("warm")]
    public void Bad_temperatures_are_refused(string text) =>
        Assert.ThrowsAny<InputException>(() => TemperatureUnits.Parse(text, "--temp"));

    [Fact]
    public void Altitude_gives_the_ICAO_standard_atmosphere()
    {
        // Hand: 101325·(1 − 2.25577e−5·1000)^5.25588 = 89 875 Pa (ICAO standard atmosphere).
        Assert.Equal(89875, Pressure.AtAltitude(1000).Pascal, 2.0);
    }
}
