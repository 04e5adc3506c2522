using System.Text.Json.Nodes;
using DistillPlan.Reports;

namespace DistillPlan.Cli.Output;

/// <summary>Small builders for the JSON node trees of the verbs that are not reports (written through the source-generated context).</summary>
internal static class J
{
    public static JsonObject Obj(params (string Key, JsonNode? Value)[] fields)
    {
        var o = new JsonObject();
        foreach (var (k, v) in fields) o[k] = v;
        return o;
    }

    public static JsonArray Arr(IEnumerable<JsonNode?> items) => new([.. items]);

    /// <summary>A number rounded for reading; small values keep significant figures instead of becoming 0.</summary>
    public static JsonNode N(double v, int digits = 3) => JsonValue.Create(Math.Abs(v) < 1 ? JsonReport.Significant(v, digits + 1) : Math.Round(v, digits));

    public static JsonNode? N(double? v, int digits = 3) => v is double d ? N(d, digits) : null;

    public static JsonNode? S(string? s) => s is null ? null : JsonValue.Create(s);

    public static JsonNode B(bool b) => JsonValue.Create(b);

    /// <summary>A map of names to numbers.</summary>
    public static JsonObject Map(IEnumerable<KeyValuePair<string, double>> d, int digits)
    {
        var o = new JsonObject();
        foreach (var (k, v) in d) o[k] = N(v, digits);
        return o;
    }

    public static JsonArray Strings(IEnumerable<string> items) => Arr(items.Select(S));

    public static void Write(TextWriter o, JsonNode node) => o.WriteLine(JsonReport.Write(node));
}
