using System.Globalization;
using DistillPlan.Core;
using DistillPlan.Core.Fitting;
using DistillPlan.Core.Quantities;
using DistillPlan.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The one text layout of a fit result, printed by <c>distillplan fit</c> and shown by the
/// text-UI fit form: the equation with its coefficients and units, the validity range, the
/// residual of every point, the latent heat, "ESTIMATE" when it is one, and the caution.
/// Lines fit in 78 columns.
/// </summary>
public static class FitText
{
    /// <summary>The caution every fit carries: a curve is no better than the points under it.</summary>
    public const string Caution =
        "A fit is only as good as its points: check units and that each pressure was read at equilibrium " +
        "(steady reading, no leak, pure liquid); outside the measured range the curve is an extrapolation.";

    /// <summary>The result as lines of text, pressures in <paramref name="unit"/>.</summary>
    public static IReadOnlyList<string> Lines(CompoundFit c, PressureUnit unit)
    {
        var f = c.Fit;
        var k = f.Coefficients;
        var lines = new List<string>();
        int n = f.Residuals.Count;
        lines.Add(f.Form switch
        {
            FitForm.Antoine => $"{c.Name}: Antoine equation fitted to {n} measured points",
            FitForm.ClausiusClapeyron => $"{c.Name}: Clausius-Clapeyron line fitted to {n} measured points",
            _ => $"{c.Name}: ESTIMATE from one boiling point (Trouton's rule), not a fit",
        });
        switch (f.Form)
        {
            case FitForm.Antoine:
                lines.Add("  log10(P/Pa) = A - B/(T/K + C)");
                lines.Add($"  A = {G(k["a"], 6)}   B = {G(k["b"], 6)} K   C = {G(k["c"], 5)} K");
                break;
            case FitForm.ClausiusClapeyron:
                lines.Add("  ln(P/P1) = -(dHvap/R)(1/T - 1/T1), R = 8.314462618 J/(mol K)");
                lines.Add($"  T1 = {G(k["t1_k"], 6)} K   P1 = {PressureUnits.Format(Pressure.FromPascal(k["p1_pa"]), unit)}   " +
                          $"dHvap = {G(k["dhvap_j_per_mol"] / 1000, 4)} kJ/mol");
                break;
            default:
                double tb = k["t1_k"], ds = k["dhvap_j_per_mol"] / tb;
                lines.Add("  ln(P/P1) = -(1/R) integral of dHvap(T)/T^2 from T1, dHvap by Watson's rule");
                lines.Add($"  T1 = Tb = {Temperature.FromKelvin(tb)}   P1 = {PressureUnits.Format(Pressure.FromPascal(k["p1_pa"]), unit)}   " +
                          $"dSvap = {G(ds, 3)} J/(mol K) (Trouton)");
                lines.Add($"  dHvap(Tb) = {G(k["dhvap_j_per_mol"] / 1000, 4)} kJ/mol   Tc = 1.5 Tb = {Temperature.FromKelvin(k["watson_tc_k"])} (Guldberg)");
                lines.Add($"  ESTIMATE: expect errors of about {G(VaporPressureFit.TroutonExpectedErrorPercent, 2)} % in vapour pressure near 40 °C;");
                lines.Add("  measure two or more points for a real fit.");
                break;
        }
        lines.Add(f.IsEstimate
            ? $"  Working range {Temperature.FromKelvin(f.Curve.TMinK)} to {Temperature.FromKelvin(f.Curve.TMaxK)} (estimated everywhere)"
            : $"  Valid {Temperature.FromKelvin(f.TMinK)} to {Temperature.FromKelvin(f.TMaxK)} (the measured range; beyond it, extrapolated)");
        lines.Add($"  Latent heat {G(f.EnthalpyOfVaporizationJPerMol / 1000, 4)} kJ/mol at {Temperature.FromKelvin(f.EnthalpyAtK)}" +
                  (f.IsEstimate ? " (estimate)" : " (from the fitted slope)"));
        try
        {
            var tb = LibraryEntryWriter.NormalBoilingPointOf(f);
            bool outside = PhysicalConstants.StandardAtmospherePa > f.Curve.PressurePa(f.Curve.TMaxK);
            lines.Add($"  Boiling point at 1013.25 mbar: {Temperature.FromKelvin(tb)}{(outside ? " (extrapolated)" : "")}");
        }
        catch (DistillPlanException) { }
        lines.Add("");
        lines.Add($"  {"T",9}  {"measured",14}  {"fitted",14}  {"residual",8}");
        foreach (var r in f.Residuals)
            lines.Add($"  {Temperature.FromKelvin(r.TemperatureK),9}  {PressureUnits.Format(Pressure.FromPascal(r.MeasuredPa), unit),14}  " +
                      $"{PressureUnits.Format(Pressure.FromPascal(r.FittedPa), unit),14}  {r.Percent.ToString("+0.00;-0.00;0.00", CultureInfo.InvariantCulture) + " %",8}");
        if (!f.IsEstimate) lines.Add($"  Largest residual {f.MaxResidualPercent.ToString("0.00", CultureInfo.InvariantCulture)} %");
        lines.Add("");
        lines.AddRange(LineWrap.Wrap(Caution, 78));
        return lines;
    }

    /// <summary>The lines joined with newlines.</summary>
    public static string Text(CompoundFit c, PressureUnit unit) => string.Join("\n", Lines(c, unit));

    private static string G(double v, int significant) => v.ToString("G" + significant, CultureInfo.InvariantCulture);
}
