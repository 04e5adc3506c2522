namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The IAPWS-IF97 Region 4 saturation-pressure equation, typed here independently of the library
/// (IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997, eq. 30, Table 34).
/// </summary>
public static class IapwsIf97
{
    // Coefficients n1..n10 of the saturation equation (Table 34). Checked against Debian's
    // python3-iapws (iapws97._PSat_T) to 5e-15 relative, 274-423 K.
    private static readonly double[] N =
    [
        0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
        0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
    ];

    /// <summary>IAPWS-IF97 eq. 30: saturation pressure [Pa] at T [K], 273.15 K to 647.096 K.</summary>
    public static double SaturationPressurePa(double t)
    {
        double theta = t + N[8] / (t - N[9]);
        double a = theta * theta + N[0] * theta + N[1];
        double b = N[2] * theta * theta + N[3] * theta + N[4];
        double c = N[5] * theta * theta + N[6] * theta + N[7];
        double p = 2 * c / (-b + Math.Sqrt(b * b - 4 * a * c));
        return Math.Pow(p, 4) * 1e6;   // the equation gives MPa
    }
}
