namespace DistillPlan.Core.VaporPressure;

/// <summary>What an estimated curve rests on instead of measured vapour pressures.</summary>
public enum EstimateBasis
{
    /// <summary>ΔHvap at the normal boiling point from Trouton's rule, ΔSvap ≈ 88 J/(mol·K) (109 for water and alcohols).</summary>
    Trouton,
    /// <summary>A published or tabulated ΔHvap (the curve's source names it).</summary>
    EnthalpyOfVaporization,
}

/// <summary>
/// Marks a vapour-pressure curve as an estimate rather than a fit to measured pressures, with
/// the error a user should expect. Absent (null) on published curves.
/// </summary>
/// <param name="Basis">What the estimate rests on.</param>
/// <param name="ExpectedErrorPercent">Typical size of the error of Psat near 40 °C [%], as measured for the same recipe
/// on solvents with published curves (see docs/solvents-schema.md, Estimated curves).</param>
/// <param name="Source">Library key of the source of the error figure.</param>
public sealed record CurveEstimate(EstimateBasis Basis, double ExpectedErrorPercent, string Source)
{
    /// <summary>The basis as written in the library: trouton or hvap.</summary>
    public string BasisName => Basis == EstimateBasis.Trouton ? "trouton" : "hvap";

    /// <summary>One line for users: what the estimate rests on and how far off it may be.</summary>
    public string Describe() => Basis == EstimateBasis.Trouton
        ? $"estimated from the normal boiling point with Trouton's rule (no measured vapour pressures); expect errors of about {ExpectedErrorPercent:0} %"
        : $"estimated from the normal boiling point and a published enthalpy of vaporization (no measured vapour pressures); expect errors of about {ExpectedErrorPercent:0} %";
}
