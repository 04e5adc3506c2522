namespace DistillPlan.Core.Tests.Reference;

/// <summary>Copying check: the library's melting points are the CRC figures, to 0.01 K.</summary>
public class MeltingPointTests
{
    public static TheoryData<string, string, double> CrcMeltingPoints()
    {
        var data = new TheoryData<string, string, double>();
        foreach (var (cas, name, _, tm) in CrcTables.Organic)
            if (tm is double t) data.Add(cas, name, t);   // CRC, Physical Constants of Organic Compounds
        return data;
    }

    [Theory]
    [MemberData(nameof(CrcMeltingPoints))]
    public void The_library_melting_point_is_the_CRC_value(string cas, string crcName, double crcTmK)
    {
        var solvent = ShippedLibrary.Instance.Find(cas);
        Assert.True(solvent.MeltingPointK.HasValue, $"{crcName} ({cas}) has no melting point in the library");
        Assert.Equal(crcTmK, solvent.MeltingPointK!.Value, 0.01);
    }

    [Fact]
    public void The_library_gives_no_melting_point_where_the_CRC_gives_none()
    {
        // CRC prints no Tm for 2-methyltetrahydrofuran and 1-methoxy-2-propanol; nothing may be invented.
        foreach (var (cas, _, _, tm) in CrcTables.Organic.Where(r => r.TmK is null))
            Assert.Null(ShippedLibrary.Instance.Find(cas).MeltingPointK);
    }
}
