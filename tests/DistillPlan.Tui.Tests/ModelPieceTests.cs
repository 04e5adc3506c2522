using DistillPlan.Core.PlanFiles;
using DistillPlan.Reports;
using DistillPlan.Tui.Model;

namespace DistillPlan.Tui.Tests;

/// <summary>The plain-C# pieces behind issue 11: the mixture builder, the readout layout, export, recent files, a broken user library.</summary>
public sealed class ModelPieceTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("dp-tui-model-").FullName;
    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Theory]
    // charge before, solvent added, charge after, cursor after "=" (or at the end of an item that has an amount)
    [InlineData("", "water", "water=", 6)]
    [InlineData("ethyl-acetate", "heptane", "ethyl-acetate,heptane=", 22)]
    [InlineData("ethyl-acetate", "ethyl-acetate", "ethyl-acetate=", 14)]
    [InlineData("EtOAc=30,heptane=70", "ethyl acetate", "EtOAc=30,heptane=70", 8)]
    [InlineData("ethanol=30, ", "water", "ethanol=30,water=", 17)]
    public void The_mixture_builder_adds_name_equals_once_with_the_cursor_after_the_equals(string charge, string solvent, string expected, int cursor)
    {
        var (text, at) = ChargeText.Add(charge, TestLibrary.Library.Find(solvent), TestLibrary.Library);
        Assert.Equal(expected, text);
        Assert.Equal(cursor, at);
    }

    [Fact]
    public void Typing_an_amount_after_adding_to_an_empty_charge_gives_name_equals_amount()
    {
        var vm = new PlannerViewModel(TestLibrary.Library);
        vm.Edit(d => d with { Charge = "" });
        int at = vm.AddSolvent(TestLibrary.Library.Find("water"));
        vm.Edit(d => d with { Charge = d.Charge.Insert(at, "30") });
        Assert.Equal("water=30", vm.Document.Charge);
    }

    [Theory]
    [InlineData(78)]
    [InlineData(66)]
    public void The_setpoint_line_keeps_every_value_when_no_vacuum_is_needed(int width)
    {
        // Diethyl ether boils at 34.6 °C (CRC), below the default 40 °C vapour temperature: no vacuum is needed.
        var vm = new PlannerViewModel(TestLibrary.Library);
        vm.Edit(d => d with { Charge = "diethyl-ether" });
        var p = vm.Outcome.Plan!;
        Assert.True(p.AtAtmosphericPressure);
        string line = vm.Readout(width)[0];
        Assert.True(line.Length <= width, line);
        Assert.Contains(p.CondenserMax.ToString(), line);
        Assert.Contains(p.Bath.ToString(), line);
        Assert.Contains(vm.P(p.VacuumSetpoint), line);
    }

    [Fact]
    public void A_long_error_keeps_its_key_part_in_the_readout()
    {
        var vm = new PlannerViewModel(TestLibrary.Library);
        vm.Edit(d => d with { Charge = "ethyl-acetate=10,ethyl-acetate=20" });
        Assert.EndsWith("is given twice", vm.Error);
        var lines = vm.Readout(78);
        Assert.All(lines, l => Assert.True(l.Length <= 78, l));
        Assert.Contains("given twice", lines[1] + lines[2]);
        // Even at a narrow width, where the message needs more than two lines.
        lines = vm.Readout(40);
        Assert.EndsWith("is given twice", lines[2]);
    }

    public static TheoryData<string> Kinds() => [".md", ".csv", ".json", ".txt"];

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Export_writes_what_the_cli_renderers_write_and_asks_before_replacing(string ext)
    {
        var vm = new PlannerViewModel(TestLibrary.Library) { Clock = new DateTimeOffset(2026, 1, 2, 3, 4, 5, TimeSpan.Zero) };
        vm.Edit(d => d with { Charge = "thf" });
        string path = Path.Combine(_dir, "plan" + ext);
        Assert.Equal(SaveOutcome.Saved, vm.Export(path, ramp: false, _ => throw new InvalidOperationException("must not ask for a new file")));
        var r = vm.Outcome.Report!;
        string expected = ext switch
        {
            ".md" => MarkdownReport.Render(r, vm.Display),
            ".csv" => CsvReport.Render(r, vm.Display),
            ".json" => JsonReport.Render(r) + "\n",
            _ => TextReport.Render(r, vm.Display),
        };
        Assert.Equal(expected, File.ReadAllText(path));
        Assert.Equal(SaveOutcome.Declined, vm.Export(path, ramp: false, _ => false));
        Assert.Equal(expected, File.ReadAllText(path));
    }

    [Theory]
    [InlineData(".svg")]
    [InlineData(".png")]
    public void Export_writes_the_plot_files_of_the_plan_and_of_the_ramp(string ext)
    {
        var vm = new PlannerViewModel(TestLibrary.Library);
        string plan = Path.Combine(_dir, "plan" + ext), ramp = Path.Combine(_dir, "ramp" + ext);
        vm.Export(plan, ramp: false, _ => false);
        vm.Export(ramp, ramp: true, _ => false);
        foreach (string f in new[] { plan, ramp })
        {
            byte[] head = File.ReadAllBytes(f).Take(8).ToArray();
            if (ext == ".svg") Assert.Contains("<svg", File.ReadAllText(f));
            else Assert.Equal(new byte[] { 0x89, (byte)'P', (byte)'N', (byte)'G' }, head.Take(4));
        }
    }

    [Fact]
    public void Export_refuses_an_unknown_extension_in_one_line()
    {
        var vm = new PlannerViewModel(TestLibrary.Library);
        var e = Assert.Throws<Core.InputException>(() => vm.Export(Path.Combine(_dir, "plan.docx"), false, _ => true));
        Assert.Contains(".md, .csv, .json, .txt, .svg, .png", e.Message);
        Assert.DoesNotContain("\n", e.Message);
    }

    [Fact]
    public void Recent_files_are_newest_first_without_repeats_and_forget_missing_files()
    {
        var recent = new RecentPlans(Path.Combine(_dir, "cfg", "recent-plans.txt"));
        Assert.Empty(recent.Paths);
        string a = Path.Combine(_dir, "a.yaml"), b = Path.Combine(_dir, "b.yaml");
        File.WriteAllText(a, "");
        File.WriteAllText(b, "");
        recent.Add(a);
        recent.Add(b);
        recent.Add(a);
        Assert.Equal([a, b], recent.Paths);
        File.Delete(b);
        Assert.Equal([a], recent.Paths);
    }

    [Fact]
    public void A_broken_user_library_gives_the_shipped_library_and_one_line_saying_why()
    {
        string broken = Path.Combine(_dir, "solvents.yaml");
        File.WriteAllText(broken, "solvents:\n  - name: [unclosed\n");
        var (library, problem) = LibraryStartup.Load(broken);
        Assert.NotNull(problem);
        Assert.DoesNotContain("\n", problem);
        Assert.Contains(broken, problem);
        Assert.True(library.TryFind("ethanol", out _));
        Assert.Equal(TestLibrary.Library.Solvents.Count, library.Solvents.Count);
    }
}
