using System.Globalization;

namespace DistillPlan.Core.Quantities;

/// <summary>An absolute pressure, stored in pascal. Gauge readings are converted on entry.</summary>
public readonly record struct Pressure : IComparable<Pressure>
{
    private Pressure(double pascal) => Pascal = pascal;

    /// <summary>The absolute pressure [Pa].</summary>
    public double Pascal { get; }

    /// <summary>The absolute pressure [mbar] (= hPa).</summary>
    public double Millibar => Pascal / 100.0;

    /// <summary>From pascal; refuses zero, negative or non-finite absolute pressures.</summary>
    public static Pressure FromPascal(double pascal) =>
        double.IsFinite(pascal) && pascal > 0
            ? new Pressure(pascal)
            : throw new InputException("pressure", pascal.ToString("G6", CultureInfo.InvariantCulture) + " Pa",
                "an absolute pressure above zero");

    /// <summary>From millibar.</summary>
    public static Pressure FromMillibar(double mbar) => FromPascal(mbar * 100.0);

    /// <inheritdoc />
    public int CompareTo(Pressure other) => Pascal.CompareTo(other.Pascal);
    /// <summary>True when a is lower than b.</summary>
    public static bool operator <(Pressure a, Pressure b) => a.Pascal < b.Pascal;
    /// <summary>True when a is higher than b.</summary>
    public static bool operator >(Pressure a, Pressure b) => a.Pascal > b.Pascal;
    /// <summary>True when a is lower than or equal to b.</summary>
    public static bool operator <=(Pressure a, Pressure b) => a.Pascal <= b.Pascal;
    /// <summary>True when a is higher than or equal to b.</summary>
    public static bool operator >=(Pressure a, Pressure b) => a.Pascal >= b.Pascal;

    /// <summary>Shown in mbar.</summary>
    public override string ToString() => PressureUnits.Format(this, PressureUnits.Millibar);

    /// <summary>
    /// Local atmospheric pressure from altitude, ICAO standard atmosphere:
    /// P = 101325·(1 − 2.25577e−5·h/m)^5.25588 Pa, valid in the troposphere (below 11 km).
    /// Example: 1000 m gives 89 875 Pa.
    /// </summary>
    public static Pressure AtAltitude(double metres)
    {
        if (!double.IsFinite(metres) || metres < -500 || metres > 11000)
            throw new InputException("--altitude", metres.ToString(CultureInfo.InvariantCulture) + " m",
                "an altitude from -500 m to 11000 m (ICAO standard atmosphere, troposphere)");
        return FromPascal(PhysicalConstants.StandardAtmospherePa * Math.Pow(1 - 2.25577e-5 * metres, 5.25588));
    }
}
