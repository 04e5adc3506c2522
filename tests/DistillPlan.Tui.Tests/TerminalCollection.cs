namespace DistillPlan.Tui.Tests;

/// <summary>Tests that drive a Terminal.Gui application run one at a time: the library keeps some state per process.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class TerminalCollection
{
    /// <summary>The collection's name.</summary>
    public const string Name = "terminal";
}
