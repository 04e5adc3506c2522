using System.Globalization;
using System.Text.RegularExpressions;

namespace DistillPlan.Core.Quantities;

/// <summary>Splits "12.5 mbar" into its number and its unit text; shared by the unit parsers.</summary>
internal static partial class QuantityText
{
    [GeneratedRegex(@"^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*([^\d\s][^\s]*(?:\s+[^\s]+)?)?\s*$")]
    private static partial Regex NumberAndUnit();

    /// <summary>The number and the unit (empty when none) of a quantity written by a user.</summary>
    public static (double Number, string Unit) Split(string text, string field, string allowed)
    {
        var m = NumberAndUnit().Match(text ?? "");
        if (!m.Success || !double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double number)
            || !double.IsFinite(number))
            throw new InputException(field, text ?? "", allowed);
        return (number, m.Groups[2].Value.Replace(" ", ""));
    }
}
