using System.CommandLine;
using System.Text.Json.Nodes;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Fitting;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// <c>distillplan fit NAME</c>: a vapour-pressure curve from the user's own measured points (or
/// one boiling point, as an estimate), with residuals; <c>--out</c> writes it as a library entry
/// and <c>--add</c> puts it in the user's library, after which every verb knows the compound.
/// </summary>
internal static class FitCommand
{
    public static Command Build()
    {
        var common = new CommonOptions();
        var name = new Argument<string>("name") { Description = "Name of the compound (its name in the library when added)." };
        var points = new Option<string?>("--points") { Description = "Measured points TEMPERATURE:PRESSURE joined by commas: 30C:42.5mbar,50C:123mbar (bare numbers are °C and mbar)." };
        var data = new Option<string?>("--data") { Description = "A CSV file of points; the header names the units: T (°C),P (mbar) or temperature_c,pressure_kpa." };
        var boiling = new Option<string?>("--boiling-point") { Description = "One boiling point, at 1 atm (78C) or at a pressure (78C@1013mbar): a Trouton estimate, not a fit." };
        var form = new Option<string?>("--form") { Description = $"Equation: {CompoundFit.FormsText} (auto: one point Trouton, two Clausius-Clapeyron, three or more Antoine)." };
        var molarMass = new Option<string?>("--molar-mass") { Description = "Molar mass in g/mol; needed for a library entry (--out, --add)." };
        var associating = new Option<bool>("--associating") { Description = "Alcohol-like, hydrogen-bonded liquid: Trouton's 109 J/(mol K) instead of 88 (one-point estimate only)." };
        var citation = new Option<string?>("--citation") { Description = "Where the points come from (lab notebook, paper), written as the entry's source." };
        var outFile = new Option<string?>("--out") { Description = "Write the compound as a library file (docs/solvents-schema.md) to FILE." };
        var add = new Option<bool>("--add") { Description = "Add the compound to the user's library (--library FILE, else ~/.config/distillplan/solvents.yaml), creating it if needed." };
        var force = new Option<bool>("--force") { Description = "Replace an existing --out file, or an entry of the same name or CAS in the library with --add." };
        var atmospheric = SettingOptions.Of("atmospheric");

        var cmd = new Command("fit", "Fit a vapour-pressure curve (Antoine or Clausius-Clapeyron) to your own measured points, show the residuals, and write it as a library entry.");
        cmd.Arguments.Add(name);
        foreach (var o in new Option[] { points, data, boiling, form, molarMass, associating, citation, outFile, add, force }) cmd.Options.Add(o);
        atmospheric.AddTo(cmd);
        common.AddOutput(cmd);

        cmd.SetAction(r =>
        {
            var atmosphere = atmospheric.Read(r).Build().Equipment.Atmosphere;
            string? pointsText = r.GetValue(points), dataFile = r.GetValue(data), boilingText = r.GetValue(boiling);
            int given = new[] { pointsText, dataFile, boilingText }.Count(v => v is not null);
            if (given != 1)
                throw new InputException("--points", given == 0 ? "none" : "several sources",
                    "exactly one of --points 30C:42.5mbar,50C:123mbar, --data FILE.csv or --boiling-point 78C");
            var fitForm = CompoundFit.ParseForm(r.GetValue(form), "--form");
            if (boilingText is not null && fitForm is not (FitForm.Auto or FitForm.Trouton))
                throw new InputException("--form", r.GetValue(form)!, "auto or trouton with --boiling-point (one point fits no slope)");
            var measured = pointsText is not null ? MeasuredPoints.ParseList(pointsText, "--points", atmosphere)
                : dataFile is not null ? MeasuredPoints.ReadCsv(dataFile, "--data", atmosphere)
                : [MeasuredPoints.ParseBoilingPoint(boilingText!, "--boiling-point", atmosphere)];
            var fit = CompoundFit.Make(r.GetValue(name)!, measured, fitForm, r.GetValue(associating), CompoundFit.ParseMolarMass(r.GetValue(molarMass), "--molar-mass"));

            string? outPath = r.GetValue(outFile);
            bool adding = r.GetValue(add), replace = r.GetValue(force);
            string? entry = outPath is not null || adding ? fit.EntryFile(r.GetValue(citation), outPath is not null ? "--out" : "--add") : null;
            string? written = null;
            if (outPath is not null)
            {
                var outcome = SafeFile.Replace(outPath, temp => File.WriteAllText(temp, entry), _ => replace, "--out");
                if (outcome == SaveOutcome.Declined)
                    throw new InputException("--out", outPath, "a file that does not exist yet, or --force to replace it");
                written = Path.GetFullPath(outPath);
            }
            LibraryAddition? added = adding ? UserLibraryFile.Add(r.GetValue(common.Library) ?? SolventLibrary.DefaultUserPath, entry!, replace) : null;

            var o = r.InvocationConfiguration.Output;
            if (common.IsJson(r)) { J.Write(o, Json(fit, written, added)); return CliApp.Ok; }
            foreach (string line in FitText.Lines(fit, common.DisplayUnit(r))) o.WriteLine(line);
            if (written is not null) o.WriteLine($"Library entry written to {written}");
            if (added is not null)
            {
                o.WriteLine($"Added '{fit.Name}' to {added.Path}{(added.Created ? " (new file)" : "")}{(added.Replaced is null ? "" : $", replacing '{added.Replaced}'")}");
                o.WriteLine($"Every verb now knows it, e.g. distillplan setpoints {SolventLibrary.Normalise(fit.Name)}");
            }
            else if (entry is null && fit.MolarMassGPerMol is null)
                o.WriteLine("To keep it: add --molar-mass G and --add (your library) or --out FILE.");
            else if (entry is null)
                o.WriteLine("To keep it: add --add (your library) or --out FILE.");
            return CliApp.Ok;
        });
        return cmd;
    }

    private static string FormName(FitForm f) => CompoundFit.Forms.First(x => x.Form == f).Text;

    private static JsonObject Json(CompoundFit c, string? written, LibraryAddition? added)
    {
        var f = c.Fit;
        static JsonNode Celsius(double k) => J.N(k - PhysicalConstants.ZeroCelsiusK, 3);
        return J.Obj(
            ("name", c.Name),
            ("form", FormName(f.Form)),
            ("equation", f.Form == FitForm.Antoine ? "log10(P/Pa) = a - b/(T/K + c)" : "ln(P/p1_pa) = -(dhvap_j_per_mol/R)(1/T - 1/t1_k)" +
                (f.Form == FitForm.Trouton ? ", dhvap by Watson's rule with watson_tc_k" : "")),
            // Full precision: the coefficients are meant to be copied.
            ("coefficients", J.Obj([.. f.Coefficients.Select(kv => (kv.Key, (JsonNode?)JsonValue.Create(kv.Value)))])),
            ("t_min_c", Celsius(f.TMinK)),
            ("t_max_c", Celsius(f.TMaxK)),
            ("curve_range_c", J.Arr([Celsius(f.Curve.TMinK), Celsius(f.Curve.TMaxK)])),
            ("max_residual_percent", J.N(f.MaxResidualPercent, 4)),
            ("residuals", J.Arr(f.Residuals.Select(p => (JsonNode)J.Obj(
                ("temperature_c", Celsius(p.TemperatureK)), ("measured_mbar", J.N(p.MeasuredPa / 100, 5)),
                ("fitted_mbar", J.N(p.FittedPa / 100, 5)), ("percent", J.N(p.Percent, 4)))))),
            ("enthalpy_of_vaporization_kj_per_mol", J.N(f.EnthalpyOfVaporizationJPerMol / 1000, 4)),
            ("enthalpy_at_c", Celsius(f.EnthalpyAtK)),
            ("normal_boiling_point_c", Celsius(LibraryEntryWriter.NormalBoilingPointOf(f))),
            ("estimate", J.B(f.IsEstimate)),
            ("expected_error_percent", f.IsEstimate ? J.N(VaporPressureFit.TroutonExpectedErrorPercent) : null),
            ("molar_mass_g_per_mol", J.N(c.MolarMassGPerMol)),
            ("caution", FitText.Caution),
            ("library_entry_file", J.S(written)),
            ("added_to", J.S(added?.Path)));
    }
}
