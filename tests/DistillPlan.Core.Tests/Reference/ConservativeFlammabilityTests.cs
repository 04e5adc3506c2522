using static DistillPlan.Core.Tests.Reference.FlammabilityTests;

namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The library keeps the conservative figure: the lower of NFPA 497 (2008) and IEC 60079-20-1:2010
/// (typed in <see cref="FlammabilityTests"/>) for flash point and autoignition temperature, with the
/// source of the value kept; where neither lists the compound, an explicit not-published record.
/// </summary>
public class ConservativeFlammabilityTests
{
    private static double? Lower(double? a, double? b) => a is null ? b : b is null ? a : Math.Min(a.Value, b.Value);

    /// <summary>
    /// Flash points where the library keeps the higher value on purpose: the NFPA row is physically
    /// impossible, because at it the vapour over the liquid holds under 5 % of the lower flammable
    /// limit (checked below).
    /// </summary>
    public static readonly IReadOnlyDictionary<string, string> FlashPointExceptions = new Dictionary<string, string>
    {
        ["78-83-1"] = "isobutanol: NFPA 233.15 K, IEC 301.15 K",
        ["1634-04-4"] = "methyl tert-butyl ether: NFPA 193.15 K, IEC 246.15 K",
    };

    public static TheoryData<string> EveryCas()
    {
        var data = new TheoryData<string>();
        foreach (var s in ShippedLibrary.Instance.Solvents) data.Add(s.Cas);
        return data;
    }

    private static (double? Nfpa, double? Iec) Flash(string cas) =>
        (Nfpa.SingleOrDefault(r => r.Cas == cas).FlashK, Iec.SingleOrDefault(r => r.Cas == cas).FlashK);

    private static (double? Nfpa, double? Iec) Autoignition(string cas) =>
        (Nfpa.SingleOrDefault(r => r.Cas == cas).AutoignitionK, Iec.SingleOrDefault(r => r.Cas == cas).AutoignitionK);

    [Theory]
    [MemberData(nameof(EveryCas))]
    public void The_library_autoignition_temperature_is_the_lower_of_NFPA_497_and_IEC_60079_20_1(string cas)
    {
        var s = ShippedLibrary.Instance.Find(cas);
        var (nfpa, iec) = Autoignition(cas);
        double? expected = Lower(nfpa, iec);
        Assert.Equal(expected, s.AutoignitionK);
        if (expected is double v)
        {
            string src = s.Sources["autoignition_k"];
            Assert.True(src == "nfpa-497" && v == nfpa || src == "iec-60079-20-1" && v == iec, $"{s.Name}: {v} K from {src}");
        }
        else
        {
            Assert.True(s.AutoignitionRecord.Unpublished, $"{s.Name}: no autoignition value and no not_published record");
            Assert.Equal(["nfpa-497", "iec-60079-20-1"], s.AutoignitionRecord.NotPublishedIn);
            Assert.StartsWith("not published in NFPA 497 (2008) and IEC 60079-20-1:2010", s.AutoignitionMissingReason);
        }
    }

    [Theory]
    [MemberData(nameof(EveryCas))]
    public void The_library_flash_point_is_the_lower_of_NFPA_497_and_IEC_60079_20_1(string cas)
    {
        var s = ShippedLibrary.Instance.Find(cas);
        var (nfpa, iec) = Flash(cas);
        if (FlashPointExceptions.ContainsKey(cas))
        {
            Assert.Equal(iec, s.FlashPointK);
            return;
        }
        double? expected = Lower(nfpa, iec);
        if (expected is double v)
        {
            Assert.Equal(v, s.FlashPointK);
            string src = s.Sources["flash_point_k"];
            Assert.True(src == "nfpa-497" && v == nfpa || src == "iec-60079-20-1" && v == iec, $"{s.Name}: {v} K from {src}");
        }
        else
        {
            Assert.Equal(["nfpa-497", "iec-60079-20-1"], s.FlashPointRecord.NotPublishedIn);
            // a value from elsewhere may stand beside the record (cyclopentyl methyl ether: from memory)
            Assert.True(s.FlashPointK is null || s.Sources["flash_point_k"] == "memory", s.Name);
        }
    }

    [Theory]
    [InlineData("78-83-1")]
    [InlineData("1634-04-4")]
    public void The_flash_points_kept_above_the_NFPA_row_are_where_that_row_is_physically_impossible(string cas)
    {
        var s = ShippedLibrary.Instance.Find(cas);
        double nfpaFlash = Nfpa.Single(r => r.Cas == cas).FlashK!.Value;
        double lfl = Nfpa.Single(r => r.Cas == cas).Lfl!.Value;
        double fraction = s.VaporPressure.SaturationPressure(nfpaFlash).PressurePa / 101325;
        Assert.True(fraction < 0.05 * lfl, $"{FlashPointExceptions[cas]}: vapour at the NFPA flash point is {fraction / lfl * 100:F1} % of the LFL");
    }

    [Theory]
    [InlineData("tetrahydrofuran", 503.15)]          // IEC 503.15 K, NFPA 594.15 K
    [InlineData("triethylamine", 488.15)]            // IEC 488.15 K, NFPA 522.15 K
    [InlineData("methyl tert-butyl ether", 658.15)]  // IEC 658.15 K, NFPA 708.15 K
    [InlineData("diisopropyl ether", 678.15)]        // IEC 678.15 K, NFPA 716.15 K
    [InlineData("butyl acetate", 663.15)]            // IEC 663.15 K, NFPA 694.15 K
    [InlineData("1-propanol", 658.15)]               // IEC 658.15 K, NFPA 686.15 K
    [InlineData("carbon disulfide", 363.15)]         // both 363.15 K: the classic hot-surface case, about 90 C
    [InlineData("1,4-dioxane", 453.15)]              // NFPA 453.15 K, IEC 648.15 K
    public void Where_the_standards_differ_the_lower_autoignition_temperature_is_kept(string name, double expectedK)
    {
        Assert.Equal(expectedK, ShippedLibrary.Instance.Find(name).AutoignitionK);
    }

    [Theory]
    [InlineData("2-methyltetrahydrofuran", "flash")]
    [InlineData("dimethyl carbonate", "flash")]
    [InlineData("cyclopentyl methyl ether", "autoignition")]
    [InlineData("diglyme", "autoignition")]
    [InlineData("dimethyl sulfoxide", "autoignition")]
    [InlineData("N-methyl-2-pyrrolidone", "autoignition")]
    [InlineData("anisole", "autoignition")]
    [InlineData("1-methoxy-2-propanol", "autoignition")]
    public void A_value_neither_standard_lists_is_recorded_as_not_published_so_a_check_can_say_so(string name, string which)
    {
        var s = ShippedLibrary.Instance.Find(name);
        var (value, record, reason) = which == "flash"
            ? (s.FlashPointK, s.FlashPointRecord, s.FlashPointMissingReason)
            : (s.AutoignitionK, s.AutoignitionRecord, s.AutoignitionMissingReason);
        Assert.Null(value);
        Assert.True(record.Unpublished);
        Assert.Contains("NFPA 497", reason);
    }

    [Fact]
    public void Every_solvent_has_a_flash_point_and_an_autoignition_record()
    {
        foreach (var s in ShippedLibrary.Instance.Solvents)
        {
            Assert.True(s.FlashPointK is not null || s.FlashPointRecord.Unpublished, $"{s.Name}: flash point neither given nor recorded as not published");
            Assert.True(s.AutoignitionK is not null || s.AutoignitionRecord.Unpublished, $"{s.Name}: autoignition neither given nor recorded as not published");
        }
    }
}
