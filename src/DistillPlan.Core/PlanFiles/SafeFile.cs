namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// Replaces a file so that a crash or a refusal never loses what was there: the new content
/// goes to a hidden temporary file in the same folder (same file system, so the final rename is
/// atomic), which then moves over the target in one step. Only regular files are replaced:
/// a device, a FIFO or a folder at the path is refused, never swapped for a file.
/// </summary>
public static class SafeFile
{
    /// <summary>Writes through <paramref name="writeTemp"/> (given the temporary path) and moves the result to <paramref name="path"/>.</summary>
    /// <param name="path">Target path.</param>
    /// <param name="writeTemp">Writes the content to the path it is given.</param>
    /// <param name="confirmOverwrite">Asked with the full path when the file exists; nothing is written unless it says yes.</param>
    /// <param name="field">The option or field the path came from, for messages.</param>
    public static SaveOutcome Replace(string path, Action<string> writeTemp, Func<string, bool> confirmOverwrite, string field)
    {
        string full;
        try { full = Path.GetFullPath(path); }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new InputException(field, path, "a file path");
        }
        if (Directory.Exists(full)) throw new InputException(field, path, "a file path, not a folder");
        bool exists = File.Exists(full);
        if (exists && !IsRegular(full))
            throw new InputException(field, path, "a regular file (this path is a device, a pipe or another special file; nothing was written)");
        string? folder = Path.GetDirectoryName(full);
        if (folder is null || !Directory.Exists(folder)) throw new InputException(field, path, "a path in an existing folder");
        if (exists && !confirmOverwrite(full)) return SaveOutcome.Declined;

        RemoveStaleTemporaries(folder, Path.GetFileName(full));
        string temp = Path.Combine(folder, $".{Path.GetFileName(full)}.{Guid.NewGuid():N}.tmp");
        try
        {
            writeTemp(temp);
            File.Move(temp, full, overwrite: exists);
            return SaveOutcome.Saved;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputException(field, path, "a path you can write to", $"{field}: cannot write '{path}': {e.Message}");
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }

    /// <summary>A temporary file of ours this old is left from a save that was killed (a live save takes seconds).</summary>
    public static readonly TimeSpan StaleAfter = TimeSpan.FromMinutes(10);

    /// <summary>
    /// Deletes what killed saves of this file left: hidden <c>.NAME.&lt;32 hex digits&gt;.tmp</c>
    /// files older than <see cref="StaleAfter"/>. Only that exact pattern is touched, so no
    /// file of the user's (or a save in progress elsewhere) is removed; failures are ignored.
    /// </summary>
    public static void RemoveStaleTemporaries(string folder, string fileName)
    {
        string prefix = "." + fileName + ".";
        IEnumerable<string> candidates;
        try { candidates = Directory.EnumerateFiles(folder, ".*.tmp").ToList(); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException) { return; }
        foreach (string path in candidates)
        {
            string name = Path.GetFileName(path);
            if (!name.StartsWith(prefix, StringComparison.Ordinal) || !name.EndsWith(".tmp", StringComparison.Ordinal)) continue;
            string middle = name[prefix.Length..^4];
            if (middle.Length != 32 || !middle.All(Uri.IsHexDigit)) continue;
            try
            {
                if (DateTime.UtcNow - File.GetLastWriteTimeUtc(path) > StaleAfter) File.Delete(path);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException) { }
        }
    }

    /// <summary>True for a regular file (not a FIFO, socket or device), following symbolic links.</summary>
    public static bool IsRegular(string path) => FileKind.IsRegularFile(path);
}
