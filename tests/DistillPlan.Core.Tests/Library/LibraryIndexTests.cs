using DistillPlan.Core.Library;

namespace DistillPlan.Core.Tests.Library;

/// <summary>
/// The shipped library is indexed at load and each entry read when first used
/// (SolventLibrary.LoadIndexed). It must answer exactly as the whole-file read does: same
/// entries, same values, and for a broken entry the same message with the same line.
/// </summary>
public class LibraryIndexTests
{
    // Two valid entries: LoaderErrorTests' ethyl acetate and toluene (CRC "Physical Constants of
    // Organic Compounds" molar mass and Tb, Poling 2001 Appendix A Antoine).
    private const string Two = LoaderErrorTests.Valid + """


          # an aromatic
          - name: 'toluene'
            aliases: ["methylbenzene", 'toluol', "phenyl, methyl-"]
            cas: "108-88-3"
            molar_mass_g_per_mol: {value: 92.141, source: crc-organic}
            normal_boiling_point_k: {value: 383.75, source: crc-organic}
            vapor_pressure:
              - {form: antoine-log10, a: 9.07954, b: 1344.8, c: -53.67, p_unit: Pa, t_unit: K, t_min_k: 286, t_max_k: 410, source: poling-2001}
        """;

    private static string Write(string text)
    {
        string path = Path.Combine(Path.GetTempPath(), $"distillplan-index-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void A_lookup_reads_only_the_entry_it_finds()
    {
        string path = Write(Two);
        try
        {
            var library = SolventLibrary.LoadIndexed(path);
            Assert.Equal(0, library.EntriesRead);
            Assert.Equal("toluene", library.Find("phenyl, methyl-").Name);
            Assert.Equal(1, library.EntriesRead);
            Assert.Equal("ethyl acetate", library.Find("etoac").Name);
            Assert.Equal(2, library.EntriesRead);
            Assert.Equal(["ethyl acetate"], library.Suggest("ethyl acetat", 1));
            Assert.Equal(2, library.EntriesRead);
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void A_plan_of_one_shipped_solvent_reads_one_entry()
    {
        var library = SolventLibrary.LoadShipped();
        Assert.Equal(0, library.EntriesRead);   // a file of another layout would have been read whole
        var found = library.Find("ethyl-acetate");
        Assert.Equal(1, library.EntriesRead);
        // A list of all reads the rest (the file whole, at once) and keeps the entry already read.
        var all = library.Solvents;
        Assert.Equal(all.Count, library.EntriesRead);
        Assert.Same(found, all.Single(s => s.Name == "ethyl acetate"));
    }

    [Fact]
    public void The_indexed_shipped_library_holds_what_the_whole_file_read_holds()
    {
        string path = SolventLibrary.FindShipped() ?? throw new InvalidOperationException("no solvents.yaml above the test folder");
        var whole = SolventYamlLoader.Load(path);
        var indexed = SolventLibrary.LoadIndexed(path);
        Assert.Equal(whole.Sources, indexed.Citations);
        Assert.Equal(whole.Solvents.Count, indexed.Solvents.Count);
        foreach (var (a, b) in whole.Solvents.Zip(indexed.Solvents))
        {
            Assert.Equal((a.Name, a.Cas, a.Origin, a.Formula), (b.Name, b.Cas, b.Origin, b.Formula));
            Assert.Equal(a.Aliases, b.Aliases);
            Assert.Equal(a.Sources, b.Sources);
            Assert.Equal((a.MolarMassGPerMol, a.NormalBoilingPointK, a.MeltingPointK, a.CriticalTemperatureK, a.FlashPointK, a.AutoignitionK),
                (b.MolarMassGPerMol, b.NormalBoilingPointK, b.MeltingPointK, b.CriticalTemperatureK, b.FlashPointK, b.AutoignitionK));
            Assert.Equal((a.PeroxideClass, a.Flags), (b.PeroxideClass, b.Flags));
            Assert.Equal(a.UnifacGroups, b.UnifacGroups);
            Assert.Equal(a.VaporPressure.Curves.Count, b.VaporPressure.Curves.Count);
            foreach (double t in new[] { a.VaporPressure.MinK, a.NormalBoilingPointK })
                Assert.Equal(a.VaporPressure.SaturationPressure(t).PressurePa, b.VaporPressure.SaturationPressure(t).PressurePa);
        }
    }

    // The broken files of LoaderErrorTests, and more: the indexed read says the same as the whole read.
    public static TheoryData<string> Broken => new()
    {
        Two.Replace("a: 9.07954", "a: abc"),
        Two.Replace("aliases: [EtOAc]", "aliases: [EtOAc, \"toluol\"]"),
        Two.Replace("cas: \"108-88-3\"", "cas: \"108-88-4\""),
        Two.Replace("source: poling-2001}\n\n", "source: nowhere}\n\n"),
        Two.Replace("aliases: [EtOAc]", "alias: [EtOAc]"),
        Two.Replace("    normal_boiling_point_k: {value: 383.75, source: crc-organic}\n", ""),
        Two.Replace("t_max_k: 410", "t_max_k: 200"),
        Two.Replace("format: distillplan-solvents/1", "format: other/2"),
        Two.Replace("  - name: 'toluene'", "  - name: ethyl acetate"),
        Two.Replace("cas: \"108-88-3\"", "cas: 141-78-6"),
        Two.Replace("aliases: [EtOAc]", "aliases: [EtOAc, toluene]"),
        Two.Replace("sources:", "colours: []\nsources:"),
        Two + "\nother: 1\n",
        Two + "\n   - : [",
        Two.Replace("  - name: 'toluene'", "  - name: \"toluene"),
        Two.Replace("name: 'toluene'", "name:"),
        Two.Replace("    cas: \"108-88-3\"", "\tcas: 108-88-3"),
    };

    [Theory]
    [MemberData(nameof(Broken))]
    public void A_broken_entry_is_reported_as_the_whole_read_reports_it(string text)
    {
        string path = Write(text);
        try
        {
            var whole = Assert.Throws<LibraryFormatException>(() => SolventYamlLoader.Load(path));
            var indexed = Assert.Throws<LibraryFormatException>(() => SolventLibrary.LoadIndexed(path).Solvents);
            Assert.Equal(whole.Message, indexed.Message);
            Assert.Equal((whole.Line, whole.Field), (indexed.Line, indexed.Field));
        }
        finally { File.Delete(path); }
    }

    [Fact]
    public void A_broken_entry_does_not_stop_lookups_of_the_others_and_is_said_when_used()
    {
        string path = Write(Two.Replace("a: 9.07954", "a: abc"));
        try
        {
            var library = SolventLibrary.LoadIndexed(path);
            Assert.Equal(350.25, library.Find("EtOAc").NormalBoilingPointK);
            Assert.Equal(1, library.EntriesRead);
            var e = Assert.Throws<LibraryFormatException>(() => library.Find("toluene"));
            Assert.Equal(21, e.Line);   // the toluene curve's line
            Assert.Contains("expected a number", e.Message);
        }
        finally { File.Delete(path); }
    }
    // Layouts the index does not read itself (it then reads the file whole) and one it does.
    public static TheoryData<string> OtherLayouts => new()
    {
        Two.Replace("aliases: [EtOAc]", "aliases:\n      - EtOAc"),
        Two.Replace("  - name: ethyl acetate", "  -\n    name: ethyl acetate"),
        Two[..Two.IndexOf("solvents:")] + Two[Two.IndexOf("solvents:")..].Replace("\n  ", "\n"),
        Two.Replace("name: ethyl acetate", "name: ethyl acetate  # EtOAc"),
        Two.Replace("name: ethyl acetate", "name: >-\n      ethyl\n      acetate"),
    };

    [Theory]
    [MemberData(nameof(OtherLayouts))]
    public void Other_layouts_give_the_same_entries(string text)
    {
        string path = Write(text);
        try
        {
            var whole = SolventYamlLoader.Load(path).Solvents;
            var indexed = SolventLibrary.LoadIndexed(path);
            Assert.Equal(whole.Select(x => (x.Name, x.Cas, string.Join('|', x.Aliases), x.Origin, x.NormalBoilingPointK)),
                indexed.Solvents.Select(x => (x.Name, x.Cas, string.Join('|', x.Aliases), x.Origin, x.NormalBoilingPointK)));
            Assert.Equal("ethyl acetate", indexed.Find("EtOAc").Name);
        }
        finally { File.Delete(path); }
    }
}
