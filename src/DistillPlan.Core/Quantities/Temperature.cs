using System.Globalization;

namespace DistillPlan.Core.Quantities;

/// <summary>An absolute (thermodynamic) temperature, stored in kelvin.</summary>
public readonly record struct Temperature : IComparable<Temperature>
{
    private Temperature(double kelvin) => Kelvin = kelvin;

    /// <summary>The temperature [K].</summary>
    public double Kelvin { get; }

    /// <summary>The temperature [°C].</summary>
    public double Celsius => Kelvin - PhysicalConstants.ZeroCelsiusK;

    /// <summary>From kelvin; refuses values at or below absolute zero.</summary>
    public static Temperature FromKelvin(double kelvin) =>
        double.IsFinite(kelvin) && kelvin > 0
            ? new Temperature(kelvin)
            : throw new InputException("temperature", kelvin.ToString("G6", CultureInfo.InvariantCulture) + " K",
                "a temperature above absolute zero (0 K, -273.15 °C)");

    /// <summary>From degrees Celsius.</summary>
    public static Temperature FromCelsius(double celsius) => FromKelvin(celsius + PhysicalConstants.ZeroCelsiusK);

    /// <summary>This temperature shifted by a difference.</summary>
    public static Temperature operator +(Temperature t, TemperatureDifference d) => FromKelvin(t.Kelvin + d.Kelvin);

    /// <summary>This temperature shifted down by a difference.</summary>
    public static Temperature operator -(Temperature t, TemperatureDifference d) => FromKelvin(t.Kelvin - d.Kelvin);

    /// <summary>The difference between two temperatures.</summary>
    public static TemperatureDifference operator -(Temperature a, Temperature b) => new(a.Kelvin - b.Kelvin);

    /// <inheritdoc />
    public int CompareTo(Temperature other) => Kelvin.CompareTo(other.Kelvin);

    /// <summary>True when a is colder than b.</summary>
    public static bool operator <(Temperature a, Temperature b) => a.Kelvin < b.Kelvin;
    /// <summary>True when a is warmer than b.</summary>
    public static bool operator >(Temperature a, Temperature b) => a.Kelvin > b.Kelvin;
    /// <summary>True when a is colder than or as warm as b.</summary>
    public static bool operator <=(Temperature a, Temperature b) => a.Kelvin <= b.Kelvin;
    /// <summary>True when a is warmer than or as warm as b.</summary>
    public static bool operator >=(Temperature a, Temperature b) => a.Kelvin >= b.Kelvin;

    /// <summary>The colder of two temperatures.</summary>
    public static Temperature Min(Temperature a, Temperature b) => a <= b ? a : b;
    /// <summary>The warmer of two temperatures.</summary>
    public static Temperature Max(Temperature a, Temperature b) => a >= b ? a : b;

    /// <summary>Shown in °C with one decimal, the way a bath is set.</summary>
    public override string ToString() => Celsius.ToString("0.0", CultureInfo.InvariantCulture) + " °C";
}

/// <summary>A temperature difference [K] (the same size in °C), as in the ΔT rule.</summary>
public readonly record struct TemperatureDifference(double Kelvin)
{
    /// <summary>Shown in K.</summary>
    public override string ToString() => Kelvin.ToString("0.#", CultureInfo.InvariantCulture) + " K";
}
