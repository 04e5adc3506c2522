using DistillPlan.Core;
using DistillPlan.Core.Library;

namespace DistillPlan.Core.Tests.Library;

/// <summary>
/// The liquid heat-capacity and density curves: the worked examples of <see cref="Dippr100"/> and
/// <see cref="Dippr105"/>, and a broken entry named by file, line and field.
/// </summary>
public class LiquidPropertyLoaderTests
{
    // Ethanol: Poling 2001 Antoine and CRC figures; Perry 2-153 Cp and Perry 2-32 density rows.
    private const string Valid = """
        format: distillplan-solvents/1
        sources:
          poling-2001: Poling, Prausnitz, O'Connell, The Properties of Gases and Liquids, 5th ed., 2001
          crc-organic: CRC Handbook, Physical Constants of Organic Compounds
          perry-2-153: Perry's Handbook, 8th ed., Table 2-153
          perry-2-32: Perry's Handbook, 8th ed., Table 2-32
        solvents:
          - name: ethanol
            cas: 64-17-5
            molar_mass_g_per_mol: {value: 46.069, source: crc-organic}
            normal_boiling_point_k: {value: 351.39, source: crc-organic}
            liquid_heat_capacity: {form: dippr100, c1: 102.64, c2: -0.13963, c3: -3.0341E-5, c4: 2.0386E-6, c5: 0, t_min_k: 159.05, t_max_k: 390, source: perry-2-153}
            liquid_density_curve: {form: dippr105, c1: 1628.8, c2: 0.27469, c3: 514, c4: 0.23178, t_min_k: 159.05, t_max_k: 514, source: perry-2-32}
            vapor_pressure:
              - {form: antoine-log10, a: 10.33675, b: 1648.22, c: -42.232, p_unit: Pa, t_unit: K, t_min_k: 276.5, t_max_k: 369.54, source: poling-2001}
        """;

    [Fact]
    public void The_worked_examples_of_the_class_comments_hold()
    {
        var s = SolventYamlLoader.Parse(Valid, "test.yaml").Solvents.Single();
        // Dippr100 comment: ethanol Cp(298.15 K) = 112.34 J/(mol K) (by hand from the Perry row:
        // 102.64 − 41.631 − 2.6971 + 54.0315 = 112.343)
        Assert.Equal(112.34, s.LiquidHeatCapacityJPerMolK(298.15)!.Value, 0.005);
        // Dippr105 comment: ethanol ρ(293.15 K) = 17155 mol/m³, 790.3 kg/m³
        Assert.Equal(17155, s.LiquidDensityCurve!.At(293.15), 0.5);
        Assert.Equal(790.3, s.LiquidDensityKgPerM3At(293.15)!.Value, 0.05);
        Assert.Equal("perry-2-153", s.Sources["liquid_heat_capacity"]);
        Assert.Equal("perry-2-32", s.Sources["liquid_density_curve"]);
    }

    public static TheoryData<string, string, int, string> Broken => new()
    {
        // Perry prints Cp in J/(kmol K): a row copied unscaled is a thousand times too large.
        { Valid.Replace("c1: 102.64, c2: -0.13963, c3: -3.0341E-5, c4: 2.0386E-6", "c1: 102640, c2: -139.63, c3: -3.0341E-2, c4: 2.0386E-3"), "liquid_heat_capacity.c1", 12, "not per kmol" },
        { Valid.Replace("c1: 102.64,", "c1: -102.64,"), "liquid_heat_capacity.c1", 12, "must lie between 0" },
        { Valid.Replace("t_min_k: 159.05, t_max_k: 390", "t_min_k: 390, t_max_k: 159.05"), "liquid_heat_capacity.t_max_k", 12, "must be above" },
        { Valid.Replace("form: dippr100", "form: dippr114"), "liquid_heat_capacity.form", 12, "allowed: dippr100" },
        { Valid.Replace("c5: 0, t_min_k", "c6: 0, t_min_k"), "liquid_heat_capacity.c6", 12, "unknown field" },
        { Valid.Replace("source: perry-2-153}", "source: perry-2-99}"), "liquid_heat_capacity.source", 12, "not defined" },
        // Perry prints the density in mol/dm³: C1 not multiplied by 1000 gives about 0.8 kg/m³.
        { Valid.Replace("c1: 1628.8,", "c1: 1.6288,"), "liquid_density_curve.c1", 13, "not mol/dm3" },
        { Valid.Replace("t_max_k: 514, source: perry-2-32", "t_max_k: 520, source: perry-2-32"), "liquid_density_curve.t_max_k", 13, "above c3" },
        { Valid.Replace("c1: 1628.8, c2: 0.27469", "c1: 20000, c2: 1.01"), "liquid_density_curve.c2", 13, "does not fall" },
        { Valid.Replace("c4: 0.23178", "c4: abc"), "liquid_density_curve.c4", 13, "expected a number" },
    };

    [Theory]
    [MemberData(nameof(Broken))]
    public void A_broken_curve_names_file_line_and_field(string text, string field, int line, string problem)
    {
        Assert.NotEqual(Valid, text);
        var e = Assert.Throws<LibraryFormatException>(() => SolventYamlLoader.Parse(text, "test.yaml"));
        Assert.Equal("test.yaml", e.File);
        Assert.EndsWith(field, e.Field);
        Assert.Equal(line, e.Line);
        Assert.Contains(problem, e.Message);
    }
}
