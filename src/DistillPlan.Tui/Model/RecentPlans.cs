using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The last few plan files opened or saved, newest first, kept in the user's config folder
/// (beside the user library: $XDG_CONFIG_HOME/distillplan or ~/.config/distillplan) in a file of
/// the planner's own, one path a line. A list that cannot be read or written is simply empty:
/// it is a convenience, never a reason to stop.
/// </summary>
public sealed class RecentPlans(string file)
{
    /// <summary>How many paths are kept.</summary>
    public const int Capacity = 8;

    /// <summary>The default list file, in the per-user config folder.</summary>
    public static string DefaultFile => Path.Combine(Path.GetDirectoryName(SolventLibrary.DefaultUserPath)!, "recent-plans.txt");

    /// <summary>The list file.</summary>
    public string File { get; } = file;

    /// <summary>The paths, newest first, those that no longer exist left out.</summary>
    public IReadOnlyList<string> Paths
    {
        get
        {
            try { return System.IO.File.Exists(File) ? System.IO.File.ReadAllLines(File).Where(l => l.Length > 0 && System.IO.File.Exists(l)).Take(Capacity).ToList() : []; }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException) { return []; }
        }
    }

    /// <summary>Puts a path first (removing it further down).</summary>
    public void Add(string path)
    {
        string full = Path.GetFullPath(path);
        var lines = new[] { full }.Concat(Paths.Where(p => p != full)).Take(Capacity);
        try
        {
            Directory.CreateDirectory(Path.GetDirectoryName(File)!);
            // The planner's own file: replaced without asking, atomically.
            SafeFile.Replace(File, temp => System.IO.File.WriteAllLines(temp, lines), _ => true, "recent plans");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or Core.DistillPlanException) { }
    }
}
