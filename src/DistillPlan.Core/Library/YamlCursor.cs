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

    public LibraryFormatException Error(string problem) => new(File, Line, Path.Length == 0 ? "(top level)" : Path, problem);

    private YamlMappingNode Mapping => Node as YamlMappingNode ?? throw Error("expected a mapping (key: value lines)");

    public bool Has(string key) => Mapping.Children.ContainsKey(new YamlScalarNode(key));

    public YamlCursor? Optional(string key) =>
        Mapping.Children.TryGetValue(new YamlScalarNode(key), out var child) ? new YamlCursor(child, Join(key), File) : null;

    public YamlCursor Required(string key) =>
        Optional(key) ?? throw new LibraryFormatException(File, Line, Join(key), "required field is missing");

    /// <summary>Rejects keys outside the allowed set, so a misspelt field is not silently ignored.</summary>
    public void OnlyKeys(params string[] allowed)
    {
        foreach (var (k, v) in Mapping.Children)
        {
            string key = KeyText(k);
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
        throw Error(Node is YamlScalarNode sc
            ? $"expected a number (finite), got '{InputException.Shorten(sc.Value ?? "")}'"
            : $"expected a number, got a {(Node is YamlSequenceNode ? "list" : "mapping")}");
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
            string key = KeyText(k);
            yield return (key, new YamlCursor(v, Join(key), File));
        }
    }

    // A key must be a plain name; YAML also allows a list or a mapping as a key, which no format here uses.
    private string KeyText(YamlNode key) => key is YamlScalarNode s
        ? (string.IsNullOrEmpty(s.Value) ? "(empty key)" : s.Value)
        : throw new LibraryFormatException(File, (int)key.Start.Line, Path.Length == 0 ? "(top level)" : Path,
            $"a key must be a plain name, not a {(key is YamlSequenceNode ? "list" : "mapping")}");

    private string Join(string key) => Path.Length == 0 ? key : Path + "." + key;
}
