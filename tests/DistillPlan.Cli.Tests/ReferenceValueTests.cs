using System.Globalization;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// Reference values through the command line, so that they are also checked on the native
/// binary (.ci/run runs this project with DISTILLPLAN_TEST_BINARY set). The library-level tests
/// (tests/DistillPlan.Core.Tests/Reference) hold the tighter per-solvent bounds and their reasons.
/// </summary>
public class ReferenceValueTests
{
    // IAPWS-IF97 Region 4 (IapwsIf97.cs, typed independently of the library).
    [Theory]
    [InlineData(10)]
    [InlineData(25)]
    [InlineData(40)]
    [InlineData(60)]
    [InlineData(80)]
    [InlineData(100)]
    public void Water_vapour_pressure_matches_IAPWS_IF97(double celsius)
    {
        var j = CliRunner.Json("curve", "water", "--temp", celsius.ToString(CultureInfo.InvariantCulture) + "C");
        double expectedMbar = IapwsIf97.SaturationPressurePa(celsius + 273.15) / 100;
        double mbar = j.GetProperty("vapor_pressure_mbar").GetDouble();
        Assert.True(Math.Abs(mbar / expectedMbar - 1) < 5e-4, $"{celsius} °C: {mbar} mbar, IAPWS-IF97 {expectedMbar:F4} mbar");
    }

    // CRC Handbook, "Physical Constants of Organic Compounds" (CrcTables.cs): the temperature at
    // which each solvent's curve reaches 1 atm, within 1.5 K (the largest miss the library
    // tests allow, DMSO and DMF).
    [Fact]
    public void Every_solvent_boils_at_one_atmosphere_near_its_CRC_boiling_point()
    {
        var misses = new List<string>();
        foreach (var (cas, name, tbK, _) in CrcTables.Organic)
        {
            var r = CliRunner.Run("curve", cas, "--at", "1013.25mbar", "--json");
            if (r.ExitCode != 0) { misses.Add($"{name}: exit {r.ExitCode} {r.Error.Trim()}"); continue; }
            double c = System.Text.Json.JsonDocument.Parse(r.Output).RootElement.GetProperty("boiling_temperature_c").GetDouble();
            if (Math.Abs(c + 273.15 - tbK) > 1.5) misses.Add($"{name}: {c:F2} °C, CRC {tbK - 273.15:F2} °C");
        }
        Assert.True(CrcTables.Organic.Count >= 50, $"{CrcTables.Organic.Count} CRC rows");
        Assert.Empty(misses);
    }
}
