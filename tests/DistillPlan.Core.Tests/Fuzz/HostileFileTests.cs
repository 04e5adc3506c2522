using System.Runtime.InteropServices;
using System.Text;
using CsCheck;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Fuzz;

/// <summary>
/// Hostile library, plan and equipment files (issues 13 and 14), generated here rather than
/// checked in: each is refused with one line naming file, line and field, never a crash, a
/// hang or an out-of-memory. Then random mutations of valid files, which must load or be refused cleanly.
/// </summary>
public sealed class HostileFileTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("distillplan-hostile-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    // A valid one-solvent file (ethyl acetate: CRC molar mass and boiling point, Poling 2001 Antoine).
    private const string Valid = Library.LoaderErrorTests.Valid;

    // Its one entry, to add a second one.
    private static readonly string Entry = Valid[Valid.IndexOf("  - name: ethyl acetate", StringComparison.Ordinal)..];


    private static string AliasBomb(int levels, int width)
    {
        var o = new StringBuilder("format: distillplan-solvents/1\n");
        o.Append("a0: &a0 [").Append(string.Join(", ", Enumerable.Repeat("x", width))).Append("]\n");
        for (int i = 1; i < levels; i++)
            o.Append($"a{i}: &a{i} [").Append(string.Join(", ", Enumerable.Repeat($"*a{i - 1}", width))).Append("]\n");
        // Used as a mapping key, where hashing the key would walk every expanded node.
        return o.Append($"? *a{levels - 1}\n: 1\n").ToString();
    }

    /// <summary>Library texts and the line and words the refusal must carry.</summary>
    public static TheoryData<string, string, int, string> BrokenLibraries => new()
    {
        { "key that is a list", Valid.Replace("    cas: 141-78-6", "    cas: 141-78-6\n    [a, b]: 3"), 9, "not a list" },
        { "key that is a mapping", Valid.Replace("    cas: 141-78-6", "    cas: 141-78-6\n    {a: 1}: 3"), 9, "not a mapping" },
        { "100,000 nested brackets", "format: distillplan-solvents/1\nsolvents: " + new string('[', 100_000) + new string(']', 100_000) + "\n", 2, "nested deeper" },
        { "100,000 nested mappings", "format: distillplan-solvents/1\nsolvents: " + string.Concat(Enumerable.Repeat("{a: ", 100_000)) + "1" + new string('}', 100_000) + "\n", 2, "nested deeper" },
        { "alias bomb 9x9 as a key", AliasBomb(9, 9), 0, "alias" },
        { "alias bomb 10x10 as a key", AliasBomb(10, 10), 0, "alias" },
        { "duplicate key", Valid.Replace("    cas: 141-78-6", "    cas: 141-78-6\n    cas: 141-78-6"), 9, "Duplicate key" },
        { "two entries with one name", Valid + "\n" + Entry.Replace("cas: 141-78-6", "cas: 64-17-5").Replace("aliases: [EtOAc]", "aliases: [x1]"), 13, "already" },
        { "two entries with one CAS", Valid + "\n" + Entry.Replace("name: ethyl acetate", "name: other").Replace("aliases: [EtOAc]", "aliases: [x1]"), 15, "already" },
        { "tab on line 78", Valid + "\n" + string.Concat(Enumerable.Repeat("# padding\n", 77 - Valid.Split('\n').Length)) + "\tbad: 1\n", 78, "tab" },
        { "undefined alias", Valid.Replace("a: 9.13361", "a: *nowhere"), 12, "nowhere" },
        { "root is a list", "- 1\n- 2\n", 1, "(top level)" },
        { "root is text", "hello\n", 1, "(top level)" },
        { "format missing", "sources: {}\nsolvents: []\n", 1, "format" },
        { "UNIFAC count 1e12", Valid.Replace("    vapor_pressure:", "    unifac: {groups: {\"1\": 1e12}, source: crc-organic}\n    vapor_pressure:"), 11, "whole number from 1 to" },
        { "at_k -5", Valid.Replace("    vapor_pressure:", "    liquid_density_kg_per_m3: {value: 900, at_k: -5, source: crc-organic}\n    vapor_pressure:"), 11, "at_k" },
        { "Antoine pole inside its range", Valid.Replace("c: -60.68", "c: -300"), 12, "pole" },
        { "range far past the entry's Tc", Valid.Replace("    vapor_pressure:", "    critical: {tc_k: 352, source: crc-organic}\n    vapor_pressure:"), 13, "critical temperature" },
        { "Wagner range past its own Tc", Valid.Replace("- {form: antoine-log10, a: 9.13361, b: 1195.13, c: -60.68, p_unit: Pa, t_unit: K,",
            "- {form: wagner-3-6, a: -7.68521, b: 1.36511, c: -4.0898, d: -1.75342, tc_k: 523.2, pc_pa: 3830100,").Replace("t_max_k: 372.51", "t_max_k: 600"), 12, "own critical temperature" },
        { "number that overflows", Valid.Replace("a: 9.13361", "a: 1e400"), 12, "expected a number" },
        { "100 kB value", Valid.Replace("formula", "x").Replace("    cas: 141-78-6", "    cas: " + new string('7', 100_000)), 8, "characters" },
        { "value with line breaks", Valid.Replace("cas: 141-78-6", "cas: \"141\\n78\\n6\""), 8, "CAS" },
        { "empty key", Valid.Replace("    cas: 141-78-6", "    cas: 141-78-6\n    \"\": 1"), 9, "(empty key)" },
    };

    [Theory]
    [MemberData(nameof(BrokenLibraries))]
    public void A_hostile_library_is_refused_with_file_line_and_field(string what, string text, int line, string words)
    {
        var e = Assert.Throws<LibraryFormatException>(() => SolventYamlLoader.Parse(text, "user.yaml"));
        Clean.AssertOneLineNamingAField(e.Message, what);
        Assert.StartsWith("user.yaml:", e.Message);
        if (line > 0) Assert.Equal(line, e.Line);
        Assert.Contains(words, e.Message);
        Assert.NotEqual("", e.Field);
    }

    [DllImport("libc", EntryPoint = "mkfifo")]
    private static extern int MakeFifo(string path, uint mode);

    /// <summary>Paths no reader may open: a FIFO with no writer (opening it would block for ever), devices, links to them, a folder, a huge file.</summary>
    private IEnumerable<string> SpecialPaths()
    {
        string fifo = Path.Combine(_dir, "fifo.yaml");
        Assert.Equal(0, MakeFifo(fifo, 0x1B6));
        yield return fifo;
        yield return "/dev/zero";
        yield return "/dev/urandom";
        foreach (string target in new[] { "/dev/zero", "/dev/urandom", fifo })
        {
            string link = Path.Combine(_dir, $"link-{Path.GetFileName(target)}.yaml");
            File.CreateSymbolicLink(link, target);
            yield return link;
        }
        string big = Path.Combine(_dir, "big.yaml");
        using (var f = File.Create(big)) f.SetLength(SolventYamlLoader.MaxFileBytes + 1);
        yield return big;
        yield return _dir;
        yield return Path.Combine(_dir, "missing.yaml");
    }

    [Fact]
    public void Special_files_are_refused_at_once_by_every_reader()
    {
        if (!OperatingSystem.IsLinux()) return;   // FIFOs and /dev as on Linux
        foreach (string path in SpecialPaths().ToList())
        {
            var library = Assert.Throws<LibraryFormatException>(() => SolventYamlLoader.Load(path));
            Clean.AssertOneLineNamingAField(library.Message, path);
            Assert.Equal("file", library.Field);
            var plan = Assert.Throws<PlanFileException>(() => PlanFileReader.Load(path));
            Clean.AssertOneLineNamingAField(plan.Message, path);
            Assert.ThrowsAny<DistillPlanException>(() => EquipmentFile.Load(path));
            var csv = Assert.Throws<InputException>(() => DistillPlan.Core.Fitting.MeasuredPoints.ReadCsv(path, "--data",
                DistillPlan.Core.Quantities.Pressure.FromPascal(PhysicalConstants.StandardAtmospherePa)));
            Clean.AssertOneLineNamingAField(csv.Message, path);
        }
    }

    [Fact]
    public void A_user_entry_that_reuses_a_shipped_name_under_another_CAS_blames_the_user_file()
    {
        // The entry takes water's CAS (so it replaces water, as documented) but calls itself ethanol, a shipped name.
        string user = Path.Combine(_dir, "mine.yaml");
        File.WriteAllText(user, Valid.Replace("name: ethyl acetate", "name: ethanol").Replace("cas: 141-78-6", "cas: 7732-18-5"));
        var e = Assert.Throws<LibraryFormatException>(() => SolventLibrary.LoadWithUser(user));
        Assert.Equal(user, e.File);
        Assert.Equal(6, e.Line);
    }

    [Fact]
    public void A_save_removes_what_killed_saves_left_and_nothing_else()
    {
        string path = Path.Combine(_dir, "plan.yaml");
        string stale = Path.Combine(_dir, $".plan.yaml.{Guid.NewGuid():N}.tmp");
        string fresh = Path.Combine(_dir, $".plan.yaml.{Guid.NewGuid():N}.tmp");
        string users = Path.Combine(_dir, ".plan.yaml.notes.tmp");
        string other = Path.Combine(_dir, $".other.yaml.{Guid.NewGuid():N}.tmp");
        foreach (string f in new[] { stale, fresh, users, other }) File.WriteAllText(f, "left over");
        foreach (string f in new[] { stale, users, other }) File.SetLastWriteTimeUtc(f, DateTime.UtcNow - SafeFile.StaleAfter - TimeSpan.FromHours(1));

        Assert.Equal(SaveOutcome.Saved, PlanFileWriter.Save(path, new PlanDocument { Charge = "ethanol" }, _ => true));

        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(fresh));    // perhaps a save in progress in another process
        Assert.True(File.Exists(users));    // not our pattern
        Assert.True(File.Exists(other));    // another file's
        Assert.Equal("ethanol", PlanFileReader.Load(path).Charge);
    }

    [Fact]
    public void Plan_files_refuse_an_unknown_pressure_unit_and_an_unknown_display_key()
    {
        const string plan = "format: distillplan-plan/1\ncharge:\n  solvents: ethanol\ndisplay:\n  pressure-unit: furlongs\n";
        var e = Assert.Throws<PlanFileException>(() => PlanFileReader.Parse(plan, "p.yaml"));
        Assert.Equal(5, e.Line);
        Assert.Contains("pressure-unit", e.Message);
        var d = Assert.Throws<PlanFileException>(() => PlanFileReader.Parse(plan.Replace("pressure-unit", "display_unit"), "p.yaml"));
        Assert.Contains("display_unit", d.Message);
        var k = Assert.Throws<PlanFileException>(() => PlanFileReader.Parse(plan.Replace("  solvents: ethanol", "  [solvents]: ethanol"), "p.yaml"));
        Assert.Contains("not a list", k.Message);
    }

    // Mutations a fuzzer makes: cut a span, repeat a line, insert YAML punctuation, swap a number for an edge value.
    private static readonly Gen<Func<string, string>> Mutation = Gen.OneOf(
        Gen.Select(Gen.Double[0, 1], Gen.Int[1, 40], (at, n) => (Func<string, string>)(s =>
        {
            int i = (int)(at * s.Length);
            return s.Remove(i, Math.Min(n, s.Length - i));
        })),
        Gen.Select(Gen.Double[0, 1], Gen.String[Gen.Char["[]{}:&*!|>-,#'\"\t\n ?%@`"], 1, 4], (at, ins) => (Func<string, string>)(s => s.Insert((int)(at * s.Length), ins))),
        Gen.Double[0, 1].Select(at => (Func<string, string>)(s =>
        {
            var lines = s.Split('\n').ToList();
            int i = (int)(at * (lines.Count - 1));
            lines.Insert(i, lines[i]);
            return string.Join('\n', lines);
        })),
        Gen.Select(Gen.Double[0, 1], Gen.OneOf(new[] { "1e400", "-5", "0", "1e12", "NaN", ".inf", "-.inf", "~", "[]", "{}", "*x", "&x" }.Select(Gen.Const).ToArray()),
            (at, v) => (Func<string, string>)(s =>
            {
                var numbers = System.Text.RegularExpressions.Regex.Matches(s, @"-?\d+(\.\d+)?").ToList();
                if (numbers.Count == 0) return s;
                var m = numbers[(int)(at * (numbers.Count - 1))];
                return s.Remove(m.Index, m.Length).Insert(m.Index, v);
            })));

    [Fact]
    public void A_mutated_library_loads_or_is_refused_with_one_line()
    {
        Mutation.Array[1, 4].Sample(mutations =>
        {
            string text = mutations.Aggregate(Valid, (s, m) => m(s));
            if (Clean.Run(text, () => SolventYamlLoader.Parse(text, "user.yaml")) is false) return;
            // What loads must answer: a finite vapour pressure at the middle of each range.
            foreach (var s in SolventYamlLoader.Parse(text, "user.yaml").Solvents)
                foreach (var c in s.VaporPressure.Curves)
                    Assert.True(double.IsFinite(c.PressurePa((c.TMinK + c.TMaxK) / 2)), text);
        }, iter: 3000, threads: 1);
    }

    [Fact]
    public void A_mutated_plan_file_reads_or_is_refused_with_one_line()
    {
        string valid = File.ReadAllText(Path.Combine(RepoRoot(), "examples", "aqueous-ethanol-extract.yaml"));
        Mutation.Array[1, 4].Sample(mutations =>
        {
            string text = mutations.Aggregate(valid, (s, m) => m(s));
            Clean.Run(text, () => PlanFileReader.Parse(text, "plan.yaml").Build(Reference.ShippedLibrary.Instance));
        }, iter: 2000, threads: 1);
    }

    [Fact]
    public void A_mutated_equipment_file_reads_or_is_refused_with_one_line()
    {
        // Demo data: an invented unit (equipment files hold the user's own glassware).
        const string valid = "format: distillplan-equipment/1\nunits:\n  - name: rotavap-2\n    description: demo unit\n    heating: water-bath\n    bath-max: \"90\"\n    pump-limit: 5mbar\n";
        Mutation.Array[1, 4].Sample(mutations =>
        {
            string text = mutations.Aggregate(valid, (s, m) => m(s));
            Clean.Run(text, () => EquipmentFile.Parse(text, "equipment.yaml"));
        }, iter: 2000, threads: 1);
    }

    private static string RepoRoot()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
            if (Directory.Exists(Path.Combine(d.FullName, "examples")) && File.Exists(Path.Combine(d.FullName, "solvents.yaml"))) return d.FullName;
        throw new DirectoryNotFoundException("the repository root (with examples/) above the test binaries");
    }
}
