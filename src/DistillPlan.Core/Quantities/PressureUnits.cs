using System.Globalization;

namespace DistillPlan.Core.Quantities;

/// <summary>A pressure unit people type and read: its symbol and its size in pascal.</summary>
/// <param name="Symbol">How it is written on output (mbar, Torr …).</param>
/// <param name="Pascal">One unit in pascal.</param>
/// <param name="Decimals">How many decimals a reading in this unit usually needs.</param>
public sealed record PressureUnit(string Symbol, double Pascal, int Decimals);

/// <summary>
/// The pressure units DistillPlan reads and writes. Sizes are the exact definitions
/// (BIPM SI brochure; mmHg and inHg conventional values of ISO 80000-4 / NIST SP 811).
/// </summary>
public static class PressureUnits
{
    /// <summary>pascal.</summary>
    public static readonly PressureUnit Pascal = new("Pa", 1, 0);
    /// <summary>hectopascal (= mbar).</summary>
    public static readonly PressureUnit Hectopascal = new("hPa", 100, 1);
    /// <summary>millibar, the default of the interface.</summary>
    public static readonly PressureUnit Millibar = new("mbar", 100, 1);
    /// <summary>kilopascal.</summary>
    public static readonly PressureUnit Kilopascal = new("kPa", 1000, 2);
    /// <summary>megapascal.</summary>
    public static readonly PressureUnit Megapascal = new("MPa", 1e6, 4);
    /// <summary>bar.</summary>
    public static readonly PressureUnit Bar = new("bar", 1e5, 4);
    /// <summary>torr, 101325/760 Pa exactly.</summary>
    public static readonly PressureUnit Torr = new("Torr", 101325.0 / 760.0, 1);
    /// <summary>conventional millimetre of mercury, 133.322387415 Pa.</summary>
    public static readonly PressureUnit MillimetreMercury = new("mmHg", 133.322387415, 1);
    /// <summary>conventional inch of mercury, 3386.389 Pa.</summary>
    public static readonly PressureUnit InchMercury = new("inHg", 3386.389, 2);
    /// <summary>pound-force per square inch, 6894.757293168 Pa.</summary>
    public static readonly PressureUnit Psi = new("psia", 6894.757293168, 3);
    /// <summary>standard atmosphere, 101325 Pa.</summary>
    public static readonly PressureUnit Atmosphere = new("atm", 101325, 4);

    /// <summary>Absolute units by every spelling accepted on input (lower case).</summary>
    private static readonly Dictionary<string, PressureUnit> Absolute = new(StringComparer.OrdinalIgnoreCase)
    {
        ["pa"] = Pascal, ["hpa"] = Hectopascal, ["mbar"] = Millibar, ["mbara"] = Millibar,
        ["kpa"] = Kilopascal, ["kpaa"] = Kilopascal, ["mpa"] = Megapascal,
        ["bar"] = Bar, ["bara"] = Bar, ["torr"] = Torr, ["mmhg"] = MillimetreMercury,
        ["inhg"] = InchMercury, ["psi"] = Psi, ["psia"] = Psi, ["atm"] = Atmosphere,
    };

    /// <summary>Gauge units (reading relative to the local atmosphere) by spelling.</summary>
    private static readonly Dictionary<string, PressureUnit> Gauge = new(StringComparer.OrdinalIgnoreCase)
    {
        ["barg"] = Bar, ["mbarg"] = Millibar, ["kpag"] = Kilopascal, ["psig"] = Psi,
    };

    /// <summary>Vacuum-gauge units: a positive reading below the local atmosphere.</summary>
    private static readonly Dictionary<string, PressureUnit> Vacuum = new(StringComparer.OrdinalIgnoreCase)
    {
        ["inhgv"] = InchMercury, ["inhgvac"] = InchMercury, ["mmhgv"] = MillimetreMercury,
    };

    /// <summary>Units that <c>--unit</c> accepts for display.</summary>
    public static IReadOnlyList<PressureUnit> Display { get; } =
        [Millibar, Hectopascal, Pascal, Kilopascal, Bar, Torr, MillimetreMercury, InchMercury, Psi, Atmosphere];

    /// <summary>Highest pressure read from a user [Pa]: 1000 bar, ten times any solvent's critical pressure.</summary>
    public const double MaxPascal = 1e8;

    /// <summary>What the parser accepts, for error messages.</summary>
    public const string AllowedText =
        "a number with a unit: mPa, Pa, hPa, mbar, kPa, MPa, bar, Torr, mmHg, inHg, psia, atm (absolute), " +
        "barg, mbarg, kPag, psig (gauge), inHgV (inches of mercury vacuum); a bare number is mbar";

    /// <summary>The display unit for a symbol given to <c>--unit</c>.</summary>
    public static PressureUnit ForDisplay(string symbol, string field = "--unit") =>
        Display.FirstOrDefault(u => string.Equals(u.Symbol, symbol, StringComparison.OrdinalIgnoreCase)
                                    || (symbol.Equals("psi", StringComparison.OrdinalIgnoreCase) && u == Psi))
        ?? throw new InputException(field, symbol, "one of " + string.Join(", ", Display.Select(u => u.Symbol)));

    /// <summary>A pressure in a unit, with the unit's usual decimals and its symbol.</summary>
    public static string Format(Pressure p, PressureUnit unit)
    {
        double value = p.Pascal / unit.Pascal;
        // Low readings need more decimals to stay meaningful (1.2 mbar, 0.05 mbar); below 1 unit
        // keep at least three significant figures so 0.0001 mbar never reads "0.000".
        int decimals = unit.Decimals + (value < 1 ? 2 : value < 10 ? 1 : 0);
        if (value > 0 && value < 1) decimals = Math.Max(decimals, Math.Min(12, 2 - (int)Math.Floor(Math.Log10(value))));
        return value.ToString("F" + decimals, CultureInfo.InvariantCulture) + " " + unit.Symbol;
    }

    /// <summary>
    /// Parses a pressure as people write it: <c>25mbar</c>, <c>15 Torr</c>, <c>2.5kPa</c>,
    /// <c>-0.95barg</c>, <c>28 inHgV</c>; a bare number is mbar. Gauge and vacuum readings are
    /// converted to absolute with the local atmospheric pressure.
    /// </summary>
    /// <param name="text">What the user wrote.</param>
    /// <param name="field">The option name, for the error message.</param>
    /// <param name="atmosphere">Local atmospheric pressure, for gauge readings.</param>
    public static Pressure Parse(string text, string field, Pressure atmosphere)
    {
        var (number, unitText) = QuantityText.Split(text, field, AllowedText);
        // Case decides between milli- and mega-pascal: "mPa" is a thousandth of a pascal, "MPa" a
        // million; any other spelling of the two is refused rather than guessed.
        if (unitText.Equals("mpa", StringComparison.OrdinalIgnoreCase) && unitText is not ("mPa" or "MPa"))
            throw new InputException(field, text, "mPa (millipascal) or MPa (megapascal), written with that case");
        double pascal;
        if (unitText.Length == 0) pascal = number * Millibar.Pascal;
        else if (unitText == "mPa") pascal = number * 1e-3;
        else if (Absolute.TryGetValue(unitText, out var abs)) pascal = number * abs.Pascal;
        else if (Gauge.TryGetValue(unitText, out var g)) pascal = atmosphere.Pascal + number * g.Pascal;
        else if (Vacuum.TryGetValue(unitText, out var v)) pascal = atmosphere.Pascal - number * v.Pascal;
        else throw new InputException(field, text, AllowedText);

        if (!(pascal > 0))
            throw new InputException(field, text, "an absolute pressure above zero (a gauge reading adds the local atmosphere, " +
                Format(atmosphere, Millibar) + ")");
        if (!(pascal <= MaxPascal))
            throw new InputException(field, text, $"an absolute pressure of at most {MaxPascal / 1e5:0} bar (no solvent boils above its critical pressure, all of them below 100 bar)");
        return Pressure.FromPascal(pascal);
    }
}
