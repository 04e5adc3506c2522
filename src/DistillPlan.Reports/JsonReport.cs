using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;
using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Reports;

/// <summary>Source-generated JSON metadata for the node tree the writers build (no reflection: trims and compiles ahead of time).</summary>
[JsonSourceGenerationOptions(WriteIndented = true)]
[JsonSerializable(typeof(JsonNode))]
[JsonSerializable(typeof(JsonObject))]
internal sealed partial class ReportJsonContext : JsonSerializerContext;

/// <summary>
/// JSON for scripts: mbar and °C always, snake_case fields, the fixed fields of the interface
/// contract (vapor_temperature_c, vacuum_setpoint_mbar, checks …) plus everything else the
/// report holds. Keys get their unit as a suffix: _c (°C), _mbar, _k (temperature difference).
/// </summary>
public static class JsonReport
{
    private static readonly JsonSerializerOptions Options = new(ReportJsonContext.Default.Options)
    {
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, // keep °C and Δ readable
        WriteIndented = true,
        TypeInfoResolver = ReportJsonContext.Default,
    };

    /// <summary>Messages in JSON are worded in mbar, like its numbers.</summary>
    private static readonly DisplayFormat Mbar = DisplayFormat.Default;

    /// <summary>The report as indented JSON text.</summary>
    public static string Render(Report r) => Write(ToNode(r));

    /// <summary>Any node as indented JSON text (for the verbs whose output is not a report).</summary>
    public static string Write(JsonNode node) => node.ToJsonString(Options);

    /// <summary>The report as a JSON object.</summary>
    public static JsonObject ToNode(Report r)
    {
        var o = new JsonObject { ["kind"] = r.Kind, ["title"] = r.Title };
        var flat = r.Sections.Where(s => s.JsonGroup is null).ToList();
        foreach (var row in flat.SelectMany(s => s.Rows).Concat(r.Header)) AddRow(o, row);
        foreach (var table in flat.SelectMany(s => s.Tables)) o[table.JsonKey] = TableNode(table);
        foreach (var section in r.Sections.Where(s => s.JsonGroup is not null))
        {
            var group = new JsonObject();
            foreach (var row in section.Rows) AddRow(group, row);
            foreach (var table in section.Tables) group[table.JsonKey] = TableNode(table);
            if (o[section.JsonGroup!] is not JsonArray list) o[section.JsonGroup!] = list = [];
            list.Add((JsonNode)group);
        }
        o["checks"] = Findings(r.Checks);
        o["notes"] = Findings(r.Notes);
        o["assumptions"] = new JsonArray([.. r.Assumptions.Select(AssumptionNode)]);
        o["sources"] = new JsonArray([.. r.Sources.Select(s => (JsonNode)new JsonObject { ["key"] = s.Key, ["citation"] = s.Citation })]);
        o["cautions"] = new JsonArray([.. r.Cautions.Select(c => (JsonNode)JsonValue.Create(c))]);
        o["program"] = r.Program;
        o["made_utc"] = r.Made.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", System.Globalization.CultureInfo.InvariantCulture);
        var inputs = new JsonObject();
        foreach (var (k, v) in r.Inputs) inputs[k] = v;
        o["inputs"] = inputs;
        if (r.UserTitle is { Length: > 0 } t) o["user_title"] = t;
        if (r.UserNotes is { Length: > 0 } n) o["user_notes"] = n;
        return o;
    }

    /// <summary>A finding: code, severity, message and action in mbar and °C, its settings and typed values.</summary>
    public static JsonObject FindingNode(Finding f)
    {
        var values = new JsonObject();
        foreach (var (k, q) in f.Values) if (q.Kind != QuantityKind.Text) values[Key(k, q.Kind)] = Value(q);
        return new JsonObject
        {
            ["code"] = f.Code,
            ["severity"] = f.SeverityWord,
            ["message"] = f.Message(Mbar),
            ["action"] = f.Action(Mbar),
            ["evaluated"] = f.Evaluated,
            ["settings"] = new JsonArray([.. f.Settings.Select(s => (JsonNode)JsonValue.Create(s))]),
            ["values"] = values,
        };
    }

    private static JsonArray Findings(IEnumerable<Finding> fs) => new([.. fs.Select(f => (JsonNode)FindingNode(f))]);

    private static JsonObject AssumptionNode(Assumption a)
    {
        var o = new JsonObject { ["key"] = a.Key, ["name"] = a.Label, ["value"] = Mbar.Format(a.Value) };
        // The number too, in JSON units, under a key that says its unit (value_c, value_mbar).
        string numberKey = Key("value", a.Value.Kind);
        if (a.Value.Kind != QuantityKind.Text) o[numberKey == "value" ? "value_number" : numberKey] = Value(a.Value);
        o["is_default"] = a.IsDefault;
        o["basis"] = a.Basis;
        return o;
    }

    private static void AddRow(JsonObject o, Row row)
    {
        if (row.JsonKey is null) return;
        var kind = row.Values.Count > 0 ? row.Values[0].Kind : QuantityKind.Text;
        if (row.Names is { } names)
        {
            var map = new JsonObject();
            for (int i = 0; i < names.Count; i++) map[names[i]] = Value(row.Values[i]);
            o[row.JsonKey] = map;
        }
        else if (row.IsList || row.Values.Count != 1)
            o[Key(row.JsonKey, kind)] = new JsonArray([.. row.Values.Select(Value)]);
        else o[Key(row.JsonKey, kind)] = Value(row.Values[0]);
    }

    private static JsonArray TableNode(Table t)
    {
        var rows = new JsonArray();
        foreach (var row in t.Rows)
        {
            var o = new JsonObject();
            for (int i = 0; i < t.Columns.Count; i++)
            {
                var c = t.Columns[i];
                if (c.JsonName is string name)
                {
                    if (o[c.JsonKey] is not JsonObject group) o[c.JsonKey] = group = new JsonObject();
                    group[name] = Value(row.Cells[i]);
                }
                else o[Key(c.JsonKey, c.Kind)] = Value(row.Cells[i]);
            }
            o["checks"] = Findings(row.Findings);
            rows.Add((JsonNode)o); // the JsonNode overload: Add<T> is the reflection path (trim warning IL2026)
        }
        return rows;
    }

    /// <summary>A key with its unit suffix.</summary>
    public static string Key(string key, QuantityKind kind) => kind switch
    {
        QuantityKind.Temperature => key + "_c",
        QuantityKind.Pressure => key + "_mbar",
        QuantityKind.TemperatureDifference => key + "_k",
        _ => key,
    };

    /// <summary>A value in JSON units: °C (2 decimals), mbar (6 significant figures), fractions, numbers, text, true/false; null for a number that is not finite (a time that never ends).</summary>
    public static JsonNode? Value(Quantity q) => q.Kind != QuantityKind.Text && !double.IsFinite(q.Value) ? null : q.Kind switch
    {
        QuantityKind.Temperature => JsonValue.Create(Math.Round(q.Value - Core.PhysicalConstants.ZeroCelsiusK, 2)),
        QuantityKind.TemperatureDifference => JsonValue.Create(Math.Round(q.Value, 3)),
        QuantityKind.Pressure => JsonValue.Create(Significant(q.Value / 100, 6)),
        QuantityKind.Percent => JsonValue.Create(Math.Round(q.Value, 5)),
        QuantityKind.MoleFraction or QuantityKind.Number => JsonValue.Create(Significant(q.Value, 6)),
        QuantityKind.Flag => JsonValue.Create(q.Value != 0),
        _ => JsonValue.Create(q.Text),
    };

    /// <summary>Rounds to significant figures, so small pressures never become 0.</summary>
    public static double Significant(double v, int figures)
    {
        if (v == 0 || !double.IsFinite(v)) return v;
        int decimals = figures - 1 - (int)Math.Floor(Math.Log10(Math.Abs(v)));
        return decimals < 0 ? Math.Round(v / Math.Pow(10, -decimals)) * Math.Pow(10, -decimals) : Math.Round(v, Math.Min(decimals, 15));
    }
}
