namespace DistillPlan.Core.Mixtures;

/// <summary>A main-group pair (m, n) for which the UNIFAC table has no interaction parameter.</summary>
/// <param name="M">First main-group id.</param>
/// <param name="MName">First main-group name.</param>
/// <param name="N">Second main-group id.</param>
/// <param name="NName">Second main-group name.</param>
public sealed record MissingUnifacPair(int M, string MName, int N, string NName)
{
    /// <inheritdoc />
    public override string ToString() => $"{MName} ({M}) / {NName} ({N})";
}

/// <summary>
/// Whether UNIFAC can describe a set of components: which components have no subgroups, which
/// subgroups are unknown to the table and which main-group pairs have no parameter.
/// </summary>
/// <param name="ComponentsWithoutGroups">Volatile components that carry no UNIFAC subgroups.</param>
/// <param name="IdealDiluents">Non-volatile components without subgroups; UNIFAC treats them as
/// ideal diluents (they lower mole fractions but do not change γ of the others).</param>
/// <param name="UnknownSubgroups">Subgroup ids used by a component but absent from the table.</param>
/// <param name="MissingPairs">Main-group pairs present in the mixture without a parameter.</param>
public sealed record UnifacCoverage(
    IReadOnlyList<string> ComponentsWithoutGroups,
    IReadOnlyList<string> IdealDiluents,
    IReadOnlyList<int> UnknownSubgroups,
    IReadOnlyList<MissingUnifacPair> MissingPairs)
{
    /// <summary>The model the coverage was checked for, as a reader knows it ("UNIFAC",
    /// "modified UNIFAC (Dortmund)", "UNIFAC-LLE").</summary>
    public string Model { get; init; } = "UNIFAC";

    /// <summary>True when UNIFAC can be evaluated for every volatile component.</summary>
    public bool IsComplete =>
        ComponentsWithoutGroups.Count == 0 && UnknownSubgroups.Count == 0 && MissingPairs.Count == 0;

    /// <summary>One sentence saying why UNIFAC cannot be used, or null when it can.</summary>
    public string? Reason
    {
        get
        {
            if (IsComplete) return null;
            var parts = new List<string>();
            if (ComponentsWithoutGroups.Count > 0)
                parts.Add($"no {Model} groups for {string.Join(", ", ComponentsWithoutGroups)}");
            if (UnknownSubgroups.Count > 0)
                parts.Add($"subgroup(s) {string.Join(", ", UnknownSubgroups)} not in the {Model} table");
            if (MissingPairs.Count > 0)
                parts.Add($"no {Model} interaction parameter for main groups {string.Join("; ", MissingPairs)}");
            return string.Join("; ", parts);
        }
    }
}
