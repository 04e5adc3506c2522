using System.Text.RegularExpressions;
using DistillPlan.Tui.Model;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// Every output of a plan says the same thing, in the unit asked for, and the defects the
/// one-report-model change fixed stay fixed.
/// </summary>
public sealed class ReportOutputTests : IDisposable
{
    static ReportOutputTests() => Environment.SetEnvironmentVariable("SOURCE_DATE_EPOCH", "1767225600");

    private readonly string _dir = Directory.CreateTempSubdirectory("distillplan-out-").FullName;
    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Fact]
    public void The_text_of_a_strip_shows_the_peroxide_warning_the_json_carries()
    {
        var text = CliRunner.Run("strip", "thf=100mL");
        Assert.Equal(0, text.ExitCode);
        Assert.Contains("WARNING peroxide-former", text.Output);
        var json = CliRunner.Json("strip", "thf=100mL");
        Assert.Contains(json.GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "peroxide-former");
        // And a peroxide former keeps its residue: at least 10 % left (docs/methods.md, Batch strip).
        Assert.True(json.GetProperty("steps").EnumerateArray().Last().GetProperty("evaporated_fraction").GetDouble() <= 0.9 + 1e-9);
    }

    [Fact]
    public void A_fixed_pressure_strip_never_heats_the_bath_past_the_product_limit_and_says_the_end_in_celsius()
    {
        var j = CliRunner.Json("strip", "dmf=30mL", "--heating", "oil-bath", "--pump-limit", "0.5mbar", "--product-max", "70",
            "--product-mass", "3.2g", "--product-molar-mass", "455", "--pressure", "10mbar", "--end", "dry");
        var steps = j.GetProperty("steps").EnumerateArray().ToList();
        Assert.All(steps, s => Assert.True(s.GetProperty("bath_temperature_c").GetDouble() <= 70 + 1e-6));
        Assert.Equal("temperature-limit-reached", j.GetProperty("end_reason").GetString());
        string end = j.GetProperty("end_message").GetString()!;
        Assert.Contains("70.0 °C", end);
        Assert.DoesNotMatch(@"\d K\b", end);
    }

    [Fact]
    public void A_strip_at_the_vapour_temperature_never_goes_below_twice_the_pump_ultimate()
    {
        var j = CliRunner.Json("strip", "ethanol=50mL,water=50mL", "--pump-limit", "20mbar", "--end", "dry");
        double lowest = j.GetProperty("steps").EnumerateArray().Min(s => s.GetProperty("pressure_mbar").GetDouble());
        Assert.True(lowest >= 40 - 1e-6, $"lowest {lowest} mbar");
    }

    [Fact]
    public void A_fixed_pressure_below_what_the_pump_holds_is_bad_input()
    {
        var r = CliRunner.Run("strip", "toluene=100mL", "--pressure", "3mbar");
        Assert.Equal(2, r.ExitCode);
        Assert.StartsWith("distillplan: --pressure: '3.00 mbar'", r.Error);
        Assert.Contains("10.0 mbar", r.Error);
    }

    [Theory]
    [InlineData("setpoints", "ethyl-acetate=100mL,heptane=100mL")]
    [InlineData("strip", "ethyl-acetate=100mL,heptane=100mL")]
    [InlineData("setpoints", "dmso")]
    public void A_Torr_plan_says_Torr_everywhere_and_never_gives_a_temperature_in_kelvin(string verb, string charge)
    {
        foreach (var format in new[] { "text", "markdown", "csv" })
        {
            var r = CliRunner.Run(verb, charge, "--unit", "Torr", "--format", format);
            Assert.Equal(0, r.ExitCode);
            Assert.DoesNotContain("mbar", r.Output);
            Assert.DoesNotMatch(@"\b\d+ Pa\b", r.Output);
            // Kelvin temperatures (three digits before a K); ΔT differences like "20 K" are allowed.
            Assert.DoesNotMatch(@"\d{3}(\.\d+)? K\b", r.Output);
            Assert.Contains("Torr", r.Output);
        }
    }

    [Fact]
    public void Assumptions_name_the_basis_of_the_value_actually_used()
    {
        var j = CliRunner.Json("setpoints", "toluene", "--pump", "rotary-vane", "--heating", "oil-bath", "--altitude", "320");
        var a = j.GetProperty("assumptions").EnumerateArray().ToDictionary(x => x.GetProperty("key").GetString()!);
        Assert.False(a["pump"].GetProperty("is_default").GetBoolean());
        Assert.True(a["pump-limit"].GetProperty("is_default").GetBoolean());
        Assert.Contains("rotary-vane", a["pump-limit"].GetProperty("basis").GetString());
        Assert.Equal(0.05, a["pump-limit"].GetProperty("value_mbar").GetDouble(), 9);
        Assert.Contains("oil bath", a["bath-max"].GetProperty("basis").GetString());
        Assert.Equal(180, a["bath-max"].GetProperty("value_c").GetDouble(), 9);
        // The altitude is the user's statement of the atmosphere: not a default, and the basis says 320 m.
        Assert.False(a["atmospheric"].GetProperty("is_default").GetBoolean());
        Assert.Contains("320 m", a["atmospheric"].GetProperty("basis").GetString());
        // ICAO standard atmosphere at 320 m: 101325·(1 − 2.25577e−5·320)^5.25588 = 97 539 Pa.
        Assert.Equal(975.39, a["atmospheric"].GetProperty("value_mbar").GetDouble(), 0.01);
    }

    [Fact]
    public void A_conflict_of_limits_is_said_once_and_the_plan_is_marked_infeasible()
    {
        string[] args = ["setpoints", "dmso", "--heating", "jacket", "--bath-max", "90", "--pump", "liquid-ring", "--delta-t", "25,20"];
        var r = CliRunner.Run(args);
        Assert.Single(Regex.Matches(r.Output, "Conflict"));
        Assert.False(CliRunner.Json(args).GetProperty("feasible").GetBoolean());
    }

    [Fact]
    public void The_text_ui_plan_pane_shows_the_same_report_as_the_command_line()
    {
        var vm = new PlannerViewModel(Core.Library.SolventLibrary.LoadWithUser(null));
        vm.Edit(d => d with { Charge = "ethyl-acetate=100mL,heptane=100mL", PressureUnit = "Torr", Inputs = d.Inputs.With("coolant-temp", "5") });
        var cli = CliRunner.Run("setpoints", "ethyl-acetate=100mL,heptane=100mL", "--unit", "Torr", "--coolant-temp", "5");
        Assert.Equal(cli.Output, vm.PlanReport(80));
    }

    [Fact]
    public void Json_markdown_and_csv_carry_the_same_setpoint_as_the_text()
    {
        var j = CliRunner.Json("setpoints", "ethanol");
        double mbar = j.GetProperty("vacuum_setpoint_mbar").GetDouble();
        string shown = mbar.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture);
        Assert.Contains($"Vacuum setpoint     {shown} mbar", CliRunner.Run("setpoints", "ethanol").Output);
        Assert.Contains($"| Vacuum setpoint | {shown} mbar |", CliRunner.Run("setpoints", "ethanol", "--format", "markdown").Output);
        Assert.Contains($"Vacuum setpoint,{shown},mbar", CliRunner.Run("setpoints", "ethanol", "--format", "csv").Output);
    }

    [Fact]
    public void The_csv_of_a_strip_has_one_row_per_step_and_units_in_the_header()
    {
        var csv = CliRunner.Run("strip", "ethyl-acetate=100mL,heptane=100mL", "--format", "csv", "--unit", "kPa").Output.TrimEnd().Split('\n');
        var steps = CliRunner.Json("strip", "ethyl-acetate=100mL,heptane=100mL").GetProperty("steps").GetArrayLength();
        Assert.Equal(steps + 1, csv.Length);
        Assert.StartsWith("Evaporated by volume (%),Pressure (kPa),Vapour temperature (°C),Bath temperature (°C)", csv[0]);
    }

    [Theory]
    [InlineData("plot.svg", "<svg")]
    [InlineData("plot.png", "\u0089PNG")]
    public void A_plot_file_is_drawn_for_a_strip_and_for_a_plan(string name, string magic)
    {
        foreach (var verb in new[] { "strip", "setpoints" })
        {
            string path = Path.Combine(_dir, verb + name);
            var r = CliRunner.Run(verb, "ethyl-acetate=100mL,heptane=100mL", "--plot", path);
            Assert.True(r.ExitCode == 0, r.Error);
            string head = new string(File.ReadAllBytes(path).Take(200).Select(b => (char)b).ToArray());
            Assert.Contains(magic, head);
        }
    }

    [Fact]
    public void Output_files_are_never_overwritten_without_force()
    {
        string path = Path.Combine(_dir, "plan.md");
        File.WriteAllText(path, "my notes");
        var r = CliRunner.Run("setpoints", "ethanol", "--format", "markdown", "-o", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("--force", r.Error);
        Assert.Equal("my notes", File.ReadAllText(path));
        Assert.Equal(0, CliRunner.Run("setpoints", "ethanol", "--format", "markdown", "-o", path, "--force").ExitCode);
        Assert.StartsWith("# Plan for ethanol", File.ReadAllText(path));
        Assert.Single(Directory.GetFiles(_dir));
    }

    [Theory]
    [InlineData("--plot", "/nonexistent-folder/x.svg")]
    [InlineData("--plot", "x.pdf")]
    [InlineData("--output", "/nonexistent-folder/x.txt")]
    [InlineData("--output", "/dev/null")]
    public void An_unwritable_output_path_is_bad_input_in_one_line(string option, string path)
    {
        var r = CliRunner.Run("strip", "ethanol=50mL,water=50mL", option, path, "--force");
        Assert.Equal(2, r.ExitCode);
        Assert.StartsWith($"distillplan: {option}", r.Error);
        Assert.Single(r.Error.TrimEnd().Split('\n'));
    }

    [Fact]
    public void A_saved_plan_runs_from_the_command_line_and_options_beside_it_override_its_settings()
    {
        string file = Path.Combine(TestPaths.RepoRoot, "examples", "dmf-reaction-workup.yaml");
        var fromFile = CliRunner.Json("setpoints", "--plan", file);
        // The file sets coolant -10 °C and the oil pump; the product limit 70 °C caps the bath at 70.
        Assert.Equal(-10, fromFile.GetProperty("coolant_temperature_c").GetDouble(), 9);
        Assert.True(fromFile.GetProperty("bath_temperature_c").GetDouble() <= 70 + 1e-9);
        var overridden = CliRunner.Json("setpoints", "--plan", file, "--coolant-temp", "0");
        Assert.Equal(0, overridden.GetProperty("coolant_temperature_c").GetDouble(), 9);
        var text = CliRunner.Run("strip", "--plan", file);
        Assert.Equal(0, text.ExitCode);
        Assert.Contains("Torr", text.Output);   // the file's display unit
        Assert.Contains("Remove DMF after an amide coupling", text.Output);
    }

    [Fact]
    public void An_azeotrope_search_whose_solver_gives_up_is_a_finding_not_an_internal_error()
    {
        // Ethylene glycol with hexane: the survey's root search does not converge for this pair at 1 atm.
        var r = CliRunner.Run("setpoints", "ethylene-glycol=50,hexane=50");
        Assert.True(r.ExitCode == 0, r.Error);
    }

    [Fact]
    public void A_strip_step_does_not_repeat_what_the_plan_already_says()
    {
        // Ethylene glycol and hexane are two layers (the plan says so once); the ramp's first step is the setpoint itself.
        var j = CliRunner.Json("setpoints", "ethylene-glycol=50,hexane=50");
        Assert.Contains(j.GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "two-liquids");
        Assert.DoesNotContain(j.GetProperty("ramp")[0].GetProperty("checks").EnumerateArray(), c => c.GetProperty("code").GetString() == "two-liquids");
    }

    [Fact]
    public void A_plan_file_given_alone_opens_the_text_ui()
    {
        string file = Path.Combine(TestPaths.RepoRoot, "examples", "dmf-reaction-workup.yaml");
        string[]? opened = null;
        var before = CliApp.OpenPlanner;
        CliApp.OpenPlanner = a => { opened = a; return 0; };
        try { Assert.Equal(0, CliRunner.RunInProcess(file).ExitCode); }
        finally { CliApp.OpenPlanner = before; }
        Assert.Equal([file], opened!);
        var missing = CliRunner.Run("no-such-plan.yaml");
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("neither a verb", missing.Error);
    }
}
