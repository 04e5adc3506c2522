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

    private BubblePoint ToBubble(EquilibriumPoint p) =>
        new(p.TemperatureK, p.PressurePa, Components.Select(s => p.Vapor[s.Name]).ToArray(), p.ExtrapolatedComponents.Count > 0);

    /// <summary>
    /// Azeotropes of every pair at a pressure, and the pairs whose search failed (with why, so
    /// the plan can say "not evaluated" instead of dropping the check). Azeotropes closer than
    /// 0.025 mole fraction to a pure component are left out: they change nothing a person can
    /// see, and original UNIFAC predicts some there that do not exist (acetone–water at 0.98 acetone).
    /// </summary>
    public (IReadOnlyList<Azeotrope> Found, string? Problem) Azeotropes(double pressurePa)
    {
        var found = new List<Azeotrope>();
        var problems = new List<string>();
        var parts = Equilibrium.Components;
        for (int i = 0; i < parts.Count; i++)
            for (int j = i + 1; j < parts.Count; j++)
            {
                var pair = PhaseEquilibrium.Create([parts[i], parts[j]], Equilibrium.Model.Requested);
                try { found.AddRange(AzeotropeSearch.Find(pair, pressurePa, gridIntervals: 100).Azeotropes.Where(a => a.MoleFractions.Values.Min() >= 0.025)); }
                catch (DistillPlanException e) { problems.Add($"{parts[i].Name}–{parts[j].Name}: {e.Message}"); }
            }
        return (found, problems.Count == 0 ? null : "the azeotrope search failed for " + string.Join("; ", problems));
    }
}
