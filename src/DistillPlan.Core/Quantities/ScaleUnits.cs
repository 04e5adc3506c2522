namespace DistillPlan.Core.Quantities;

/// <summary>
/// Readers for the equipment sizes people type: volumes, areas, powers, heat-transfer
/// coefficients, volume flows and leak rates. Each returns SI and throws an
/// <see cref="InputException"/> naming the field, the value and what is allowed. Unit
/// spellings are matched exactly (m3 and L, not M3), except that "l" is taken for litres.
/// </summary>
public static class ScaleUnits
{
    /// <summary>A volume [m³]: mL, L or m3 (bare number: L).</summary>
    public static double VolumeM3(string text, string field, double maxM3 = 1000)
    {
        const string allowed = "a volume above zero in mL, L or m3 (e.g. 250mL, 1L, 0.25m3; bare number: L)";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        double? m3 = unit switch { "" or "L" or "l" => n * 1e-3, "mL" or "ml" => n * 1e-6, "m3" or "m³" => n, _ => null };
        return m3 is double v && v > 0 && v <= maxM3 ? v : throw new InputException(field, text, allowed);
    }

    /// <summary>An area [m²]: m2 or cm2 (bare number: m²).</summary>
    public static double AreaM2(string text, string field)
    {
        const string allowed = "an area above zero in m2 or cm2 (e.g. 0.2m2, 450cm2; bare number: m2), at most 1000 m2";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        double? m2 = unit switch { "" or "m2" or "m²" => n, "cm2" or "cm²" => n * 1e-4, _ => null };
        return m2 is double v && v > 0 && v <= 1000 ? v : throw new InputException(field, text, allowed);
    }

    /// <summary>A power [W]: W or kW (bare number: W).</summary>
    public static double PowerW(string text, string field)
    {
        const string allowed = "a power above zero in W or kW (e.g. 400W, 25kW; bare number: W), at most 10 MW";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        double? w = unit switch { "" or "W" => n, "kW" => n * 1e3, "MW" => n * 1e6, _ => null };
        return w is double v && v > 0 && v <= 1e7 ? v : throw new InputException(field, text, allowed);
    }

    /// <summary>An overall heat-transfer coefficient [W/(m²·K)] (bare number, or with W/m2K).</summary>
    public static double HeatTransferWPerM2K(string text, string field)
    {
        const string allowed = "a heat-transfer coefficient from 1 to 5000 W/(m2 K) (e.g. 400 or 400W/m2K)";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        bool known = unit is "" or "W/m2K" or "W/(m2K)" or "W/m2/K" or "W/(m2.K)" or "W/m²K";
        return known && n >= 1 && n <= 5000 ? n : throw new InputException(field, text, allowed);
    }

    /// <summary>A volume flow [m³/s]: m3/h, L/min or L/s (bare number: m³/h).</summary>
    public static double VolumeFlowM3PerS(string text, string field)
    {
        const string allowed = "a pumping speed above zero in m3/h, L/min or L/s (e.g. 2m3/h, 30L/min; bare number: m3/h), at most 100000 m3/h";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        double? s = unit switch
        {
            "" or "m3/h" or "m³/h" => n / 3600,
            "L/min" or "l/min" => n * 1e-3 / 60,
            "L/s" or "l/s" => n * 1e-3,
            _ => null,
        };
        return s is double v && v > 0 && v <= 100000.0 / 3600 ? v : throw new InputException(field, text, allowed);
    }

    /// <summary>
    /// An air leak into the vacuum [kg/s]: kg/h or g/h as a mass flow, or mbar.L/s as a
    /// throughput (converted at 20 °C with air's molar mass; bare number: kg/h).
    /// </summary>
    public static double LeakKgPerS(string text, string field)
    {
        const string allowed = "an air leak above zero in kg/h, g/h or mbar.L/s (e.g. 1kg/h, 0.5mbar.L/s; bare number: kg/h), at most 1000 kg/h";
        var (n, unit) = QuantityText.Split(text, field, allowed);
        double? kgPerS = unit switch
        {
            "" or "kg/h" => n / 3600,
            "g/h" => n / 3.6e6,
            "mbar.L/s" or "mbarL/s" or "mbar·L/s" or "mbar*L/s" => ThroughputToKgPerS(n * 0.1),
            _ => null,
        };
        return kgPerS is double v && v > 0 && v <= 1000.0 / 3600 ? v : throw new InputException(field, text, allowed);
    }

    /// <summary>A volume [m³] as people write it in a message: litres, "250 L", "0.5 L".</summary>
    public static string Litres(double m3) => (m3 * 1e3).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + " L";

    /// <summary>A leak throughput [Pa·m³/s] as a mass flow of air [kg/s] at 20 °C (ideal gas).</summary>
    public static double ThroughputToKgPerS(double paM3PerS) =>
        paM3PerS / (PhysicalConstants.GasConstant * 293.15) * PhysicalConstants.AirMolarMassGPerMol / 1000;
}
