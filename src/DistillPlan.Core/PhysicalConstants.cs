namespace DistillPlan.Core;

/// <summary>Constants used across the core, each with its source.</summary>
public static class PhysicalConstants
{
    /// <summary>Molar gas constant R [J/(mol·K)] (CODATA 2018, exact).</summary>
    public const double GasConstant = 8.314462618;

    /// <summary>0 °C in kelvin [K] (definition of the Celsius scale).</summary>
    public const double ZeroCelsiusK = 273.15;

    /// <summary>Standard atmosphere [Pa] (definition; ICAO standard atmosphere at sea level).</summary>
    public const double StandardAtmospherePa = 101325.0;

    /// <summary>Molar mass of dry air [g/mol] (ICAO standard atmosphere, 28.9644).</summary>
    public const double AirMolarMassGPerMol = 28.9644;
}
