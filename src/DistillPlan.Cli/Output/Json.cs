using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace DistillPlan.Cli.Output;

/// <summary>The JSON writer every verb uses: snake_case, indented, numbers as numbers.</summary>
internal static class Json
{
    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.SnakeCaseLower,
        DictionaryKeyPolicy = null,
        WriteIndented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,   // keep °C and Δ readable
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
        NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
    };

    public static void Write(TextWriter output, object value) => output.WriteLine(JsonSerializer.Serialize(value, value.GetType(), Options));

    /// <summary>Rounds for output so JSON is readable and stable (the core keeps full precision).</summary>
    public static double R(double v, int digits = 3) => Math.Round(v, digits);
}
