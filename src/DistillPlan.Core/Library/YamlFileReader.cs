using System.Text;
using DistillPlan.Core.PlanFiles;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Library;

/// <summary>Builds the caller's exception for a problem at a line and field of a file.</summary>
internal delegate Exception YamlProblem(int line, string field, string problem);

/// <summary>
/// The one guarded way Core reads a YAML file the user points at (solvent library, plan file,
/// equipment file). A user can name anything: a FIFO with no writer, /dev/zero, a 10 GB log, a
/// file of 100,000 nested brackets or an alias bomb. So it reads only regular files, at most a
/// fixed number of bytes, checks nesting depth and alias expansion in a flat pass over the
/// parser's events before the tree (whose loader recurses per level) is built, and reports every
/// problem through the caller's exception with the line it is on.
/// </summary>
internal static class YamlFileReader
{
    /// <summary>Deepest nesting accepted; the deepest file format nests about eight levels.</summary>
    public const int MaxDepth = 64;

    /// <summary>Most nodes aliases may stand for in one document (a real file uses none).</summary>
    public const long MaxAliasNodes = 100_000;

    /// <summary>
    /// The text of a regular file of at most <paramref name="maxBytes"/> bytes, decoded as UTF-8.
    /// A missing path, a folder, a device, a FIFO (or a link to one) and an oversized file are
    /// refused before anything large is read, and nothing here can block.
    /// </summary>
    public static string ReadText(string path, long maxBytes, YamlProblem problem)
    {
        if (Directory.Exists(path)) throw problem(0, "file", "is a folder, not a file");
        if (!File.Exists(path)) throw problem(0, "file", "does not exist");
        // Opening a FIFO blocks until a writer comes and a device never ends: ask stat(2) first.
        if (!FileKind.IsRegularFile(path))
            throw problem(0, "file", "is not a regular file (a device, a pipe or another special file); give a text file");
        byte[] bytes;
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
            bytes = new byte[(int)Math.Min(maxBytes + 1, Math.Max(0, stream.Length) + 1)];
            int total = 0, n;
            // Read one byte past the limit, never more, so a file that grows while it is read is still bounded.
            while (total < bytes.Length && (n = stream.Read(bytes, total, bytes.Length - total)) > 0) total += n;
            if (total > maxBytes) throw problem(0, "file", $"is larger than {maxBytes / 1024} KiB, the most read from a file of this kind");
            Array.Resize(ref bytes, total);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw problem(0, "file", "cannot be read: " + e.Message);
        }
        try { return new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(bytes).TrimStart('\uFEFF'); }
        catch (DecoderFallbackException) { throw problem(0, "file", "is not UTF-8 text"); }
    }

    /// <summary>
    /// The root node of the first document, or null for an empty file. Problems of depth,
    /// aliases and YAML syntax are reported through <paramref name="problem"/> with field "yaml".
    /// </summary>
    public static YamlNode? Parse(string text, YamlProblem problem)
    {
        CheckShape(text, problem);
        var stream = new YamlStream();
        try { stream.Load(new StringReader(text)); }
        catch (YamlException e) { throw Syntax(e, text, problem); }
        // The tree loader rejects some event sequences the parser accepts (odd tags, keys) with these.
        catch (Exception e) when (e is InvalidOperationException or ArgumentException)
        {
            throw problem(1, "yaml", "not valid YAML for this format (" + e.Message.Split('\n')[0] + ")");
        }
        return stream.Documents.Count == 0 ? null : stream.Documents[0].RootNode;
    }

    // A flat walk over the parser's events: the depth and the size of every anchored node, so
    // an alias's expansion is known without expanding it.
    private static void CheckShape(string text, YamlProblem problem)
    {
        var parser = new Parser(new StringReader(text));
        var anchors = new Dictionary<string, long>(StringComparer.Ordinal);
        var open = new Stack<(string? Anchor, long Size)>();
        long aliasNodes = 0;
        void Add(long size)
        {
            if (open.Count > 0) { var top = open.Pop(); open.Push((top.Anchor, Math.Min(top.Size + size, long.MaxValue / 4))); }
        }
        try
        {
            while (parser.MoveNext())
            {
                var ev = parser.Current!;
                int line = (int)ev.Start.Line;
                switch (ev)
                {
                    case SequenceStart or MappingStart:
                        if (open.Count >= MaxDepth) throw problem(line, "yaml", $"nested deeper than {MaxDepth} levels");
                        open.Push((((NodeEvent)ev).Anchor.IsEmpty ? null : ((NodeEvent)ev).Anchor.Value, 1));
                        break;
                    case SequenceEnd or MappingEnd:
                        var done = open.Pop();
                        if (done.Anchor is not null) anchors[done.Anchor] = done.Size;
                        Add(done.Size);
                        break;
                    case Scalar s:
                        if (!s.Anchor.IsEmpty) anchors[s.Anchor.Value] = 1;
                        Add(1);
                        break;
                    case AnchorAlias a:
                        if (!anchors.TryGetValue(a.Value.Value, out long size))
                            throw problem(line, "yaml", $"alias '*{a.Value.Value}' names no anchor '&{a.Value.Value}' defined above it");
                        aliasNodes += size;
                        if (aliasNodes > MaxAliasNodes)
                            throw problem(line, "yaml", $"aliases here stand for more than {MaxAliasNodes} nodes (an alias bomb?); write the values out");
                        Add(size);
                        break;
                }
            }
        }
        catch (YamlException e) { throw Syntax(e, text, problem); }
        catch (Exception e) when (e is InvalidOperationException or ArgumentException)
        {
            throw problem(1, "yaml", "not valid YAML for this format (" + e.Message.Split('\n')[0] + ")");
        }
    }

    private static Exception Syntax(YamlException e, string text, YamlProblem problem)
    {
        string first = e.Message.Split('\n')[0];
        int line = (int)e.Start.Line;
        // The scanner reports a tab in the indentation at the mapping it was reading, often far
        // above; the tab's own line is what the user needs.
        if (first.Contains("tab", StringComparison.OrdinalIgnoreCase) && TabIndentedLine(text) is int tabLine)
            return problem(tabLine, "yaml", "a tab in the indentation; YAML indents with spaces");
        return problem(line, "yaml", "not valid YAML: " + first);
    }

    private static int? TabIndentedLine(string text)
    {
        int line = 1;
        foreach (var l in text.AsSpan().EnumerateLines())
        {
            var indent = l[..(l.Length - l.TrimStart(" \t").Length)];
            if (indent.Contains('\t')) return line;
            line++;
        }
        return null;
    }
}
