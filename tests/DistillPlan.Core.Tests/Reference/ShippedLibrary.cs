using DistillPlan.Core.Library;

namespace DistillPlan.Core.Tests.Reference;

/// <summary>The shipped solvents.yaml, loaded once for all reference tests.</summary>
public static class ShippedLibrary
{
    private static readonly Lazy<SolventLibrary> Lazy = new(SolventLibrary.LoadShipped);

    /// <summary>The shipped library.</summary>
    public static SolventLibrary Instance => Lazy.Value;
}
