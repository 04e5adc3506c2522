namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// Flash points and autoignition temperatures in the library against the two standards,
/// typed here from NFPA 497 (2008) and IEC 60079-20-1:2010.
/// </summary>
public class FlammabilityTests
{
    // IEC 60079-20-1:2010: (CAS, flash point [K], autoignition [K], LFL [volume fraction])
    public static readonly IReadOnlyList<(string Cas, double? FlashK, double? AutoignitionK, double? Lfl)> Iec =
    [
        ("60-29-7", 228.15, 448.15, 0.017),   // diethyl ether
        ("64-17-5", 285.15, 673.15, 0.031),   // ethanol
        ("64-18-6", 315.15, 798.15, 0.18),   // formic acid
        ("64-19-7", 312.15, 783.15, 0.04),   // acetic acid
        ("67-56-1", 282.15, 713.15, 0.06),   // methanol
        ("67-63-0", 285.15, 672.15, 0.02),   // 2-propanol
        ("67-64-1", 253.15, 812.15, 0.025),   // acetone
        ("68-12-2", 331.15, 713.15, 0.018),   // N,N-dimethylformamide
        ("71-23-8", 288.15, 658.15, 0.021),   // 1-propanol
        ("71-36-3", 308.15, 616.15, 0.014),   // 1-butanol
        ("71-43-2", 262.15, 771.15, 0.012),   // benzene
        ("75-05-8", 275.15, 796.15, 0.03),   // acetonitrile
        ("75-15-0", 243.15, 363.15, 0.006),   // carbon disulfide
        ("75-52-5", 308.15, 687.15, 0.073),   // nitromethane
        ("78-83-1", 301.15, 681.15, 0.014),   // isobutanol
        ("78-92-2", 297.15, 679.15, 0.017),   // 2-butanol
        ("78-93-3", 263.15, 677.15, 0.015),   // 2-butanone
        ("79-20-9", 263.15, 778.15, 0.031),   // methyl acetate
        ("95-47-6", 303.15, 743.15, 0.01),   // o-xylene
        ("98-82-8", 304.15, 697.15, 0.008),   // cumene
        ("100-41-4", 288.15, 704.15, 0.008),   // ethylbenzene
        ("106-42-3", 298.15, 808.15, 0.009),   // p-xylene
        ("107-06-2", 286.15, 711.15, 0.062),   // 1,2-dichloroethane
        ("108-10-1", 289.15, 748.15, 0.012),   // methyl isobutyl ketone
        ("108-20-3", 245.15, 678.15, 0.01),   // diisopropyl ether
        ("108-21-4", 274.15, 698.15, 0.017),   // isopropyl acetate
        ("108-38-3", 298.15, 738.15, 0.01),   // m-xylene
        ("108-87-2", 269.15, 523.15, 0.01),   // methylcyclohexane
        ("108-88-3", 277.15, 803.15, 0.01),   // toluene
        ("108-90-7", 301.15, 866.15, 0.013),   // chlorobenzene
        ("108-94-1", 316.15, 692.15, 0.013),   // cyclohexanone
        ("109-60-4", 283.15, 703.15, 0.017),   // propyl acetate
        ("109-66-0", 233.15, 516.15, 0.011),   // pentane
        ("109-99-9", 259.15, 503.15, 0.015),   // tetrahydrofuran
        ("110-54-3", 251.15, 498.15, 0.01),   // hexane
        ("110-71-4", 267.15, 470.15, 0.016),   // 1,2-dimethoxyethane
        ("110-82-7", 256.15, 517.15, 0.01),   // cyclohexane
        ("110-83-8", 256.15, 517.15, 0.011),   // cyclohexene
        ("110-86-1", 291.15, 755.15, 0.017),   // pyridine
        ("111-65-9", 286.15, 479.15, 0.008),   // octane
        ("121-44-8", 265.15, 488.15, 0.012),   // triethylamine
        ("123-86-4", 295.15, 663.15, 0.012),   // butyl acetate
        ("123-91-1", 284.15, 648.15, 0.014),   // 1,4-dioxane
        ("141-78-6", 269.15, 743.15, 0.02),   // ethyl acetate
        ("142-82-5", 266.15, 477.15, 0.0085),   // heptane
        ("540-84-1", 261.15, 686.15, 0.007),   // isooctane
        ("1634-04-4", 246.15, 658.15, 0.015),   // methyl tert-butyl ether
    ];

    // NFPA 497 (2008): (CAS, flash point [K], autoignition [K], LFL [volume fraction])
    public static readonly IReadOnlyList<(string Cas, double? FlashK, double? AutoignitionK, double? Lfl)> Nfpa =
    [
        ("60-29-7", 228.15, 433.15, 0.019),   // diethyl ether
        ("64-17-5", 286.15, 636.15, 0.033),   // ethanol
        ("64-18-6", 323.15, 707.15, 0.18),   // formic acid
        ("64-19-7", 312.15, 699.15, null),   // acetic acid
        ("67-56-1", 285.15, 658.15, 0.06),   // methanol
        ("67-63-0", 285.15, 672.15, 0.02),   // 2-propanol
        ("67-64-1", 253.15, 738.15, 0.025),   // acetone
        ("68-12-2", 331.15, 728.15, 0.022),   // N,N-dimethylformamide
        ("71-23-8", 288.15, 686.15, 0.022),   // 1-propanol
        ("71-36-3", 309.15, 616.15, 0.014),   // 1-butanol
        ("71-43-2", 262.15, 771.15, 0.012),   // benzene
        ("75-05-8", 279.15, 797.15, 0.03),   // acetonitrile
        ("75-15-0", 243.15, 363.15, 0.013),   // carbon disulfide
        ("75-52-5", 308.15, 691.15, 0.073),   // nitromethane
        ("75-65-0", 283.15, 633.15, 0.024),   // tert-butanol
        ("78-83-1", 233.15, 689.15, 0.012),   // isobutanol
        ("78-92-2", 296.95, 678.15, 0.017),   // 2-butanol
        ("78-93-3", 267.15, 677.15, 0.014),   // 2-butanone
        ("79-20-9", 263.15, 727.15, 0.031),   // methyl acetate
        ("95-50-1", 339.15, 920.15, 0.022),   // 1,2-dichlorobenzene
        ("98-82-8", 309.15, 697.15, 0.009),   // cumene
        ("100-41-4", 288.15, 705.15, 0.008),   // ethylbenzene
        ("107-06-2", 286.15, 686.15, 0.062),   // 1,2-dichloroethane
        ("108-20-3", 245.15, 716.15, 0.014),   // diisopropyl ether
        ("108-21-4", null, 733.15, 0.018),   // isopropyl acetate
        ("108-87-2", 269.15, 523.15, 0.012),   // methylcyclohexane
        ("108-88-3", 277.15, 753.15, 0.011),   // toluene
        ("108-90-7", 302.15, 866.15, 0.013),   // chlorobenzene
        ("108-94-1", 317.15, 693.15, 0.011),   // cyclohexanone
        ("109-60-4", 287.15, 723.15, 0.017),   // propyl acetate
        ("109-66-0", 233.15, 516.15, 0.015),   // pentane
        ("109-99-9", 259.15, 594.15, 0.02),   // tetrahydrofuran
        ("110-54-3", 250.15, 498.15, 0.011),   // hexane
        ("110-82-7", 256.15, 518.15, 0.013),   // cyclohexane
        ("110-83-8", 267.15, 517.15, 0.012),   // cyclohexene
        ("110-86-1", 293.15, 755.15, 0.018),   // pyridine
        ("111-65-9", 286.15, 479.15, 0.01),   // octane
        ("121-44-8", 264.15, 522.15, 0.012),   // triethylamine
        ("123-86-4", 295.15, 694.15, 0.017),   // butyl acetate
        ("123-91-1", 285.15, 453.15, 0.02),   // 1,4-dioxane
        ("141-78-6", 269.15, 700.15, 0.02),   // ethyl acetate
        ("142-82-5", 269.15, 477.15, 0.01),   // heptane
        ("1634-04-4", 193.15, 708.15, 0.016),   // methyl tert-butyl ether
    ];

    [Theory]
    [InlineData("diethyl ether")]   // NFPA 228.15 K, IEC 228.15 K
    [InlineData("pentane")]         // NFPA 233.15 K, IEC 233.15 K
    [InlineData("acetone")]         // NFPA 253.15 K, IEC 253.15 K
    public void The_flash_point_is_below_0_C_in_the_library_and_in_both_standards(string name)
    {
        var s = ShippedLibrary.Instance.Find(name);
        Assert.True(s.FlashPointK < 273.15, $"library {s.FlashPointK} K");
        Assert.True(Nfpa.Single(r => r.Cas == s.Cas).FlashK < 273.15);
        Assert.True(Iec.Single(r => r.Cas == s.Cas).FlashK < 273.15);
    }

    public static TheoryData<string> SolventsWithAStandardFlashPoint()
    {
        var data = new TheoryData<string>();
        foreach (var s in ShippedLibrary.Instance.Solvents)
            if (s.FlashPointK is double && s.Sources.TryGetValue("flash_point_k", out var src) && src is "nfpa-497" or "iec-60079-20-1")
                data.Add(s.Name);
        return data;
    }

    /// <summary>
    /// At the flash point the vapour over the liquid is roughly at the lower flammable limit
    /// (common practice): Psat(Tflash)/P_atm ≈ LFL. Closed-cup flash points sit somewhat above the
    /// LFL temperature and LFLs come from other apparatus, so a factor of 3 below to 8 above is
    /// allowed; a flash point typed into the wrong row or in the wrong unit misses by far more.
    /// The LFL is taken from the same standard as the flash point.
    /// </summary>
    [Theory]
    [MemberData(nameof(SolventsWithAStandardFlashPoint))]
    public void The_flash_point_is_where_the_vapour_reaches_the_lower_flammable_limit(string name)
    {
        var s = ShippedLibrary.Instance.Find(name);
        var table = s.Sources["flash_point_k"] == "nfpa-497" ? Nfpa : Iec;
        double? lfl = table.Single(r => r.Cas == s.Cas).Lfl ?? Iec.SingleOrDefault(r => r.Cas == s.Cas).Lfl;
        Assert.NotNull(lfl);
        double fraction = s.VaporPressure.SaturationPressure(s.FlashPointK!.Value).PressurePa / 101325;
        Assert.InRange(fraction / lfl!.Value, 1.0 / 3, 8);
    }
}
