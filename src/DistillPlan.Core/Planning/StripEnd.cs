using System.Globalization;

namespace DistillPlan.Core.Planning;

/// <summary>Where a strip is to end, as the user asked (<c>--end</c>).</summary>
public enum StripEndKind
{
    /// <summary>At what the pump can hold, or with 5 % of the charge left, whichever comes first.</summary>
    Default,
    /// <summary>With a fraction of the charge left (<c>left=10%</c>).</summary>
    FractionLeft,
    /// <summary>When one component is down to a liquid mole fraction (<c>residual=thf:0.01</c>).</summary>
    Residual,
    /// <summary>At what the pump can hold (<c>pump</c>).</summary>
    Pump,
    /// <summary>To dryness (<c>dry</c>); peroxide formers still keep their residue.</summary>
    Dry,
}

/// <summary>A strip's end condition.</summary>
/// <param name="Kind">Which end.</param>
/// <param name="Fraction">Fraction left, or the residual mole fraction.</param>
/// <param name="Component">The component of a residual target, as the user typed it.</param>
public sealed record StripEnd(StripEndKind Kind, double? Fraction = null, string? Component = null)
{
    /// <summary>The default end.</summary>
    public static StripEnd Default { get; } = new(StripEndKind.Default);

    /// <summary>What <c>--end</c> accepts, for messages.</summary>
    public const string Allowed = "left=10% (of the charge), residual=NAME:0.01 (liquid mole fraction), pump, or dry";

    /// <summary>Reads <c>--end</c>.</summary>
    public static StripEnd Parse(string text, string field = "--end")
    {
        string e = text.Trim().ToLowerInvariant();
        if (e == "pump") return new(StripEndKind.Pump);
        if (e == "dry") return new(StripEndKind.Dry);
        if (e.StartsWith("left=", StringComparison.Ordinal))
        {
            string v = e[5..].TrimEnd('%').Trim();
            if (!double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out double pct) || !(pct > 0) || !(pct < 100))
                throw new InputException(field, text, "left= a percentage between 0 and 100, e.g. left=10%");
            return new(StripEndKind.FractionLeft, pct / 100);
        }
        if (e.StartsWith("residual=", StringComparison.Ordinal))
        {
            string[] parts = text.Trim()[9..].Split(':');
            if (parts.Length != 2 || parts[0].Trim().Length == 0
                || !double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double x) || !(x > 0) || !(x < 1))
                throw new InputException(field, text, "residual=NAME:FRACTION with a mole fraction between 0 and 1, e.g. residual=thf:0.01");
            return new(StripEndKind.Residual, x, parts[0].Trim());
        }
        throw new InputException(field, text, Allowed);
    }
}
