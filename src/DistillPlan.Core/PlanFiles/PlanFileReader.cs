using DistillPlan.Core.Library;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// Reads a plan file (docs/plan-file.md). Strict on purpose: an unknown key is more likely a
/// typing error than a wish, so it is refused with its line rather than silently ignored, and
/// every value is read by the same parser as its command-line option, with the file's line on error.
/// The sections and keys come from the settings table (<see cref="PlanSettings"/>).
/// </summary>
public static class PlanFileReader
{
    /// <summary>The sections that hold settings, in file order.</summary>
    internal static readonly string[] SettingSections = ["charge", "product", "settings", "strip"];

    /// <summary>Reads a plan file from disk.</summary>
    public static PlanDocument Load(string path)
    {
        string text = YamlFileReader.ReadText(path, MaxFileBytes, (line, _, problem) => new PlanFileException(path, line, problem));
        return Parse(text, path);
    }

    /// <summary>Largest plan file read: a plan with pages of notes is a few kB.</summary>
    public const long MaxFileBytes = 1 << 20;

    /// <summary>Reads plan-file text; <paramref name="file"/> names it in messages.</summary>
    public static PlanDocument Parse(string text, string file)
    {
        var rootNode = YamlFileReader.Parse(text, (line, _, problem) => new PlanFileException(file, line, problem));
        if (rootNode is not YamlMappingNode root)
            throw new PlanFileException(file, 1, $"expected a mapping that starts with 'format: {PlanDocument.FormatTag}'");

        var top = Map(root, file, ["format", "title", "notes", .. SettingSections, "display"]);
        string format = Scalar(top, "format", file) ?? throw new PlanFileException(file, 1, $"missing 'format: {PlanDocument.FormatTag}'");
        if (format != PlanDocument.FormatTag)
            throw new PlanFileException(file, Line(top["format"]), $"format '{format}' is not supported; this program reads {PlanDocument.FormatTag}");

        var doc = new PlanDocument { Title = Scalar(top, "title", file) ?? "", Notes = Scalar(top, "notes", file) ?? "" };
        var lines = new Dictionary<string, (int Line, string Where)>();
        var inputs = new PlanInputs();
        foreach (string section in SettingSections)
        {
            var settings = PlanSettings.All.Where(s => s.FileSection == section).ToList();
            if (Child(top, section, file) is not YamlMappingNode node)
            {
                if (section == "charge") throw new PlanFileException(file, 1, "missing the 'charge' section with 'solvents'");
                continue;
            }
            var keys = settings.Select(s => s.FileKey).ToList();
            if (section == "charge") keys.Insert(0, "solvents");
            var map = Map(node, file, keys);
            if (section == "charge")
                doc = doc with { Charge = Scalar(map, "solvents", file) ?? throw new PlanFileException(file, Line(node), "charge: missing 'solvents', e.g. solvents: ethanol=30,water=70") };
            foreach (var s in settings)
                if (Scalar(map, s.FileKey, file) is string v && v.Trim().Length > 0)
                {
                    inputs = inputs.With(s.Key, v);
                    lines[s.Option] = (Line(map[s.FileKey]), $"{section}.{s.FileKey}");
                }
        }
        // Every value is read now, so a bad one is reported with its line, not later as an option.
        try { inputs.Build(); }
        catch (InputException e) when (lines.TryGetValue(e.Field, out var at))
        {
            throw new PlanFileException(file, at.Line, $"{at.Where}: '{e.Value}' is not valid; expected {e.Allowed}");
        }
        doc = doc with { Inputs = inputs };

        if (Child(top, "display", file) is YamlMappingNode display)
        {
            var d = Map(display, file, ["pressure-unit"]);
            string unit = Scalar(d, "pressure-unit", file) ?? "mbar";
            try { unit = PressureUnits.ForDisplay(unit).Symbol; }
            catch (InputException e) { throw new PlanFileException(file, Line(d["pressure-unit"]), $"display.pressure-unit: '{unit}' is not valid; expected {e.Allowed}"); }
            doc = doc with { PressureUnit = unit };
        }
        return doc;
    }

    private static Dictionary<string, YamlNode> Map(YamlMappingNode node, string file, IReadOnlyList<string> allowed)
    {
        var result = new Dictionary<string, YamlNode>(StringComparer.Ordinal);
        foreach (var (k, v) in node.Children)
        {
            string key = k is YamlScalarNode ks ? (string.IsNullOrEmpty(ks.Value) ? "(empty key)" : ks.Value)
                : throw new PlanFileException(file, Line(k), $"a key must be a plain name, not a {(k is YamlSequenceNode ? "list" : "mapping")}; expected one of {string.Join(", ", allowed)}");
            if (!allowed.Contains(key))
                throw new PlanFileException(file, Line(k), $"unknown key '{key}'; expected one of {string.Join(", ", allowed)}");
            if (!result.TryAdd(key, v))
                throw new PlanFileException(file, Line(k), $"key '{key}' is given twice");
            result[key] = v;
        }
        return result;
    }

    private static YamlMappingNode? Child(Dictionary<string, YamlNode> map, string key, string file) =>
        !map.TryGetValue(key, out var node) ? null
        : node is YamlMappingNode m ? m
        : node is YamlScalarNode { Value: null or "" } ? null
        : throw new PlanFileException(file, Line(node), $"'{key}' must be a section of 'key: value' lines");

    private static string? Scalar(Dictionary<string, YamlNode> map, string key, string file)
    {
        if (!map.TryGetValue(key, out var node)) return null;
        if (node is not YamlScalarNode s) throw new PlanFileException(file, Line(node), $"'{key}' must be a single value");
        // An unquoted empty value or ~ is YAML null: treated as "not given".
        return s.Style == ScalarStyle.Plain && s.Value is null or "~" or "null" ? null : s.Value;
    }

    private static int Line(YamlNode node) => (int)node.Start.Line;
}
