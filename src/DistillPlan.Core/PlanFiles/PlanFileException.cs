namespace DistillPlan.Core.PlanFiles;

/// <summary>A plan file that cannot be read: names the file, the line and what is wrong.</summary>
public sealed class PlanFileException(string file, int line, string problem)
    : InputException("plan file", file, "a plan file as described in docs/plan-file.md", line > 0 ? $"{Path.GetFileName(file)}:{line}: {problem}" : $"{Path.GetFileName(file)}: {problem}")
{
    /// <summary>1-based line of the offending node (0 when the file as a whole is wrong).</summary>
    public int Line { get; } = line;
}
