using System.Reflection;

namespace DistillPlan.Core.Reports;

/// <summary>What a report records beside the computation: who made it, when, from which inputs, and how to cite.</summary>
/// <param name="Inputs">Every input as the user gave it: "charge" first, then each setting given, by key.</param>
/// <param name="Cite">Full citation for a library source key.</param>
public sealed record ReportContext(IReadOnlyList<KeyValuePair<string, string>> Inputs, Func<string, string> Cite)
{
    /// <summary>When the report is made: now, or SOURCE_DATE_EPOCH when set (the reproducible-builds convention), so tests and archived runs can pin it.</summary>
    public DateTimeOffset Made { get; init; } = Now();
    /// <summary>The plan's own title, when it has one.</summary>
    public string? UserTitle { get; init; }
    /// <summary>The plan's notes, when it has them.</summary>
    public string? UserNotes { get; init; }
    /// <summary>Program name and version, e.g. "distillplan 0.3.0".</summary>
    public string Program { get; init; } = ProgramName;

    /// <summary>Now, or the time SOURCE_DATE_EPOCH gives (seconds since 1970 UTC).</summary>
    public static DateTimeOffset Now() =>
        long.TryParse(Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH"), out long s) && s >= 0 && s < 253402300800
            ? DateTimeOffset.FromUnixTimeSeconds(s) : DateTimeOffset.UtcNow;

    /// <summary>"distillplan" and the version of this build.</summary>
    public static string ProgramName { get; } =
        "distillplan " + (typeof(ReportContext).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0");
}
