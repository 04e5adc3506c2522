using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Reads a table file of any YAML shape with YamlDotNet into a <see cref="TableText"/>: the reader
/// for tables a caller hands in and for shipped text the quick <see cref="FlowTableReader"/> does
/// not recognise.
/// </summary>
internal static class YamlTableReader
{
    /// <summary>The file's top-level keys and values; FormatException when it is not one mapping
    /// (YamlDotNet's own exception for text that is not YAML).</summary>
    public static TableText Read(TextReader reader, string origin)
    {
        var stream = new YamlStream();
        stream.Load(reader);
        if (stream.Documents.Count != 1 || stream.Documents[0].RootNode is not YamlMappingNode root)
            throw new FormatException($"{origin}: expected one YAML mapping");

        var entries = new Dictionary<string, TableEntry>();
        foreach (var (keyNode, node) in root.Children)
        {
            if (keyNode is not YamlScalarNode { Value: { } key }) continue;
            entries.TryAdd(key, node switch
            {
                YamlScalarNode scalar => new TableEntry(Scalar: scalar.Value),
                YamlSequenceNode rows => new TableEntry(Rows: rows.Children.Select(Row).ToList()),
                YamlMappingNode map when map.Children.All(p => p.Key is YamlScalarNode && p.Value is YamlScalarNode)
                    => new TableEntry(Pairs: map.Children.Select(Pair).ToList()),
                _ => new TableEntry(),
            });
        }
        return new TableText(entries);
    }

    private static TableRow Row(YamlNode row)
        => new((int)row.Start.Line,
            row is YamlSequenceNode cells && cells.Children.All(c => c is YamlScalarNode)
                ? cells.Children.Select(c => Cell((YamlScalarNode)c)).ToList()
                : null);

    private static KeyValuePair<string, TableCell> Pair(KeyValuePair<YamlNode, YamlNode> pair)
        => new(((YamlScalarNode)pair.Key).Value ?? "", Cell((YamlScalarNode)pair.Value));

    private static TableCell Cell(YamlScalarNode node) => new(node.Value ?? "", (int)node.Start.Line);
}
