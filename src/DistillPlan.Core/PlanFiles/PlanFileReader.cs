using DistillPlan.Core.Planning;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// Reads a plan file (docs/plan-file.md). Strict on purpose: an unknown key is more likely a
/// typing error than a wish, so it is refused with its line rather than silently ignored.
/// </summary>
public static class PlanFileReader
{
    /// <summary>The setting keys, spelt like the command-line options, with their accessors.</summary>
    internal static readonly (string Key, Func<PlanInputs, string?> Get, Func<PlanInputs, string, PlanInputs> Set)[] Settings =
    [
        ("vapor-temp", i => i.VaporTemp, (i, v) => i with { VaporTemp = v }),
        ("bath-max", i => i.BathMax, (i, v) => i with { BathMax = v }),
        ("heating", i => i.Heating, (i, v) => i with { Heating = v }),
        ("coolant-temp", i => i.CoolantTemp, (i, v) => i with { CoolantTemp = v }),
        ("pump", i => i.Pump, (i, v) => i with { Pump = v }),
        ("pump-limit", i => i.PumpLimit, (i, v) => i with { PumpLimit = v }),
        ("atmospheric", i => i.Atmospheric, (i, v) => i with { Atmospheric = v }),
        ("altitude", i => i.Altitude, (i, v) => i with { Altitude = v }),
        ("delta-t", i => i.DeltaT, (i, v) => i with { DeltaT = v }),
        ("product-max", i => i.ProductMax, (i, v) => i with { ProductMax = v }),
    ];

    /// <summary>Reads a plan file from disk.</summary>
    public static PlanDocument Load(string path)
    {
        string text;
        try { text = File.ReadAllText(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new PlanFileException(path, 0, "cannot be read: " + e.Message);
        }
        return Parse(text, path);
    }

    /// <summary>Reads plan-file text; <paramref name="file"/> names it in messages.</summary>
    public static PlanDocument Parse(string text, string file)
    {
        var stream = new YamlStream();
        try { stream.Load(new StringReader(text)); }
        catch (YamlException e) { throw new PlanFileException(file, (int)e.Start.Line, "not valid YAML: " + e.Message.Split('\n')[0]); }
        if (stream.Documents.Count == 0 || stream.Documents[0].RootNode is not YamlMappingNode root)
            throw new PlanFileException(file, 1, $"expected a mapping that starts with 'format: {PlanDocument.FormatTag}'");

        var top = Map(root, file, "format", "title", "notes", "charge", "product", "settings", "display");
        string format = Scalar(top, "format", file, root) ?? throw new PlanFileException(file, 1, $"missing 'format: {PlanDocument.FormatTag}'");
        if (format != PlanDocument.FormatTag)
            throw new PlanFileException(file, Line(top["format"]), $"format '{format}' is not supported; this program reads {PlanDocument.FormatTag}");

        var doc = new PlanDocument
        {
            Title = Scalar(top, "title", file, root) ?? "",
            Notes = Scalar(top, "notes", file, root) ?? "",
        };

        var charge = Child(top, "charge", file) ?? throw new PlanFileException(file, 1, "missing the 'charge' section with 'solvents'");
        var c = Map(charge, file, "solvents", "basis", "model");
        doc = doc with
        {
            Charge = Scalar(c, "solvents", file, charge) ?? throw new PlanFileException(file, Line(charge), "charge: missing 'solvents', e.g. solvents: ethanol=30,water=70"),
            Basis = ReadBasis(c, file, charge),
            Model = Scalar(c, "model", file, charge) ?? "",
        };
        if (doc.Model is not ("" or "unifac" or "ideal"))
            throw new PlanFileException(file, Line(c["model"]), $"charge.model: '{doc.Model}' is not valid; expected unifac or ideal (or leave it out)");

        if (Child(top, "product", file) is YamlMappingNode product)
        {
            var p = Map(product, file, "mass", "molar-mass");
            doc = doc with { ProductMass = Scalar(p, "mass", file, product) ?? "", ProductMolarMass = Scalar(p, "molar-mass", file, product) ?? "" };
        }

        if (Child(top, "settings", file) is YamlMappingNode settings)
        {
            var s = Map(settings, file, Settings.Select(k => k.Key).ToArray());
            var inputs = new PlanInputs();
            foreach (var (key, _, set) in Settings)
                if (Scalar(s, key, file, settings) is string v && v.Length > 0) inputs = set(inputs, v);
            doc = doc with { Inputs = inputs };
        }

        if (Child(top, "display", file) is YamlMappingNode display)
        {
            var d = Map(display, file, "pressure-unit");
            doc = doc with { PressureUnit = Scalar(d, "pressure-unit", file, display) ?? "mbar" };
        }
        return doc;
    }

    private static Basis ReadBasis(Dictionary<string, YamlNode> c, string file, YamlNode parent)
    {
        string word = Scalar(c, "basis", file, parent) ?? "volume";
        try { return PlanDocument.ParseBasis(word); }
        catch (InputException) { throw new PlanFileException(file, Line(c["basis"]), $"charge.basis: '{word}' is not valid; expected volume, mass or mole"); }
    }

    private static Dictionary<string, YamlNode> Map(YamlMappingNode node, string file, params string[] allowed)
    {
        var result = new Dictionary<string, YamlNode>(StringComparer.Ordinal);
        foreach (var (k, v) in node.Children)
        {
            string key = (k as YamlScalarNode)?.Value ?? "";
            if (!allowed.Contains(key))
                throw new PlanFileException(file, Line(k), $"unknown key '{key}'; expected one of {string.Join(", ", allowed)}");
            result[key] = v;
        }
        return result;
    }

    private static YamlMappingNode? Child(Dictionary<string, YamlNode> map, string key, string file) =>
        !map.TryGetValue(key, out var node) ? null
        : node is YamlMappingNode m ? m
        : node is YamlScalarNode { Value: null or "" } ? null
        : throw new PlanFileException(file, Line(node), $"'{key}' must be a section of 'key: value' lines");

    private static string? Scalar(Dictionary<string, YamlNode> map, string key, string file, YamlNode parent)
    {
        if (!map.TryGetValue(key, out var node)) return null;
        if (node is not YamlScalarNode s) throw new PlanFileException(file, Line(node), $"'{key}' must be a single value");
        // An unquoted empty value or ~ is YAML null: treated as "not given".
        return s.Style == ScalarStyle.Plain && s.Value is null or "~" or "null" ? null : s.Value;
    }

    private static int Line(YamlNode node) => (int)node.Start.Line;
}
