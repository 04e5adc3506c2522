using DistillPlan.Core.Library;
using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Planning;

/// <summary>
/// A mixture boiling by modified Raoult's law (y_i·P = x_i·γ_i·Psat_i), with UNIFAC or ideal
/// activity coefficients: the planner's view of <see cref="PhaseEquilibrium"/>.
/// </summary>
public sealed class MixtureBoilingSystem : IBoilingSystem
{
    /// <summary>Builds the equilibrium of the solvents with the requested model.</summary>
    public MixtureBoilingSystem(IReadOnlyList<Solvent> solvents, ActivityModelKind requested)
    {
        Components = solvents;
        Equilibrium = PhaseEquilibrium.Create(solvents.Select(MixtureComponent.FromSolvent).ToList(), requested);
    }

    /// <summary>The underlying equilibrium (for strips and azeotrope searches).</summary>
    public PhaseEquilibrium Equilibrium { get; }
    /// <inheritdoc />
    public IReadOnlyList<Solvent> Components { get; }
    /// <inheritdoc />
    public string Model => Equilibrium.Model.Name;
    /// <inheritdoc />
    public string? ModelNote => Equilibrium.Model.FallbackReason ?? Equilibrium.Model.Note;

    /// <inheritdoc />
    public BubblePoint BubblePressure(double temperatureK, double[] liquid) => ToBubble(Equilibrium.BubblePressure(temperatureK, liquid));

    /// <inheritdoc />
    public BubblePoint BubbleTemperature(double pressurePa, double[] liquid) => ToBubble(Equilibrium.BubbleTemperature(pressurePa, liquid));

    /// <summary>Bubble pressure [Pa] of a liquid at T, honouring a split, without the point's
    /// other parts (for drawing a curve: one liquid is settled by UNIFAC-LLE first where it can,
    /// which gives the same pressure sooner).</summary>
    public double BubblePressurePa(double temperatureK, double[] liquid) => Equilibrium.BubblePressurePa(temperatureK, liquid);

    private BubblePoint ToBubble(EquilibriumPoint p) =>
        new(p.TemperatureK, p.PressurePa, Components.Select(s => p.Vapor[s.Name]).ToArray(), p.ExtrapolatedComponents.Count > 0,
            p.LiquidPhases, p.LiquidPhaseBasis);

    /// <summary>Why the answer is approximate whatever the model (a carboxylic acid: vapour association not modelled), or null.</summary>
    public string? ApproximationNote => Equilibrium.Model.ApproximationNote;

    /// <summary>
    /// Azeotropes of every pair at a pressure, the pairs whose search failed (with why, so the
    /// plan can say "not evaluated" instead of dropping the check), and what published facts said
    /// about the pairs (the model overruled, or data only at other pressures). Azeotropes closer
    /// than 0.025 mole fraction to a pure component are left out: they change nothing a person
    /// can see, and original UNIFAC predicts some there that do not exist (acetone–water at 0.98 acetone).
    /// </summary>
    public AzeotropeSurvey Azeotropes(double pressurePa) => _surveys.GetOrAdd(pressurePa, Survey);

    // The plan surveys at its setpoint and its ramp checks its first step at the same pressure
    // (and the text UI plans the ramp again): each survey is some hundred bubble points per pair.
    // A survey depends only on the components, the model and the pressure, so it is kept.
    private readonly System.Collections.Concurrent.ConcurrentDictionary<double, AzeotropeSurvey> _surveys = new();

    private AzeotropeSurvey Survey(double pressurePa)
    {
        var parts = Equilibrium.Components;
        var pairs = new List<(int I, int J)>();
        for (int i = 0; i < parts.Count; i++)
            for (int j = i + 1; j < parts.Count; j++) pairs.Add((i, j));

        // The pairs are independent searches (each its own equilibrium and model, nothing
        // shared that changes), so they run side by side on a machine with more than one core;
        // the results are put together in pair order, so the answer does not depend on it.
        var results = new (AzeotropeSearchResult? Result, string? Problem)[pairs.Count];
        void Search(int k)
        {
            var (i, j) = pairs[k];
            var pair = PhaseEquilibrium.Create([parts[i], parts[j]], Equilibrium.Model.Requested);
            try { results[k] = (AzeotropeSearch.Find(pair, pressurePa, gridIntervals: 100), null); }
            // A search whose solver gives up is reported as "not evaluated", never as an internal error.
            catch (Exception e) when (e is DistillPlanException or MathNet.Numerics.NonConvergenceException) { results[k] = (null, e.Message); }
        }
        if (pairs.Count > 1 && Environment.ProcessorCount > 1)
        {
            // Anything else a search throws is a fault: let it surface as itself, as without threads.
            try { Parallel.For(0, pairs.Count, Search); }
            catch (AggregateException e) when (e.InnerExceptions.Count > 0)
            {
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            }
        }
        else for (int k = 0; k < pairs.Count; k++) Search(k);

        var found = new List<Azeotrope>();
        var problems = new List<string>();
        var notes = new List<string>();
        for (int k = 0; k < pairs.Count; k++)
        {
            var (i, j) = pairs[k];
            var (result, problem) = results[k];
            if (problem is not null) { problems.Add($"{parts[i].Name}–{parts[j].Name}: {problem}"); continue; }
            found.AddRange(result!.Azeotropes.Where(a => a.MoleFractions.Values.Min() >= 0.025));
            if (result.UsesPublishedValue && result.Note is string n) notes.Add($"{parts[i].Name}–{parts[j].Name}: {n}");
        }
        return new(found, problems.Count == 0 ? null : "the azeotrope search failed for " + string.Join("; ", problems), notes);
    }
}

/// <summary>What an azeotrope search over every pair of a mixture found at one pressure.</summary>
/// <param name="Found">Azeotropes (published values where the model was overruled, with their <see cref="Azeotrope.Source"/>).</param>
/// <param name="Problem">Why the search failed for some pair, or null.</param>
/// <param name="PublishedNotes">One sentence per pair where a published azeotrope or zeotrope overruled the model, with its citation.</param>
public sealed record AzeotropeSurvey(IReadOnlyList<Azeotrope> Found, string? Problem, IReadOnlyList<string> PublishedNotes)
{
    /// <summary>Nothing found, nothing failed (a pure solvent).</summary>
    public static AzeotropeSurvey None { get; } = new([], null, []);
}
