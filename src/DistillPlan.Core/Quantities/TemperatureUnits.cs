namespace DistillPlan.Core.Quantities;

/// <summary>Parses temperatures as people write them: <c>40</c>, <c>40C</c>, <c>40 °C</c>, <c>313.15K</c>, <c>104F</c>.</summary>
public static class TemperatureUnits
{
    /// <summary>What the parser accepts, for error messages.</summary>
    public const string AllowedText = "a number with C, °C, K or F (a bare number is °C), above absolute zero";

    /// <summary>Parses a temperature; a bare number is °C.</summary>
    /// <param name="text">What the user wrote.</param>
    /// <param name="field">The option name, for the error message.</param>
    public static Temperature Parse(string text, string field)
    {
        var (number, unit) = QuantityText.Split(text, field, AllowedText);
        double kelvin = unit.ToUpperInvariant() switch
        {
            "" or "C" or "°C" or "DEGC" or "ºC" => number + PhysicalConstants.ZeroCelsiusK,
            "K" => number,
            "F" or "°F" or "DEGF" => (number - 32) * 5.0 / 9.0 + PhysicalConstants.ZeroCelsiusK,
            _ => throw new InputException(field, text, AllowedText),
        };
        if (!(kelvin > 0))
            throw new InputException(field, text, "a temperature above absolute zero (-273.15 °C, 0 K)");
        return Temperature.FromKelvin(kelvin);
    }

    /// <summary>Parses a temperature difference in K (a bare number, or with K or C).</summary>
    public static TemperatureDifference ParseDifference(string text, string field)
    {
        const string allowed = "a positive temperature difference in K (e.g. 20 or 20K)";
        var (number, unit) = QuantityText.Split(text, field, allowed);
        if (unit.ToUpperInvariant() is not ("" or "K" or "C" or "°C") || !(number > 0) || number > 200)
            throw new InputException(field, text, allowed + ", at most 200 K");
        return new TemperatureDifference(number);
    }
}
