using DistillPlan.Core;
using DistillPlan.Core.Library;

namespace DistillPlan.Core.Tests.Library;

/// <summary>A broken library file must name its file, line and field, never crash.</summary>
public class LoaderErrorTests
{
    // A valid one-solvent file; the numbers are Poling 2001 / CRC values for ethyl acetate.
    // Other loader tests start from it.
    internal const string Valid = """
        format: distillplan-solvents/1
        sources:
          poling-2001: Poling, Prausnitz, O'Connell, The Properties of Gases and Liquids, 5th ed., 2001
          crc-organic: CRC Handbook, Physical Constants of Organic Compounds
        solvents:
          - name: ethyl acetate
            aliases: [EtOAc]
            cas: 141-78-6
            molar_mass_g_per_mol: {value: 88.106, source: crc-organic}
            normal_boiling_point_k: {value: 350.25, source: crc-organic}
            vapor_pressure:
              - {form: antoine-log10, a: 9.13361, b: 1195.13, c: -60.68, p_unit: Pa, t_unit: K, t_min_k: 265.5, t_max_k: 372.51, source: poling-2001}
        """;

    [Fact]
    public void A_valid_file_loads_and_answers_by_alias_and_CAS()
    {
        var file = SolventYamlLoader.Parse(Valid, "test.yaml");
        Assert.Single(file.Solvents);
        Assert.Equal(350.25, file.Solvents[0].NormalBoilingPointK);
    }

    public static TheoryData<string, string, int, string> Broken => new()
    {
        { Valid.Replace("a: 9.13361", "a: abc"), "vapor_pressure[0].a", 12, "expected a number" },
        { Valid.Replace("cas: 141-78-6", "cas: 141-78-7"), "cas", 8, "check digit" },
        { Valid.Replace("source: poling-2001}", "source: nowhere}"), "vapor_pressure[0].source", 12, "not defined" },
        { Valid.Replace("aliases: [EtOAc]", "alias: [EtOAc]"), "solvents[0].alias", 7, "unknown field" },
        { Valid.Replace("    normal_boiling_point_k: {value: 350.25, source: crc-organic}\n", ""), "solvents[0]", 6, "normal_boiling_point_k" },
        { Valid.Replace("t_max_k: 372.51", "t_max_k: 200"), "t_max_k", 12, "must be above" },
        { Valid.Replace("b: 1195.13", "b: -1195.13"), "form", 12, "rising" },
        { Valid.Replace("format: distillplan-solvents/1", "format: other/2"), "format", 1, "expected" },
        { Valid + "\n   - : [", "yaml", 13, "not valid YAML" },
    };

    [Theory]
    [MemberData(nameof(Broken))]
    public void A_broken_file_names_file_line_and_field(string text, string field, int line, string problem)
    {
        var e = Assert.Throws<LibraryFormatException>(() => SolventYamlLoader.Parse(text, "test.yaml"));
        Assert.Equal("test.yaml", e.File);
        Assert.Contains(field, e.Field);
        Assert.Equal(line, e.Line);
        Assert.Contains(problem, e.Message);
    }

    [Theory]
    [InlineData("7732-18-5", true)]   // water (CAS)
    [InlineData("141-78-6", true)]    // ethyl acetate (CAS)
    [InlineData("67-68-5", true)]     // DMSO (CAS)
    [InlineData("67-68-6", false)]
    [InlineData("abc", false)]
    public void CAS_check_digits_are_verified(string cas, bool valid) => Assert.Equal(valid, CasNumber.IsValid(cas));
}
