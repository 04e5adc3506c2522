using DistillPlan.Core.VaporPressure;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;

namespace DistillPlan.Core.Fitting;

/// <summary>
/// Fits a vapour-pressure curve to a user's measured (T, P) points (docs/methods.md, Vapour pressure: Fitting):
/// <list type="bullet">
/// <item>Antoine, log10(P/Pa) = A − B/(T/K + C): Levenberg–Marquardt (MathNet.Numerics) on log10 P,
/// started from the Clausius–Clapeyron line, with C held in [−0.8·Tmin, 0] K so that the implied
/// ΔHvap falls with temperature as it does for every liquid;</item>
/// <item>Clausius–Clapeyron, ln P = a − b/T: linear least squares on ln P against 1/T; ΔHvap = b·R;</item>
/// <item>one boiling point (Trouton): ΔHvap(Tb) = 88 J/(mol·K)·Tb (109 for associating liquids
/// such as water and alcohols; common practice), carried to other temperatures by Watson's rule with
/// Tc = 1.5·Tb (Guldberg's rule, common practice); flagged as an estimate.</item>
/// </list>
/// The measured range [Tmin, Tmax] becomes the curve's validity range. Bad input (no points,
/// non-positive values, repeated temperatures, pressures that do not rise with temperature, fewer
/// points than the form has parameters) is an <see cref="InputException"/> with one clear line.
/// </summary>
public static class VaporPressureFit
{
    /// <summary>Library source key the fitted curve carries until the writer names the user's source.</summary>
    public const string DefaultSourceKey = "user-measurements";

    /// <summary>Expected error [%] of the one-point estimate near 40 °C: the 90th percentile of the same recipe on the library's published solvents, rounded up (see EstimateErrorTests).</summary>
    public const double TroutonExpectedErrorPercent = 30;

    /// <summary>Fits <paramref name="points"/> (T [K], P [Pa]) to <paramref name="form"/>.</summary>
    /// <param name="points">Measured points, in any order.</param>
    /// <param name="form">Equation to fit; <see cref="FitForm.Auto"/> picks by the number of points.</param>
    /// <param name="associating">For a one-point estimate: true for water, alcohols and other hydrogen-bonded liquids (ΔSvap 109 instead of 88).</param>
    /// <param name="sourceKey">Source key written on the fitted curve.</param>
    public static VaporPressureFitResult Fit(IReadOnlyList<(double TK, double PPa)> points, FitForm form = FitForm.Auto,
        bool associating = false, string sourceKey = DefaultSourceKey)
    {
        var sorted = Validate(points);
        if (form == FitForm.Auto)
            form = sorted.Count switch { 1 => FitForm.Trouton, 2 => FitForm.ClausiusClapeyron, _ => FitForm.Antoine };
        int needed = form switch { FitForm.Antoine => 3, FitForm.ClausiusClapeyron => 2, _ => 1 };
        if (sorted.Count < needed)
            throw new InputException("points", $"{sorted.Count} point{(sorted.Count == 1 ? "" : "s")}",
                $"at least {needed} points for {Describe(form)} (one point gives a Trouton estimate, two a Clausius–Clapeyron line)");
        if (form == FitForm.Trouton && sorted.Count > 1)
            throw new InputException("points", $"{sorted.Count} points", "one boiling point for a Trouton estimate (with more points fit Clausius–Clapeyron or Antoine)");

        return form switch
        {
            FitForm.Antoine => FitAntoine(sorted, sourceKey),
            FitForm.ClausiusClapeyron => FitClausiusClapeyron(sorted, sourceKey),
            _ => FitTrouton(sorted[0], associating, sourceKey),
        };
    }

    private static string Describe(FitForm f) => f switch
    {
        FitForm.Antoine => "an Antoine fit (three constants)",
        FitForm.ClausiusClapeyron => "a Clausius–Clapeyron fit (two constants)",
        _ => "a Trouton estimate",
    };

    private static List<(double TK, double PPa)> Validate(IReadOnlyList<(double TK, double PPa)> points)
    {
        if (points.Count == 0) throw new InputException("points", "none", "at least one measured (temperature, pressure) point");
        foreach (var (t, p) in points)
        {
            if (!(double.IsFinite(t) && t > 0)) throw new InputException("points", $"{t} K", "a temperature above absolute zero");
            if (!(double.IsFinite(p) && p > 0)) throw new InputException("points", $"{p} Pa at {C(t)}", "an absolute pressure above zero");
        }
        var sorted = points.OrderBy(p => p.TK).ToList();
        for (int i = 1; i < sorted.Count; i++)
        {
            var (t0, p0) = sorted[i - 1];
            var (t1, p1) = sorted[i];
            if (Math.Abs(t1 - t0) < 1e-6)
                throw new InputException("points", $"two points at {C(t1)}", "each temperature once (average repeated measurements first)");
            if (!(p1 > p0))
                throw new InputException("points", $"{p0 / 100:G4} mbar at {C(t0)} and {p1 / 100:G4} mbar at {C(t1)}",
                    "pressures that rise with temperature (a vapour pressure never falls as T rises; check units and order)");
        }
        return sorted;
    }

    private static string C(double tK) => $"{tK - PhysicalConstants.ZeroCelsiusK:0.##} °C";

    private static VaporPressureFitResult FitClausiusClapeyron(List<(double TK, double PPa)> pts, string sourceKey)
    {
        var (a, slope) = MathNet.Numerics.Fit.Line(pts.Select(p => 1.0 / p.TK).ToArray(), pts.Select(p => Math.Log(p.PPa)).ToArray());
        double b = -slope;                                    // ln P = a − b/T
        if (!(b > 0)) throw new InputException("points", "the measured slope", "pressures that rise with temperature");
        double tRef = MidInverse(pts);
        double dh = b * PhysicalConstants.GasConstant;
        var curve = new ClausiusClapeyron
        {
            T1K = tRef, P1Pa = Math.Exp(a - b / tRef), EnthalpyJPerMol = dh,
            Source = sourceKey, TMinK = pts[0].TK, TMaxK = pts[^1].TK,
        };
        return Result(FitForm.ClausiusClapeyron, curve, pts, dh, tRef, false, new Dictionary<string, double>
        {
            ["t1_k"] = curve.T1K, ["p1_pa"] = curve.P1Pa, ["dhvap_j_per_mol"] = dh,
        });
    }

    private static VaporPressureFitResult FitAntoine(List<(double TK, double PPa)> pts, string sourceKey)
    {
        // Start from the Clausius–Clapeyron line (C = 0), in log10 form.
        var (a0, slope) = MathNet.Numerics.Fit.Line(pts.Select(p => 1.0 / p.TK).ToArray(), pts.Select(p => Math.Log10(p.PPa)).ToArray());
        double tMin = pts[0].TK;
        var x = Vector<double>.Build.DenseOfEnumerable(pts.Select(p => p.TK));
        var y = Vector<double>.Build.DenseOfEnumerable(pts.Select(p => Math.Log10(p.PPa)));
        static double F(Vector<double> k, double t) => k[0] - k[1] / (t + k[2]);
        static Vector<double> G(Vector<double> k, double t)
        {
            double d = t + k[2];
            return Vector<double>.Build.DenseOfArray([1.0, -1.0 / d, k[1] / (d * d)]);
        }
        var model = ObjectiveFunction.NonlinearModel(F, G, x, y);
        var start = Vector<double>.Build.DenseOfArray([a0, -slope, -1e-3]);
        var lower = Vector<double>.Build.DenseOfArray([-1e3, 1e-3, -0.8 * tMin]);
        var upper = Vector<double>.Build.DenseOfArray([1e3, 1e7, 0.0]);
        Vector<double> k;
        try
        {
            k = new LevenbergMarquardtMinimizer(maximumIterations: 2000).FindMinimum(model, start, lower, upper).MinimizingPoint;
        }
        catch (MaximumIterationsException e)
        {
            throw new NoConvergenceException("Antoine fit (Levenberg–Marquardt)", e.Message);
        }
        var curve = new Antoine { Log10 = true, A = k[0], B = k[1], C = k[2], Source = sourceKey, TMinK = tMin, TMaxK = pts[^1].TK };
        double tRef = MidInverse(pts);
        double dh = PhysicalConstants.GasConstant * Math.Log(10) * curve.B * tRef * tRef / ((tRef + curve.C) * (tRef + curve.C));
        return Result(FitForm.Antoine, curve, pts, dh, tRef, false, new Dictionary<string, double>
        {
            ["a"] = curve.A, ["b"] = curve.B, ["c"] = curve.C,
        });
    }

    private static VaporPressureFitResult FitTrouton((double TK, double PPa) point, bool associating, string sourceKey)
    {
        double ds = associating ? ClausiusClapeyron.TroutonEntropyAssociated : ClausiusClapeyron.TroutonEntropy;
        ClausiusClapeyron Through(double tb) => new()
        {
            T1K = tb, P1Pa = PhysicalConstants.StandardAtmospherePa, EnthalpyJPerMol = ds * tb, WatsonTcK = GuldbergFactor * tb,
            Source = sourceKey, TMinK = tb - 120, TMaxK = tb + 20,
            Estimate = new CurveEstimate(EstimateBasis.Trouton, TroutonExpectedErrorPercent, LibraryEntryWriter.EstimateErrorSourceKey),
        };
        // The boiling point may be given at any pressure: find the normal boiling point whose
        // estimated curve passes through it.
        double tb = Math.Abs(point.PPa - PhysicalConstants.StandardAtmospherePa) < 1e-6
            ? point.TK
            : MathNet.Numerics.RootFinding.Brent.FindRoot(t => Math.Log(Through(t).PressurePa(point.TK) / point.PPa),
                point.TK / 3, point.TK * 3, 1e-9, 200);
        var cc = Through(tb);
        var curve = new ClausiusClapeyron
        {
            T1K = cc.T1K, P1Pa = cc.P1Pa, EnthalpyJPerMol = cc.EnthalpyJPerMol, WatsonTcK = cc.WatsonTcK,
            Source = sourceKey, TMinK = Math.Max(1, Math.Min(point.TK, tb) - 120), TMaxK = Math.Max(point.TK, tb) + 20, Estimate = cc.Estimate,
        };
        return Result(FitForm.Trouton, curve, [point], curve.EnthalpyAt(point.TK), point.TK, true, new Dictionary<string, double>
        {
            ["t1_k"] = curve.T1K, ["p1_pa"] = curve.P1Pa, ["dhvap_j_per_mol"] = curve.EnthalpyJPerMol, ["watson_tc_k"] = curve.WatsonTcK!.Value,
        });
    }

    /// <summary>Tc/Tb by Guldberg's rule (Tb/Tc ≈ 2/3; common practice).</summary>
    public const double GuldbergFactor = 1.5;

    private static double MidInverse(List<(double TK, double PPa)> pts) => 2.0 / (1.0 / pts[0].TK + 1.0 / pts[^1].TK);

    private static VaporPressureFitResult Result(FitForm form, IVaporPressureCurve curve, List<(double TK, double PPa)> pts,
        double dh, double tRef, bool estimate, Dictionary<string, double> coefficients) => new()
    {
        Form = form,
        Coefficients = coefficients,
        TMinK = pts[0].TK,
        TMaxK = pts[^1].TK,
        Residuals = pts.Select(p =>
        {
            double fit = curve.PressurePa(p.TK);
            return new FitResidual(p.TK, p.PPa, fit, 100 * (fit / p.PPa - 1));
        }).ToList(),
        EnthalpyOfVaporizationJPerMol = dh,
        EnthalpyAtK = tRef,
        IsEstimate = estimate,
        Curve = curve,
    };
}
