namespace DistillPlan.Core.Mixtures;

/// <summary>
/// A quick reader for the restricted YAML shape of the shipped table files: top-level
/// <c>key: scalar</c> lines; lists whose rows are one-line flow sequences
/// (<c>  - [1, "CH3", 1, "CH2", 0.6325, 1.0608]</c>); mappings of <c>  key: scalar</c> lines;
/// plain or double-quoted scalars (no escapes), <c>#</c> comments and blank lines.
/// YamlDotNet's scanner reads about 4 MB/s in the native binary, which made the three UNIFAC
/// tables cost 20–25 ms of a mixture plan's start; this reads them with about a tenth of the work
/// and a seventh of the allocation (bench/DistillPlan.Benchmarks, TableBenchmarks).
/// Anything it does not recognise (tabs, control characters, a byte-order mark, anchors, tags, block scalars,
/// escapes, quotes spanning lines, odd indentation, duplicate keys) makes it answer null, and the
/// caller reads the text with <see cref="YamlTableReader"/> instead, so a file it cannot read
/// gets YamlDotNet's answer, not a different one.
/// </summary>
internal static class FlowTableReader
{
    /// <summary>The text's keys and values, or null when the text is not of the restricted shape.</summary>
    public static TableText? TryRead(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var entries = new Dictionary<string, TableEntry>();
        string? blockKey = null;
        int blockIndent = -1;
        List<TableRow>? rows = null;
        List<KeyValuePair<string, TableCell>>? pairs = null;
        List<TableCell> cells = new(8);

        int pos = 0, lineNo = 0;
        while (pos <= text.Length)
        {
            int end = text.IndexOf('\n', pos);
            if (end < 0) end = text.Length;
            var line = text.AsSpan(pos, end - pos);
            pos = end + 1;
            lineNo++;
            if (line.EndsWith('\r')) line = line[..^1];
            if (!IsPlainText(line)) return null;

            int indent = 0;
            while (indent < line.Length && line[indent] == ' ') indent++;
            var rest = line[indent..];
            if (rest.IsEmpty || rest[0] == '#') continue;

            if (indent == 0)
            {
                if (blockKey is not null) Close();
                int colon = KeyLength(rest);
                if (colon == 0 || colon >= rest.Length || rest[colon] != ':') return null;
                string key = rest[..colon].ToString();
                if (entries.ContainsKey(key)) return null;
                var after = rest[(colon + 1)..];
                if (IsEndOfLine(after))
                {
                    (blockKey, blockIndent, rows, pairs) = (key, -1, null, null);
                    continue;
                }
                if (after[0] != ' ' || BlockScalar(after) is not { } value) return null;
                entries.Add(key, new TableEntry(Scalar: value));
                continue;
            }

            // An indented line belongs to the open block (a list or a mapping), at one indentation.
            if (blockKey is null) return null;
            if (blockIndent < 0) blockIndent = indent;
            else if (indent != blockIndent) return null;
            if (rest.StartsWith("- ["))
            {
                if (pairs is not null || !FlowRow(rest[2..], lineNo, cells)) return null;
                (rows ??= []).Add(new TableRow(lineNo, cells.ToArray()));
            }
            else
            {
                int colon = KeyLength(rest);
                if (rows is not null || colon == 0 || colon >= rest.Length || rest[colon] != ':') return null;
                var after = rest[(colon + 1)..];
                string? value = IsEndOfLine(after) ? "" : after[0] == ' ' ? BlockScalar(after) : null;
                if (value is null) return null;
                string key = rest[..colon].ToString();
                pairs ??= [];
                foreach (var pair in pairs)
                    if (pair.Key == key) return null;
                pairs.Add(new(key, new TableCell(value, lineNo)));
            }
        }
        if (blockKey is not null) Close();
        return entries.Count == 0 ? null : new TableText(entries);

        // A key with nothing after it and no indented lines is an empty scalar, as in YAML.
        void Close()
        {
            var entry = rows is not null ? new TableEntry(Rows: rows)
                : pairs is not null ? new TableEntry(Pairs: pairs)
                : new TableEntry(Scalar: "");
            entries.Add(blockKey!, entry);
            blockKey = null;
        }
    }

    // Printable characters only: no tab, control character, YAML line break (NEL, LS, PS), BOM
    // or surrogate, whose treatment is YamlDotNet's business. Printable ASCII is checked in one
    // vectorised search; the shipped files are all ASCII.
    private static bool IsPlainText(ReadOnlySpan<char> line)
    {
        if (line.IndexOfAnyExceptInRange(' ', '~') < 0) return true;
        foreach (char c in line)
            if (c < ' ' || (c >= '\x7F' && c < '\xA0') || c is '\u2028' or '\u2029' or '\uFEFF' or >= '\uD800' and <= '\uDFFF' or '\uFFFE' or '\uFFFF')
                return false;
        return true;
    }

    // Length of a leading bare key (a letter, then letters, digits, '_' or '-'), 0 when none.
    private static int KeyLength(ReadOnlySpan<char> s)
    {
        if (s.IsEmpty || !char.IsAsciiLetter(s[0])) return 0;
        int i = 1;
        while (i < s.Length && (char.IsAsciiLetterOrDigit(s[i]) || s[i] is '_' or '-')) i++;
        return i;
    }

    // Nothing but spaces, then the end or a comment.
    private static bool IsEndOfLine(ReadOnlySpan<char> s)
    {
        var t = s.TrimStart(' ');
        return t.IsEmpty || (t[0] == '#' && t.Length < s.Length);
    }

    // The value after "key:" (s starts with the space): double-quoted, or plain up to a comment.
    private static string? BlockScalar(ReadOnlySpan<char> s)
    {
        var t = s.TrimStart(' ');
        if (t.IsEmpty || t[0] == '#') return null;
        if (t[0] == '"')
        {
            int close = t[1..].IndexOfAny('"', '\\');
            if (close < 0 || t[1 + close] == '\\' || !IsEndOfLine(t[(close + 2)..])) return null;
            return t.Slice(1, close).ToString();
        }
        if (IsIndicator(t)) return null;
        int comment = t.IndexOf(" #");
        var plain = (comment < 0 ? t : t[..comment]).TrimEnd(' ');
        if (plain.Contains(": ", StringComparison.Ordinal) || plain.EndsWith(':')) return null;
        return plain.ToString();
    }

    // A flow sequence "[a, "b", 1.5]" filling the rest of the line; false when it is anything else.
    private static bool FlowRow(ReadOnlySpan<char> s, int lineNo, List<TableCell> cells)
    {
        cells.Clear();
        int i = 1;
        while (true)
        {
            while (i < s.Length && s[i] == ' ') i++;
            if (i >= s.Length) return false;
            string value;
            if (s[i] == '"')
            {
                int close = s[(i + 1)..].IndexOfAny('"', '\\');
                if (close < 0 || s[i + 1 + close] == '\\') return false;
                value = s.Slice(i + 1, close).ToString();
                i += close + 2;
                while (i < s.Length && s[i] == ' ') i++;
            }
            else
            {
                int start = i;
                while (i < s.Length && IsPlainCellChar(s[i])) i++;
                var plain = s[start..i].TrimEnd(' ');
                if (plain.IsEmpty || IsIndicator(plain)) return false;
                value = plain.ToString();
            }
            cells.Add(new TableCell(value, lineNo));
            if (i >= s.Length) return false;
            if (s[i] == ']') return IsEndOfLine(s[(i + 1)..]);
            if (s[i] != ',') return false;
            i++;
        }
    }

    // Plain cells are numbers and simple words ("null", "thf-loop", "minimum-boiling").
    private static bool IsPlainCellChar(char c) => char.IsAsciiLetterOrDigit(c) || c is '.' or '-' or '+' or '_' or ' ';

    // A YAML indicator that cannot start a plain scalar ('-' only when a space or nothing follows).
    private static bool IsIndicator(ReadOnlySpan<char> s)
        => s[0] is '?' or ':' or ',' or '[' or ']' or '{' or '}' or '#' or '&' or '*' or '!' or '|' or '>' or '\'' or '"' or '%' or '@' or '`'
           || (s[0] == '-' && (s.Length == 1 || s[1] == ' '));
}
