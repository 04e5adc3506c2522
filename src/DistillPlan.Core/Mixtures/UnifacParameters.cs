using System.Globalization;
using System.Reflection;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Mixtures;

/// <summary>One UNIFAC subgroup: its id, name, main group and its van der Waals volume and area.</summary>
/// <param name="Id">Subgroup id (k).</param>
/// <param name="Name">Subgroup name, e.g. "CH3".</param>
/// <param name="MainGroup">Main-group id; interaction parameters are per main group.</param>
/// <param name="MainGroupName">Main-group name, e.g. "CH2".</param>
/// <param name="R">Relative van der Waals volume R_k [-].</param>
/// <param name="Q">Relative van der Waals surface area Q_k [-].</param>
public sealed record UnifacSubgroup(int Id, string Name, int MainGroup, string MainGroupName, double R, double Q);

/// <summary>
/// A UNIFAC parameter table: subgroups (R, Q) and main-group interaction parameters a_mn [K].
/// <see cref="Original"/> is the published original-UNIFAC table shipped with DistillPlan.
/// </summary>
public sealed class UnifacParameters
{
    private const string OriginalResource = "DistillPlan.Core.Mixtures.unifac-original.yaml";
    private const string Format = "distillplan-unifac/1";

    private static readonly Lazy<UnifacParameters> OriginalTable = new(LoadOriginal);

    private readonly Dictionary<int, UnifacSubgroup> _subgroups;
    private readonly Dictionary<(int M, int N), double> _interactions;

    private UnifacParameters(string source, Dictionary<int, UnifacSubgroup> subgroups,
        Dictionary<(int M, int N), double> interactions)
    {
        Source = source;
        _subgroups = subgroups;
        _interactions = interactions;
    }

    /// <summary>
    /// Original UNIFAC parameters (Hansen et al., Ind. Eng. Chem. Res. 30 (1991) 2352–2355, and
    /// later revisions), read once from the embedded resource <c>unifac-original.yaml</c>.
    /// </summary>
    public static UnifacParameters Original => OriginalTable.Value;

    /// <summary>Citation of the table.</summary>
    public string Source { get; }

    /// <summary>All subgroups by id.</summary>
    public IReadOnlyDictionary<int, UnifacSubgroup> Subgroups => _subgroups;

    /// <summary>Number of main-group pairs (m, n), m ≠ n, that have a parameter.</summary>
    public int InteractionCount => _interactions.Count;

    /// <summary>
    /// The interaction parameter a_mn [K] between main groups m and n; a_mm = 0.
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
        return _interactions.TryGetValue((m, n), out aMnK);
    }

    /// <summary>Reads a table in the <c>distillplan-unifac/1</c> YAML format.</summary>
    /// <param name="reader">The YAML text.</param>
    /// <param name="origin">Name of the file or resource, for error messages.</param>
    /// <exception cref="FormatException">The text is not a valid table.</exception>
    public static UnifacParameters Parse(TextReader reader, string origin)
    {
        var stream = new YamlStream();
        stream.Load(reader);
        if (stream.Documents.Count != 1 || stream.Documents[0].RootNode is not YamlMappingNode root)
            throw new FormatException($"{origin}: expected one YAML mapping");

        string format = Scalar(root, "format", origin);
        if (format != Format)
            throw new FormatException($"{origin}: format is '{format}', expected '{Format}'");
        string source = Scalar(root, "source", origin);

        var subgroups = new Dictionary<int, UnifacSubgroup>();
        foreach (var row in Rows(root, "subgroups", 6, origin))
        {
            var subgroup = new UnifacSubgroup(
                Int(row[0], origin), Text(row[1]), Int(row[2], origin), Text(row[3]),
                Number(row[4], origin), Number(row[5], origin));
            if (!subgroups.TryAdd(subgroup.Id, subgroup))
                throw new FormatException($"{origin}, line {row[0].Start.Line}: subgroup {subgroup.Id} listed twice");
        }

        var mainGroups = subgroups.Values.Select(s => s.MainGroup).ToHashSet();
        var interactions = new Dictionary<(int, int), double>();
        foreach (var row in Rows(root, "interactions", 3, origin))
        {
            int m = Int(row[0], origin), n = Int(row[1], origin);
            if (!mainGroups.Contains(m) || !mainGroups.Contains(n) || m == n)
                throw new FormatException(
                    $"{origin}, line {row[0].Start.Line}: interaction ({m}, {n}) names an unknown or equal main group");
            if (!interactions.TryAdd((m, n), Number(row[2], origin)))
                throw new FormatException($"{origin}, line {row[0].Start.Line}: interaction ({m}, {n}) listed twice");
        }

        return new UnifacParameters(source, subgroups, interactions);
    }

    private static UnifacParameters LoadOriginal()
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(OriginalResource)
            ?? throw new InvalidOperationException($"embedded resource {OriginalResource} is missing from the build");
        using var reader = new StreamReader(stream);
        return Parse(reader, OriginalResource);
    }

    private static string Scalar(YamlMappingNode root, string key, string origin)
        => root.Children.TryGetValue(new YamlScalarNode(key), out var node) && node is YamlScalarNode { Value: { } value }
            ? value
            : throw new FormatException($"{origin}: missing '{key}'");

    private static IEnumerable<IReadOnlyList<YamlScalarNode>> Rows(YamlMappingNode root, string key, int width, string origin)
    {
        if (!root.Children.TryGetValue(new YamlScalarNode(key), out var node) || node is not YamlSequenceNode rows)
            throw new FormatException($"{origin}: missing list '{key}'");
        foreach (var row in rows)
        {
            if (row is not YamlSequenceNode cells || cells.Children.Count != width
                || cells.Children.Any(c => c is not YamlScalarNode))
                throw new FormatException($"{origin}, line {row.Start.Line}: '{key}' rows have {width} plain values");
            yield return cells.Children.Cast<YamlScalarNode>().ToList();
        }
    }

    private static string Text(YamlScalarNode node) => node.Value ?? "";

    private static int Int(YamlScalarNode node, string origin)
        => int.TryParse(node.Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out int value)
            ? value
            : throw new FormatException($"{origin}, line {node.Start.Line}: '{node.Value}' is not an integer");

    private static double Number(YamlScalarNode node, string origin)
        => double.TryParse(node.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double value)
           && double.IsFinite(value)
            ? value
            : throw new FormatException($"{origin}, line {node.Start.Line}: '{node.Value}' is not a number");
}
