using System.Globalization;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Library;

/// <summary>
/// A position in a parsed YAML document: the node, its dotted path and its file. Every read
/// either returns a typed value or throws <see cref="LibraryFormatException"/> naming the
/// file, the line and the field, so the loader reads like a list of rules.
/// </summary>
internal sealed class YamlCursor(YamlNode node, string path, string file)
{
    public YamlNode Node { get; } = node;
    public string Path { get; } = path;
    public string File { get; } = file;
    public int Line => (int)Node.Start.Line;

    public LibraryFormatException Error(string problem) => new(File, Line, Path, problem);

    private YamlMappingNode Mapping => Node as YamlMappingNode ?? throw Error("expected a mapping (key: value lines)");

    public bool Has(string key) => Mapping.Children.ContainsKey(new YamlScalarNode(key));

    public YamlCursor? Optional(string key) =>
        Mapping.Children.TryGetValue(new YamlScalarNode(key), out var child) ? new YamlCursor(child, Join(key), File) : null;

    public YamlCursor Required(string key) => Optional(key) ?? throw Error($"required field '{key}' is missing");

    /// <summary>Rejects keys outside the allowed set, so a misspelt field is not silently ignored.</summary>
    public void OnlyKeys(params string[] allowed)
    {
        foreach (var (k, v) in Mapping.Children)
        {
            string key = ((YamlScalarNode)k).Value ?? "";
            if (!allowed.Contains(key))
                throw new LibraryFormatException(File, (int)k.Start.Line, Join(key),
                    $"unknown field; allowed here: {string.Join(", ", allowed)}");
        }
    }

    public string String()
    {
        if (Node is not YamlScalarNode s || string.IsNullOrWhiteSpace(s.Value)) throw Error("expected a non-empty text value");
        return s.Value.Trim();
    }

    public double Number()
    {
        if (Node is YamlScalarNode s && double.TryParse(s.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v)
            && double.IsFinite(v))
            return v;
        throw Error($"expected a number, got '{(Node as YamlScalarNode)?.Value ?? Node.NodeType.ToString()}'");
    }

    public double Positive()
    {
        double v = Number();
        return v > 0 ? v : throw Error($"expected a value above zero, got {v.ToString(CultureInfo.InvariantCulture)}");
    }

    public IEnumerable<YamlCursor> Items()
    {
        var seq = Node as YamlSequenceNode ?? throw Error("expected a list");
        int i = 0;
        foreach (var child in seq.Children) yield return new YamlCursor(child, $"{Path}[{i++}]", File);
    }

    public IEnumerable<(string Key, YamlCursor Value)> Entries()
    {
        foreach (var (k, v) in Mapping.Children)
        {
            string key = ((YamlScalarNode)k).Value ?? "";
            yield return (key, new YamlCursor(v, Join(key), File));
        }
    }

    private string Join(string key) => Path.Length == 0 ? key : Path + "." + key;
}
