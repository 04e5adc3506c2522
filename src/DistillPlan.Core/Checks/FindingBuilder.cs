using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Checks;

/// <summary>Short helpers so each check reads as its rule, not as dictionary plumbing.</summary>
internal static class F
{
    public static Finding Make(string code, Severity severity, string variant, string[] settings, params (string Key, Quantity Value)[] values) => new()
    {
        Code = code,
        Severity = severity,
        Variant = variant,
        Settings = settings,
        Values = values.ToDictionary(v => v.Key, v => v.Value),
    };

    /// <summary>A check that could not be evaluated: shown, with the reason, never dropped.</summary>
    public static Finding NotEvaluated(string code, string reason, string[] settings, params (string Key, Quantity Value)[] values) =>
        Make(code, Severity.Caution, "not-evaluated", settings, [.. values, ("reason", Quantity.Words(reason))]) with { Evaluated = false };

    public static (string, Quantity) T(string key, Temperature t) => (key, Quantity.Of(t));
    public static (string, Quantity) TK(string key, double kelvin) => (key, Quantity.Kelvin(kelvin));
    public static (string, Quantity) P(string key, Pressure p) => (key, Quantity.Of(p));
    public static (string, Quantity) PPa(string key, double pascal) => (key, Quantity.Pascal(pascal));
    public static (string, Quantity) DT(string key, double kelvin) => (key, Quantity.Of(new TemperatureDifference(kelvin)));
    public static (string, Quantity) N(string key, double value, string unit = "") => (key, Quantity.Number(value, unit));
    public static (string, Quantity) X(string key, double moleFraction) => (key, Quantity.MoleFraction(moleFraction));
    public static (string, Quantity) W(string key, string text) => (key, Quantity.Words(text));
}
