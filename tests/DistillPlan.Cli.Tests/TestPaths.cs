namespace DistillPlan.Cli.Tests;

/// <summary>Where the tests find the repository and their own source folder (for files they regenerate).</summary>
internal static class TestPaths
{
    /// <summary>The repository root (the folder holding DistillPlan.sln).</summary>
    public static string RepoRoot => Above("DistillPlan.sln");

    /// <summary>This test project's source folder.</summary>
    public static string SourceDir => Above("DistillPlan.Cli.Tests.csproj");

    private static string Above(string marker)
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
            if (File.Exists(Path.Combine(d.FullName, marker))) return d.FullName;
        throw new DirectoryNotFoundException(marker);
    }
}
