using MathNet.Numerics.RootFinding;

namespace DistillPlan.Core.Mixtures;

/// <summary>One run of <see cref="BatchStrip"/>: state, events and the integration loop.</summary>
/// <remarks>
/// State u = [N_1 … N_n, D_1 … D_n] (liquid and distillate, mol); independent variable s =
/// evaporated moles / charged moles; du/ds = N0 · [−y, +y].
/// </remarks>
internal sealed class RayleighStrip
{
    private const double DryFraction = 1e-6;     // "dry": this fraction of the volatile charge left
    private const double EventTolerance = 1e-9;  // an event counts as reached within this margin
    private const double MinimumStep = 1e-14;

    private readonly PhaseEquilibrium _equilibrium;
    private readonly StripMode _mode;
    private readonly double _setpoint; // K or Pa
    private readonly StripOptions _options;
    private readonly string[] _names;
    private readonly double[] _charge;
    private readonly int _n;
    private readonly double _chargeTotal;
    private readonly double[]? _molarVolume;
    private readonly double _chargeVolume;
    private readonly double _dryS;
    private double _temperatureGuessK;

    private sealed record Snapshot(double S, double[] U, double TemperatureK, double PressurePa, double[] X, double[] Y)
    {
        public IReadOnlyList<LiquidPhase> Phases { get; init; } = [];
    }

    private sealed class StripEvent(string name, Func<Snapshot, double> remaining, StripEndReason? endReason,
        Func<Snapshot, string> message, bool amountsOnly = false)
    {
        public string Name { get; } = name;
        /// <summary>The distance reads only the amounts (S and U), not the equilibrium: it is
        /// located without a bubble point per trial length.</summary>
        public bool AmountsOnly { get; } = amountsOnly;
        public Func<Snapshot, double> Remaining { get; } = remaining;
        public StripEndReason? EndReason { get; } = endReason;  // null: a report event
        public Func<Snapshot, string> Message { get; } = message;
    }

    public RayleighStrip(PhaseEquilibrium equilibrium, IReadOnlyList<double> chargeMol, StripMode mode,
        double setpoint, StripOptions options)
    {
        ArgumentNullException.ThrowIfNull(equilibrium);
        ArgumentNullException.ThrowIfNull(chargeMol);
        ArgumentNullException.ThrowIfNull(options);
        _equilibrium = equilibrium;
        _mode = mode;
        _setpoint = setpoint;
        _options = options;
        var components = equilibrium.Components;
        _n = components.Count;
        _names = components.Select(c => c.Name).ToArray();
        if (chargeMol.Count != _n)
            throw new ArgumentException($"expected {_n} charge amounts, got {chargeMol.Count}", nameof(chargeMol));
        if (chargeMol.Any(m => !(m >= 0) || !double.IsFinite(m)))
            throw new ArgumentException("charge amounts must be finite and ≥ 0 mol", nameof(chargeMol));
        _charge = chargeMol.ToArray();
        _chargeTotal = _charge.Sum();
        double volatileCharge = Enumerable.Range(0, _n).Where(i => !components[i].IsNonVolatile).Sum(i => _charge[i]);
        if (!(volatileCharge > 0))
            throw new ArgumentException("the charge holds no volatile component", nameof(chargeMol));
        _dryS = (1 - DryFraction) * volatileCharge / _chargeTotal;

        // The volume basis counts the solvents: a dissolved non-volatile product adds no solvent volume.
        if (components.All(c => c.IsNonVolatile || c.LiquidMolarVolumeM3PerMol is not null))
        {
            _molarVolume = components.Select(c => c.IsNonVolatile ? 0.0 : c.LiquidMolarVolumeM3PerMol!.Value).ToArray();
            _chargeVolume = Enumerable.Range(0, _n).Sum(i => _charge[i] * _molarVolume[i]);
        }
        else if (options.Basis == StripBasis.Volume)
        {
            var missing = components.Where(c => !c.IsNonVolatile && c.LiquidDensityKgPerM3 is null).Select(c => c.Name);
            throw new ArgumentException(
                $"a volume basis needs every component's liquid density; missing for {string.Join(", ", missing)}",
                nameof(options));
        }
        ValidateOptions();
        _temperatureGuessK = mode == StripMode.FixedVaporTemperature ? setpoint : double.NaN;
    }

    public StripResult Run()
    {
        var u = new double[2 * _n];
        Array.Copy(_charge, u, _n);
        Snapshot current;
        try
        {
            current = Evaluate(0.0, u);
        }
        catch (EquilibriumConvergenceException error)
        {
            return Finish([], StripEndReason.EquilibriumFailed, $"no bubble point for the charge: {error.Message}");
        }

        var reports = new List<StripStep> { Report(current) };
        var ends = EndEvents();
        var started = ends.FirstOrDefault(e => e.Remaining(current) <= 0);
        if (started is not null) return Finish(reports, started.EndReason!.Value, "at the start: " + started.Message(current));

        double nextReport = _options.ReportEveryEvaporatedFraction;
        double referencePa = current.PressurePa, referenceK = current.TemperatureK;
        var reportEvents = ReportEvents(() => nextReport, () => referencePa, () => referenceK);
        var events = ends.Concat(reportEvents).ToList();

        double hMax = Math.Min(0.05, _options.ReportEveryEvaporatedFraction / 2);
        double h = Math.Min(1e-3, hMax);
        double absoluteTolerance = 1e-12 * _chargeTotal;

        for (int step = 0; step < _options.MaxSteps; step++)
        {
            h = Math.Min(h, _dryS - current.S);
            Snapshot trial;
            double errorNorm;
            double[][] stages;
            try
            {
                (var next, var error, stages) = DormandPrince45.StepWithStages(Derivative, current.S, current.U, h);
                errorNorm = ErrorNorm(current.U, next, error, absoluteTolerance);
                trial = errorNorm <= 1 ? Evaluate(current.S + h, next) : current;
            }
            catch (EquilibriumConvergenceException error)
            {
                // Near dryness the bubble point may leave the solvers' range: retry shorter, then stop.
                h /= 4;
                if (h >= MinimumStep) continue;
                reports.Add(Report(current));
                return Finish(reports, StripEndReason.EquilibriumFailed,
                    $"bubble point not found after {current.S:P2} of the charge evaporated: {error.Message}");
            }

            if (errorNorm > 1)
            {
                h *= Math.Max(0.2, 0.9 * Math.Pow(errorNorm, -0.2));
                continue;
            }

            var crossed = events.Where(e => e.Remaining(current) > 0 && e.Remaining(trial) <= 0).ToList();
            if (crossed.Count == 0)
            {
                current = trial;
                h = Math.Min(hMax, h * Math.Min(5.0, 0.9 * Math.Pow(Math.Max(errorNorm, 1e-10), -0.2)));
                continue;
            }

            // Move exactly to the earliest event in this step and act on every event reached there.
            var located = crossed.Select(e => (Event: e, H: Locate(e, current, trial, stages, h))).MinBy(p => p.H);
            current = Evaluate(current.S + located.H, DormandPrince45.Step(Derivative, current.S, current.U, located.H).Next);
            var reached = events.Where(e => e == located.Event || e.Remaining(current) <= EventTolerance).ToList();
            var end = reached.FirstOrDefault(e => e.EndReason is not null);
            reports.Add(Report(current));
            if (end is not null) return Finish(reports, end.EndReason!.Value, end.Message(current));

            double evaporated = EvaporatedFraction(current.U);
            double every = _options.ReportEveryEvaporatedFraction;
            nextReport = (Math.Floor(evaporated / every + EventTolerance) + 1) * every;
            referencePa = current.PressurePa;
            referenceK = current.TemperatureK;
        }

        reports.Add(Report(current));
        return Finish(reports, StripEndReason.StepLimitReached,
            $"stopped after {_options.MaxSteps} integrator steps at {current.S:P2} evaporated");
    }

    private List<StripEvent> EndEvents()
    {
        var ends = new List<StripEvent>();
        string basis = _options.Basis == StripBasis.Moles ? "by moles" : "by volume";
        if (_options.StopAtFractionLeft is { } left)
            ends.Add(new("fraction left", s => FractionLeft(s.U) - left, StripEndReason.FractionLeftReached,
                _ => $"{left:P1} of the charge ({basis}) is left", amountsOnly: true));
        if (_options.MinimumResidueFraction is { } residue)
            ends.Add(new("minimum residue", s => FractionLeft(s.U) - residue, StripEndReason.MinimumResidueReached,
                _ => $"minimum residue reached: {residue:P1} of the charge ({basis}) is kept; do not evaporate further", amountsOnly: true));
        if (_options.StopAtResidualMoleFraction is { } target)
        {
            int k = _equilibrium.IndexOf(target.Component);
            ends.Add(new("residual mole fraction", s => s.X[k] - target.MoleFraction, StripEndReason.ResidualMoleFractionReached,
                s => $"{target.Component} is down to mole fraction {s.X[k]:G3} in the liquid (target {target.MoleFraction:G3})"));
        }
        if (_options.PumpLimitPa is { } pump)
            ends.Add(new("pump limit", s => Math.Log(s.PressurePa / pump), StripEndReason.PumpLimitReached,
                s => $"bubble pressure has fallen to the pump limit, {pump:0.#} Pa"));
        if (_options.TemperatureLimitK is { } limit)
            ends.Add(new("temperature limit", s => limit - s.TemperatureK, StripEndReason.TemperatureLimitReached,
                _ => $"boiling temperature has risen to the limit, {limit:0.##} K"));
        ends.Add(new("dry", s => _dryS - s.S, StripEndReason.Dry,
            _ => "practically dry: less than 1 ppm of the volatile charge is left"));
        return ends;
    }

    private List<StripEvent> ReportEvents(Func<double> nextReport, Func<double> referencePa, Func<double> referenceK)
    {
        var reports = new List<StripEvent>
        {
            new("evaporated fraction", s => nextReport() - EvaporatedFraction(s.U), null, _ => "", amountsOnly: true),
        };
        if (_options.ReportPressureRatio is { } ratio)
            reports.Add(new("pressure ratio", s => Math.Log(s.PressurePa / (referencePa() * ratio)), null, _ => ""));
        if (_options.ReportTemperatureStepK is { } stepK)
            reports.Add(new("temperature step", s => referenceK() + stepK - s.TemperatureK, null, _ => ""));
        return reports;
    }

    /// <summary>Step length in (0, h] at which the event's remaining distance reaches zero.</summary>
    /// <remarks>The root is that of a real step of that length (the state the strip moves to), to
    /// h·1e-12. A trial step costs six equilibrium evaluations, so the root is first found on the
    /// step's dense output (one evaluation per trial), then polished by secant steps on real steps
    /// (usually two); Brent on real steps over the whole step is the fallback.</remarks>
    private double Locate(StripEvent e, Snapshot from, Snapshot to, double[][] stages, double h)
    {
        // An event on the amounts alone needs no bubble point at the trial state: the same
        // distances, so the same root, for a seventh of the evaluations.
        Snapshot At(double s, double[] u) => e.AmountsOnly ? new Snapshot(s, u, double.NaN, double.NaN, [], []) : Evaluate(s, u);
        double Real(double length) =>
            e.Remaining(At(from.S + length, DormandPrince45.Step(Derivative, from.S, from.U, length).Next));
        double Dense(double length) =>
            e.Remaining(At(from.S + length, DormandPrince45.Interpolate(from.U, to.U, stages, h, length / h)));
        double tolerance = Math.Max(h * 1e-12, MinimumStep);
        if (e.Remaining(to) == 0) return h;
        if (Polished(Real, Dense, h, tolerance) is { } polished) return polished;
        return Brent.TryFindRoot(Real, 0.0, h, tolerance, 200, out double root) ? root : h;
    }

    private static double? Polished(Func<double, double> real, Func<double, double> dense, double h, double tolerance)
    {
        if (!Brent.TryFindRoot(dense, 0.0, h, tolerance, 200, out double length)) return null;
        double delta = Math.Max(h * 1e-6, 16 * tolerance);
        double other = length - delta > 0 ? length - delta : length + delta;
        double slope = (dense(other) - dense(length)) / (other - length);
        double r = real(length);
        for (int iteration = 0; iteration < 8; iteration++)
        {
            if (r == 0) return length;
            if (!(slope != 0) || !double.IsFinite(slope)) return null;
            double next = length - r / slope;
            if (!(next > 0 && next <= h)) return null;
            if (Math.Abs(next - length) <= tolerance) return next;
            double rNext = real(next);
            slope = (rNext - r) / (next - length);
            (length, r) = (next, rNext);
        }
        return null;
    }

    private double[] Derivative(double s, double[] u)
    {
        var y = Evaluate(s, u).Y;
        var du = new double[2 * _n];
        for (int i = 0; i < _n; i++)
        {
            du[i] = -_chargeTotal * y[i];
            du[_n + i] = _chargeTotal * y[i];
        }
        return du;
    }

    // The last few evaluations, newest first. Dormand–Prince evaluates its seventh stage at the
    // step's own result (first same as last), the accepted step is then evaluated there again, the
    // next step's first stage is that same state, and every trial step of the event location
    // starts with the same first stage: each repeat is a full bubble point with a stability test.
    private readonly Snapshot?[] _recent = new Snapshot?[4];

    private Snapshot Evaluate(double s, double[] u)
    {
        foreach (var known in _recent)
            if (known is not null && known.S == s && known.U.AsSpan().SequenceEqual(u)) return known;
        var snapshot = EvaluateNew(s, (double[])u.Clone());
        Array.Copy(_recent, 0, _recent, 1, _recent.Length - 1);
        _recent[0] = snapshot;
        return snapshot;
    }

    private Snapshot EvaluateNew(double s, double[] u)
    {
        var liquid = new double[_n];
        for (int i = 0; i < _n; i++) liquid[i] = Math.Max(u[i], 0.0); // a trial stage may overshoot a tiny amount
        if (_mode == StripMode.FixedVaporTemperature)
        {
            // With two liquids the vapour is the three-phase one (heteroazeotrope while both layers last).
            var x = _equilibrium.Normalise(liquid, "liquid");
            var (p, y, _, split) = _equilibrium.BubblePressureWithPhases(_setpoint, x, phasesOnly: true);
            return new Snapshot(s, u, _setpoint, p, x, y) { Phases = split.Phases };
        }

        var point = _equilibrium.BubbleTemperature(_setpoint, liquid,
            initialGuessK: double.IsNaN(_temperatureGuessK) ? null : _temperatureGuessK);
        _temperatureGuessK = point.TemperatureK;
        return new Snapshot(s, u, point.TemperatureK, _setpoint, point.X, point.Y) { Phases = point.LiquidPhases };
    }

    private double ErrorNorm(double[] u, double[] next, double[] error, double absoluteTolerance)
    {
        double sum = 0;
        for (int i = 0; i < u.Length; i++)
        {
            double scale = absoluteTolerance + _options.RelativeTolerance * Math.Max(Math.Abs(u[i]), Math.Abs(next[i]));
            sum += Math.Pow(error[i] / scale, 2);
        }
        return Math.Sqrt(sum / u.Length);
    }

    private double FractionLeft(double[] u) => _options.Basis == StripBasis.Volume
        ? Enumerable.Range(0, _n).Sum(i => Math.Max(u[i], 0) * _molarVolume![i]) / _chargeVolume
        : Enumerable.Range(0, _n).Sum(i => Math.Max(u[i], 0)) / _chargeTotal;

    private double EvaporatedFraction(double[] u) => _options.Basis == StripBasis.Volume
        ? EvaporatedVolumeFraction(u)!.Value
        : Enumerable.Range(0, _n).Sum(i => u[_n + i]) / _chargeTotal;

    private double? EvaporatedVolumeFraction(double[] u) => _molarVolume is null
        ? null
        : Enumerable.Range(0, _n).Sum(i => u[_n + i] * _molarVolume[i]) / _chargeVolume;

    private StripStep Report(Snapshot s) => new()
    {
        EvaporatedMoleFraction = Enumerable.Range(0, _n).Sum(i => s.U[_n + i]) / _chargeTotal,
        EvaporatedVolumeFraction = EvaporatedVolumeFraction(s.U),
        PressurePa = s.PressurePa,
        TemperatureK = s.TemperatureK,
        Liquid = ByName(s.X),
        Vapor = ByName(s.Y),
        DistillateMol = ByName(s.U[_n..]),
        ResidueMol = ByName(s.U[.._n]),
        LiquidPhases = s.Phases,
    };

    private StripResult Finish(List<StripStep> reports, StripEndReason reason, string message) => new()
    {
        Mode = _mode,
        ChargeMol = ByName(_charge),
        Steps = reports,
        EndReason = reason,
        EndMessage = message,
        Model = _equilibrium.Model.Name,
        FallbackReason = _equilibrium.Model.FallbackReason,
        ModelNote = _equilibrium.Model.Note,
        ApproximationNote = _equilibrium.Model.ApproximationNote,
    };

    private Dictionary<string, double> ByName(double[] values)
        => _names.Zip(values).ToDictionary(p => p.First, p => p.Second);

    private void ValidateOptions()
    {
        static void Fraction(double? value, string name, bool allowOne = false)
        {
            if (value is { } v && (!(v > 0) || v > 1 || (!allowOne && v == 1)))
                throw new ArgumentOutOfRangeException(name, v, "must be a fraction between 0 and 1");
        }
        Fraction(_options.StopAtFractionLeft, nameof(StripOptions.StopAtFractionLeft));
        Fraction(_options.MinimumResidueFraction, nameof(StripOptions.MinimumResidueFraction));
        Fraction(_options.ReportEveryEvaporatedFraction, nameof(StripOptions.ReportEveryEvaporatedFraction), allowOne: true);
        Fraction(_options.ReportPressureRatio, nameof(StripOptions.ReportPressureRatio));
        if (_options.StopAtResidualMoleFraction is { } target)
        {
            _equilibrium.IndexOf(target.Component);
            Fraction(target.MoleFraction, nameof(StripOptions.StopAtResidualMoleFraction));
        }
        bool fixedT = _mode == StripMode.FixedVaporTemperature;
        if (_options.PumpLimitPa is not null && !fixedT)
            throw new ArgumentException("a pump limit applies to a fixed-temperature strip (the pressure is fixed here)");
        if (_options.PumpLimitPa is { } pump && !(pump > 0))
            throw new ArgumentOutOfRangeException(nameof(StripOptions.PumpLimitPa), pump, "must be > 0 Pa");
        if (_options.ReportPressureRatio is not null && !fixedT)
            throw new ArgumentException("pressure-ratio reports apply to a fixed-temperature strip");
        if (_options.TemperatureLimitK is not null && fixedT)
            throw new ArgumentException("a temperature limit applies to a fixed-pressure strip (the temperature is fixed here)");
        if (_options.ReportTemperatureStepK is not null && fixedT)
            throw new ArgumentException("temperature-step reports apply to a fixed-pressure strip");
        if (_options.ReportTemperatureStepK is { } stepK && !(stepK > 0))
            throw new ArgumentOutOfRangeException(nameof(StripOptions.ReportTemperatureStepK), stepK, "must be > 0 K");
        if (!(_options.RelativeTolerance > 0)) throw new ArgumentOutOfRangeException(nameof(StripOptions.RelativeTolerance));
        ArgumentOutOfRangeException.ThrowIfLessThan(_options.MaxSteps, 1);
    }
}
