using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Fitting;

/// <summary>What <see cref="UserLibraryFile.Add"/> did.</summary>
/// <param name="Path">Full path of the library file.</param>
/// <param name="Created">True when the file was new.</param>
/// <param name="Replaced">The name of the entry that was replaced (with force), or null.</param>
public sealed record LibraryAddition(string Path, bool Created, string? Replaced);

/// <summary>
/// Adds one entry written by <see cref="LibraryEntryWriter"/> to a user's library file. The file is
/// edited as text, never re-serialised, so the user's other entries, comments and layout stay as
/// they were: the entry's source lines go at the end of the <c>sources</c> map (which is made when
/// missing), the entry at the end of the <c>solvents</c> list, re-indented to match it. A name,
/// alias or CAS number the library already holds is refused unless <c>replace</c> is given, which
/// removes that one user entry (or, for a shipped solvent, overrides it). The result is loaded
/// with the shipped library before it is written (through <see cref="SafeFile"/>), so a file that
/// would not load is never written.
/// </summary>
public static class UserLibraryFile
{
    /// <summary>Source key for a fitted compound's measurements in a user library: unique per compound.</summary>
    /// <param name="name">The compound's name.</param>
    public static string SourceKeyFor(string name) => "fit-" + SolventLibrary.Normalise(name);

    /// <summary>Adds <paramref name="entryFile"/> (a whole file from <see cref="LibraryEntryWriter.Write"/>) to the library at <paramref name="path"/>.</summary>
    /// <param name="path">The user's library file; created with its folder when missing.</param>
    /// <param name="entryFile">The entry as a complete library file of one solvent.</param>
    /// <param name="replace">Replace an entry with the same name or CAS number instead of refusing.</param>
    /// <param name="field">Option or field the path came from, for messages.</param>
    public static LibraryAddition Add(string path, string entryFile, bool replace, string field = "--add")
    {
        string full = Path.GetFullPath(path);
        var shipped = SolventLibrary.LoadShipped();
        var entry = SolventYamlLoader.Parse(entryFile, "fitted entry", shipped.Citations).Solvents.Single();
        bool exists = File.Exists(full);
        string? replaced = null;
        string text;
        if (!exists)
        {
            text = entryFile;
        }
        else
        {
            string old = YamlFileReader.ReadText(full, SolventYamlLoader.MaxFileBytes, (line, f, problem) => new LibraryFormatException(full, line, f, problem));
            var mine = SolventYamlLoader.Parse(old, full, shipped.Citations);
            var clash = mine.Solvents.Select((s, i) => (s, i)).Where(t => Clashes(t.s, entry)).ToList();
            if (clash.Count > 0 && !replace)
                throw new InputException(field, entry.Name, "", $"{field}: {full} already holds '{clash[0].s.Name}' ({clash[0].s.Origin}) with the same name, alias or CAS number; " +
                    "give --force to replace that entry, or choose another name");
            if (clash.Count > 1)
                throw new InputException(field, entry.Name, "", $"{field}: '{entry.Name}' matches {clash.Count} entries of {full}; remove them by hand first");
            text = Merge(old, entryFile, clash.Count == 1 ? clash[0].i : null, full);
            replaced = clash.Count == 1 ? clash[0].s.Name : null;
        }
        if (replaced is null)
        {
            var shippedClash = shipped.Solvents.FirstOrDefault(s => Clashes(s, entry));
            if (shippedClash is not null && !(replace && SameKey(shippedClash, entry)))
                throw new InputException(field, entry.Name, "", $"{field}: '{entry.Name}' is already the shipped solvent '{shippedClash.Name}'" +
                    (SameKey(shippedClash, entry) ? "; give --force to override it in every plan, or choose another name" : " (an alias or CAS of it); choose another name"));
            replaced = shippedClash?.Name;
        }

        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        SafeFile.Replace(full, temp =>
        {
            File.WriteAllText(temp, text);
            SolventLibrary.LoadWithUser(temp);   // the merged library must load, or nothing is written
        }, _ => true, field);
        return new LibraryAddition(full, !exists, replaced);
    }

    private static IEnumerable<string> Keys(Solvent s) =>
        new[] { s.Name, s.Cas }.Concat(s.Aliases).Where(k => k.Length > 0).Select(SolventLibrary.Normalise);

    private static bool Clashes(Solvent a, Solvent b) => Keys(a).Intersect(Keys(b)).Any();

    // What the library's merge rule treats as the same entry: same CAS, or same name.
    private static bool SameKey(Solvent a, Solvent b) =>
        (a.Cas.Length > 0 && a.Cas == b.Cas) || SolventLibrary.Normalise(a.Name) == SolventLibrary.Normalise(b.Name);

    private static string Merge(string old, string entryFile, int? removeIndex, string file)
    {
        var lines = old.Replace("\r\n", "\n").Split('\n').ToList();
        if (lines.Count > 0 && lines[^1].Length == 0) lines.RemoveAt(lines.Count - 1);
        var (newSources, newEntry) = SplitEntryFile(entryFile);

        var root = RootOf(string.Join('\n', lines), file);
        var solvents = Value(root, "solvents", file);
        if (IsEmpty(solvents))
        {
            // "solvents:" or "solvents: []": the list starts here.
            int at = (int)KeyNode(root, "solvents")!.Start.Line - 1;
            lines[at] = "solvents:";
            lines.InsertRange(at + 1, newEntry);
            return WithSources(lines, newSources, file);
        }
        if (solvents is not YamlSequenceNode seq || seq.Style == SequenceStyle.Flow)
            throw new InputException("--add", file, "", $"--add: {file}: 'solvents' is not a block list ('- name: ...' lines); add the entry by hand");

        // 1. The entry: remove the replaced one, then append at the end of the list, with the list's indent.
        int dash = DashColumn(lines, seq.Children[0]);
        var entry = newEntry.Select(l => Indent(l, dash - 2)).ToList();
        int end = EndLine(lines, KeyNode(root, "solvents")!);
        if (removeIndex is int r)
        {
            int from = (int)seq.Children[r].Start.Line - 1;
            int to = r + 1 < seq.Children.Count ? (int)seq.Children[r + 1].Start.Line - 1 : end;
            lines.RemoveRange(from, to - from);
            lines.InsertRange(from, entry);
        }
        else lines.InsertRange(end, entry);
        return WithSources(lines, newSources, file);
    }

    private static bool IsEmpty(YamlNode? node) =>
        node is YamlScalarNode { Value: null or "" } || node is YamlSequenceNode { Children.Count: 0 } || node is YamlMappingNode { Children.Count: 0 };

    // The sources: a key already there is rewritten when it sits on one line (the replaced entry's citation), else kept.
    private static string WithSources(List<string> lines, List<(string Key, string Line)> newSources, string file)
    {
        var root = RootOf(string.Join('\n', lines), file);
        var sources = Value(root, "sources", file);
        var block = newSources.Select(s => "  " + s.Line.TrimStart()).ToList();
        if (sources is null)
        {
            int at = (int)KeyNode(root, "solvents")!.Start.Line - 1;
            lines.InsertRange(at, ["sources:", .. block]);
        }
        else if (IsEmpty(sources))
        {
            int at = (int)KeyNode(root, "sources")!.Start.Line - 1;
            lines[at] = "sources:";
            lines.InsertRange(at + 1, block);
        }
        else if (sources is YamlMappingNode map && map.Style != MappingStyle.Flow && map.Children.Count > 0)
        {
            int indent = (int)map.Children.First().Key.Start.Column - 1;
            int mapEnd = EndLine(lines, KeyNode(root, "sources")!);
            var add = new List<string>();
            foreach (var (key, line) in newSources)
            {
                var existing = map.Children.FirstOrDefault(kv => kv.Key is YamlScalarNode k && k.Value == key);
                if (existing.Key is null) { add.Add(new string(' ', indent) + line.TrimStart()); continue; }
                int l = (int)existing.Key.Start.Line - 1;
                if (existing.Value.Start.Line == existing.Key.Start.Line && existing.Value.End.Line == existing.Key.Start.Line)
                    lines[l] = new string(' ', indent) + line.TrimStart();
            }
            lines.InsertRange(mapEnd, add);
        }
        else throw new InputException("--add", file, "", $"--add: {file}: 'sources' is not a block map ('key: citation' lines); add the entry by hand");
        return string.Join('\n', lines) + "\n";
    }

    /// <summary>The source lines (key, line) and the entry lines of a file written by <see cref="LibraryEntryWriter"/>.</summary>
    private static (List<(string Key, string Line)> Sources, List<string> Entry) SplitEntryFile(string entryFile)
    {
        var lines = entryFile.Replace("\r\n", "\n").TrimEnd('\n').Split('\n');
        int src = Array.IndexOf(lines, "sources:"), sol = Array.IndexOf(lines, "solvents:");
        var sources = lines[(src + 1)..sol].Select(l => (l.Trim()[..l.Trim().IndexOf(':')], l)).ToList();
        return (sources, lines[(sol + 1)..].ToList());
    }

    private static YamlMappingNode RootOf(string text, string file)
    {
        var stream = new YamlStream();
        try { stream.Load(new StringReader(text)); }
        catch (YamlException e) { throw new LibraryFormatException(file, (int)e.Start.Line, "yaml", "not valid YAML: " + e.Message.Split('\n')[0]); }
        return stream.Documents[0].RootNode as YamlMappingNode ?? throw new LibraryFormatException(file, 1, "file", "expected a map at the top");
    }

    private static YamlNode? KeyNode(YamlMappingNode root, string key) =>
        root.Children.Keys.FirstOrDefault(k => k is YamlScalarNode s && s.Value == key);

    private static YamlNode? Value(YamlMappingNode root, string key, string file) =>
        KeyNode(root, key) is { } k ? root.Children[k] : null;

    // The column of the '-' of a list item ("  - name: x": the item's map starts two further on).
    private static int DashColumn(List<string> lines, YamlNode item)
    {
        string line = lines[(int)item.Start.Line - 1];
        int col = (int)item.Start.Column - 1;
        int dash = line.LastIndexOf('-', Math.Max(0, col - 1));
        return dash >= 0 ? dash : 0;
    }

    // The line index after the last line of a top-level block value: the next top-level key (a
    // line starting in column 0 that is neither a comment nor a list dash), less trailing blank and
    // comment lines. Marks of YamlDotNet's block ends are not reliable at the end of a file.
    private static int EndLine(List<string> lines, YamlNode key)
    {
        int start = (int)key.Start.Line - 1, end = start + 1;
        while (end < lines.Count && !(lines[end].Length > 0 && !char.IsWhiteSpace(lines[end][0]) && lines[end][0] is not ('#' or '-'))) end++;
        while (end > start + 1 && (lines[end - 1].Trim().Length == 0 || lines[end - 1].TrimStart().StartsWith('#'))) end--;
        return end;
    }

    private static string Indent(string line, int by) =>
        by >= 0 ? new string(' ', by) + line : line[Math.Min(-by, line.Length - line.TrimStart().Length)..];
}
