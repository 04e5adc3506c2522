namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The temperature at which the library's ranked curves reach 101325 Pa, against the CRC normal
/// boiling point (water: IAPWS-IF97), within 0.5 K.
/// </summary>
public class NormalBoilingPointTests
{
    private const double OneAtmospherePa = 101325;
    private const double ToleranceK = 0.5;

    /// <summary>
    /// Solvents whose published curves cannot meet 0.5 K, with the bound they do meet and why.
    /// Bounds are the measured miss rounded up; the list must stay exactly the set that misses.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, (double BoundK, string Reason)> KnownMisses =
        new Dictionary<string, (double, string)>
        {
            // Perry DIPPR-101 is the only table covering Tb; it gives 463.9 K (CRC 465.05 K).
            ["67-68-5"] = (1.5, "dimethyl sulfoxide: Perry DIPPR-101, the only table covering Tb, gives 1.2 K low"),
            // Perry DIPPR-101 gives 424.9 K (CRC 425.95 K); the L-B row stops at 363 K.
            ["68-12-2"] = (1.5, "N,N-dimethylformamide: Perry DIPPR-101, the only table covering Tb, gives 1.0 K low"),
            // Sulfolane's curve is a refit of the L-B row (364-529 K) with the CRC Tb among its points; it boils 0.7 K low.
            ["126-33-0"] = (1.0, "sulfolane: a Clausius-Clapeyron refit of the L-B row and the CRC Tb, 0.7 K low"),
        };

    /// <summary>Library solvents not checked here, and why.</summary>
    public static readonly IReadOnlyDictionary<string, string> NotComparable = new Dictionary<string, string>
    {
        ["616-38-6"] = "dimethyl carbonate: its only curve is a Trouton estimate drawn through the CRC Tb, so the check would be circular",
        ["127-19-5"] = "N,N-dimethylacetamide: its only published row (L-B, boiling 20 K low) is left out; the estimate is drawn through the CRC Tb, so the check would be circular",
        ["5614-37-9"] = "cyclopentyl methyl ether: from memory; no CRC figure at hand, curve drawn through the remembered Tb",
        ["111-96-6"] = "diglyme: from memory; no CRC figure at hand, curve drawn through the remembered Tb",
    };

    public static TheoryData<string, string, double> ReferenceBoilingPoints()
    {
        var data = new TheoryData<string, string, double>();
        foreach (var (cas, name, tb, _) in CrcTables.Organic)
            if (!NotComparable.ContainsKey(cas)) data.Add(cas, name, tb);   // CRC, Physical Constants of Organic Compounds
        data.Add("7732-18-5", "Water", CrcTables.WaterTbK);                   // IAPWS-IF97
        return data;
    }

    private static double LibraryBoilingPointK(string cas) =>
        ShippedLibrary.Instance.Find(cas).VaporPressure.SaturationTemperature(OneAtmospherePa).TemperatureK;

    [Theory]
    [MemberData(nameof(ReferenceBoilingPoints))]
    public void The_library_boils_at_the_reference_normal_boiling_point(string cas, string referenceName, double referenceTbK)
    {
        double tolerance = KnownMisses.TryGetValue(cas, out var miss) ? miss.BoundK : ToleranceK;
        double tb = LibraryBoilingPointK(cas);
        Assert.True(Math.Abs(tb - referenceTbK) <= tolerance,
            $"{referenceName} ({cas}): library {tb:F3} K, reference {referenceTbK} K, allowed ±{tolerance} K");
    }

    [Fact]
    public void The_known_misses_are_exactly_the_solvents_that_miss_by_more_than_half_a_kelvin()
    {
        var missing = ReferenceBoilingPoints()
            .Select(row => ((string)row[0], (double)row[2]))
            .Where(r => Math.Abs(LibraryBoilingPointK(r.Item1) - r.Item2) > ToleranceK)
            .Select(r => r.Item1).OrderBy(c => c).ToList();
        Assert.Equal(KnownMisses.Keys.OrderBy(c => c).ToList(), missing);
    }

    [Fact]
    public void Every_library_solvent_has_a_reference_boiling_point_or_a_stated_reason()
    {
        var referenced = CrcTables.Organic.Select(r => r.Cas).Append("7732-18-5").ToHashSet();
        var unaccounted = ShippedLibrary.Instance.Solvents
            .Where(s => !referenced.Contains(s.Cas) && !NotComparable.ContainsKey(s.Cas))
            .Select(s => s.Name).ToList();
        Assert.Empty(unaccounted);
        // and nothing is excused that is not in the library
        Assert.All(NotComparable.Keys, cas => Assert.True(ShippedLibrary.Instance.TryFind(cas, out _), cas));
    }
}
