using System.CommandLine;
using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Cli.Commands;

/// <summary>Output and library options shared by the verbs.</summary>
internal sealed class CommonOptions
{
    public static readonly string[] Formats = ["text", "json", "markdown", "csv"];

    public Option<bool> Json { get; } = new("--json") { Description = "Write JSON (mbar and °C, snake_case fields); the same as --format json." };
    public Option<string?> Format { get; } = new("--format") { Description = "Output format: text (default), json, markdown or csv." };
    public Option<string?> Unit { get; } = new("--unit") { Description = "Pressure unit for people's output: mbar (default), hPa, Pa, kPa, bar, Torr, mmHg, inHg, psia, atm." };
    public Option<string?> Library { get; } = new("--library") { Description = "A solvents YAML file merged over the shipped library (default: ~/.config/distillplan/solvents.yaml when present)." };
    public Option<string?> Output { get; } = new("--output", "-o") { Description = "Write the output to this file instead of the terminal." };
    public Option<string?> Plot { get; } = new("--plot") { Description = "Also draw the plot to FILE.svg or FILE.png." };
    public Option<bool> Force { get; } = new("--force") { Description = "Replace existing --output or --plot files (otherwise they are never overwritten)." };

    /// <summary>Adds the output and library options; <paramref name="files"/> adds -o, --plot and --force.</summary>
    public void AddOutput(Command c, bool files = false, bool formats = false)
    {
        c.Options.Add(Json);
        if (formats) c.Options.Add(Format);
        c.Options.Add(Unit);
        c.Options.Add(Library);
        if (!files) return;
        c.Options.Add(Output);
        c.Options.Add(Plot);
        c.Options.Add(Force);
    }

    public SolventLibrary LoadLibrary(ParseResult r) => SolventLibrary.LoadWithUser(r.GetValue(Library));

    /// <summary>The unit asked for, or <paramref name="fallback"/> (a plan file's) when --unit is not given.</summary>
    public PressureUnit DisplayUnit(ParseResult r, string? fallback = null) => PressureUnits.ForDisplay(r.GetValue(Unit) ?? fallback ?? "mbar");

    public bool IsJson(ParseResult r) => FormatOf(r) == "json";

    /// <summary>text, json, markdown or csv; --json is the same as --format json.</summary>
    public string FormatOf(ParseResult r)
    {
        string? given = r.GetValue(Format)?.Trim().ToLowerInvariant();
        if (given is not null && !Formats.Contains(given)) throw new InputException("--format", given, string.Join(", ", Formats));
        if (r.GetValue(Json))
        {
            if (given is not null && given != "json") throw new InputException("--format", given, "json when --json is given (or leave out --json)");
            return "json";
        }
        return given ?? "text";
    }

    public DisplayFormat Display(ParseResult r, string? fallback = null) => new(DisplayUnit(r, fallback));
}

/// <summary>
/// The plan settings as command-line options, generated from the settings table (one option per
/// setting, spelt as its key, its help text from the table).
/// </summary>
internal sealed class SettingOptions
{
    private readonly List<(PlanSetting Setting, Option<string?> Option)> _options;

    public SettingOptions(params SettingGroup[] groups) : this(PlanSettings.All.Where(s => groups.Contains(s.Group))) { }

    public SettingOptions(IEnumerable<PlanSetting> settings) =>
        _options = settings.Select(s => (s, new Option<string?>(s.Option) { Description = s.Help })).ToList();

    /// <summary>Only these setting keys.</summary>
    public static SettingOptions Of(params string[] keys) => new(keys.Select(PlanSettings.Get));

    public void AddTo(Command c)
    {
        foreach (var (_, o) in _options) c.Options.Add(o);
    }

    /// <summary>What the user typed, by setting key.</summary>
    public PlanInputs Read(ParseResult r) =>
        _options.Aggregate(new PlanInputs(), (inputs, t) => r.GetValue(t.Option) is string v ? inputs.With(t.Setting.Key, v) : inputs);
}
