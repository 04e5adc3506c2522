namespace DistillPlan.Core.Library;

/// <summary>
/// Reads a library file as far as a lookup needs: the header (format, sources) and, for each
/// entry of the <c>solvents</c> list, its lines, name, aliases and CAS number. Each entry's YAML
/// is parsed and validated only when the entry is first used. Why: parsing and checking all 65
/// shipped entries costs the native program about 60 ms, three times everything else a
/// single-solvent plan does (docs/performance.md).
/// <para>
/// It works on lines and so accepts only the layout library files have: a column-0
/// <c>solvents:</c> key last, then list items at one indentation. For anything else (and for
/// any doubt about the names) it returns null and the caller parses the whole file, which gives
/// the usual messages.
/// </para>
/// </summary>
internal static class LibraryTextIndex
{
    /// <summary>The header's sources and an entry per list item, or null when the layout is not the simple one.</summary>
    /// <param name="text">The file's text.</param>
    /// <param name="file">The file's name, for messages and origins.</param>
    /// <param name="readEntry">Reads one entry: its text, the sources, its first line (0-based) and its index.</param>
    /// <param name="wholeFile">The file read whole, for when every entry is wanted.</param>
    public static IndexedLibrary? TryRead(
        string text, string file, Func<string, IReadOnlyDictionary<string, string>, int, int, Solvent> readEntry, Lazy<LibraryFile> wholeFile)
    {
        var lines = Lines(text);
        int list = lines.FindIndex(l => IsSolventsKey(l.Text));
        if (list < 0) return null;
        var items = ItemStarts(lines, list);
        if (items is null) return null;

        IReadOnlyDictionary<string, string> sources;
        try
        {
            var header = SolventYamlLoader.ParseHeader(text[..lines[list].Start], file);
            if (header is null) return null;
            sources = header;
        }
        catch (LibraryFormatException) { return null; }   // the whole-file parse gives the same message with its context

        var entries = new List<LibraryEntry>(items.Count);
        var owners = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < items.Count; i++)
        {
            int first = items[i], end = i + 1 < items.Count ? items[i + 1] : lines.Count;
            if (Keys(lines, first, end) is not var (name, cas, aliases)) return null;
            int startChar = lines[first].Start, endChar = end < lines.Count ? lines[end].Start : text.Length;
            string entryText = text[startChar..endChar];
            int index = i, firstLine = first;
            var entry = new LibraryEntry(name, cas, aliases, $"{file}:{first + 1}", () => readEntry(entryText, sources, firstLine, index), wholeFile);
            // Two entries sharing a name: the whole-file parse says which, with both lines.
            foreach (string k in entry.Keys)
                if (!owners.Add(SolventLibrary.Normalise(k))) return null;
            entries.Add(entry);
        }
        return new IndexedLibrary(sources, entries);
    }

    // A line as a range of the text (no copy: the shipped file has 1,500 lines and copying them
    // costs as much as the rest of the index).
    private readonly record struct Line(string Source, int Start, int Length)
    {
        public ReadOnlySpan<char> Text => Source.AsSpan(Start, Length);
        public int Indent => Text.Length - Text.TrimStart(' ').Length;
        public bool IsBlankOrComment => Text.Trim().IsEmpty || Text.TrimStart()[0] == '#';
    }

    private static List<Line> Lines(string text)
    {
        var lines = new List<Line>(text.Length / 40);
        int start = 0;
        while (start <= text.Length)
        {
            int nl = text.IndexOf('\n', start);
            int end = nl < 0 ? text.Length : nl;
            int length = end - start;
            if (length > 0 && text[end - 1] == '\r') length--;
            lines.Add(new Line(text, start, length));
            if (nl < 0) break;
            start = nl + 1;
        }
        return lines;
    }

    private static bool IsSolventsKey(ReadOnlySpan<char> line)
    {
        if (!line.StartsWith("solvents:", StringComparison.Ordinal)) return false;
        var rest = line["solvents:".Length..].Trim();
        return rest.IsEmpty || rest[0] == '#';
    }

    // The line numbers of the list items, or null when something other than items at one
    // indentation (and their deeper lines, blanks and comments) follows the key.
    private static List<int>? ItemStarts(List<Line> lines, int list)
    {
        var starts = new List<int>();
        int itemIndent = -1;
        for (int j = list + 1; j < lines.Count; j++)
        {
            var line = lines[j];
            if (line.IsBlankOrComment) continue;
            if (line.Text.TrimStart(' ').StartsWith('\t')) return null;
            int indent = line.Indent;
            bool dash = line.Text.Length > indent && line.Text[indent] == '-'
                && (line.Text.Length == indent + 1 || line.Text[indent + 1] == ' ');
            if (itemIndent < 0)
            {
                if (!dash) return null;
                itemIndent = indent;
            }
            if (indent == itemIndent && dash) starts.Add(j);
            else if (indent <= itemIndent) return null;
        }
        return starts;
    }

    // The entry's keys from its lines at the entry's key indentation, when they are written as
    // plain one-line values (name: x, cas: x, aliases: [a, b]); null for anything else.
    private static (string Name, string Cas, IReadOnlyList<string> Aliases)? Keys(List<Line> lines, int first, int end)
    {
        string? name = null, cas = null;
        IReadOnlyList<string>? aliases = null;
        int keyIndent = -1;
        for (int j = first; j < end; j++)
        {
            var line = lines[j];
            if (line.IsBlankOrComment) continue;
            var text = line.Text;
            int at = line.Indent;
            if (j == first)
            {
                at++;   // past the dash
                while (at < text.Length && text[at] == ' ') at++;
                if (at == text.Length) continue;   // "-" alone: the keys start on the next line
            }
            if (keyIndent < 0) keyIndent = at;
            if (at != keyIndent) continue;      // a deeper line: inside another field's value
            var field = text[at..];
            if (Value(field, "name") is { } n) { if (name is not null || Scalar(n) is not { } v) return null; name = v; }
            else if (Value(field, "cas") is { } c) { if (cas is not null || Scalar(c) is not { } v) return null; cas = v; }
            else if (Value(field, "aliases") is { } a)
            {
                if (aliases is not null) return null;
                aliases = FlowList(a);
                if (aliases is null) return null;
            }
            else continue;
            // A key's value written over more lines is for the YAML parser to read.
            if (j + 1 < end && !lines[j + 1].IsBlankOrComment && lines[j + 1].Indent > keyIndent) return null;
        }
        return name is null ? null : (name, cas ?? "", aliases ?? []);
    }

    // The text after "key:" when the line is that key (empty when its value is on the next lines).
    private static string? Value(ReadOnlySpan<char> field, string key)
    {
        if (!field.StartsWith(key, StringComparison.Ordinal) || field.Length == key.Length || field[key.Length] != ':') return null;
        var rest = field[(key.Length + 1)..];
        return rest.IsEmpty ? "" : rest[0] == ' ' ? rest.Trim().ToString() : null;
    }

    // A one-line scalar as YAML reads it: double- or single-quoted without escapes, or plain
    // (no indicator, comment or key in it). Null for anything else.
    private static string? Scalar(string v)
    {
        if (v.Length >= 2 && v[0] is '"' or '\'' && v[^1] == v[0])
        {
            string inner = v[1..^1];
            return inner.Contains(v[0]) || inner.Contains('\\') || inner.Trim().Length == 0 ? null : inner.Trim();
        }
        bool plain = v.Length > 0 && "[]{}&*!|>'\"%@`#,?:-".IndexOf(v[0]) < 0 && !v.Contains(" #", StringComparison.Ordinal)
            && !v.Contains(": ", StringComparison.Ordinal) && !v.EndsWith(':') && !v.Contains('\t');
        return plain ? v : null;
    }

    // [a, "b, c", d]: items split at commas outside quotes, each a scalar as above.
    private static IReadOnlyList<string>? FlowList(string v)
    {
        if (v.Length < 2 || v[0] != '[' || v[^1] != ']') return null;
        var items = new List<string>();
        int start = 1;
        char quote = '\0';
        for (int i = 1; i < v.Length - 1; i++)
        {
            char ch = v[i];
            if (quote != '\0') { if (ch == quote) quote = '\0'; }
            else if (ch is '"' or '\'') quote = ch;
            else if (ch == ',') { items.Add(v[start..i].Trim()); start = i + 1; }
            else if (ch is '[' or ']' or '{' or '}') return null;
        }
        if (quote != '\0') return null;
        string last = v[start..^1].Trim();
        if (last.Length > 0 || items.Count > 0) items.Add(last);
        var scalars = items.Select(Scalar).ToList();
        return scalars.All(x => x is not null) ? scalars.Select(x => x!).ToList() : null;
    }
}
