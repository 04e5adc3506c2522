using System.Globalization;

namespace DistillPlan.Core.Mixtures;

/// <summary>One UNIFAC subgroup: its id, name, main group and its van der Waals volume and area.</summary>
/// <param name="Id">Subgroup id (k).</param>
/// <param name="Name">Subgroup name, e.g. "CH3".</param>
/// <param name="MainGroup">Main-group id; interaction parameters are per main group.</param>
/// <param name="MainGroupName">Main-group name, e.g. "CH2".</param>
/// <param name="R">Relative van der Waals volume R_k [-].</param>
/// <param name="Q">Relative van der Waals surface area Q_k [-].</param>
public sealed record UnifacSubgroup(int Id, string Name, int MainGroup, string MainGroupName, double R, double Q);

/// <summary>Which equations a UNIFAC table belongs to.</summary>
public enum UnifacVariant
{
    /// <summary>Original UNIFAC (Fredenslund et al. 1975): combinatorial with r_i, ψ_mn = exp(−a_mn/T).
    /// UNIFAC-LLE (Magnussen et al. 1981) uses the same equations with other parameters.</summary>
    Original,

    /// <summary>Modified UNIFAC (Dortmund; Weidlich and Gmehling 1987): combinatorial with r_i^(3/4),
    /// ψ_mn = exp(−(a_mn + b_mn T + c_mn T²)/T).</summary>
    Modified,
}

/// <summary>Temperature-dependent main-group interaction ψ_mn = exp(−(a + b T + c T²)/T).</summary>
/// <param name="AK">a_mn [K].</param>
/// <param name="B">b_mn [-] (0 for original UNIFAC).</param>
/// <param name="CPerK">c_mn [1/K] (0 for original UNIFAC).</param>
public readonly record struct UnifacInteraction(double AK, double B, double CPerK)
{
    /// <summary>ψ_mn [-] at <paramref name="temperatureK"/> [K].</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    public double Psi(double temperatureK) => Math.Exp(-(AK + B * temperatureK + CPerK * temperatureK * temperatureK) / temperatureK);
}

/// <summary>
/// A UNIFAC parameter table: subgroups (R, Q), main-group interaction parameters (a_mn [K], and for
/// modified UNIFAC b_mn, c_mn) and, for the tables that carry them, subgroup assignments of
/// solvents by CAS number. <see cref="Original"/>, <see cref="Dortmund"/> and <see cref="Lle"/>
/// are the published tables shipped with DistillPlan.
/// </summary>
public sealed class UnifacParameters
{
    private const string OriginalResource = "DistillPlan.Core.Mixtures.unifac-original.yaml";
    private const string DortmundResource = "DistillPlan.Core.Mixtures.unifac-dortmund.yaml";
    private const string LleResource = "DistillPlan.Core.Mixtures.unifac-lle.yaml";
    private const string FormatV1 = "distillplan-unifac/1";
    private const string FormatV2 = "distillplan-unifac/2";

    private static readonly Lazy<UnifacParameters> OriginalTable = new(() => Load(OriginalResource));
    private static readonly Lazy<UnifacParameters> DortmundTable = new(() => Load(DortmundResource));
    private static readonly Lazy<UnifacParameters> LleTable = new(() => Load(LleResource));

    private readonly Dictionary<int, UnifacSubgroup> _subgroups;
    private readonly Dictionary<(int M, int N), UnifacInteraction> _interactions;
    private readonly Dictionary<string, IReadOnlyDictionary<int, int>> _assignments;

    private UnifacParameters(string model, UnifacVariant variant, string source, Dictionary<int, UnifacSubgroup> subgroups,
        Dictionary<(int M, int N), UnifacInteraction> interactions, Dictionary<string, IReadOnlyDictionary<int, int>> assignments)
    {
        Model = model;
        Variant = variant;
        Source = source;
        _subgroups = subgroups;
        _interactions = interactions;
        _assignments = assignments;
    }

    /// <summary>
    /// Modified UNIFAC (Dortmund) parameters and assignments (Weidlich and Gmehling 1987 and revisions
    /// to 2016, as compiled by DDBST), read once from the embedded resource <c>unifac-dortmund.yaml</c>.
    /// </summary>
    public static UnifacParameters Dortmund => DortmundTable.Value;

    /// <summary>
    /// UNIFAC-LLE parameters and assignments (Magnussen, Rasmussen, Fredenslund 1981), read once from
    /// the embedded resource <c>unifac-lle.yaml</c>; used to confirm liquid–liquid splits.
    /// </summary>
    public static UnifacParameters Lle => LleTable.Value;

    /// <summary>Short model name: "unifac" (original), "dortmund" or "unifac-lle".</summary>
    public string Model { get; }

    /// <summary>Which UNIFAC equations the table belongs to.</summary>
    public UnifacVariant Variant { get; }

    /// <summary>
    /// Subgroup counts of a component for this table: the table's own assignment by CAS number
    /// when it has one, otherwise (original UNIFAC only) the component's
    /// <see cref="MixtureComponent.UnifacSubgroups"/>; null when unknown.
    /// </summary>
    /// <param name="component">The component.</param>
    public IReadOnlyDictionary<int, int>? GroupsFor(MixtureComponent component)
    {
        ArgumentNullException.ThrowIfNull(component);
        if (component.Cas is { } cas && _assignments.TryGetValue(cas, out var counts)) return counts;
        return Model == "unifac" ? component.UnifacSubgroups : null;
    }

    /// <summary>Number of solvents with a subgroup assignment in the table (0 for original UNIFAC,
    /// whose assignments live in the solvent library).</summary>
    public int AssignmentCount => _assignments.Count;

    /// <summary>
    /// Original UNIFAC parameters (Hansen et al., Ind. Eng. Chem. Res. 30 (1991) 2352–2355, and
    /// later revisions), read once from the embedded resource <c>unifac-original.yaml</c>.
    /// </summary>
    public static UnifacParameters Original => OriginalTable.Value;

    /// <summary>Citation of the table.</summary>
    public string Source { get; }

    /// <summary>All subgroups by id.</summary>
    public IReadOnlyDictionary<int, UnifacSubgroup> Subgroups => _subgroups;

    /// <summary>Every interaction by (m, n), for the readers' tests.</summary>
    internal IReadOnlyDictionary<(int M, int N), UnifacInteraction> Interactions => _interactions;

    /// <summary>Every assignment by CAS, for the readers' tests.</summary>
    internal IReadOnlyDictionary<string, IReadOnlyDictionary<int, int>> Assignments => _assignments;

    /// <summary>Number of main-group pairs (m, n), m ≠ n, that have a parameter.</summary>
    public int InteractionCount => _interactions.Count;

    /// <summary>
    /// The interaction parameter a_mn [K] between main groups m and n; a_mm = 0 (for modified
    /// UNIFAC only the a part; see <see cref="TryGetInteractionParameters"/> for b and c).
    /// Returns false when the table has no parameter for the pair (the model cannot be used).
    /// </summary>
    /// <param name="m">Main group m.</param>
    /// <param name="n">Main group n.</param>
    /// <param name="aMnK">a_mn [K] when found.</param>
    public bool TryGetInteraction(int m, int n, out double aMnK)
    {
        if (m == n)
        {
            aMnK = 0.0;
            return true;
        }
        bool found = _interactions.TryGetValue((m, n), out var interaction);
        aMnK = interaction.AK;
        return found;
    }

    /// <summary>The full interaction (a_mn, b_mn, c_mn) between main groups m and n; zero for m = n.
    /// Returns false when the table has no parameter for the pair.</summary>
    /// <param name="m">Main group m.</param>
    /// <param name="n">Main group n.</param>
    /// <param name="interaction">The parameters when found.</param>
    public bool TryGetInteractionParameters(int m, int n, out UnifacInteraction interaction)
    {
        if (m == n)
        {
            interaction = default;
            return true;
        }
        return _interactions.TryGetValue((m, n), out interaction);
    }

    /// <summary>A copy of this table with some interactions replaced (e.g. an older published set of
    /// one pair, to reproduce a reference calculation made with it).</summary>
    /// <param name="replacements">(m, n) → new parameters.</param>
    public UnifacParameters WithInteractions(IReadOnlyDictionary<(int M, int N), UnifacInteraction> replacements)
    {
        ArgumentNullException.ThrowIfNull(replacements);
        var copy = new Dictionary<(int M, int N), UnifacInteraction>(_interactions);
        foreach (var (key, value) in replacements) copy[key] = value;
        return new UnifacParameters(Model, Variant, Source + " (with replaced pairs)", _subgroups, copy, _assignments);
    }

    /// <summary>Reads a table in the <c>distillplan-unifac/1</c> YAML format (original UNIFAC,
    /// a_mn only) or <c>distillplan-unifac/2</c> (adds <c>model</c>, <c>variant</c>, interactions
    /// with a, b, c and an <c>assignments</c> list of [CAS, name, "subgroup count …", source]).</summary>
    /// <param name="reader">The YAML text.</param>
    /// <param name="origin">Name of the file or resource, for error messages.</param>
    /// <exception cref="FormatException">The text is not a valid table.</exception>
    public static UnifacParameters Parse(TextReader reader, string origin)
        => FromTable(YamlTableReader.Read(reader, origin), origin);

    /// <summary>Reads table text by <see cref="TableText.Read"/>: the same table, or the same error, whichever reader reads it.</summary>
    internal static UnifacParameters ParseText(string text, string origin) => FromTable(TableText.Read(text, origin), origin);

    /// <summary>The table's checks and content, whichever reader read the text.</summary>
    internal static UnifacParameters FromTable(TableText root, string origin)
    {
        string format = root.Scalar("format", origin);
        if (format != FormatV1 && format != FormatV2)
            throw new FormatException($"{origin}: format is '{format}', expected '{FormatV1}' or '{FormatV2}'");
        bool v2 = format == FormatV2;
        string source = root.Scalar("source", origin);
        string model = v2 ? root.Scalar("model", origin) : "unifac";
        if (model == "unifac-original") model = "unifac";
        var variant = !v2 ? UnifacVariant.Original : root.Scalar("variant", origin) switch
        {
            "original" => UnifacVariant.Original,
            "modified" => UnifacVariant.Modified,
            var other => throw new FormatException($"{origin}: variant is '{other}', expected 'original' or 'modified'"),
        };

        var subgroups = new Dictionary<int, UnifacSubgroup>();
        foreach (var row in root.Rows("subgroups", 6, origin))
        {
            var subgroup = new UnifacSubgroup(
                Int(row[0], origin), row[1].Value, Int(row[2], origin), row[3].Value,
                Number(row[4], origin), Number(row[5], origin));
            if (!subgroups.TryAdd(subgroup.Id, subgroup))
                throw new FormatException($"{origin}, line {row[0].Line}: subgroup {subgroup.Id} listed twice");
        }

        var mainGroups = subgroups.Values.Select(s => s.MainGroup).ToHashSet();
        var interactions = new Dictionary<(int, int), UnifacInteraction>();
        int width = variant == UnifacVariant.Modified ? 5 : 3;
        foreach (var row in root.Rows("interactions", width, origin))
        {
            int m = Int(row[0], origin), n = Int(row[1], origin);
            if (!mainGroups.Contains(m) || !mainGroups.Contains(n) || m == n)
                throw new FormatException(
                    $"{origin}, line {row[0].Line}: interaction ({m}, {n}) names an unknown or equal main group");
            var interaction = width == 5
                ? new UnifacInteraction(Number(row[2], origin), Number(row[3], origin), Number(row[4], origin))
                : new UnifacInteraction(Number(row[2], origin), 0, 0);
            if (!interactions.TryAdd((m, n), interaction))
                throw new FormatException($"{origin}, line {row[0].Line}: interaction ({m}, {n}) listed twice");
        }

        var assignments = new Dictionary<string, IReadOnlyDictionary<int, int>>();
        if (v2 && root.Has("assignments"))
            foreach (var row in root.Rows("assignments", 4, origin))
            {
                var cells = row[2].Value.Split(' ', StringSplitOptions.RemoveEmptyEntries);
                if (cells.Length == 0 || cells.Length % 2 != 0)
                    throw new FormatException($"{origin}, line {row[0].Line}: assignment needs pairs of subgroup and count");
                var counts = new Dictionary<int, int>();
                for (int k = 0; k < cells.Length; k += 2)
                {
                    if (!int.TryParse(cells[k], CultureInfo.InvariantCulture, out int id) || !subgroups.ContainsKey(id)
                        || !int.TryParse(cells[k + 1], CultureInfo.InvariantCulture, out int count) || count <= 0)
                        throw new FormatException($"{origin}, line {row[0].Line}: '{cells[k]} {cells[k + 1]}' is not a known subgroup and a positive count");
                    counts[id] = counts.GetValueOrDefault(id) + count;
                }
                if (!assignments.TryAdd(row[0].Value, counts))
                    throw new FormatException($"{origin}, line {row[0].Line}: CAS {row[0].Value} assigned twice");
            }

        return new UnifacParameters(model, variant, source, subgroups, interactions, assignments);
    }

    private static UnifacParameters Load(string resource) => ParseText(TableText.ReadResource(resource), resource);

    /// <summary>Resource names of the shipped tables: original, Dortmund, LLE.</summary>
    internal static IReadOnlyList<string> ShippedResources { get; } = [OriginalResource, DortmundResource, LleResource];

    private static int Int(TableCell cell, string origin)
        => int.TryParse(cell.Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out int value)
            ? value
            : throw new FormatException($"{origin}, line {cell.Line}: '{cell.Value}' is not an integer");

    private static double Number(TableCell cell, string origin)
        => double.TryParse(cell.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double value)
           && double.IsFinite(value)
            ? value
            : throw new FormatException($"{origin}, line {cell.Line}: '{cell.Value}' is not a number");
}
