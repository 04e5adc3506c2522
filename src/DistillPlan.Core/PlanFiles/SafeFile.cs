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

    /// <summary>True for a regular file (not a FIFO, socket or device), following symbolic links.</summary>
    public static bool IsRegular(string path) => FileKind.IsRegularFile(path);
}
