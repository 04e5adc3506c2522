using System.Text.RegularExpressions;
using DistillPlan.Core.Library;

namespace DistillPlan.Core.Tests.Reference;

/// <summary>Integrity of the shipped solvents.yaml: size, sources, ranges, names, molar masses, UNIFAC groups.</summary>
public class LibraryIntegrityTests
{
    private static SolventLibrary Library => ShippedLibrary.Instance;

    [Fact]
    public void The_library_holds_at_least_sixty_solvents()
    {
        Assert.True(Library.Solvents.Count >= 60, $"{Library.Solvents.Count} solvents");
    }

    [Fact]
    public void Every_curve_names_a_cited_source_and_has_a_range_with_Tmin_below_Tmax()
    {
        foreach (var s in Library.Solvents)
            foreach (var c in s.VaporPressure.Curves)
            {
                Assert.True(Library.Citations.ContainsKey(c.Source), $"{s.Name}: source '{c.Source}' is not cited");
                Assert.True(c.TMinK < c.TMaxK, $"{s.Name} {c.Source}: {c.TMinK}..{c.TMaxK}");
            }
    }

    [Fact]
    public void Every_field_source_is_cited()
    {
        foreach (var s in Library.Solvents)
        {
            Assert.Contains("molar_mass_g_per_mol", s.Sources.Keys);
            Assert.Contains("normal_boiling_point_k", s.Sources.Keys);
            foreach (var (field, key) in s.Sources)
                Assert.True(Library.Citations.ContainsKey(key), $"{s.Name}.{field}: '{key}'");
        }
    }

    [Theory]
    [InlineData("EtOAc", "ethyl acetate")]
    [InlineData("AcOEt", "ethyl acetate")]
    [InlineData("141-78-6", "ethyl acetate")]
    [InlineData("THF", "tetrahydrofuran")]
    [InlineData("2-MeTHF", "2-methyltetrahydrofuran")]
    [InlineData("DCM", "dichloromethane")]
    [InlineData("methylene chloride", "dichloromethane")]
    [InlineData("IPA", "2-propanol")]
    [InlineData("isopropanol", "2-propanol")]
    [InlineData("MeCN", "acetonitrile")]
    [InlineData("DMF", "N,N-dimethylformamide")]
    [InlineData("DMAc", "N,N-dimethylacetamide")]
    [InlineData("DMSO", "dimethyl sulfoxide")]
    [InlineData("NMP", "N-methyl-2-pyrrolidone")]
    [InlineData("MTBE", "methyl tert-butyl ether")]
    [InlineData("MEK", "2-butanone")]
    [InlineData("MIBK", "methyl isobutyl ketone")]
    [InlineData("DIPE", "diisopropyl ether")]
    [InlineData("DME", "1,2-dimethoxyethane")]
    [InlineData("glyme", "1,2-dimethoxyethane")]
    [InlineData("TEA", "triethylamine")]
    [InlineData("Et3N", "triethylamine")]
    [InlineData("PhMe", "toluene")]
    [InlineData("PhCl", "chlorobenzene")]
    [InlineData("ODCB", "1,2-dichlorobenzene")]
    [InlineData("TFT", "trifluorotoluene")]
    [InlineData("HOAc", "acetic acid")]
    [InlineData("AcOH", "acetic acid")]
    [InlineData("MeOH", "methanol")]
    [InlineData("EtOH", "ethanol")]
    [InlineData("n-BuOH", "1-butanol")]
    [InlineData("t-BuOH", "tert-butanol")]
    [InlineData("IPAc", "isopropyl acetate")]
    [InlineData("nBuOAc", "butyl acetate")]
    [InlineData("iso-octane", "isooctane")]
    [InlineData("iso octane", "isooctane")]
    [InlineData("CS2", "carbon disulfide")]
    [InlineData("CCl4", "carbon tetrachloride")]
    [InlineData("chloroform", "chloroform")]
    [InlineData("CHCl3", "chloroform")]
    [InlineData("1,2-DCE", "1,2-dichloroethane")]
    [InlineData("EG", "ethylene glycol")]
    [InlineData("PGME", "1-methoxy-2-propanol")]
    [InlineData("DMC", "dimethyl carbonate")]
    [InlineData("cumene", "cumene")]
    [InlineData("Ethyl_Acetate", "ethyl acetate")]
    [InlineData("7732-18-5", "water")]
    public void A_name_chemists_type_finds_the_solvent(string typed, string expectedName)
    {
        Assert.Equal(expectedName, Library.Find(typed).Name);
    }

    [Fact]
    public void Names_aliases_and_CAS_numbers_are_unique_after_normalisation()
    {
        var keys = Library.Solvents.SelectMany(s => new[] { s.Name, s.Cas }.Concat(s.Aliases).Select(SolventLibrary.Normalise).Distinct().Select(k => (k, s.Name)));
        var clashes = keys.GroupBy(p => p.k).Where(g => g.Select(p => p.Name).Distinct().Count() > 1).Select(g => g.Key).ToList();
        Assert.Empty(clashes);
    }

    // IUPAC standard atomic weights (2013), conventional values for elements given as intervals.
    private static readonly Dictionary<string, double> AtomicWeight = new()
    {
        ["H"] = 1.008, ["C"] = 12.011, ["N"] = 14.007, ["O"] = 15.999, ["F"] = 18.998403163, ["S"] = 32.06, ["Cl"] = 35.45,
    };

    private static Dictionary<string, int> Atoms(string formula)
    {
        var d = new Dictionary<string, int>();
        foreach (Match m in Regex.Matches(formula, "([A-Z][a-z]?)([0-9]*)"))
        {
            string el = m.Groups[1].Value;
            int n = m.Groups[2].Value.Length == 0 ? 1 : int.Parse(m.Groups[2].Value);
            d[el] = d.GetValueOrDefault(el) + n;
        }
        return d;
    }

    [Fact]
    public void The_molar_mass_follows_from_the_formula_and_IUPAC_atomic_weights()
    {
        foreach (var s in Library.Solvents)
        {
            Assert.False(string.IsNullOrEmpty(s.Formula), s.Name);
            double m = Atoms(s.Formula!).Sum(a => AtomicWeight[a.Key] * a.Value);
            Assert.True(Math.Abs(m - s.MolarMassGPerMol) < 0.001, $"{s.Name}: {s.MolarMassGPerMol} vs {m:F3} from {s.Formula}");
        }
    }

    // Atoms in each UNIFAC (original) subgroup used by the library, from the subgroup
    // definitions of Hansen, Rasmussen, Fredenslund, Schiller, Gmehling, Ind. Eng. Chem. Res. 30 (1991) 2352.
    private static readonly Dictionary<int, string> SubgroupAtoms = new()
    {
        [1] = "CH3", [2] = "CH2", [3] = "CH", [4] = "C", [6] = "C2H2", [9] = "CH", [10] = "C", [11] = "C2H3", [12] = "C2H2",
        [13] = "C2H", [14] = "OH", [15] = "CH4O", [16] = "H2O", [18] = "C2H3O", [19] = "C2H2O", [21] = "C2H3O2",
        [24] = "CH3O", [25] = "CH2O", [26] = "CHO", [27] = "CH2O", [35] = "CH2N", [37] = "C5H5N", [40] = "C2H3N",
        [42] = "CHO2", [43] = "CH2O2", [44] = "CH2Cl", [47] = "CH2Cl2", [50] = "CHCl3", [52] = "CCl4", [53] = "CCl",
        [54] = "CH3NO2", [58] = "CS2", [62] = "C2H6O2", [67] = "C2H6OS", [72] = "C3H7NO", [74] = "CF3", [77] = "CO2",
        [85] = "C5H9NO", [97] = "C3H6NO", [101] = "C2H4O2", [118] = "C2H4O2S",
    };

    [Fact]
    public void The_UNIFAC_groups_of_each_solvent_add_up_to_its_formula()
    {
        foreach (var s in Library.Solvents)
        {
            Assert.True(s.UnifacGroups is { Count: > 0 }, $"{s.Name} has no UNIFAC groups");
            var sum = new Dictionary<string, int>();
            foreach (var (id, count) in s.UnifacGroups!)
            {
                Assert.True(SubgroupAtoms.ContainsKey(id), $"{s.Name}: subgroup {id} not in the check table");
                foreach (var (el, n) in Atoms(SubgroupAtoms[id])) sum[el] = sum.GetValueOrDefault(el) + n * count;
            }
            var expected = Atoms(s.Formula!);
            Assert.True(expected.Count == sum.Count && expected.All(e => sum.GetValueOrDefault(e.Key) == e.Value),
                $"{s.Name}: groups give {string.Join("", sum.Select(e => e.Key + e.Value))}, formula {s.Formula}");
        }
    }

    [Theory]
    [InlineData("diisopropyl ether", PeroxideClass.Severe)]          // Kelly 1996
    [InlineData("tetrahydrofuran", PeroxideClass.OnConcentration)]   // Kelly 1996
    [InlineData("2-propanol", PeroxideClass.OnConcentration)]        // Kelly 1996 (secondary alcohol)
    [InlineData("cyclopentyl methyl ether", PeroxideClass.Slow)]     // forms peroxides slowly
    [InlineData("toluene", PeroxideClass.None)]
    public void Peroxide_formers_are_classed_as_Kelly_lists_them(string name, PeroxideClass expected)
    {
        Assert.Equal(expected, Library.Find(name).PeroxideClass);
    }
}
