using System.Globalization;

namespace DistillPlan.Core.Mixtures;

/// <summary>A published fact that two liquids mix in all proportions over a temperature range.</summary>
/// <param name="FirstCas">CAS number of the first liquid.</param>
/// <param name="FirstName">Its name.</param>
/// <param name="SecondCas">CAS number of the second liquid.</param>
/// <param name="SecondName">Its name.</param>
/// <param name="TMinK">Lowest temperature of the range [K].</param>
/// <param name="TMaxK">Highest temperature of the range [K].</param>
/// <param name="Source">Citation (or "from memory" and what it rests on).</param>
public sealed record MiscibilityFact(string FirstCas, string FirstName, string SecondCas, string SecondName,
    double TMinK, double TMaxK, string Source)
{
    /// <summary>True when the fact is about the pair (in either order) at temperature T.</summary>
    /// <param name="casA">CAS of one liquid.</param>
    /// <param name="casB">CAS of the other.</param>
    /// <param name="temperatureK">Temperature [K].</param>
    public bool Covers(string? casA, string? casB, double temperatureK)
        => IsPair(FirstCas, SecondCas, casA, casB) && temperatureK >= TMinK && temperatureK <= TMaxK;

    /// <summary>The fact in one sentence, with its source.</summary>
    public string Describe()
        => $"{FirstName} and {SecondName} mix in all proportions at {TMinK - 273.15:0}–{TMaxK - 273.15:0} °C ({Source})";

    internal static bool IsPair(string first, string second, string? casA, string? casB)
        => (first == casA && second == casB) || (first == casB && second == casA);
}

/// <summary>A published azeotrope or zeotrope of a binary pair.</summary>
/// <param name="FirstCas">CAS number of the first component.</param>
/// <param name="FirstName">Its name.</param>
/// <param name="SecondCas">CAS number of the second component.</param>
/// <param name="SecondName">Its name.</param>
/// <param name="Kind">The azeotrope's kind, or null for a zeotropic pair.</param>
/// <param name="TemperatureK">Boiling temperature of the azeotrope at 1 atm [K], or null.</param>
/// <param name="MassFractionFirst">Azeotrope composition as mass fraction of the first component, or null.</param>
/// <param name="MoreVolatile">Name of the more volatile component of a zeotropic pair, or null.</param>
/// <param name="PressureMinPa">Lowest pressure the fact is applied at [Pa].</param>
/// <param name="PressureMaxPa">Highest pressure the fact is applied at [Pa].</param>
/// <param name="Source">Citation (or "from memory").</param>
public sealed record PublishedAzeotropeFact(string FirstCas, string FirstName, string SecondCas, string SecondName,
    AzeotropeKind? Kind, double? TemperatureK, double? MassFractionFirst, string? MoreVolatile,
    double PressureMinPa, double PressureMaxPa, string Source)
{
    /// <summary>True for a published zeotrope (no azeotrope).</summary>
    public bool IsZeotropic => Kind is null;

    /// <summary>True when the fact applies to this pair (either order) at pressure P.</summary>
    /// <param name="casA">CAS of one component.</param>
    /// <param name="casB">CAS of the other.</param>
    /// <param name="pressurePa">Pressure [Pa].</param>
    public bool Covers(string? casA, string? casB, double pressurePa)
        => MiscibilityFact.IsPair(FirstCas, SecondCas, casA, casB) && pressurePa >= PressureMinPa && pressurePa <= PressureMaxPa;

    /// <summary>The fact in one sentence, with its source.</summary>
    public string Describe() => IsZeotropic
        ? $"{FirstName}–{SecondName} is zeotropic" + (MoreVolatile is null ? "" : $" ({MoreVolatile} the more volatile)") + $" ({Source})"
        : $"{FirstName}–{SecondName} azeotrope at {TemperatureK - 273.15:0.0} °C and 1 atm, {MassFractionFirst * 100:0.#} wt % {FirstName} ({Source})";
}

/// <summary>
/// The shipped table of published mixture facts (embedded <c>published-mixture-facts.yaml</c>):
/// miscibility that overrules predicted liquid–liquid splits, and azeotropes and zeotropes that
/// overrule a model's azeotrope search where the models are known to fail.
/// </summary>
public sealed class PublishedMixtureFacts
{
    private const string Resource = "DistillPlan.Core.Mixtures.published-mixture-facts.yaml";
    private static readonly Lazy<PublishedMixtureFacts> ShippedTable = new(Load);

    private PublishedMixtureFacts(IReadOnlyList<MiscibilityFact> miscible, IReadOnlyList<PublishedAzeotropeFact> azeotropes)
    {
        Miscible = miscible;
        Azeotropes = azeotropes;
    }

    /// <summary>The shipped table.</summary>
    public static PublishedMixtureFacts Shipped => ShippedTable.Value;

    /// <summary>No facts at all: the models answer alone (to see what they predict).</summary>
    public static PublishedMixtureFacts Empty { get; } = new([], []);

    /// <summary>Pairs that mix in all proportions over a temperature range.</summary>
    public IReadOnlyList<MiscibilityFact> Miscible { get; }

    /// <summary>Published azeotropes and zeotropes.</summary>
    public IReadOnlyList<PublishedAzeotropeFact> Azeotropes { get; }

    /// <summary>The miscibility fact for a pair at T, or null.</summary>
    /// <param name="a">One component.</param>
    /// <param name="b">The other.</param>
    /// <param name="temperatureK">Temperature [K].</param>
    public MiscibilityFact? MiscibilityOf(MixtureComponent a, MixtureComponent b, double temperatureK)
        => Miscible.FirstOrDefault(f => f.Covers(a.Cas, b.Cas, temperatureK));

    /// <summary>The published azeotrope or zeotrope fact for a pair at P, or null.</summary>
    /// <param name="a">One component.</param>
    /// <param name="b">The other.</param>
    /// <param name="pressurePa">Pressure [Pa].</param>
    public PublishedAzeotropeFact? AzeotropeOf(MixtureComponent a, MixtureComponent b, double pressurePa)
        => Azeotropes.FirstOrDefault(f => f.Covers(a.Cas, b.Cas, pressurePa));

    /// <summary>Any published azeotrope or zeotrope fact for a pair, whatever the pressure, or null.</summary>
    /// <param name="a">One component.</param>
    /// <param name="b">The other.</param>
    public PublishedAzeotropeFact? AnyAzeotropeOf(MixtureComponent a, MixtureComponent b)
        => Azeotropes.FirstOrDefault(f => MiscibilityFact.IsPair(f.FirstCas, f.SecondCas, a.Cas, b.Cas));

    private static PublishedMixtureFacts Load() => FromTable(TableText.Read(TableText.ReadResource(Resource), Resource), Resource);

    /// <summary>Resource name of the shipped facts (for the readers' tests and benchmarks).</summary>
    internal const string ShippedResource = Resource;

    /// <summary>The facts' checks and content, whichever reader read the text.</summary>
    internal static PublishedMixtureFacts FromTable(TableText root, string origin)
    {
        var sources = new Dictionary<string, string>();
        foreach (var (key, value) in root.Pairs("sources", origin)) sources.TryAdd(key, value.Value);

        double? Number(TableCell cell) => cell.Value is "null" or ""
            ? null
            : double.TryParse(cell.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value)
                ? value
                : throw new FormatException($"{origin}, line {cell.Line}: '{cell.Value}' is not a number or null");
        double Required(TableCell cell) => Number(cell)
            ?? throw new FormatException($"{origin}, line {cell.Line}: a number is needed here, not '{cell.Value}'");
        string Source(TableCell cell) => sources.TryGetValue(cell.Value, out var s)
            ? s : throw new FormatException($"{origin}, line {cell.Line}: unknown source key '{cell.Value}'");

        var miscible = root.Rows("miscible", 7, origin).Select(row => new MiscibilityFact(
            row[0].Value, row[1].Value, row[2].Value, row[3].Value,
            Required(row[4]) + 273.15, Required(row[5]) + 273.15, Source(row[6]))).ToList();
        var azeotropes = root.Rows("azeotropes", 11, origin).Select(row => new PublishedAzeotropeFact(
            row[0].Value, row[1].Value, row[2].Value, row[3].Value,
            row[4].Value switch
            {
                "zeotropic" => null,
                "minimum-boiling" => AzeotropeKind.MinimumBoiling,
                "maximum-boiling" => AzeotropeKind.MaximumBoiling,
                var k => throw new FormatException($"{origin}, line {row[4].Line}: unknown kind '{k}'"),
            },
            Number(row[5]) + 273.15, Number(row[6]), row[7].Value is "null" or "" ? null : row[7].Value,
            Required(row[8]), Required(row[9]), Source(row[10]))).ToList();
        return new PublishedMixtureFacts(miscible, azeotropes);
    }
}
