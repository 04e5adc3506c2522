using DistillPlan.Core.Library;

namespace DistillPlan.Tui.Tests;

/// <summary>The shipped library (found like the program finds it) and the repository root, loaded once.</summary>
internal static class TestLibrary
{
    private static readonly Lazy<SolventLibrary> Shipped = new(SolventLibrary.LoadShipped);

    public static SolventLibrary Library => Shipped.Value;

    public static string RepoRoot
    {
        get
        {
            for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
                if (File.Exists(Path.Combine(d.FullName, "DistillPlan.sln"))) return d.FullName;
            throw new InvalidOperationException("repository root (DistillPlan.sln) not found above " + AppContext.BaseDirectory);
        }
    }
}
