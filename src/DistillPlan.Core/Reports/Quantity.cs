using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Reports;

/// <summary>What a reported number is, which decides how each output shows it.</summary>
public enum QuantityKind
{
    /// <summary>An absolute temperature, stored in K; shown in °C (never in K in a message).</summary>
    Temperature,
    /// <summary>A temperature difference, stored in K (the same size in °C).</summary>
    TemperatureDifference,
    /// <summary>An absolute pressure, stored in Pa; shown in the display unit.</summary>
    Pressure,
    /// <summary>A plain number with an optional unit label (g/h, mol, W).</summary>
    Number,
    /// <summary>A fraction 0…1, shown as a percentage.</summary>
    Percent,
    /// <summary>A mole fraction 0…1, shown with three decimals.</summary>
    MoleFraction,
    /// <summary>Text (a solvent's name, a list of names, a constraint code).</summary>
    Text,
    /// <summary>Yes or no (Value 1 or 0).</summary>
    Flag,
}

/// <summary>
/// One typed value in a finding, a report row or a table cell: SI inside, so every renderer
/// can show it in the unit its reader asked for. Build with the factory methods.
/// </summary>
/// <param name="Kind">What it is.</param>
/// <param name="Value">The number in SI (K, Pa) or as given for plain numbers; NaN for text.</param>
/// <param name="Text">The text of a <see cref="QuantityKind.Text"/> value.</param>
/// <param name="Unit">Unit label of a plain number (shown after it, and the JSON key suffix).</param>
public readonly record struct Quantity(QuantityKind Kind, double Value, string? Text = null, string? Unit = null)
{
    /// <summary>A temperature.</summary>
    public static Quantity Of(Temperature t) => new(QuantityKind.Temperature, t.Kelvin);
    /// <summary>A temperature difference.</summary>
    public static Quantity Of(TemperatureDifference d) => new(QuantityKind.TemperatureDifference, d.Kelvin);
    /// <summary>A pressure.</summary>
    public static Quantity Of(Pressure p) => new(QuantityKind.Pressure, p.Pascal);
    /// <summary>A temperature given in K.</summary>
    public static Quantity Kelvin(double k) => new(QuantityKind.Temperature, k);
    /// <summary>A pressure given in Pa.</summary>
    public static Quantity Pascal(double pa) => new(QuantityKind.Pressure, pa);
    /// <summary>A plain number with a unit label such as "g/h" (empty for none).</summary>
    public static Quantity Number(double value, string unit = "") => new(QuantityKind.Number, value, null, unit);
    /// <summary>A fraction shown as a percentage.</summary>
    public static Quantity Percent(double fraction) => new(QuantityKind.Percent, fraction);
    /// <summary>A mole fraction.</summary>
    public static Quantity MoleFraction(double x) => new(QuantityKind.MoleFraction, x);
    /// <summary>Text.</summary>
    public static Quantity Words(string text) => new(QuantityKind.Text, double.NaN, text);
    /// <summary>Yes or no.</summary>
    public static Quantity Flag(bool yes) => new(QuantityKind.Flag, yes ? 1 : 0);

    /// <summary>The temperature, for a temperature value.</summary>
    public Temperature AsTemperature => Kind == QuantityKind.Temperature ? Temperature.FromKelvin(Value) : throw new InvalidOperationException($"{Kind} is not a temperature");
    /// <summary>The pressure, for a pressure value.</summary>
    public Pressure AsPressure => Kind == QuantityKind.Pressure ? Pressure.FromPascal(Value) : throw new InvalidOperationException($"{Kind} is not a pressure");
}
