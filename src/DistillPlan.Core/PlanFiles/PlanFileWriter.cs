using System.Text;
using DistillPlan.Core.Planning.Settings;

namespace DistillPlan.Core.PlanFiles;

/// <summary>What happened to a save.</summary>
public enum SaveOutcome
{
    /// <summary>The file was written.</summary>
    Saved,
    /// <summary>The file existed and the user declined to overwrite it; nothing was written.</summary>
    Declined,
}

/// <summary>
/// Writes plan files (docs/plan-file.md). A save never replaces an existing file without a yes
/// from the caller, and it is atomic: the text goes to a temporary file in the same folder
/// (same file system, so the rename is atomic), which then replaces the target in one move.
/// A crash mid-save leaves the old file whole.
/// </summary>
public static class PlanFileWriter
{
    /// <summary>The YAML text of a plan: sections and keys from the settings table, given settings only.</summary>
    public static string Format(PlanDocument doc)
    {
        var o = new StringBuilder();
        o.Append("format: ").Append(PlanDocument.FormatTag).Append('\n');
        o.Append("title: ").Append(Quote(doc.Title)).Append('\n');
        if (doc.Notes.Length > 0) o.Append("notes: ").Append(Block(doc.Notes, "  ")).Append('\n');
        foreach (string section in PlanFileReader.SettingSections)
        {
            var given = PlanSettings.All.Where(s => s.FileSection == section)
                .Select(s => (s.FileKey, Value: doc.Inputs.Get(s.Key))).Where(s => s.Value is not null).ToList();
            if (section == "charge") given.Insert(0, ("solvents", doc.Charge));
            if (given.Count == 0) continue;
            o.Append(section).Append(":\n");
            foreach (var (key, value) in given) o.Append("  ").Append(key).Append(": ").Append(Quote(value!)).Append('\n');
        }
        o.Append("display:\n  pressure-unit: ").Append(Quote(doc.PressureUnit)).Append('\n');
        return o.ToString();
    }

    /// <summary>
    /// Saves a plan. When the file exists, <paramref name="confirmOverwrite"/> is asked first
    /// (with the path) and nothing is written unless it says yes.
    /// </summary>
    public static SaveOutcome Save(string path, PlanDocument doc, Func<string, bool> confirmOverwrite)
    {
        try
        {
            return SafeFile.Replace(path, temp =>
            {
                using var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write);
                stream.Write(new UTF8Encoding(false).GetBytes(Format(doc)));
                stream.Flush(flushToDisk: true);
            }, confirmOverwrite, "plan file");
        }
        catch (InputException e) when (e is not PlanFileException)
        {
            throw new PlanFileException(Path.GetFullPath(path), 0, "cannot be saved: " + e.Message);
        }
    }

    /// <summary>A YAML double-quoted scalar: exact for any text.</summary>
    internal static string Quote(string s)
    {
        var o = new StringBuilder("\"");
        foreach (char ch in s)
            o.Append(ch switch
            {
                '"' => "\\\"",
                '\\' => "\\\\",
                '\n' => "\\n",
                '\r' => "\\r",
                '\t' => "\\t",
                _ when char.IsControl(ch) => $"\\u{(int)ch:X4}",
                _ => ch.ToString(),
            });
        return o.Append('"').ToString();
    }

    /// <summary>
    /// Notes as a literal block (readable in an editor) when that keeps them exact; otherwise quoted.
    /// </summary>
    private static string Block(string text, string indent)
    {
        var lines = text.Split('\n');
        bool literalSafe = !text.Any(ch => char.IsControl(ch) && ch != '\n')
            && !text.EndsWith('\n') && !text.StartsWith(' ') && !text.StartsWith('\n')
            && lines.All(l => l.Length == 0 || !char.IsWhiteSpace(l[^1]))
            && lines.Any(l => l.Length > 0);
        if (!literalSafe) return Quote(text);
        return "|-\n" + string.Join("\n", lines.Select(l => l.Length == 0 ? "" : indent + l));
    }
}
