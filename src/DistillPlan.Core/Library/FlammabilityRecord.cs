namespace DistillPlan.Core.Library;

/// <summary>
/// What the library holds for one flammability figure (flash point or autoignition temperature):
/// a value with its source, and/or the published tables that were searched and do not list the
/// compound. A check that needs the figure and finds none reports "not evaluated" with
/// <see cref="MissingReason"/> instead of passing in silence.
/// </summary>
/// <param name="ValueK">The value [K], or null when the library has none.</param>
/// <param name="NotPublishedIn">Source keys of the tables that do not list the compound (e.g. nfpa-497, iec-60079-20-1).</param>
/// <param name="Reason">Why it is absent, when known (e.g. "water does not burn").</param>
public sealed record FlammabilityRecord(double? ValueK, IReadOnlyList<string> NotPublishedIn, string? Reason)
{
    /// <summary>No entry in the library at all (a user entry that leaves the field out).</summary>
    public static FlammabilityRecord NotRecorded { get; } = new(null, [], null);

    /// <summary>True when there is no value because the searched tables do not publish one.</summary>
    public bool Unpublished => ValueK is null && NotPublishedIn.Count > 0;

    /// <summary>Null when a value is present; otherwise why not, naming the tables searched.</summary>
    public string? MissingReason(IReadOnlyDictionary<string, string>? citations = null)
    {
        if (ValueK is not null) return null;
        if (NotPublishedIn.Count == 0) return "not recorded in the library";
        string tables = string.Join(" and ", NotPublishedIn.Select(k => ShortName(k, citations)));
        return Reason is null ? $"not published in {tables}" : $"not published in {tables} ({Reason})";
    }

    private static string ShortName(string key, IReadOnlyDictionary<string, string>? citations) => key switch
    {
        "nfpa-497" => "NFPA 497 (2008)",
        "iec-60079-20-1" => "IEC 60079-20-1:2010",
        _ => citations is not null && citations.TryGetValue(key, out var c) ? c : key,
    };
}
