using DistillPlan.Core.Library;

namespace DistillPlan.Core.Planning;

/// <summary>The temperature below which the pot starts to freeze, and what it rests on.</summary>
/// <param name="Solvent">The solvent that would crystallise.</param>
/// <param name="LimitK">The solid–liquid limit of the pot [K].</param>
/// <param name="Basis">"pure" (the solvent's melting point) or "dominant" (a mixture: the pure melting point of
/// a component over half of the moles, an upper estimate of where crystals appear).</param>
public sealed record FreezingLimit(Solvent Solvent, double LimitK, string Basis);

/// <summary>
/// Where a pot freezes (docs/methods.md, Safety checks, pot-freezing): a pure solvent at its CRC
/// melting point; a mixture at the solid–liquid limit of its component with the highest melting
/// point. The library has no enthalpies of fusion, so the ideal-solubility estimate
/// ln x = −(ΔHfus/R)(1/T − 1/Tm) cannot be made; the pure melting point of a dominant component
/// (x &gt; 0.5) stands in for it. That is an upper bound (the other components lower the freezing
/// point), so a plan held above it is safe, and the message says it is an estimate.
/// </summary>
public static class PotFreezing
{
    /// <summary>The planner keeps the pot this far above the freezing limit [K] (common practice).</summary>
    public const double MarginK = 2;

    /// <summary>A component this far over half of the moles counts as dominant.</summary>
    public const double DominantFraction = 0.5;

    /// <summary>The freezing limit of a pot of these solvents (composition order) and mole fractions, or null when none can be given.</summary>
    public static FreezingLimit? Limit(IReadOnlyList<Solvent> components, IReadOnlyList<double> liquid)
    {
        if (components.Count == 1)
            return components[0].MeltingPointK is double tm ? new FreezingLimit(components[0], tm, "pure") : null;
        for (int i = 0; i < components.Count; i++)
            if (liquid[i] > DominantFraction && components[i].MeltingPointK is double tm)
                return new FreezingLimit(components[i], tm, "dominant");
        return null;
    }

    /// <summary>
    /// Refuses a pressure at which every solvent would be frozen: each one's own boiling
    /// temperature there lies below its melting point, so no liquid is left to boil (a mixture
    /// melts lower than its components, but not by the hundred kelvin such pressures need, and a
    /// curve so far below its range is no answer). Names the option the pressure came from.
    /// </summary>
    /// <param name="solvents">The volatile solvents of the charge.</param>
    /// <param name="pressurePa">The pressure asked for [Pa].</param>
    /// <param name="field">The option the pressure came from, e.g. --at.</param>
    /// <param name="text">The pressure as the user wrote it.</param>
    public static void RequireLiquidAt(IReadOnlyList<Solvent> solvents, double pressurePa, string field, string text)
    {
        var parts = new List<string>();
        foreach (var s in solvents)
        {
            if (s.MeltingPointK is not double tm) return;
            double tb;
            try { tb = s.VaporPressure.SaturationTemperature(pressurePa).TemperatureK; }
            catch (OutOfRangeException) { continue; }
            if (tb >= tm - MarginK) return;
            parts.Add($"{s.Name} would boil at {C(tb)}, below its melting point {C(tm)}");
        }
        if (parts.Count == 0) return;
        throw new InputException(field, text, "a pressure at which the charge is liquid",
            $"{field}: at {InputException.Shorten(text)} the charge would be frozen, not boiling: {string.Join("; ", parts)}; give a higher pressure");
    }

    private static string C(double k) => (k - PhysicalConstants.ZeroCelsiusK).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture) + " °C";
}
