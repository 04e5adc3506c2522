namespace DistillPlan.Core.VaporPressure;

/// <summary>Enthalpy of vaporization of one substance as a function of temperature.</summary>
public interface IEnthalpyOfVaporization
{
    /// <summary>ΔHvap [J/mol] at T [K].</summary>
    double At(double temperatureK);
    /// <summary>Library key of the source.</summary>
    string Source { get; }
}

/// <summary>
/// DIPPR equation 106, ΔHvap/(J/mol) = C1·(1 − Tr)^(C2 + C3·Tr + C4·Tr²), Tr = T/Tc.
/// C1 [J/mol], C2..C4 [-], Tc [K]. Zero at and above Tc. Coefficients as in Perry's Chemical
/// Engineers' Handbook, 8th ed., Table 2-150.
/// Example (Perry 2-150, ethanol: Tc 514, C1 55789, C2 0.31245): ΔHvap(351.4 K) = 38.94 kJ/mol.
/// </summary>
public sealed class Dippr106 : IEnthalpyOfVaporization
{
    /// <summary>Critical temperature of the fit [K].</summary>
    public required double TcK { get; init; }
    /// <summary>C1 [J/mol].</summary>
    public required double C1 { get; init; }
    /// <summary>C2 [-].</summary>
    public required double C2 { get; init; }
    /// <summary>C3 [-].</summary>
    public double C3 { get; init; }
    /// <summary>C4 [-].</summary>
    public double C4 { get; init; }
    /// <inheritdoc />
    public required string Source { get; init; }

    /// <inheritdoc />
    public double At(double temperatureK)
    {
        double tr = temperatureK / TcK;
        return tr >= 1 ? 0 : C1 * Math.Pow(1 - tr, C2 + C3 * tr + C4 * tr * tr);
    }
}

/// <summary>
/// One ΔHvap value carried to other temperatures by Watson's rule,
/// ΔH2 = ΔH1·((1 − Tr2)/(1 − Tr1))^0.38 (Watson, Ind. Eng. Chem. 35 (1943) 398).
/// Without a critical temperature the value is used as it is.
/// </summary>
public sealed class WatsonEnthalpy : IEnthalpyOfVaporization
{
    /// <summary>Known ΔHvap [J/mol].</summary>
    public required double ValueJPerMol { get; init; }
    /// <summary>Temperature of the known value [K].</summary>
    public required double AtK { get; init; }
    /// <summary>Critical temperature [K], when known.</summary>
    public double? TcK { get; init; }
    /// <inheritdoc />
    public required string Source { get; init; }

    /// <inheritdoc />
    public double At(double temperatureK)
    {
        if (TcK is not double tc) return ValueJPerMol;
        if (temperatureK >= tc) return 0;
        return ValueJPerMol * Math.Pow((1 - temperatureK / tc) / (1 - AtK / tc), 0.38);
    }
}
