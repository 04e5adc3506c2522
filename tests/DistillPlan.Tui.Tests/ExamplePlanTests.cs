using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;

namespace DistillPlan.Tui.Tests;

public sealed class ExamplePlanTests
{
    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        // Every plan file; the demo equipment file (examples/equipment.yaml) is another format, tested in Core.
        foreach (var f in Directory.GetFiles(Path.Combine(TestLibrary.RepoRoot, "examples"), "*.yaml").Order())
            if (!File.ReadAllText(f).Contains("format: distillplan-equipment/", StringComparison.Ordinal)) data.Add(Path.GetFileName(f));
        return data;
    }

    [Fact]
    public void There_are_at_least_four_examples()
    {
        Assert.True(Examples().Count >= 4);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_loads_survives_a_round_trip_and_reaches_the_planner(string file)
    {
        var doc = PlanFileReader.Load(Path.Combine(TestLibrary.RepoRoot, "examples", file));
        Assert.Equal(doc, PlanFileReader.Parse(PlanFileWriter.Format(doc), file));
        Assert.NotEmpty(doc.Title);
        Assert.Contains("invented", doc.Notes, StringComparison.OrdinalIgnoreCase);

        var outcome = new PlannerViewModel(TestLibrary.Library).Compute(doc);
        Assert.True(outcome.Plan is not null, outcome.Error);
        Assert.NotNull(outcome.Ramp);
    }
}
