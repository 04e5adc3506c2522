using System.Globalization;

namespace DistillPlan.Core.Planning;

/// <summary>How a swap's residual is measured: by mass (how specifications are written), by moles, or in mass ppm.</summary>
public enum SwapTargetKind
{
    /// <summary>Mass fraction of the old solvents in the liquid.</summary>
    MassFraction,
    /// <summary>Mole fraction of the old solvents in the liquid.</summary>
    MoleFraction,
}

/// <summary>The residual of the old solvents to swap down to.</summary>
/// <param name="Kind">By mass or by moles.</param>
/// <param name="Fraction">The target as a fraction (0.01 for 1 %).</param>
/// <param name="Text">As the user wrote it.</param>
public sealed record SwapTarget(SwapTargetKind Kind, double Fraction, string Text)
{
    /// <summary>What <c>--target</c> accepts.</summary>
    public const string Allowed = "a residual of the old solvent such as 1% or 1wt% (by mass), 0.5mol% (by moles) or 1000ppm (by mass), above 0 and below 50 %";

    /// <summary>Reads 1%, 1wt%, 0.5mol%, 1000ppm.</summary>
    public static SwapTarget Parse(string text)
    {
        string t = text.Trim().Replace(" ", "");
        (SwapTargetKind kind, string number, double scale) = t switch
        {
            _ when t.EndsWith("mol%", StringComparison.Ordinal) => (SwapTargetKind.MoleFraction, t[..^4], 0.01),
            _ when t.EndsWith("wt%", StringComparison.Ordinal) => (SwapTargetKind.MassFraction, t[..^3], 0.01),
            _ when t.EndsWith("ppm", StringComparison.Ordinal) => (SwapTargetKind.MassFraction, t[..^3], 1e-6),
            _ when t.EndsWith('%') => (SwapTargetKind.MassFraction, t[..^1], 0.01),
            _ => throw new InputException("--target", text, Allowed),
        };
        if (!double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
            throw new InputException("--target", text, Allowed);
        double f = v * scale;
        return f > 0 && f < 0.5 ? new SwapTarget(kind, f, text.Trim()) : throw new InputException("--target", text, Allowed);
    }
}
