namespace DistillPlan.Core.Mixtures;

/// <summary>One scalar of a table file and the 1-based line it stands on.</summary>
internal readonly record struct TableCell(string Value, int Line);

/// <summary>One row of a list: its line and its cells, or null cells when the row is not a
/// sequence of scalars (the reader of the table then refuses it).</summary>
internal sealed record TableRow(int Line, IReadOnlyList<TableCell>? Cells);

/// <summary>The value under a top-level key: a scalar, a list of rows, a mapping of scalars, or
/// something else (all null), which no table reader accepts.</summary>
internal sealed record TableEntry(string? Scalar = null, IReadOnlyList<TableRow>? Rows = null,
    IReadOnlyList<KeyValuePair<string, TableCell>>? Pairs = null);

/// <summary>
/// A table file (UNIFAC parameters, mixture facts) as top-level keys and their values, whichever
/// reader produced it: <see cref="FlowTableReader"/> for the restricted shape of the shipped files,
/// <see cref="YamlTableReader"/> (YamlDotNet) for anything else. The table readers validate this
/// form only, so both paths give the same tables and the same errors.
/// </summary>
internal sealed class TableText(IReadOnlyDictionary<string, TableEntry> entries)
{
    /// <summary>Reads table text with the quick reader when it has the shipped files' restricted
    /// shape, with YamlDotNet otherwise: the same table, or the same error, either way.</summary>
    public static TableText Read(string text, string origin)
        => FlowTableReader.TryRead(text) ?? YamlTableReader.Read(new StringReader(text), origin);

    /// <summary>The text of a table embedded in Core (the UNIFAC tables, the mixture facts).</summary>
    public static string ReadResource(string resource)
    {
        using var stream = typeof(TableText).Assembly.GetManifestResourceStream(resource)
            ?? throw new InvalidOperationException($"embedded resource {resource} is missing from the build");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>Every top-level key and its value, for the readers' tests.</summary>
    public IReadOnlyDictionary<string, TableEntry> Entries => entries;

    /// <summary>True when the file has the top-level key.</summary>
    public bool Has(string key) => entries.ContainsKey(key);

    /// <summary>The scalar under <paramref name="key"/>; FormatException when missing or not a scalar.</summary>
    public string Scalar(string key, string origin)
        => entries.TryGetValue(key, out var entry) && entry.Scalar is { } value
            ? value
            : throw new FormatException($"{origin}: missing '{key}'");

    /// <summary>The mapping of scalars under <paramref name="key"/>; FormatException when missing.</summary>
    public IReadOnlyList<KeyValuePair<string, TableCell>> Pairs(string key, string origin)
        => entries.TryGetValue(key, out var entry) && entry.Pairs is { } pairs
            ? pairs
            : throw new FormatException($"{origin}: missing mapping '{key}'");

    /// <summary>The rows of the list under <paramref name="key"/>, each checked (as it is reached) to
    /// hold <paramref name="width"/> scalars; FormatException naming the line otherwise.</summary>
    public IEnumerable<IReadOnlyList<TableCell>> Rows(string key, int width, string origin)
    {
        if (!entries.TryGetValue(key, out var entry) || entry.Rows is not { } rows)
            throw new FormatException($"{origin}: missing list '{key}'");
        return Checked(rows, key, width, origin);
    }

    private static IEnumerable<IReadOnlyList<TableCell>> Checked(IReadOnlyList<TableRow> rows, string key, int width, string origin)
    {
        foreach (var row in rows)
        {
            if (row.Cells is not { } cells || cells.Count != width)
                throw new FormatException($"{origin}, line {row.Line}: '{key}' rows have {width} plain values");
            yield return cells;
        }
    }
}
