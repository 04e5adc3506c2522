using System.Diagnostics.CodeAnalysis;
using MathNet.Numerics.RootFinding;

namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Bubble and dew points of a liquid mixture by modified Raoult's law,
/// y_i P = x_i γ_i(T, x) Psat_i(T), for a fixed, ordered list of components.
/// </summary>
/// <remarks>
/// <para>Bubble pressure at T is explicit: P = Σ x_i γ_i Psat_i, y_i = x_i γ_i Psat_i / P.</para>
/// <para>Bubble temperature at P solves ln(Σ x_i γ_i Psat_i(T)) = ln P in T with Brent's method
/// (ln P is nearly linear in 1/T, so the root is well conditioned).</para>
/// <para>Dew pressure at T: 1/P = Σ y_i/(γ_i Psat_i), where γ depends on the unknown liquid
/// x_i = y_i P/(γ_i Psat_i); solved by successive substitution on x from the ideal start.
/// Dew temperature at P: Brent in T on ln P_dew(T) = ln P.</para>
/// <para>Mole-fraction arguments may be amounts in any unit: they are normalised. A non-volatile
/// component has Psat = 0: it appears in x, never in y.</para>
/// </remarks>
public sealed partial class PhaseEquilibrium
{
    /// <summary>Lowest temperature [K] the temperature solvers search.</summary>
    public const double SearchMinimumK = 100.0;

    /// <summary>Highest temperature [K] the temperature solvers search.</summary>
    public const double SearchMaximumK = 1000.0;

    private readonly MixtureComponent[] _components;

    /// <summary>Creates the solver for <paramref name="components"/> with a chosen model.</summary>
    /// <param name="components">Components; names must be unique.</param>
    /// <param name="model">The activity model and why it was chosen.</param>
    public PhaseEquilibrium(IReadOnlyList<MixtureComponent> components, ActivityModelChoice model)
    {
        ArgumentNullException.ThrowIfNull(components);
        ArgumentNullException.ThrowIfNull(model);
        if (components.Count == 0) throw new ArgumentException("no components", nameof(components));
        var duplicate = components.GroupBy(c => c.Name).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
            throw new ArgumentException($"component '{duplicate.Key}' appears twice", nameof(components));
        if (components.All(c => c.IsNonVolatile))
            throw new ArgumentException("at least one component must be volatile", nameof(components));
        if (model.Model.ComponentCount != components.Count)
            throw new ArgumentException("the activity model was built for a different component list", nameof(model));
        _components = components.ToArray();
        Model = model;
    }

    /// <summary>Creates the solver, choosing UNIFAC (or ideal, with a reason) as
    /// <see cref="ActivityModelChoice.Choose"/> does.</summary>
    /// <param name="components">Components; names must be unique.</param>
    /// <param name="requested">Model asked for; modified UNIFAC (Dortmund) by default.</param>
    public static PhaseEquilibrium Create(IReadOnlyList<MixtureComponent> components,
        ActivityModelKind requested = ActivityModelKind.Dortmund)
        => new(components, ActivityModelChoice.Choose(components, requested));

    /// <summary>Components in the order mole-fraction arrays use.</summary>
    public IReadOnlyList<MixtureComponent> Components => _components;

    /// <summary>The activity model in use and any fallback reason.</summary>
    public ActivityModelChoice Model { get; }

    /// <summary>Index of the component called <paramref name="name"/> (exact match).</summary>
    /// <param name="name">Component name.</param>
    /// <exception cref="ArgumentException">No such component.</exception>
    public int IndexOf(string name)
    {
        int index = Array.FindIndex(_components, c => c.Name == name);
        return index >= 0 ? index : throw new ArgumentException(
            $"no component '{name}' in this mixture (have {string.Join(", ", _components.Select(c => c.Name))})", nameof(name));
    }

    /// <summary>Bubble pressure and vapour composition of a liquid at temperature T (explicit).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="liquid">Liquid amounts or mole fractions in component order.</param>
    public EquilibriumPoint BubblePressure(double temperatureK, IReadOnlyList<double> liquid)
    {
        var x = Normalise(liquid, nameof(liquid));
        RequireVolatile(x, "bubble pressure");
        var (p, y, gamma, split) = BubblePressureWithPhases(temperatureK, x);
        return Point(SaturationKind.BubblePoint, temperatureK, p, x, y, gamma, split);
    }

    /// <summary>Bubble pressure [Pa] of a liquid at temperature T, honouring a split (the same
    /// pressure as <see cref="BubblePressure"/>, sooner: only the phases are settled, not why).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="liquid">Liquid amounts or mole fractions in component order.</param>
    public double BubblePressurePa(double temperatureK, IReadOnlyList<double> liquid)
    {
        var x = Normalise(liquid, nameof(liquid));
        RequireVolatile(x, "bubble pressure");
        return BubblePressureWithPhases(temperatureK, x, phasesOnly: true).PressurePa;
    }

    /// <summary>Bubble temperature of a liquid at pressure P.</summary>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <param name="liquid">Liquid amounts or mole fractions in component order.</param>
    /// <param name="toleranceK">Convergence tolerance on T [K].</param>
    /// <param name="maxIterations">Iteration cap of the root solve.</param>
    /// <param name="initialGuessK">Starting temperature [K] (a nearby earlier answer speeds it up).</param>
    /// <exception cref="EquilibriumConvergenceException">No bracket or no convergence.</exception>
    public EquilibriumPoint BubbleTemperature(double pressurePa, IReadOnlyList<double> liquid,
        double toleranceK = 1e-9, int maxIterations = 100, double? initialGuessK = null)
    {
        var x = Normalise(liquid, nameof(liquid));
        var (t, p, y, gamma, split) = BubbleTemperatureCore(pressurePa, x, toleranceK, maxIterations, initialGuessK);
        return Point(SaturationKind.BubblePoint, t, p, x, y, gamma, split);
    }

    /// <summary>The bubble point at P of normalised x without the reader's parts of an
    /// <see cref="EquilibriumPoint"/> (names, K values, relative volatilities): the same numbers
    /// as <see cref="BubbleTemperature"/>, for a scan that needs only T, y and the phases.</summary>
    internal (double TemperatureK, double PressurePa, double[] Y, double[] Gamma, LiquidPhaseSplit Split) BubbleTemperatureCore(
        double pressurePa, double[] x, double toleranceK = 1e-9, int maxIterations = 100, double? initialGuessK = null)
    {
        RequirePressure(pressurePa);
        RequireVolatile(x, "bubble temperature");
        double lnP = Math.Log(pressurePa);
        double Residual(double t) => Math.Log(BubblePressureCore(t, x).PressurePa) - lnP;

        double t = SolveTemperature(Residual, "bubble temperature", pressurePa, toleranceK, maxIterations,
            initialGuessK ?? StartingTemperature(pressurePa));
        // One stability test at the one-liquid estimate; with two liquids, the three-phase point.
        var split = Split(t, x);
        if (split.IsSplit && ThreePhaseBubbleTemperature(pressurePa, x, split, toleranceK, maxIterations) is { } three)
        {
            var (p3, y3, gamma3) = BubblePressureCore(three.TemperatureK, three.Split.Phases[0].X);
            return (three.TemperatureK, p3, y3, gamma3, three.Split);
        }
        if (split.IsSplit) split = Single(t, x, "one liquid: the predicted split vanishes at the three-phase temperature");
        var (p, y, gamma) = BubblePressureCore(t, x);
        return (t, p, y, gamma, split);
    }

    /// <summary>Bubble temperature at P, or false when the solver does not converge.</summary>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <param name="liquid">Liquid amounts or mole fractions in component order.</param>
    /// <param name="result">The bubble point when found.</param>
    /// <param name="toleranceK">Convergence tolerance on T [K].</param>
    /// <param name="maxIterations">Iteration cap of the root solve.</param>
    /// <param name="initialGuessK">Starting temperature [K].</param>
    public bool TryBubbleTemperature(double pressurePa, IReadOnlyList<double> liquid,
        [NotNullWhen(true)] out EquilibriumPoint? result,
        double toleranceK = 1e-9, int maxIterations = 100, double? initialGuessK = null)
    {
        try
        {
            result = BubbleTemperature(pressurePa, liquid, toleranceK, maxIterations, initialGuessK);
            return true;
        }
        catch (EquilibriumConvergenceException)
        {
            result = null;
            return false;
        }
    }

    /// <summary>Dew pressure and liquid composition of a vapour at temperature T.</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="vapor">Vapour amounts or mole fractions in component order (non-volatile ones 0).</param>
    /// <param name="tolerance">Convergence tolerance on the liquid mole fractions [-].</param>
    /// <param name="maxIterations">Cap on successive-substitution steps.</param>
    /// <exception cref="EquilibriumConvergenceException">The liquid composition does not settle.</exception>
    public EquilibriumPoint DewPressure(double temperatureK, IReadOnlyList<double> vapor,
        double tolerance = 1e-10, int maxIterations = 500)
    {
        var y = NormaliseVapor(vapor);
        var (p, x, gamma) = DewPressureCore(temperatureK, y, tolerance, maxIterations, null);
        return Point(SaturationKind.DewPoint, temperatureK, p, x, y, gamma);
    }

    /// <summary>Dew pressure at T, or false when the solver does not converge.</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="vapor">Vapour amounts or mole fractions in component order.</param>
    /// <param name="result">The dew point when found.</param>
    /// <param name="tolerance">Convergence tolerance on the liquid mole fractions [-].</param>
    /// <param name="maxIterations">Cap on successive-substitution steps.</param>
    public bool TryDewPressure(double temperatureK, IReadOnlyList<double> vapor,
        [NotNullWhen(true)] out EquilibriumPoint? result, double tolerance = 1e-10, int maxIterations = 500)
    {
        try
        {
            result = DewPressure(temperatureK, vapor, tolerance, maxIterations);
            return true;
        }
        catch (EquilibriumConvergenceException)
        {
            result = null;
            return false;
        }
    }

    /// <summary>Dew temperature of a vapour at pressure P.</summary>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <param name="vapor">Vapour amounts or mole fractions in component order (non-volatile ones 0).</param>
    /// <param name="toleranceK">Convergence tolerance on T [K].</param>
    /// <param name="maxIterations">Iteration cap of the outer root solve and of each inner
    /// successive substitution.</param>
    /// <param name="initialGuessK">Starting temperature [K].</param>
    /// <exception cref="EquilibriumConvergenceException">No bracket or no convergence.</exception>
    public EquilibriumPoint DewTemperature(double pressurePa, IReadOnlyList<double> vapor,
        double toleranceK = 1e-9, int maxIterations = 500, double? initialGuessK = null)
    {
        var y = NormaliseVapor(vapor);
        RequirePressure(pressurePa);
        double lnP = Math.Log(pressurePa);
        double[]? warmStart = null; // the liquid of the previous trial T starts the next one
        double Residual(double t)
        {
            var (p, x, _) = DewPressureCore(t, y, 1e-12, maxIterations, warmStart);
            warmStart = x;
            return Math.Log(p) - lnP;
        }

        double t = SolveTemperature(Residual, "dew temperature", pressurePa, toleranceK, maxIterations,
            initialGuessK ?? StartingTemperature(pressurePa));
        var (pDew, xDew, gamma) = DewPressureCore(t, y, 1e-12, maxIterations, warmStart);
        return Point(SaturationKind.DewPoint, t, pDew, xDew, y, gamma);
    }

    /// <summary>Dew temperature at P, or false when the solver does not converge.</summary>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <param name="vapor">Vapour amounts or mole fractions in component order.</param>
    /// <param name="result">The dew point when found.</param>
    /// <param name="toleranceK">Convergence tolerance on T [K].</param>
    /// <param name="maxIterations">Iteration caps as for <see cref="DewTemperature"/>.</param>
    /// <param name="initialGuessK">Starting temperature [K].</param>
    public bool TryDewTemperature(double pressurePa, IReadOnlyList<double> vapor,
        [NotNullWhen(true)] out EquilibriumPoint? result,
        double toleranceK = 1e-9, int maxIterations = 500, double? initialGuessK = null)
    {
        try
        {
            result = DewTemperature(pressurePa, vapor, toleranceK, maxIterations, initialGuessK);
            return true;
        }
        catch (EquilibriumConvergenceException)
        {
            result = null;
            return false;
        }
    }

    /// <summary>Boiling temperature [K] of one pure volatile component at pressure P.</summary>
    /// <param name="componentIndex">Index into <see cref="Components"/>.</param>
    /// <param name="pressurePa">Pressure [Pa].</param>
    /// <exception cref="EquilibriumConvergenceException">No bracket or no convergence.</exception>
    public double PureBoilingTemperatureK(int componentIndex, double pressurePa)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(componentIndex);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(componentIndex, _components.Length);
        var pure = new double[_components.Length];
        pure[componentIndex] = 1.0;
        return BubbleTemperature(pressurePa, pure).TemperatureK;
    }

    /// <summary>P = Σ x_i γ_i Psat_i and y_i = x_i γ_i Psat_i / P at T for normalised x.</summary>
    internal (double PressurePa, double[] Y, double[] Gamma) BubblePressureCore(double temperatureK, double[] x)
    {
        var gamma = Gamma(temperatureK, x);
        var partial = new double[x.Length];
        double p = 0;
        for (int i = 0; i < x.Length; i++)
            if (x[i] > 0) p += partial[i] = x[i] * gamma[i] * _components[i].SaturationPressurePa(temperatureK);
        for (int i = 0; i < x.Length; i++) partial[i] /= p;
        return (p, partial, gamma);
    }

    private (double PressurePa, double[] X, double[] Gamma) DewPressureCore(
        double temperatureK, double[] y, double tolerance, int maxIterations, double[]? start)
    {
        var psat = _components.Select(c => c.SaturationPressurePa(temperatureK)).ToArray();
        var x = start ?? Normalised(y.Select((yi, i) => yi > 0 ? yi / psat[i] : 0.0).ToArray());
        double inverseP = double.NaN;
        for (int iteration = 0; iteration < maxIterations; iteration++)
        {
            var gamma = Gamma(temperatureK, x);
            var next = new double[x.Length];
            inverseP = 0;
            for (int i = 0; i < x.Length; i++)
                if (y[i] > 0) inverseP += next[i] = y[i] / (gamma[i] * psat[i]);
            for (int i = 0; i < x.Length; i++) next[i] /= inverseP;

            double change = 0;
            for (int i = 0; i < x.Length; i++) change = Math.Max(change, Math.Abs(next[i] - x[i]));
            x = next;
            if (change <= tolerance)
                return (1.0 / inverseP, x, Gamma(temperatureK, x));
        }
        throw new EquilibriumConvergenceException("dew pressure", temperatureK, 1.0 / inverseP,
            $"liquid composition still changing after {maxIterations} substitutions " +
            "(strongly non-ideal vapour; the liquid may split into two phases)");
    }

    private double[] Gamma(double temperatureK, double[] x)
    {
        var gamma = new double[x.Length];
        Model.Model.LnActivityCoefficients(temperatureK, x, gamma);
        for (int i = 0; i < gamma.Length; i++) gamma[i] = Math.Exp(gamma[i]);
        return gamma;
    }

    /// <summary>Brackets the root of an increasing residual r(T) by stepping outward from the
    /// guess (steps doubling from 2 K), then refines it with Brent. A step that lands where a
    /// vapour-pressure curve refuses (above a critical temperature) is shortened instead.</summary>
    private static double SolveTemperature(Func<double, double> residual, string method, double pressurePa,
        double toleranceK, int maxIterations, double guessK)
    {
        double lo = Math.Clamp(guessK, SearchMinimumK, SearchMaximumK);
        double rLo = Evaluate(residual, lo, method, pressurePa)
            ?? throw new EquilibriumConvergenceException(method, lo, pressurePa, "no vapour pressure at the starting temperature");
        double direction = rLo < 0 ? 1.0 : -1.0; // below the root the mixture's pressure is too low
        double step = 2.0, hi = lo, rHi = rLo;
        while (Math.Sign(rHi) == Math.Sign(rLo) && rHi != 0)
        {
            double next = Math.Clamp(hi + direction * step, SearchMinimumK, SearchMaximumK);
            if (next == hi)
                throw new EquilibriumConvergenceException(method, hi, pressurePa,
                    $"no root between {SearchMinimumK} K and {SearchMaximumK} K");
            if (Evaluate(residual, next, method, pressurePa) is not { } rNext)
            {
                step /= 4; // refused there: approach the edge more carefully
                if (step < 1e-3)
                    throw new EquilibriumConvergenceException(method, next, pressurePa,
                        "the root lies beyond where a component's vapour pressure is defined");
                continue;
            }
            (lo, rLo, hi, rHi) = (hi, rHi, next, rNext);
            step *= 2;
        }
        if (rHi == 0) return hi;
        double lower = Math.Min(lo, hi), upper = Math.Max(lo, hi);
        if (!Brent.TryFindRoot(residual, lower, upper, toleranceK, maxIterations, out double root))
            throw new EquilibriumConvergenceException(method, 0.5 * (lower + upper), pressurePa,
                $"Brent's method did not reach {toleranceK} K in {maxIterations} iterations between {lower:0.###} and {upper:0.###} K");
        return root;
    }

    /// <summary>The residual at T, or null where a curve refuses (out of range) or gives no number.</summary>
    private static double? Evaluate(Func<double, double> residual, double temperatureK, string method, double pressurePa)
    {
        try
        {
            double r = residual(temperatureK);
            return double.IsNaN(r) ? null : r;
        }
        catch (OutOfRangeException)
        {
            return null;
        }
        catch (EquilibriumConvergenceException error) when (error.Method != method)
        {
            return null; // an inner solve (dew liquid) failed at this trial temperature
        }
    }

    /// <summary>A guess that keeps the bracket search short: the temperature at which the
    /// Clausius–Clapeyron line through a typical solvent (Trouton's rule, 350 K at 1 atm) gives P.</summary>
    private static double StartingTemperature(double pressurePa)
    {
        const double normalBoilingK = 350.0, troutonJPerMolK = 88.0, r = 8.314462618;
        double inverseT = 1.0 / normalBoilingK - r * Math.Log(pressurePa / 101325.0) / (troutonJPerMolK * normalBoilingK);
        return inverseT > 0 ? Math.Clamp(1.0 / inverseT, SearchMinimumK, SearchMaximumK) : SearchMaximumK;
    }

    private EquilibriumPoint Point(SaturationKind kind, double t, double p, double[] x, double[] y, double[] gamma,
        LiquidPhaseSplit? split = null)
    {
        var names = _components.Select(c => c.Name).ToArray();
        var k = new double[x.Length];
        for (int i = 0; i < x.Length; i++)
            k[i] = _components[i].IsNonVolatile ? 0.0 : gamma[i] * _components[i].SaturationPressurePa(t) / p;
        var alphas = new List<RelativeVolatility>();
        for (int i = 0; i < x.Length; i++)
            for (int j = i + 1; j < x.Length; j++)
                if (!_components[i].IsNonVolatile && !_components[j].IsNonVolatile)
                    alphas.Add(new RelativeVolatility(names[i], names[j], k[i] / k[j]));
        return new EquilibriumPoint
        {
            Kind = kind,
            TemperatureK = t,
            PressurePa = p,
            Liquid = ByName(names, x),
            Vapor = ByName(names, y),
            ActivityCoefficients = ByName(names, gamma),
            KValues = ByName(names, k),
            RelativeVolatilities = alphas,
            ExtrapolatedComponents = _components
                .Where(c => !c.IsNonVolatile && c.IsSaturationPressureExtrapolated(t)).Select(c => c.Name).ToList(),
            Model = Model.Name,
            FallbackReason = Model.FallbackReason,
            ModelReason = Model.Reason,
            ApproximationNote = Model.ApproximationNote,
            LiquidPhases = split?.Phases ?? [Phase(x, 1.0)],
            LiquidPhaseBasis = split?.Basis,
            X = x,
            Y = y,
        };
    }

    private static Dictionary<string, double> ByName(string[] names, double[] values)
        => names.Zip(values).ToDictionary(p => p.First, p => p.Second);

    internal double[] Normalise(IReadOnlyList<double> amounts, string parameter)
    {
        ArgumentNullException.ThrowIfNull(amounts, parameter);
        if (amounts.Count != _components.Length)
            throw new ArgumentException($"expected {_components.Length} amounts, got {amounts.Count}", parameter);
        for (int i = 0; i < amounts.Count; i++)
            if (!(amounts[i] >= 0) || !double.IsFinite(amounts[i]))
                throw new ArgumentException($"amount of {_components[i].Name} is {amounts[i]}; must be ≥ 0", parameter);
        var x = Normalised(amounts.ToArray());
        return x.All(double.IsFinite) ? x : throw new ArgumentException("amounts add up to zero", parameter);
    }

    private static double[] Normalised(double[] values)
    {
        double sum = values.Sum();
        return values.Select(v => v / sum).ToArray();
    }

    private double[] NormaliseVapor(IReadOnlyList<double> vapor)
    {
        var y = Normalise(vapor, nameof(vapor));
        for (int i = 0; i < y.Length; i++)
            if (y[i] > 0 && _components[i].IsNonVolatile)
                throw new ArgumentException($"{_components[i].Name} is non-volatile and cannot be in the vapour", nameof(vapor));
        return y;
    }

    private void RequireVolatile(double[] x, string method)
    {
        for (int i = 0; i < x.Length; i++)
            if (x[i] > 0 && !_components[i].IsNonVolatile) return;
        throw new ArgumentException($"{method}: the liquid holds no volatile component");
    }

    private static void RequirePressure(double pressurePa)
    {
        if (!(pressurePa > 0) || !double.IsFinite(pressurePa))
            throw new ArgumentOutOfRangeException(nameof(pressurePa), pressurePa, "pressure must be > 0 Pa");
    }
}
