using System.Globalization;
using System.Text;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Fitting;

/// <summary>What the user knows about the compound besides its measured points.</summary>
/// <param name="Name">Display name.</param>
/// <param name="MolarMassGPerMol">Molar mass [g/mol] (the library needs it for mass and volume amounts).</param>
/// <param name="Citation">Where the points come from, in the user's words (e.g. "lab notebook 12, p. 34, 2025-03-02").</param>
public sealed record FittedCompound(string Name, double MolarMassGPerMol, string Citation)
{
    /// <summary>CAS registry number, when the compound has one.</summary>
    public string? Cas { get; init; }
    /// <summary>Other names to find it by.</summary>
    public IReadOnlyList<string> Aliases { get; init; } = [];
    /// <summary>Molecular formula, for display.</summary>
    public string? Formula { get; init; }
    /// <summary>Normal boiling point [K]; when null it is taken from the fitted curve at 101325 Pa.</summary>
    public double? NormalBoilingPointK { get; init; }
}

/// <summary>
/// Writes a fitted compound as a library file in the format of solvents.yaml
/// (docs/solvents-schema.md), which <see cref="Library.SolventYamlLoader"/> reads back to the same
/// vapour pressures; the user's library can take the entry as it is.
/// </summary>
public static class LibraryEntryWriter
{
    /// <summary>Source key of the error figure of a one-point estimate, defined in every file the writer makes for one.</summary>
    public const string EstimateErrorSourceKey = "fit-estimate-error";

    private const string EstimateErrorCitation =
        "measured in DistillPlan: the one-point recipe (Trouton 88 J/(mol K), 109 for associating liquids; Watson's rule with Tc = 1.5 Tb) " +
        "against the 61 shipped solvents with published curves, |error| of Psat at 40 degC: median 6 %, 90th percentile 27 %, rounded up to 30 %";

    /// <summary>A whole library file (format tag, sources, one solvent entry) for the fitted compound.</summary>
    /// <param name="compound">Name, molar mass and the citation of the measurements.</param>
    /// <param name="fit">The result of <see cref="VaporPressureFit.Fit"/>.</param>
    /// <param name="sourceKey">Source key under which the citation is filed.</param>
    public static string Write(FittedCompound compound, VaporPressureFitResult fit, string sourceKey = VaporPressureFit.DefaultSourceKey)
    {
        if (string.IsNullOrWhiteSpace(compound.Name)) throw new InputException("name", compound.Name, "a name for the compound");
        if (!(compound.MolarMassGPerMol > 0)) throw new InputException("molar mass", N(compound.MolarMassGPerMol), "a molar mass above zero in g/mol");
        if (compound.Cas is { } cas && !Library.CasNumber.IsValid(cas)) throw new InputException("cas", cas, "a CAS number with a valid check digit, or none");

        double tb = compound.NormalBoilingPointK ?? NormalBoilingPointOf(fit);
        var w = new StringBuilder();
        w.AppendLine("# Written by DistillPlan from measured vapour pressures (format: docs/solvents-schema.md).");
        w.AppendLine("format: " + Library.SolventYamlLoader.FormatTag);
        w.AppendLine("sources:");
        w.AppendLine($"  {sourceKey}: {Q(compound.Citation)}");
        if (fit.IsEstimate) w.AppendLine($"  {EstimateErrorSourceKey}: {Q(EstimateErrorCitation)}");
        w.AppendLine("solvents:");
        w.AppendLine($"  - name: {Q(compound.Name)}");
        if (compound.Aliases.Count > 0) w.AppendLine($"    aliases: [{string.Join(", ", compound.Aliases.Select(Q))}]");
        if (compound.Cas is not null) w.AppendLine($"    cas: {compound.Cas}");
        if (compound.Formula is not null) w.AppendLine($"    formula: {Q(compound.Formula)}");
        w.AppendLine($"    molar_mass_g_per_mol: {{value: {N(compound.MolarMassGPerMol)}, source: {sourceKey}}}");
        w.AppendLine($"    normal_boiling_point_k: {{value: {N(tb)}, source: {sourceKey}}}"
            + (compound.NormalBoilingPointK is null ? "   # from the fitted curve at 101325 Pa" : ""));
        w.AppendLine("    vapor_pressure:");
        w.AppendLine("      - " + Curve(fit, sourceKey));
        w.AppendLine($"    enthalpy_of_vaporization: {{form: value, value_j_per_mol: {N(fit.EnthalpyOfVaporizationJPerMol)}, at_k: {N(fit.EnthalpyAtK)}, source: {sourceKey}}}");
        w.AppendLine($"    notes: {Q(Notes(fit))}");
        return w.ToString();
    }

    /// <summary>Normal boiling point from the fitted curve [K] (an extrapolation when 101325 Pa lies outside the points).</summary>
    public static double NormalBoilingPointOf(VaporPressureFitResult fit) => fit.Curve.TemperatureK(PhysicalConstants.StandardAtmospherePa);

    private static string Curve(VaporPressureFitResult fit, string sourceKey)
    {
        var c = fit.Coefficients;
        string range = $"t_min_k: {N(fit.Curve.TMinK)}, t_max_k: {N(fit.Curve.TMaxK)}";
        return fit.Form switch
        {
            FitForm.Antoine =>
                $"{{form: antoine-log10, a: {N(c["a"])}, b: {N(c["b"])}, c: {N(c["c"])}, p_unit: Pa, t_unit: K, {range}, source: {sourceKey}}}",
            FitForm.ClausiusClapeyron =>
                $"{{form: clausius-clapeyron, t1_k: {N(c["t1_k"])}, p1_pa: {N(c["p1_pa"])}, dhvap_j_per_mol: {N(c["dhvap_j_per_mol"])}, {range}, source: {sourceKey}}}",
            _ =>
                $"{{form: clausius-clapeyron, t1_k: {N(c["t1_k"])}, p1_pa: {N(c["p1_pa"])}, dhvap_j_per_mol: {N(c["dhvap_j_per_mol"])}, " +
                $"watson_tc_k: {N(c["watson_tc_k"])}, {range}, estimate: {{basis: trouton, expected_error_percent: " +
                $"{N(VaporPressureFit.TroutonExpectedErrorPercent)}, source: {EstimateErrorSourceKey}}}, source: {sourceKey}}}",
        };
    }

    private static string Notes(VaporPressureFitResult fit) => fit.Form switch
    {
        FitForm.Trouton => "ESTIMATE from one boiling point (Trouton's rule and Watson's rule, Tc = 1.5 Tb); no measured slope",
        _ => $"{(fit.Form == FitForm.Antoine ? "Antoine" : "Clausius-Clapeyron")} fitted to {fit.Residuals.Count} measured points, " +
             $"{N(Math.Round(fit.TMinK - PhysicalConstants.ZeroCelsiusK, 2))} to {N(Math.Round(fit.TMaxK - PhysicalConstants.ZeroCelsiusK, 2))} degC; " +
             $"largest residual {fit.MaxResidualPercent.ToString("0.###", CultureInfo.InvariantCulture)} %",
    };

    private static string N(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static string Q(string s) => "\"" + s.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\"";
}
