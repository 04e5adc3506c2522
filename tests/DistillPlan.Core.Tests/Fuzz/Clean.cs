using DistillPlan.Core;

namespace DistillPlan.Core.Tests.Fuzz;

/// <summary>
/// The contract every bad input must keep (issues 13 and 14): either an answer, or one of Core's
/// own exceptions whose message is one line that names a field ("field: …" or "file:line: field: …").
/// Anything else (a cast, an overflow, a NaN reaching a solver) fails with the input that caused it.
/// </summary>
internal static class Clean
{
    /// <summary>Runs <paramref name="action"/>; true when it answered, false when it refused cleanly.</summary>
    public static bool Run(string input, Action action)
    {
        try
        {
            action();
            return true;
        }
        catch (DistillPlanException e)
        {
            AssertOneLineNamingAField(e.Message, input);
            return false;
        }
        catch (Exception e)
        {
            Assert.Fail($"input {Show(input)} threw {e.GetType().Name}: {e.Message}");
            return false;
        }
    }

    public static void AssertOneLineNamingAField(string message, string input)
    {
        Assert.False(string.IsNullOrWhiteSpace(message), $"empty message for {Show(input)}");
        Assert.False(message.Contains('\n') || message.Contains('\r'), $"message of more than one line for {Show(input)}: {message}");
        // "field: problem": the part before the first ": " is a field, option or file:line, never empty.
        int colon = message.IndexOf(": ", StringComparison.Ordinal);
        Assert.True(colon > 0, $"message names no field for {Show(input)}: {message}");
        Assert.False(message.Contains(": : ", StringComparison.Ordinal), $"empty field name for {Show(input)}: {message}");
        Assert.True(message.Length < 1000, $"message of {message.Length} characters for {Show(input)}");
    }

    private static string Show(string input) => input.Length <= 200 ? $"'{input}'" : $"'{input[..200]}…' ({input.Length} characters)";
}
