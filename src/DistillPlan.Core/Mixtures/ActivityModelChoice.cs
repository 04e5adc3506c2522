namespace DistillPlan.Core.Mixtures;

/// <summary>Which activity model a caller asks for.</summary>
public enum ActivityModelKind
{
    /// <summary>UNIFAC (original) where every group and pair has a parameter, ideal otherwise.</summary>
    Unifac,

    /// <summary>Ideal solution (Raoult's law), on request.</summary>
    Ideal,
}

/// <summary>
/// The activity model chosen for a mixture, with the reason when UNIFAC was asked for but
/// could not be used, and any note about how the model treats the components.
/// </summary>
/// <param name="Model">The model to evaluate.</param>
/// <param name="Requested">What the caller asked for.</param>
/// <param name="FallbackReason">Why UNIFAC was replaced by ideal, or null.</param>
/// <param name="Note">A remark on the model's treatment (e.g. a product as ideal diluent), or null.</param>
public sealed record ActivityModelChoice(
    IActivityModel Model,
    ActivityModelKind Requested,
    string? FallbackReason,
    string? Note)
{
    /// <summary>Name of the model used ("unifac" or "ideal").</summary>
    public string Name => Model.Name;

    /// <summary>
    /// Chooses the model for <paramref name="components"/>: UNIFAC when requested and complete,
    /// otherwise ideal with <see cref="FallbackReason"/> saying what was missing; ideal when
    /// requested.
    /// </summary>
    /// <param name="components">The mixture's components in order.</param>
    /// <param name="requested">The model asked for; UNIFAC by default.</param>
    /// <param name="parameters">UNIFAC table; the original table by default.</param>
    public static ActivityModelChoice Choose(
        IReadOnlyList<MixtureComponent> components,
        ActivityModelKind requested = ActivityModelKind.Unifac,
        UnifacParameters? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        if (requested == ActivityModelKind.Ideal)
            return new(new IdealSolution(components.Count), requested, null, null);

        var coverage = Unifac.CheckCoverage(components, parameters);
        if (!coverage.IsComplete)
            return new(new IdealSolution(components.Count), requested,
                $"ideal solution used instead of UNIFAC: {coverage.Reason}", null);

        string? note = coverage.IdealDiluents.Count == 0
            ? null
            : $"{string.Join(", ", coverage.IdealDiluents)} has no UNIFAC groups and is treated as an ideal " +
              "diluent (it lowers the solvents' mole fractions but not their activity coefficients)";
        return new(new Unifac(components, parameters), requested, null, note);
    }
}
