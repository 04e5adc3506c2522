namespace DistillPlan.Core.Mixtures;

/// <summary>The liquid–liquid part of <see cref="PhaseEquilibrium"/>: stability, the two-liquid
/// flash and the three-phase (vapour–liquid–liquid) bubble point.</summary>
/// <remarks>
/// <para>A split is reported when the vapour–liquid model (the one that answered, e.g. Dortmund)
/// finds the liquid unstable by the tangent-plane test and UNIFAC-LLE (Magnussen et al. 1981)
/// agrees; where UNIFAC-LLE lacks a group or pair, the vapour–liquid model decides alone. A
/// published miscibility fact about the pair that differs most between the two phases overrules
/// both. The phase compositions are those of the vapour–liquid model, so that the two liquids
/// have the same activities, hence the same vapour, in that model.</para>
/// <para>With two liquids at fixed P, the bubble (three-phase) temperature is where the first
/// liquid's bubble pressure equals P at the flash compositions of that temperature; it is found
/// by alternating a bubble-temperature solve of phase I with a flash warm-started from the last
/// phases, and it does not depend on the overall composition inside the two-liquid region. The
/// stability test runs once per call (per composition), never inside the root solve; a strip
/// that stays in the two-liquid region reuses the last phases as the flash's start.</para>
/// </remarks>
public sealed partial class PhaseEquilibrium
{
    private IActivityModel? _lleModel;
    private string? _lleMissing;
    private bool _lleChecked;
    private (double[] PhaseI, double[] PhaseII)? _lastSplit; // warm start of the next flash

    /// <summary>Whether bubble points test the liquid for a split into two phases (true by default).</summary>
    public bool DetectLiquidSplit { get; init; } = true;

    /// <summary>The published facts that overrule the models (the shipped table by default).</summary>
    public PublishedMixtureFacts Facts { get => _facts ??= PublishedMixtureFacts.Shipped; init => _facts = value; }

    private PublishedMixtureFacts? _facts; // read on first use: a pure liquid never needs the table

    /// <summary>
    /// The liquid phases of a liquid at temperature T: one (the whole liquid) or two, with each
    /// phase's composition and share of the moles, and the basis of the answer.
    /// </summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="liquid">Liquid amounts or mole fractions in component order.</param>
    public LiquidPhaseSplit LiquidPhases(double temperatureK, IReadOnlyList<double> liquid)
        => Split(temperatureK, Normalise(liquid, nameof(liquid)), useWarmStart: false);

    /// <summary>The split at T of normalised x (see the class remarks for the rule).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    /// <param name="x">Normalised liquid mole fractions.</param>
    /// <param name="useWarmStart">Start the flash from the last split found (a strip's path).</param>
    /// <param name="phasesOnly">The caller uses only the phases, not the basis sentence (a strip
    /// step): where UNIFAC-LLE finds the liquid stable the answer is one liquid whatever the
    /// vapour–liquid model says (its split would be overruled), so that test is asked first and
    /// the costlier vapour–liquid test and flash are skipped.</param>
    internal LiquidPhaseSplit Split(double temperatureK, double[] x, bool useWarmStart = true, bool phasesOnly = false)
    {
        var model = Model.Model;
        if (!DetectLiquidSplit || model is IdealSolution) return Single(temperatureK, x, null);

        (double[] PhaseI, double[] PhaseII, double ShareI)? flash = null;
        bool confirmed = false;
        bool? lleUnstable = null;
        if (useWarmStart && _lastSplit is { } last)
        {
            flash = LiquidStability.Flash(model, temperatureK, x, last.PhaseI, last.PhaseII, maxIterations: 200);
            confirmed = flash is not null; // on the path of a split already confirmed
        }
        if (flash is null && phasesOnly && LleModel() is { } lleFirst)
        {
            lleUnstable = LiquidStability.UnstableTrial(lleFirst, temperatureK, x) is not null;
            if (lleUnstable == false)
            {
                _lastSplit = null;
                return Single(temperatureK, x, null);
            }
        }
        if (flash is null)
        {
            var trial = LiquidStability.UnstableTrial(model, temperatureK, x);
            if (trial is not null) flash = LiquidStability.Flash(model, temperatureK, x, trial);
        }
        if (flash is not { } f)
        {
            _lastSplit = null;
            return Single(temperatureK, x, null);
        }

        // The published fact about the pair that separates most overrules every model.
        int richI = 0, richII = 0;
        for (int i = 1; i < x.Length; i++)
        {
            if (f.PhaseI[i] - f.PhaseII[i] > f.PhaseI[richI] - f.PhaseII[richI]) richI = i;
            if (f.PhaseII[i] - f.PhaseI[i] > f.PhaseII[richII] - f.PhaseI[richII]) richII = i;
        }
        // A binary fact decides only where the pair is practically the whole liquid (other
        // components under 5 % of the moles); beyond that the split stands, with the fact noted.
        var miscible = richI != richII ? Facts.MiscibilityOf(_components[richI], _components[richII], temperatureK) : null;
        string? caution = null;
        if (miscible is not null && 1 - x[richI] - x[richII] > MinorComponentsLimit)
        {
            caution = $"; the split may be exaggerated: every UNIFAC variant wrongly splits {miscible.FirstName}–{miscible.SecondName}, " +
                      $"while {miscible.Describe()}";
            miscible = null;
        }
        if (miscible is { } fact)
        {
            _lastSplit = null;
            return Single(temperatureK, x,
                $"one liquid: {Model.Name} predicts two liquids, overruled by the published fact that {fact.Describe()}") with
                { OverrulingFact = fact };
        }

        string basis;
        var lle = LleModel();
        if (confirmed)
            basis = _lastBasis ?? "two liquids";
        else if (lle is null)
            basis = $"two liquids: {Describe(model)} alone (UNIFAC-LLE cannot be used here: {_lleMissing})";
        else if (lleUnstable ?? LiquidStability.UnstableTrial(lle, temperatureK, x) is not null)
            basis = $"two liquids: {Describe(model)} and UNIFAC-LLE agree";
        else
        {
            _lastSplit = null;
            return Single(temperatureK, x, $"one liquid: {Describe(model)} predicts two liquids but UNIFAC-LLE does not, so one is assumed");
        }
        if (caution is not null && !basis.Contains(caution)) basis += caution;
        _lastSplit = (f.PhaseI, f.PhaseII);
        _lastBasis = basis;
        return new LiquidPhaseSplit
        {
            TemperatureK = temperatureK,
            Phases = [Phase(f.PhaseI, f.ShareI), Phase(f.PhaseII, 1 - f.ShareI)],
            Basis = basis,
        };
    }

    private string? _lastBasis;

    /// <summary>Above this mole fraction of components outside a miscible pair, the binary
    /// miscibility fact no longer overrules a predicted split.</summary>
    public const double MinorComponentsLimit = 0.05;

    private static string Describe(IActivityModel model)
        => model is Unifac u ? Unifac.Describe(u.Parameters) : model.Name;

    /// <summary>The UNIFAC-LLE model of these components, or null (with the reason kept) when its
    /// table lacks a group or pair.</summary>
    private IActivityModel? LleModel()
    {
        if (_lleChecked) return _lleModel;
        var coverage = Unifac.CheckCoverage(_components, UnifacParameters.Lle);
        if (coverage.IsComplete) _lleModel = new Unifac(_components, UnifacParameters.Lle);
        else _lleMissing = coverage.Reason;
        _lleChecked = true;
        return _lleModel;
    }

    private LiquidPhaseSplit Single(double temperatureK, double[] x, string? basis) => new()
    {
        TemperatureK = temperatureK,
        Phases = [Phase(x, 1.0)],
        Basis = basis,
    };

    private LiquidPhase Phase(double[] x, double share)
        => new(_components.Select(c => c.Name).Zip(x).ToDictionary(p => p.First, p => p.Second), share) { X = x };

    /// <summary>Bubble pressure at T honouring a split: with two liquids, that of phase I (the same
    /// as phase II's in the model).</summary>
    internal (double PressurePa, double[] Y, double[] Gamma, LiquidPhaseSplit Split) BubblePressureWithPhases(
        double temperatureK, double[] x, bool phasesOnly = false)
    {
        var split = Split(temperatureK, x, phasesOnly: phasesOnly);
        var (p, y, gamma) = BubblePressureCore(temperatureK, split.IsSplit ? split.Phases[0].X : x);
        return (p, y, gamma, split);
    }

    /// <summary>Three-phase bubble temperature at P for a liquid whose split at the one-liquid
    /// estimate is <paramref name="split"/>; returns the temperature
    /// and the split there, or null when the split vanishes on the way (then one liquid holds).</summary>
    internal (double TemperatureK, LiquidPhaseSplit Split)? ThreePhaseBubbleTemperature(double pressurePa, double[] x,
        LiquidPhaseSplit split, double toleranceK, int maxIterations)
    {
        // One root solve in T; each trial T re-flashes from the last phases (no stability test).
        double lnP = Math.Log(pressurePa);
        var phaseI = split.Phases[0].X;
        var phaseII = split.Phases[1].X;
        var model = Model.Model;
        double Residual(double temperature)
        {
            if (LiquidStability.Flash(model, temperature, x, phaseI, phaseII, maxIterations: 200) is { } f)
                (phaseI, phaseII) = (f.PhaseI, f.PhaseII);
            return Math.Log(BubblePressureCore(temperature, phaseI).PressurePa) - lnP;
        }
        // Start from the liquid's own one-liquid estimate pushed up: the three-phase point lies above it.
        double t = SolveTemperature(Residual, "bubble temperature", pressurePa, toleranceK, maxIterations, split.TemperatureK);
        _lastSplit = (phaseI, phaseII);
        var there = Split(t, x);
        return there.IsSplit ? (t, there) : null;
    }
}
