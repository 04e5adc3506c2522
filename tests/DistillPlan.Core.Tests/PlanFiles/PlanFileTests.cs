using DistillPlan.Core;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning.Settings;

namespace DistillPlan.Core.Tests.PlanFiles;

public sealed class PlanFileTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("distillplan-planfile-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    // Strings are arbitrary user text (invented test data), chosen to need escaping.
    private static readonly PlanDocument Full = new()
    {
        Title = "Fractions \"14-22\": KV-317 \\ bench 3",
        Notes = "line one\n  indented line: with colon # and hash\n\nafter a blank line",
        Charge = "ethyl-acetate=180mL,heptane=270mL",
        Inputs = PlanInputs.Of(("basis", "mass"), ("model", "ideal"), ("product-mass", "1.4 g"), ("product-molar-mass", "312"),
            ("coolant-temp", "5"), ("pump-limit", "3 mbar"), ("delta-t", "25,20"), ("altitude", "320"), ("heating", "oil-bath"), ("product-max", "50"),
            ("pressure", "20 mbar"), ("end", "left=10%")),
        PressureUnit = "Torr",
    };

    [Fact]
    public void A_plan_read_back_after_formatting_equals_the_plan_written()
    {
        var back = PlanFileReader.Parse(PlanFileWriter.Format(Full), "t.yaml");
        Assert.Equal(Full, back);
    }

    [Theory]
    [InlineData("trailing newline\n")]
    [InlineData("tab\there")]
    [InlineData(" leading space")]
    [InlineData("trailing space ")]
    public void Notes_that_a_literal_block_would_change_are_still_read_back_exactly(string notes)
    {
        var doc = Full with { Notes = notes };
        Assert.Equal(doc, PlanFileReader.Parse(PlanFileWriter.Format(doc), "t.yaml"));
    }

    [Fact]
    public void An_existing_file_is_left_alone_when_the_user_declines_to_overwrite()
    {
        string path = Path.Combine(_dir, "plan.yaml");
        File.WriteAllText(path, "precious");
        string? asked = null;
        var outcome = PlanFileWriter.Save(path, Full, p => { asked = p; return false; });
        Assert.Equal(SaveOutcome.Declined, outcome);
        Assert.Equal(Path.GetFullPath(path), asked);
        Assert.Equal("precious", File.ReadAllText(path));
        Assert.Single(Directory.GetFiles(_dir));
    }

    [Fact]
    public void An_existing_file_is_replaced_only_after_a_yes_and_no_temporary_file_remains()
    {
        string path = Path.Combine(_dir, "plan.yaml");
        File.WriteAllText(path, "old");
        Assert.Equal(SaveOutcome.Saved, PlanFileWriter.Save(path, Full, _ => true));
        Assert.Equal(Full, PlanFileReader.Load(path));
        Assert.Equal([path], Directory.GetFiles(_dir));
    }

    [Fact]
    public void A_new_file_is_written_without_asking()
    {
        string path = Path.Combine(_dir, "new.yaml");
        bool asked = false;
        Assert.Equal(SaveOutcome.Saved, PlanFileWriter.Save(path, Full, _ => asked = true));
        Assert.False(asked);
        Assert.Equal(Full, PlanFileReader.Load(path));
    }

    [Fact]
    public void A_save_that_cannot_complete_leaves_the_folder_as_it_was()
    {
        // The target is a folder, so the final move fails after the temporary file was written.
        string target = Path.Combine(_dir, "taken");
        Directory.CreateDirectory(target);
        File.WriteAllText(Path.Combine(target, "inside.txt"), "keep");
        var e = Assert.Throws<PlanFileException>(() => PlanFileWriter.Save(target, Full, _ => true));
        Assert.Contains("cannot be saved", e.Message);
        Assert.Empty(Directory.GetFiles(_dir));
        Assert.Equal("keep", File.ReadAllText(Path.Combine(target, "inside.txt")));
    }

    [Theory]
    [InlineData("format: other/9\ncharge:\n  solvents: water\n", 1, "not supported")]
    [InlineData("format: distillplan-plan/1\ncharge:\n  solvents: water\n  colour: blue\n", 4, "unknown key 'colour'")]
    [InlineData("format: distillplan-plan/1\ncharge:\n  solvents: water\n  basis: litres\n", 4, "basis")]
    [InlineData("format: distillplan-plan/1\ntitle: x\n", 1, "charge")]
    // Every value is read by its option's parser when the file is read, and blamed on its line.
    [InlineData("format: distillplan-plan/1\ncharge:\n  solvents: water\nsettings:\n  coolant-temp: warm\n", 5, "settings.coolant-temp: 'warm'")]
    [InlineData("format: distillplan-plan/1\ncharge:\n  solvents: water\ndisplay:\n  pressure-unit: furlongs\n", 5, "pressure-unit: 'furlongs'")]
    [InlineData("format: distillplan-plan/1\ncharge:\n  solvents: water\nstrip:\n  end: halfway\n", 5, "strip.end")]
    // The YAML parser notices the unclosed list at the end of the text, line 3.
    [InlineData("format: distillplan-plan/1\ncharge: [1, 2\n", 3, "YAML")]
    public void A_bad_file_is_refused_with_its_line_and_the_problem(string text, int line, string fragment)
    {
        var e = Assert.Throws<PlanFileException>(() => PlanFileReader.Parse(text, "bad.yaml"));
        Assert.Equal(line, e.Line);
        Assert.Contains(fragment, e.Message);
        Assert.StartsWith("bad.yaml:", e.Message);
    }

    [Fact]
    public void A_product_needs_both_its_mass_and_its_molar_mass()
    {
        var e = Assert.Throws<InputException>(() => Full.Inputs.With("product-molar-mass", null).Build());
        Assert.Contains("molar mass", e.Message);
    }

    [Theory]
    [InlineData("1.4 g", 1.4)]
    [InlineData("250mg", 0.25)]
    [InlineData("2 kg", 2000)]
    [InlineData("3", 3)]
    public void Product_mass_is_read_in_grams(string text, double grams)
    {
        var p = Full.Inputs.With("product-mass", text).Build().Product!;
        Assert.Equal(grams, p.MassG, 9);
        Assert.Equal(312, p.MolarMassGPerMol);
    }
}
