namespace DistillPlan.Core.Tests;

/// <summary>The shape the code keeps: Core is the domain and knows no front end.</summary>
public class ArchitectureTests
{
    [Fact]
    public void Core_references_no_front_end_and_no_renderer()
    {
        var references = typeof(DistillPlan.Core.Planning.Plan).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        string[] forbidden = ["DistillPlan.Cli", "distillplan", "DistillPlan.Tui", "DistillPlan.Reports", "Terminal.Gui", "ScottPlot", "System.CommandLine", "SkiaSharp"];
        Assert.Empty(references.Intersect(forbidden));
        // Only the runtime and the two domain libraries.
        Assert.All(references, r => Assert.True(r.StartsWith("System") || r is "netstandard" or "MathNet.Numerics" or "YamlDotNet", r));
    }
}
