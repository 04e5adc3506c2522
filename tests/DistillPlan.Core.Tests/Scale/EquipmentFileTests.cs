using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>The user's equipment file: named units fill the settings; errors name file, line and field. Demo units only.</summary>
public class EquipmentFileTests
{
    private static string Demo => Path.Combine(FindRepo(), "examples", "equipment.yaml");

    private static string FindRepo()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
            if (File.Exists(Path.Combine(d.FullName, "DistillPlan.sln"))) return d.FullName;
        throw new DirectoryNotFoundException("repository root");
    }

    [Fact]
    public void A_named_unit_fills_its_settings_and_options_beside_it_win()
    {
        var setup = PlanInputs.Of(("equipment", "r-104"), ("equipment-file", Demo), ("pump-speed", "60")).Build();
        Assert.True(setup.Equipment.IsVessel);
        Assert.Equal(0.25, setup.Equipment.NominalVolumeM3!.Value, 1e-12);
        Assert.Equal(-5, setup.Equipment.Coolant.Celsius, 1e-9);
        Assert.Equal(60.0 / 3600, setup.Equipment.PumpSpeedM3PerS!.Value, 1e-12);
        var coolant = Assert.Single(setup.Assumptions, a => a.Key == "coolant-temp");
        Assert.False(coolant.IsDefault);
        Assert.Equal("equipment unit R-104", coolant.Basis);
        Assert.Equal("given", Assert.Single(setup.Assumptions, a => a.Key == "pump-speed").Basis);
    }

    [Fact]
    public void An_unknown_unit_lists_the_units_of_the_file()
    {
        var e = Assert.Throws<InputException>(() => PlanInputs.Of(("equipment", "R-999"), ("equipment-file", Demo)).Build());
        Assert.Equal("--equipment", e.Field);
        Assert.Contains("rotavap-2", e.Message);
        Assert.Contains("R-104", e.Message);
    }

    [Theory]
    [InlineData("format: distillplan-equipment/1\nunits:\n  - name: a\n    vessel: -5L\n", 4, "vessel")]
    [InlineData("format: distillplan-equipment/1\nunits:\n  - name: a\n    flask: 1L\n    colour: red\n", 5, "colour")]
    [InlineData("format: distillplan-equipment/1\nunits:\n  - name: a\n  - name: A\n", 4, "name")]
    [InlineData("format: distillplan-equipment/1\nunits:\n  - name: a\n    vessel: 100L\n    min-volume: 150L\n", 5, "min-volume")]
    [InlineData("format: something-else\nunits: []\n", 1, "format")]
    public void A_bad_file_names_its_line_and_field(string text, int line, string field)
    {
        var e = Assert.Throws<LibraryFormatException>(() => EquipmentFile.Parse(text, "eq.yaml"));
        Assert.Equal(line, e.Line);
        Assert.Contains(field, e.Field);
        Assert.StartsWith($"eq.yaml:{line}:", e.Message);
    }
}
