namespace DistillPlan.Core.Fitting;

/// <summary>The equation a set of measured (T, P) points is fitted to.</summary>
public enum FitForm
{
    /// <summary>Pick by the number of points: one → Trouton, two → Clausius–Clapeyron, three or more → Antoine.</summary>
    Auto,
    /// <summary>Antoine, log10(P/Pa) = A − B/(T/K + C), by nonlinear least squares in log10 P; needs three points.</summary>
    Antoine,
    /// <summary>Clausius–Clapeyron, ln P = a − b/T, by linear least squares; the slope gives ΔHvap = b·R. Needs two points.</summary>
    ClausiusClapeyron,
    /// <summary>One boiling point: ΔHvap from Trouton's rule, carried with Watson's rule; an estimate.</summary>
    Trouton,
}
