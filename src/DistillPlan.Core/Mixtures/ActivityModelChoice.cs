namespace DistillPlan.Core.Mixtures;

/// <summary>Which activity model a caller asks for.</summary>
public enum ActivityModelKind
{
    /// <summary>Original UNIFAC (Fredenslund, Jones, Prausnitz 1975) where every group and pair
    /// has a parameter, ideal otherwise.</summary>
    Unifac,

    /// <summary>Ideal solution (Raoult's law), on request.</summary>
    Ideal,

    /// <summary>Modified UNIFAC (Dortmund) where it covers every pair, original UNIFAC where a
    /// Dortmund pair is missing, ideal last. The default.</summary>
    Dortmund,
}

/// <summary>
/// The activity model chosen for a mixture, why it was chosen (and why a preferred one was not),
/// and notes on how the model treats the components.
/// </summary>
/// <param name="Model">The model to evaluate.</param>
/// <param name="Requested">What the caller asked for.</param>
/// <param name="FallbackReason">Why the requested model was replaced by a less preferred one, or null.</param>
/// <param name="Note">A remark on the model's treatment (e.g. a product as ideal diluent), or null.</param>
public sealed record ActivityModelChoice(
    IActivityModel Model,
    ActivityModelKind Requested,
    string? FallbackReason,
    string? Note)
{
    /// <summary>Name of the model used: "dortmund", "unifac" (original) or "ideal".</summary>
    public string Name => Model.Name;

    /// <summary>One sentence saying which model answered and why.</summary>
    public string Reason { get; init; } = "";

    /// <summary>Non-null when the answer is known to be approximate whatever the model: a
    /// carboxylic acid is present, and its association in the vapour (acetic acid is partly
    /// dimerised) is not modelled.</summary>
    public string? ApproximationNote { get; init; }

    /// <summary>The user's spelling of a model kind: "dortmund", "unifac" or "ideal".</summary>
    /// <param name="kind">The kind.</param>
    public static string NameOf(ActivityModelKind kind) => kind switch
    {
        ActivityModelKind.Dortmund => "dortmund",
        ActivityModelKind.Unifac => "unifac",
        _ => "ideal",
    };

    /// <summary>Parses "dortmund", "unifac" or "ideal" (any case); false for anything else.</summary>
    /// <param name="name">The name.</param>
    /// <param name="kind">The kind when recognised.</param>
    public static bool TryParse(string? name, out ActivityModelKind kind)
    {
        switch (name?.Trim().ToLowerInvariant())
        {
            case "dortmund": kind = ActivityModelKind.Dortmund; return true;
            case "unifac": kind = ActivityModelKind.Unifac; return true;
            case "ideal": kind = ActivityModelKind.Ideal; return true;
            default: kind = ActivityModelKind.Dortmund; return false;
        }
    }

    /// <summary>
    /// Chooses the model for <paramref name="components"/>. Dortmund (the default request): modified
    /// UNIFAC where its table covers every group pair, else original UNIFAC, else ideal, with
    /// <see cref="FallbackReason"/> naming what was missing. Unifac: original UNIFAC, else ideal.
    /// Ideal: ideal.
    /// </summary>
    /// <param name="components">The mixture's components in order.</param>
    /// <param name="requested">The model asked for; modified UNIFAC (Dortmund) by default.</param>
    /// <param name="parameters">Original-UNIFAC table; the shipped one by default.</param>
    public static ActivityModelChoice Choose(
        IReadOnlyList<MixtureComponent> components,
        ActivityModelKind requested = ActivityModelKind.Dortmund,
        UnifacParameters? parameters = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        string? acids = AcidNote(components);
        if (requested == ActivityModelKind.Ideal)
            return new(new IdealSolution(components.Count), requested, null, null)
            { Reason = "ideal solution (Raoult's law), as requested", ApproximationNote = acids };

        var reasons = new List<string>();
        if (requested == ActivityModelKind.Dortmund)
        {
            var dortmund = Unifac.CheckCoverage(components, UnifacParameters.Dortmund);
            if (dortmund.IsComplete)
                return Build(components, UnifacParameters.Dortmund, dortmund, requested, null,
                    "modified UNIFAC (Dortmund): its table has every group and pair of this mixture", acids);
            reasons.Add(dortmund.Reason!);
        }

        var original = Unifac.CheckCoverage(components, parameters);
        if (original.IsComplete)
        {
            string? fallback = reasons.Count == 0 ? null : $"original UNIFAC used instead of modified UNIFAC (Dortmund): {reasons[0]}";
            return Build(components, parameters ?? UnifacParameters.Original, original, requested, fallback,
                fallback ?? "original UNIFAC, as requested: its table has every group and pair of this mixture", acids);
        }
        reasons.Add(original.Reason!);
        string because = $"ideal solution used instead of UNIFAC: {string.Join("; ", reasons.Distinct())}";
        return new(new IdealSolution(components.Count), requested, because, null) { Reason = because, ApproximationNote = acids };
    }

    /// <summary>
    /// The model of a single pure liquid: its activity coefficient is 1 in every model, so no
    /// parameter table is read (a pure solvent's ramp stays as quick to start as its setpoints).
    /// It carries the requested model's name; the acid note does not apply (a pure acid's
    /// vapour pressure is measured, association and all).
    /// </summary>
    /// <param name="requested">The model asked for.</param>
    public static ActivityModelChoice PureLiquid(ActivityModelKind requested)
        => new(IdealSolution.PureLiquid(NameOf(requested)), requested, null, null)
        { Reason = "one pure liquid: its activity coefficient is 1 in every model" };

    private static ActivityModelChoice Build(IReadOnlyList<MixtureComponent> components, UnifacParameters table,
        UnifacCoverage coverage, ActivityModelKind requested, string? fallback, string reason, string? acids)
    {
        string? note = coverage.IdealDiluents.Count == 0
            ? null
            : $"{string.Join(", ", coverage.IdealDiluents)} has no UNIFAC groups and is treated as an ideal " +
              "diluent (it lowers the solvents' mole fractions but not their activity coefficients)";
        return new(new Unifac(components, table), requested, fallback, note) { Reason = reason, ApproximationNote = acids };
    }

    /// <summary>A note when a volatile carboxylic acid (a COOH or HCOOH group in either UNIFAC
    /// table) is in the mixture; null otherwise.</summary>
    private static string? AcidNote(IReadOnlyList<MixtureComponent> components)
    {
        var acids = components.Where(c => !c.IsNonVolatile && IsCarboxylicAcid(c)).Select(c => c.Name).ToList();
        return acids.Count == 0
            ? null
            : $"approximate: {string.Join(", ", acids)} is a carboxylic acid, which associates (dimerises) in the vapour; " +
              "no UNIFAC variant models that, so bubble points and volatilities with it are rough";
    }

    /// <summary>True for a component carrying a carboxylic-acid group (original UNIFAC main group
    /// 20 COOH; Dortmund main groups 20 COOH and 44 HCOOH). A component the Dortmund table assigns
    /// is answered from that assignment (the groups the default model computes with), so a
    /// Dortmund plan does not read the original table just for this check; the original table is
    /// read only for components the Dortmund table does not assign.</summary>
    /// <param name="component">The component.</param>
    public static bool IsCarboxylicAcid(MixtureComponent component)
    {
        ArgumentNullException.ThrowIfNull(component);
        static bool Has(IReadOnlyDictionary<int, int> groups, UnifacParameters table, params int[] mainGroups)
            => groups.Keys.Any(k => table.Subgroups.TryGetValue(k, out var s) && mainGroups.Contains(s.MainGroup));
        if (UnifacParameters.Dortmund.GroupsFor(component) is { } dortmund)
            return Has(dortmund, UnifacParameters.Dortmund, 20, 44);
        return component.UnifacSubgroups is { } original && Has(original, UnifacParameters.Original, 20);
    }
}
