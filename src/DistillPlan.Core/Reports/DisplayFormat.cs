using System.Globalization;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Reports;

/// <summary>
/// How a reader wants numbers shown: the pressure unit (temperatures are always °C, the unit
/// every bath and thermometer in the trade reads). The one place a typed value becomes text,
/// so a Torr plan says Torr in every line, messages included.
/// </summary>
/// <param name="PressureUnit">The display unit for pressures.</param>
public sealed record DisplayFormat(PressureUnit PressureUnit)
{
    /// <summary>mbar, the default of the interface.</summary>
    public static DisplayFormat Default { get; } = new(PressureUnits.Millibar);

    /// <summary>A value as text with its unit.</summary>
    public string Format(Quantity q) => q.Kind switch
    {
        QuantityKind.Temperature => Temperature.FromKelvin(q.Value).ToString(),
        QuantityKind.TemperatureDifference => new TemperatureDifference(q.Value).ToString(),
        QuantityKind.Pressure => PressureUnits.Format(Pressure.FromPascal(q.Value), PressureUnit),
        QuantityKind.Percent => (100 * q.Value).ToString("0.#", CultureInfo.InvariantCulture) + " %",
        QuantityKind.MoleFraction => q.Value.ToString("0.000", CultureInfo.InvariantCulture),
        QuantityKind.Number => Number(q.Value) + (string.IsNullOrEmpty(q.Unit) ? "" : " " + q.Unit),
        QuantityKind.Flag => q.Value != 0 ? "yes" : "no",
        _ => q.Text ?? "",
    };

    /// <summary>A value as a bare number in the unit <see cref="UnitOf"/> names (for table cells and CSV).</summary>
    public string FormatBare(Quantity q) => q.Kind switch
    {
        QuantityKind.Temperature => (q.Value - PhysicalConstants.ZeroCelsiusK).ToString("0.0", CultureInfo.InvariantCulture),
        QuantityKind.TemperatureDifference => q.Value.ToString("0.#", CultureInfo.InvariantCulture),
        QuantityKind.Pressure => PressureUnits.Format(Pressure.FromPascal(q.Value), PressureUnit).Split(' ')[0],
        QuantityKind.Percent => (100 * q.Value).ToString("0.0", CultureInfo.InvariantCulture),
        QuantityKind.MoleFraction => q.Value.ToString("0.000", CultureInfo.InvariantCulture),
        // Bare numbers go to tables and spreadsheets: keep six significant figures.
        QuantityKind.Number => q.Value.ToString("G6", CultureInfo.InvariantCulture),
        QuantityKind.Flag => q.Value != 0 ? "yes" : "no",
        _ => q.Text ?? "",
    };

    /// <summary>The unit a bare value of this kind is in ("°C", the pressure unit, "%" …).</summary>
    public string UnitOf(QuantityKind kind, string? numberUnit = null) => kind switch
    {
        QuantityKind.Temperature => "°C",
        QuantityKind.TemperatureDifference => "K",
        QuantityKind.Pressure => PressureUnit.Symbol,
        QuantityKind.Percent => "%",
        QuantityKind.MoleFraction => "mol/mol",
        QuantityKind.Number => numberUnit ?? "",
        _ => "",
    };

    /// <summary>Three significant figures for small and large numbers, plain decimals otherwise.</summary>
    public static string Number(double v)
    {
        if (!double.IsFinite(v)) return v.ToString(CultureInfo.InvariantCulture);
        double a = Math.Abs(v);
        if (a == 0) return "0";
        if (a >= 100) return v.ToString("0", CultureInfo.InvariantCulture);
        if (a >= 10) return v.ToString("0.#", CultureInfo.InvariantCulture);
        if (a >= 0.01) return v.ToString("0.##", CultureInfo.InvariantCulture);
        return v.ToString("G3", CultureInfo.InvariantCulture);
    }
}
