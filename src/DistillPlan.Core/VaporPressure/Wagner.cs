namespace DistillPlan.Core.VaporPressure;

/// <summary>
/// Wagner equation, ln(P/Pc) = (Tc/T)·Σ a_i·τ^n_i with τ = 1 − T/Tc.
/// The usual forms are "3,6" (exponents 1, 1.5, 3, 6), "2.5,5" (1, 1.5, 2.5, 5), and the
/// six-term form of Wagner and Pruß for water (1, 1.5, 3, 3.5, 4, 7.5).
/// a_i [-], Tc [K], Pc [Pa]. Valid from the fitted Tmin up to Tc; no vapour pressure above Tc.
/// Sources of the forms: Wagner, Cryogenics 13 (1973) 470; McGarry, Ind. Eng. Chem. Process
/// Des. Dev. 22 (1983) 313; Wagner and Pruß, J. Phys. Chem. Ref. Data 22 (1993) 783.
/// Example (Wagner–Pruß 1993, water): P(373.124 K) = 101.325 kPa.
/// </summary>
public sealed class Wagner : NumericallyInvertedCurve
{
    /// <summary>Critical temperature of the fit [K].</summary>
    public required double TcK { get; init; }
    /// <summary>Critical pressure of the fit [Pa].</summary>
    public required double PcPa { get; init; }
    /// <summary>Pairs of (coefficient a_i [-], exponent n_i of τ [-]).</summary>
    public required IReadOnlyList<(double Coefficient, double Exponent)> Terms { get; init; }
    /// <summary>The form's name as written in the library.</summary>
    public required string FormName { get; init; }
    /// <inheritdoc />
    public override string Form => FormName;

    /// <summary>The 3,6 form: ln(P/Pc) = (Aτ + Bτ^1.5 + Cτ^3 + Dτ^6)/Tr.</summary>
    public static IReadOnlyList<(double, double)> Form36(double a, double b, double c, double d) =>
        [(a, 1.0), (b, 1.5), (c, 3.0), (d, 6.0)];

    /// <summary>The 2.5,5 form: ln(P/Pc) = (Aτ + Bτ^1.5 + Cτ^2.5 + Dτ^5)/Tr.</summary>
    public static IReadOnlyList<(double, double)> Form255(double a, double b, double c, double d) =>
        [(a, 1.0), (b, 1.5), (c, 2.5), (d, 5.0)];

    /// <inheritdoc />
    public override double PressurePa(double temperatureK)
    {
        double tau = 1.0 - temperatureK / TcK;
        if (tau < 0)
            throw new OutOfRangeException(Source, Form, $"{temperatureK:F2} K is above the critical temperature {TcK:F2} K");
        double sum = 0;
        foreach (var (a, n) in Terms) sum += a * Math.Pow(tau, n);
        return PcPa * Math.Exp(sum * TcK / temperatureK);
    }

    /// <inheritdoc />
    protected override double UpperBoundK => TcK;
}
