using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Fitting;

/// <summary>How far the fitted curve lies from one measured point.</summary>
/// <param name="TemperatureK">Measured temperature [K].</param>
/// <param name="MeasuredPa">Measured pressure [Pa].</param>
/// <param name="FittedPa">The fitted curve at that temperature [Pa].</param>
/// <param name="Percent">100·(fitted/measured − 1) [%].</param>
public readonly record struct FitResidual(double TemperatureK, double MeasuredPa, double FittedPa, double Percent);

/// <summary>
/// A vapour-pressure curve fitted to a user's measured points (see <see cref="VaporPressureFit"/>).
/// </summary>
public sealed record VaporPressureFitResult
{
    /// <summary>The form that was fitted (never <see cref="FitForm.Auto"/>).</summary>
    public required FitForm Form { get; init; }
    /// <summary>
    /// The coefficients under their library (solvents.yaml) names: Antoine a, b, c (log10, P in Pa, T in K);
    /// Clausius–Clapeyron and Trouton t1_k, p1_pa, dhvap_j_per_mol (Trouton also watson_tc_k).
    /// </summary>
    public required IReadOnlyDictionary<string, double> Coefficients { get; init; }
    /// <summary>Lowest measured temperature [K]; the lower end of the validity range.</summary>
    public required double TMinK { get; init; }
    /// <summary>Highest measured temperature [K]; the upper end of the validity range.</summary>
    public required double TMaxK { get; init; }
    /// <summary>One residual per measured point, in rising temperature.</summary>
    public required IReadOnlyList<FitResidual> Residuals { get; init; }
    /// <summary>Largest |residual| [%].</summary>
    public double MaxResidualPercent => Residuals.Count == 0 ? 0 : Residuals.Max(r => Math.Abs(r.Percent));
    /// <summary>ΔHvap implied by the fit at <see cref="EnthalpyAtK"/>, −R·d ln P/d(1/T) [J/mol].</summary>
    public required double EnthalpyOfVaporizationJPerMol { get; init; }
    /// <summary>Temperature the ΔHvap figure is for: the middle of the range in 1/T [K].</summary>
    public required double EnthalpyAtK { get; init; }
    /// <summary>True for a one-point Trouton estimate (no measured slope): say so wherever it is shown.</summary>
    public required bool IsEstimate { get; init; }
    /// <summary>The fitted curve, ready to evaluate; its range is the validity range (a working range for Trouton).</summary>
    public required IVaporPressureCurve Curve { get; init; }
}
