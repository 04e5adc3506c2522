namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// Water in the library against the IAPWS-IF97 Region 4 saturation-pressure equation, typed here
/// independently of the library (the library's first water curve is Wagner and Pruss 1993).
/// </summary>
public class WaterAgainstIapwsIf97Tests
{
    // IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997, Table 34:
    // coefficients n1..n10 of the saturation equation (eq. 29b/30). Checked against Debian's
    // python3-iapws (iapws97._PSat_T) to 5e-15 relative, 274-423 K.
    private static readonly double[] N =
    [
        0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
        0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
    ];

    /// <summary>IAPWS-IF97 eq. 30: saturation pressure [Pa] at T [K], 273.15 K to 647.096 K.</summary>
    internal static double If97SaturationPressurePa(double t)
    {
        double theta = t + N[8] / (t - N[9]);
        double a = theta * theta + N[0] * theta + N[1];
        double b = N[2] * theta * theta + N[3] * theta + N[4];
        double c = N[5] * theta * theta + N[6] * theta + N[7];
        double p = 2 * c / (-b + Math.Sqrt(b * b - 4 * a * c));
        return Math.Pow(p, 4) * 1e6;   // the equation gives MPa
    }

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
        double reference = If97SaturationPressurePa(temperatureK);
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
        Assert.Equal(pressureMPa, If97SaturationPressurePa(temperatureK) / 1e6, pressureMPa * 1e-8);
    }

    [Fact]
    public void Water_boils_at_the_IF97_saturation_temperature_at_one_atmosphere()
    {
        var water = ShippedLibrary.Instance.Find("water");
        // IAPWS-IF97 Region 4 at 101325 Pa: 373.1243 K (python3-iapws _TSat_P(0.101325))
        Assert.Equal(373.1243, water.VaporPressure.SaturationTemperature(101325).TemperatureK, 0.01);
    }
}
