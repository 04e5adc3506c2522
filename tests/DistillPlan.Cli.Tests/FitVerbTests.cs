using System.Globalization;
using System.Text.Json;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// <c>distillplan fit</c> against outside values: water points from IAPWS-IF97 (computed here by the
/// Core tests' own typed copy of the equation, tests/DistillPlan.Core.Tests/Reference/IapwsIf97.cs,
/// linked into this project), toluene points from McGarry's Wagner equation against Perry's latent
/// heat, and a fitted compound planned by the other verbs.
/// </summary>
public sealed class FitVerbTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("dp-fit-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string PathOf(string name) => Path.Combine(_dir, name);

    private static string F(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Water at 30, 40 … 90 °C from IAPWS-IF97, as --points in K and Pa.</summary>
    private static string WaterPoints() =>
        string.Join(",", Enumerable.Range(0, 7).Select(i => 303.15 + 10 * i).Select(t => $"{F(t)}K:{F(IapwsIf97.SaturationPressurePa(t))}Pa"));

    private static double Antoine(JsonElement fit, double tK)
    {
        var c = fit.GetProperty("coefficients");
        return Math.Pow(10, c.GetProperty("a").GetDouble() - c.GetProperty("b").GetDouble() / (tK + c.GetProperty("c").GetDouble()));
    }

    [Fact]
    public void Water_points_from_IAPWS_fit_an_Antoine_curve_that_gives_IAPWS_back_between_the_points()
    {
        var j = CliRunner.Json("fit", "water-fit", "--points", WaterPoints());
        Assert.Equal("antoine", j.GetProperty("form").GetString());
        Assert.False(j.GetProperty("estimate").GetBoolean());
        Assert.Equal(30, j.GetProperty("t_min_c").GetDouble(), 1e-9);
        Assert.Equal(90, j.GetProperty("t_max_c").GetDouble(), 1e-9);
        Assert.Equal(7, j.GetProperty("residuals").GetArrayLength());
        // Three Antoine constants carry water's curve over 60 K to better than 0.1 % (measured: 0.023 %).
        Assert.InRange(j.GetProperty("max_residual_percent").GetDouble(), 0, 0.1);
        // Between the points, against IAPWS-IF97 itself.
        for (double t = 305.65; t < 363.15; t += 5)
        {
            double iapws = IapwsIf97.SaturationPressurePa(t);
            Assert.True(Math.Abs(Antoine(j, t) / iapws - 1) < 1e-3, $"at {t} K: fit {Antoine(j, t)} Pa, IAPWS-IF97 {iapws} Pa");
        }
        // Latent heat at the middle of the range in 1/T (57.3 °C) from the slope: steam tables (IAPWS-95)
        // give h_fg = 2370.1 kJ/kg at 55 °C and 2357.7 at 60 °C, so 2364.4 kJ/kg or 42.59 kJ/mol
        // (M = 18.015 g/mol) at 57.3 °C (from memory). The slope of ln P in 1/T gives ΔH/ΔZ, a little
        // below ΔH where the vapour is not quite ideal: within 2 %.
        Assert.Equal(57.30, j.GetProperty("enthalpy_at_c").GetDouble(), 0.01);
        Assert.Equal(42.59, j.GetProperty("enthalpy_of_vaporization_kj_per_mol").GetDouble(), 42.59 * 0.02);
        // CRC normal boiling point of water 100.0 °C; the fit extrapolates 10 K beyond its last point.
        Assert.Equal(100.0, j.GetProperty("normal_boiling_point_c").GetDouble(), 0.3);
    }

    [Fact]
    public void Two_toluene_points_give_a_latent_heat_within_2_percent_of_the_published_one()
    {
        // Points from McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313, Wagner (3,6) row of toluene
        // (A −7.28607, B 1.38091, C −2.83433, D −2.79168, Tc 591.72 K, Pc 4106450 Pa), computed:
        // 78.887 mbar at 40 °C and 388.311 mbar at 80 °C.
        var j = CliRunner.Json("fit", "toluene-lab", "--points", "40C:78.887mbar,80C:388.311mbar");
        Assert.Equal("clausius-clapeyron", j.GetProperty("form").GetString());
        // Perry's Handbook 8th ed. Table 2-150 (DIPPR-106: C1 49507 J/mol, C2 0.37742, Tc 591.75 K) at the
        // mean temperature in 1/T, 58.80 °C: 36.29 kJ/mol.
        Assert.Equal(58.80, j.GetProperty("enthalpy_at_c").GetDouble(), 0.01);
        Assert.Equal(36.29, j.GetProperty("enthalpy_of_vaporization_kj_per_mol").GetDouble(), 36.29 * 0.02);
        // A two-constant line passes through both points.
        Assert.InRange(j.GetProperty("max_residual_percent").GetDouble(), 0, 1e-6);
    }

    [Fact]
    public void The_text_shows_the_equation_range_residual_table_latent_heat_and_the_caution()
    {
        var r = CliRunner.Run("fit", "water-fit", "--points", WaterPoints(), "--unit", "kPa");
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("log10(P/Pa) = A - B/(T/K + C)", r.Output);
        Assert.Contains("Valid 30.0 °C to 90.0 °C", r.Output);
        Assert.Contains("measured", r.Output);
        // IAPWS-IF97 at 30 °C: 4.2470 kPa, shown in the unit asked for with the unit's decimals.
        Assert.Contains("4.247 kPa", r.Output);
        Assert.Contains("Latent heat", r.Output);
        Assert.Contains("only as good as its points", r.Output);
        Assert.DoesNotContain("ESTIMATE", r.Output);
        Assert.All(r.Output.Split('\n'), l => Assert.True(l.Length <= 78, l));
    }

    [Fact]
    public void The_command_line_prints_the_layout_the_text_UI_shows()
    {
        var r = CliRunner.Run("fit", "toluene-lab", "--points", "40C:78.887mbar,80C:388.311mbar");
        var fit = DistillPlan.Tui.Model.CompoundFit.Make("toluene-lab",
            [(313.15, 7888.7), (353.15, 38831.1)], DistillPlan.Core.Fitting.FitForm.Auto, false, null);
        string shared = DistillPlan.Tui.Model.FitText.Text(fit, DistillPlan.Core.Quantities.PressureUnits.Millibar);
        Assert.StartsWith(shared + "\n", r.Output.Replace("\r\n", "\n"));
    }

    [Fact]
    public void One_boiling_point_is_a_Trouton_estimate_and_says_so()
    {
        // Ethanol: CRC normal boiling point 78.29 °C; an alcohol, so Trouton's 109 J/(mol K).
        var j = CliRunner.Json("fit", "ethanol-guess", "--boiling-point", "78.29C", "--associating");
        Assert.Equal("trouton", j.GetProperty("form").GetString());
        Assert.True(j.GetProperty("estimate").GetBoolean());
        // 109 J/(mol K) × 351.44 K = 38.31 kJ/mol; CRC gives ΔHvap at Tb 38.56 kJ/mol (from memory).
        Assert.Equal(38.56, j.GetProperty("enthalpy_of_vaporization_kj_per_mol").GetDouble(), 38.56 * 0.03);
        Assert.Equal(78.29, j.GetProperty("normal_boiling_point_c").GetDouble(), 0.01);
        var text = CliRunner.Run("fit", "ethanol-guess", "--boiling-point", "78.29C@1013.25mbar", "--associating");
        Assert.Contains("ESTIMATE", text.Output);
        Assert.Contains("109 J/(mol K)", text.Output);
    }

    [Fact]
    public void A_boiling_point_at_a_reduced_pressure_gives_back_that_point()
    {
        var j = CliRunner.Json("fit", "x", "--boiling-point", "78C@100mbar");
        var point = j.GetProperty("residuals")[0];
        Assert.Equal(78, point.GetProperty("temperature_c").GetDouble(), 1e-9);
        Assert.Equal(100, point.GetProperty("fitted_mbar").GetDouble(), 1e-3);
    }

    [Theory]
    [InlineData("T (°C),P (kPa)\n", ",", 1.0, 1000.0)]
    [InlineData("temperature_k;pressure_torr\n", ";", 0.0, 101325.0 / 760)]
    [InlineData("# lab notebook 7 (demo of the header rule)\nTemperature [C]\tVapour pressure [mbar]\tnote\n", "\t", 1.0, 100.0)]
    public void A_CSV_file_with_units_in_the_header_fits_the_same_curve_as_the_points(string header, string sep, double celsius, double pascalPerUnit)
    {
        var byPoints = CliRunner.Json("fit", "water-fit", "--points", WaterPoints());
        var rows = Enumerable.Range(0, 7).Select(i => 303.15 + 10 * i).Select(t =>
            F(celsius > 0 ? t - 273.15 : t) + sep + F(IapwsIf97.SaturationPressurePa(t) / pascalPerUnit) + (sep == "\t" ? "\tok" : ""));
        File.WriteAllText(PathOf("water.csv"), header + string.Join("\n", rows) + "\n\n");
        var byCsv = CliRunner.Json("fit", "water-fit", "--data", PathOf("water.csv"));
        foreach (string k in new[] { "a", "b", "c" })
            Assert.Equal(byPoints.GetProperty("coefficients").GetProperty(k).GetDouble(), byCsv.GetProperty("coefficients").GetProperty(k).GetDouble(), 1e-6);
    }

    [Theory]
    [InlineData("T (°C),P (psx)", "column 2 'P (psx)'", "psx")]
    [InlineData("T (degrees),P (mbar)", "column 1 'T (degrees)'", "degrees")]
    [InlineData("T,P (mbar)", "column 1 'T'", "no unit")]
    [InlineData("when,what", "needs a temperature and a pressure column", "temperature_c")]
    public void A_CSV_header_with_an_unknown_or_missing_unit_is_refused_naming_the_column(string header, string mentions, string alsoMentions)
    {
        File.WriteAllText(PathOf("bad.csv"), header + "\n30,42.5\n50,123\n");
        var r = CliRunner.Run("fit", "x", "--data", PathOf("bad.csv"));
        AssertBadInput(r, mentions);
        Assert.Contains(alsoMentions, r.Error);
    }

    [Fact]
    public void A_bad_number_in_the_CSV_names_the_line()
    {
        File.WriteAllText(PathOf("bad.csv"), "T (°C),P (mbar)\n30,42.5\n50,12x3\n");
        AssertBadInput(CliRunner.Run("fit", "x", "--data", PathOf("bad.csv")), "line 3");
    }

    [Theory]
    [InlineData("exactly one of --points", "fit", "x")]
    [InlineData("exactly one of --points", "fit", "x", "--points", "30C:42mbar,50C:123mbar", "--boiling-point", "78C")]
    [InlineData("--points", "fit", "x", "--points", "30C-42mbar,50C:123mbar")]
    [InlineData("--points", "fit", "x", "--points", "30C:abc,50C:123mbar")]
    [InlineData("--points", "fit", "x", "--points", "30 parsecs:42mbar,50C:123mbar")]
    [InlineData("rise with temperature", "fit", "x", "--points", "30C:123mbar,50C:42mbar")]
    [InlineData("each temperature once", "fit", "x", "--points", "30C:42mbar,30C:44mbar,50C:123mbar")]
    [InlineData("at least 3 points", "fit", "x", "--points", "30C:42mbar,50C:123mbar", "--form", "antoine")]
    [InlineData("--form", "fit", "x", "--points", "30C:42mbar,50C:123mbar", "--form", "wagner")]
    [InlineData("--form", "fit", "x", "--boiling-point", "78C", "--form", "antoine")]
    [InlineData("--boiling-point", "fit", "x", "--boiling-point", "78C@1013mbar@2")]
    [InlineData("--molar-mass", "fit", "x", "--points", "30C:42mbar,50C:123mbar", "--molar-mass", "-46")]
    [InlineData("--molar-mass", "fit", "x", "--points", "30C:42mbar,50C:123mbar", "--out", "/tmp/never-written-dp-fit.yaml")]
    [InlineData("--data", "fit", "x", "--data", "/nonexistent/points.csv")]
    public void Bad_input_gives_one_line_naming_the_option_and_exit_code_2(string mentions, params string[] args)
    {
        AssertBadInput(CliRunner.Run(args), mentions);
        Assert.False(File.Exists("/tmp/never-written-dp-fit.yaml"));
    }

    private static void AssertBadInput(CliRunner.Result r, string mentions)
    {
        Assert.Equal(2, r.ExitCode);
        Assert.Equal("", r.Output);
        string line = r.Error.TrimEnd('\n');
        Assert.DoesNotContain("\n", line);
        Assert.StartsWith("distillplan: ", line);
        Assert.Contains(mentions, line);
    }

    [Fact]
    public void Out_writes_a_library_file_that_loads_and_is_never_overwritten_without_force()
    {
        string file = PathOf("water-fit.yaml");
        var r = CliRunner.Run("fit", "water-fit", "--points", WaterPoints(), "--molar-mass", "18.015", "--out", file, "--citation", "IAPWS-IF97 points (test)");
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("Library entry written to", r.Output);
        string written = File.ReadAllText(file);
        Assert.Contains("IAPWS-IF97 points (test)", written);
        // The entry works as a library: 45 °C against IAPWS-IF97 (9.5837 kPa), within 0.1 %.
        var c = CliRunner.Json("curve", "water fit", "--temp", "45C", "--library", file);
        Assert.Equal(IapwsIf97.SaturationPressurePa(318.15) / 100, c.GetProperty("vapor_pressure_mbar").GetDouble(), IapwsIf97.SaturationPressurePa(318.15) / 100 * 1e-3);

        var again = CliRunner.Run("fit", "water-fit", "--points", "30C:42.5mbar,50C:123mbar", "--molar-mass", "18", "--out", file);
        AssertBadInput(again, "--out");
        Assert.Contains("--force", again.Error);
        Assert.Equal(written, File.ReadAllText(file));
        Assert.Equal(0, CliRunner.Run("fit", "water-fit", "--points", "30C:42.5mbar,50C:123mbar", "--molar-mass", "18", "--out", file, "--force").ExitCode);
        Assert.Contains("clausius-clapeyron", File.ReadAllText(file));
    }

    // A hand-written user library (demo entry, invented numbers) with comments and its own layout.
    private const string HandWritten =
        "format: distillplan-solvents/1\n" +
        "# my lab's compounds\n" +
        "sources:\n" +
        "    nb12: lab notebook 12, p. 34   # demo data\n" +
        "solvents:\n" +
        "- name: dp-7 intermediate      # demo entry, invented numbers\n" +
        "  molar_mass_g_per_mol: {value: 154.2, source: nb12}\n" +
        "  normal_boiling_point_k: {value: 455.0, source: nb12}\n" +
        "  vapor_pressure:\n" +
        "    - {form: antoine-log10, a: 9.2, b: 1900, c: -60, p_unit: Pa, t_unit: K, t_min_k: 300, t_max_k: 460, source: nb12}\n" +
        "\n" +
        "# end of my list\n";

    [Fact]
    public void Add_merges_into_the_users_library_without_touching_the_other_entries_and_refuses_a_duplicate()
    {
        string lib = PathOf("solvents.yaml");
        File.WriteAllText(lib, HandWritten);
        double before = CliRunner.Json("curve", "dp-7 intermediate", "--temp", "120C", "--library", lib).GetProperty("vapor_pressure_mbar").GetDouble();

        var r = CliRunner.Run("fit", "water-fit", "--points", WaterPoints(), "--molar-mass", "18.015", "--add", "--library", lib);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains($"Added 'water-fit' to {lib}", r.Output);
        Assert.Equal(0, CliRunner.Run("fit", "toluene-lab", "--points", "40C:78.887mbar,80C:388.311mbar", "--molar-mass", "92.14", "--add", "--library", lib).ExitCode);
        string merged = File.ReadAllText(lib);
        // Every hand-written line is still there, in order.
        var kept = HandWritten.TrimEnd('\n').Split('\n').Where(l => l.Length > 0).ToList();
        int at = 0;
        foreach (string line in merged.Split('\n')) if (at < kept.Count && line == kept[at]) at++;
        Assert.Equal(kept.Count, at);
        // The new entries follow the file's own indent (dash in column 0).
        Assert.Contains("\n- name: \"water-fit\"", merged);
        Assert.Contains("\n    fit-water-fit: ", merged);
        double after = CliRunner.Json("curve", "dp-7 intermediate", "--temp", "120C", "--library", lib).GetProperty("vapor_pressure_mbar").GetDouble();
        Assert.Equal(before, after);

        // A second add of the same name is refused and leaves the file as it was; --force replaces that entry only.
        var dup = CliRunner.Run("fit", "Water Fit", "--points", "30C:42.5mbar,50C:123mbar", "--molar-mass", "18", "--add", "--library", lib);
        AssertBadInput(dup, "already holds 'water-fit'");
        Assert.Equal(merged, File.ReadAllText(lib));
        var forced = CliRunner.Run("fit", "water-fit", "--points", "30C:42.5mbar,50C:123mbar", "--molar-mass", "18", "--add", "--library", lib, "--force");
        Assert.Equal(0, forced.ExitCode);
        Assert.Contains("replacing 'water-fit'", forced.Output);
        var names = CliRunner.Json("solvents", "--library", lib).GetProperty("solvents").EnumerateArray().Select(s => s.GetProperty("name").GetString()).ToList();
        Assert.Single(names, n => n == "water-fit");
        Assert.Contains("toluene-lab", names);
        Assert.Contains("dp-7 intermediate", names);
        Assert.Equal(before, CliRunner.Json("curve", "dp-7 intermediate", "--temp", "120C", "--library", lib).GetProperty("vapor_pressure_mbar").GetDouble());
        Assert.Equal(123, CliRunner.Json("curve", "water-fit", "--temp", "50C", "--library", lib).GetProperty("vapor_pressure_mbar").GetDouble(), 1e-3);
    }

    [Fact]
    public void Add_refuses_the_name_or_alias_of_a_shipped_solvent()
    {
        string lib = PathOf("solvents.yaml");
        AssertBadInput(CliRunner.Run("fit", "EtOH", "--points", "30C:42.5mbar,50C:123mbar", "--molar-mass", "46", "--add", "--library", lib), "shipped solvent 'ethanol'");
        Assert.False(File.Exists(lib));
    }

    [Fact]
    public void A_fitted_and_added_compound_is_planned_by_setpoints_on_its_fitted_curve()
    {
        string lib = PathOf("solvents.yaml");
        var fit = CliRunner.Json("fit", "water-fit", "--points", WaterPoints(), "--molar-mass", "18.015", "--add", "--library", lib);
        Assert.Equal(lib, fit.GetProperty("added_to").GetString());
        var plan = CliRunner.Json("setpoints", "water-fit", "--library", lib);
        double vaporK = plan.GetProperty("vapor_temperature_c").GetDouble() + 273.15;
        Assert.InRange(vaporK, 303.15, 363.15);   // inside the fitted range, so the fitted curve answers
        double vacuumMbar = plan.GetProperty("vacuum_setpoint_mbar").GetDouble();
        Assert.Equal(Antoine(fit, vaporK) / 100, vacuumMbar, vacuumMbar * 1e-3);
        // And the plan for the fitted water matches IAPWS-IF97 at that vapour temperature within 0.1 %.
        Assert.Equal(IapwsIf97.SaturationPressurePa(vaporK) / 100, vacuumMbar, vacuumMbar * 1e-3);
        var curve = CliRunner.Json("curve", "water-fit", "--at", F(vacuumMbar) + "mbar", "--library", lib);
        Assert.Equal(vaporK - 273.15, curve.GetProperty("boiling_temperature_c").GetDouble(), 0.01);
        Assert.False(curve.GetProperty("extrapolated").GetBoolean());
    }

    [Fact]
    public void Add_goes_to_the_per_user_library_under_XDG_CONFIG_HOME_and_the_program_then_knows_the_compound()
    {
        // A separate process, so the environment variable touches no other test.
        string dll = Path.Combine(AppContext.BaseDirectory, "distillplan.dll");
        (int Code, string Out) Run(params string[] args)
        {
            var start = new System.Diagnostics.ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true };
            start.ArgumentList.Add(dll);
            foreach (string a in args) start.ArgumentList.Add(a);
            start.Environment["XDG_CONFIG_HOME"] = _dir;
            using var p = System.Diagnostics.Process.Start(start)!;
            string o = p.StandardOutput.ReadToEnd() + p.StandardError.ReadToEnd();
            p.WaitForExit();
            return (p.ExitCode, o);
        }
        var add = Run("fit", "toluene-lab", "--points", "40C:78.887mbar,80C:388.311mbar", "--molar-mass", "92.14", "--add");
        Assert.True(add.Code == 0, add.Out);
        string lib = Path.Combine(_dir, "distillplan", "solvents.yaml");
        Assert.Contains(lib, add.Out);
        Assert.True(File.Exists(lib));
        var curve = Run("curve", "toluene-lab", "--temp", "60C", "--json");
        Assert.True(curve.Code == 0, curve.Out);
        // McGarry 1983 Wagner for toluene at 60 °C: 185.3 mbar; a two-point line over 40–80 °C is within 1 %.
        Assert.Equal(185.3, JsonDocument.Parse(curve.Out).RootElement.GetProperty("vapor_pressure_mbar").GetDouble(), 185.3 * 0.01);
    }
}
