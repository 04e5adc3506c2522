namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// Antoine equation, log10(P/p_unit) = A − B/(T/t_unit + C), or its natural-log form
/// ln(P/p_unit) = A − B/(T/t_unit + C).
/// A [-], B [t_unit], C [t_unit]; p_unit is the pressure unit the constants were fitted in
/// (Pa, kPa, bar, mmHg …) and t_unit is K or °C; both are part of the entry.
/// Valid over the authors' fitted range only; it diverges near T = −C.
/// Source of the form: Antoine, C. R. Acad. Sci. 107 (1888) 681.
/// Example (Poling 2001, App. A, ethyl acetate: A 9.13361, B 1195.13, C −60.68, Pa, K):
/// P(350.25 K) = 10^(9.13361 − 1195.13/289.57) = 101.47 kPa.
/// </summary>
public sealed class Antoine : IVaporPressureCurve
{
    /// <summary>True for log10 form, false for natural-log form.</summary>
    public required bool Log10 { get; init; }
    /// <summary>Constant A [-].</summary>
    public required double A { get; init; }
    /// <summary>Constant B [t_unit].</summary>
    public required double B { get; init; }
    /// <summary>Constant C [t_unit].</summary>
    public required double C { get; init; }
    /// <summary>One pressure unit of the fit, in pascal.</summary>
    public double PressureUnitPa { get; init; } = 1.0;
    /// <summary>True when the fit takes T in °C rather than K.</summary>
    public bool CelsiusScale { get; init; }
    /// <inheritdoc />
    public string Form => Log10 ? "antoine-log10" : "antoine-ln";
    /// <inheritdoc />
    public required string Source { get; init; }
    /// <inheritdoc />
    public required double TMinK { get; init; }
    /// <inheritdoc />
    public required double TMaxK { get; init; }
    /// <inheritdoc />
    public CurveEstimate? Estimate { get; init; }

    private double Base => Log10 ? 10.0 : Math.E;
    private double Offset => CelsiusScale ? PhysicalConstants.ZeroCelsiusK : 0.0;

    /// <inheritdoc />
    public double PressurePa(double temperatureK)
    {
        double t = temperatureK - Offset;
        return PressureUnitPa * Math.Pow(Base, A - B / (t + C));
    }

    /// <inheritdoc />
    public double TemperatureK(double pressurePa)
    {
        // Closed form: T = B/(A − log(P/p_unit)) − C.
        double logP = Log10 ? Math.Log10(pressurePa / PressureUnitPa) : Math.Log(pressurePa / PressureUnitPa);
        if (logP >= A)
            throw new OutOfRangeException(Source, Form, $"{pressurePa:G4} Pa is beyond the reach of this Antoine fit");
        return B / (A - logP) - C + Offset;
    }
}
