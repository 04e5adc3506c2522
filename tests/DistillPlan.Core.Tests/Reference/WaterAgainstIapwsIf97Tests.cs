namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// Water in the library against the IAPWS-IF97 Region 4 saturation-pressure equation, typed here
/// independently of the library (the library's first water curve is Wagner and Pruss 1993).
/// </summary>
public class WaterAgainstIapwsIf97Tests
{
    public static TheoryData<double> EveryKelvinFrom1To150C()
    {
        var data = new TheoryData<double>();
        for (int c = 1; c <= 150; c++) data.Add(273.15 + c);
        return data;
    }

    [Theory]
    [MemberData(nameof(EveryKelvinFrom1To150C))]
    public void Water_vapour_pressure_agrees_with_IAPWS_IF97_within_0_2_percent(double temperatureK)
    {
        var water = ShippedLibrary.Instance.Find("water");
        var result = water.VaporPressure.SaturationPressure(temperatureK);
        double reference = IapwsIf97.SaturationPressurePa(temperatureK);
        Assert.False(result.Extrapolated);
        Assert.InRange(result.PressurePa / reference - 1, -0.002, 0.002);
    }

    [Theory]
    // IAPWS R7-97(2012), Table 35 (computer-program verification values for eq. 30)
    [InlineData(300, 0.353658941e-2)]
    [InlineData(500, 0.263889776e1)]
    [InlineData(600, 0.123443146e2)]
    public void The_typed_IF97_equation_reproduces_the_release_check_values(double temperatureK, double pressureMPa)
    {
        Assert.Equal(pressureMPa, IapwsIf97.SaturationPressurePa(temperatureK) / 1e6, pressureMPa * 1e-8);
    }

    [Fact]
    public void Water_boils_at_the_IF97_saturation_temperature_at_one_atmosphere()
    {
        var water = ShippedLibrary.Instance.Find("water");
        // IAPWS-IF97 Region 4 at 101325 Pa: 373.1243 K (python3-iapws _TSat_P(0.101325))
        Assert.Equal(373.1243, water.VaporPressure.SaturationTemperature(101325).TemperatureK, 0.01);
    }
}
