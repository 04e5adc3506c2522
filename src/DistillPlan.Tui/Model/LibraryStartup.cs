using DistillPlan.Core;
using DistillPlan.Core.Library;

namespace DistillPlan.Tui.Model;

/// <summary>The library the planner starts with.</summary>
public static class LibraryStartup
{
    /// <summary>
    /// The shipped library merged with the user's (<paramref name="userPath"/>, else the per-user
    /// file). When the user's file is broken, the shipped library alone and the one-line reason;
    /// a broken shipped library still throws (nothing could be planned).
    /// </summary>
    public static (SolventLibrary Library, string? Problem) Load(string? userPath = null)
    {
        try { return (SolventLibrary.LoadWithUser(userPath), null); }
        catch (DistillPlanException e)
        {
            var shipped = SolventLibrary.LoadShipped();
            return (shipped, "Your solvent library was not loaded (the shipped one is in use): " + e.Message);
        }
    }
}
