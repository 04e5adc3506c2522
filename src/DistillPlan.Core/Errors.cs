namespace DistillPlan.Core;

/// <summary>Base of the small exception family the core throws; the CLI and TUI catch it.</summary>
public abstract class DistillPlanException(string message, Exception? inner = null) : Exception(OneLine(message), inner)
{
    /// <summary>Most characters a message keeps: a value quoted from a file may be megabytes long.</summary>
    public const int MaxMessageLength = 400;

    // Every message is printed as one line on stderr: values quoted in it may hold line breaks or be huge.
    private static string OneLine(string message)
    {
        string line = message.ReplaceLineEndings(" ");
        return line.Length <= MaxMessageLength ? line : $"{line[..(MaxMessageLength - 60)]}… (message of {line.Length} characters cut)";
    }
}

/// <summary>
/// Input the user gave that cannot be used. The message names the field, the value and what
/// is allowed, in one line, so the CLI can print it as it is and exit with code 2.
/// </summary>
public class InputException(string field, string value, string allowed, string? message = null)
    : DistillPlanException(message ?? $"{field}: '{Shorten(value)}' is not valid; expected {allowed}")
{
    /// <summary>A value as it is quoted in a message: long ones are cut, so one line stays one line.</summary>
    public static string Shorten(string value)
    {
        string oneLine = value.ReplaceLineEndings(" ");
        return oneLine.Length <= 60 ? oneLine : $"{oneLine[..40]}… ({value.Length} characters)";
    }

    /// <summary>The option, argument or file field the bad value came from.</summary>
    public string Field { get; } = field;
    /// <summary>The value as the user wrote it.</summary>
    public string Value { get; } = value;
    /// <summary>What would have been accepted.</summary>
    public string Allowed { get; } = allowed;
}

/// <summary>A solvent name, alias or CAS number that the library does not hold.</summary>
public sealed class UnknownSolventException(string name, IReadOnlyList<string> suggestions)
    : InputException("solvent", name, "a name, alias or CAS number of the library",
        $"solvent: '{Shorten(name)}' is not in the library; " + (suggestions.Count > 0
            ? $"nearest names: {string.Join(", ", suggestions)}"
            : "`distillplan solvents` lists the names"))
{
    /// <summary>The nearest library names, best first.</summary>
    public IReadOnlyList<string> Suggestions { get; } = suggestions;
}

/// <summary>
/// A state with no vapour pressure: above the critical temperature or pressure, or a value
/// the curves cannot reach. Carries the solvent, the method and the offending value.
/// </summary>
public sealed class OutOfRangeException(string solvent, string method, string message)
    : DistillPlanException($"{solvent}: {message} ({method})")
{
    /// <summary>Name of the solvent the computation was for.</summary>
    public string Solvent { get; } = solvent;
    /// <summary>The curve or solver that refused.</summary>
    public string Method { get; } = method;
}

/// <summary>An iterative solver that did not converge within its iteration cap.</summary>
public sealed class NoConvergenceException(string method, string detail)
    : DistillPlanException($"{method} did not converge: {detail}")
{
    /// <summary>The solver that gave up.</summary>
    public string Method { get; } = method;
}

/// <summary>A library file that cannot be read: names the file, line and field.</summary>
public sealed class LibraryFormatException(string file, int line, string field, string problem)
    : DistillPlanException(line > 0 ? $"{file}:{line}: {field}: {problem}" : $"{file}: {field}: {problem}")
{
    /// <summary>Path of the YAML file.</summary>
    public string File { get; } = file;
    /// <summary>1-based line of the offending node.</summary>
    public int Line { get; } = line;
    /// <summary>Dotted path of the offending field.</summary>
    public string Field { get; } = field;
}
