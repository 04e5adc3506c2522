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
}
