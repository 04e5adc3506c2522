using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>
/// The plan settings as the user wrote them (command-line options, text-UI fields, plan
/// files), before parsing. Null or empty means "use the default". One parser for all three
/// front ends, so a value means the same everywhere.
/// </summary>
public sealed record PlanInputs
{
    /// <summary>--vapor-temp: preferred vapour temperature.</summary>
    public string? VaporTemp { get; init; }
    /// <summary>--bath-max: highest heating-medium temperature.</summary>
    public string? BathMax { get; init; }
    /// <summary>--coolant-temp: coolant temperature.</summary>
    public string? CoolantTemp { get; init; }
    /// <summary>--pump-limit: the pump's ultimate pressure.</summary>
    public string? PumpLimit { get; init; }
    /// <summary>--delta-t: both ΔT steps ("20"), or bath→vapour and vapour→condenser ("25,20").</summary>
    public string? DeltaT { get; init; }
    /// <summary>--product-max: product maximum temperature.</summary>
    public string? ProductMax { get; init; }
    /// <summary>--atmospheric: local atmospheric pressure.</summary>
    public string? Atmospheric { get; init; }
    /// <summary>--altitude: altitude in metres, for the ICAO standard atmosphere.</summary>
    public string? Altitude { get; init; }
    /// <summary>--heating: water-bath, oil-bath or jacket.</summary>
    public string? Heating { get; init; }
    /// <summary>--pump: diaphragm, rotary-vane, aspirator or liquid-ring.</summary>
    public string? Pump { get; init; }

    private static bool Given(string? s) => !string.IsNullOrWhiteSpace(s);

    /// <summary>The local atmospheric pressure these inputs say (needed first: gauge readings add it).</summary>
    public Pressure ParseAtmosphere()
    {
        if (Given(Atmospheric) && Given(Altitude))
            throw new InputException("--atmospheric", Atmospheric!, "either --atmospheric or --altitude, not both");
        if (Given(Altitude))
        {
            string metres = Altitude!.Trim().TrimEnd('m', 'M').Trim();
            if (!double.TryParse(metres, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double h))
                throw new InputException("--altitude", Altitude!, "an altitude in metres, e.g. 450 or 450m");
            return Pressure.AtAltitude(h);
        }
        var standard = Pressure.FromPascal(PhysicalConstants.StandardAtmospherePa);
        if (!Given(Atmospheric)) return standard;
        var p = PressureUnits.Parse(Atmospheric!, "--atmospheric", standard);
        if (p.Millibar < 500 || p.Millibar > 1100)
            throw new InputException("--atmospheric", Atmospheric!, "a barometric pressure from 500 to 1100 mbar (absolute)");
        return p;
    }

    /// <summary>Parses everything into the equipment and the rules; bad values throw <see cref="InputException"/>.</summary>
    public (Equipment Equipment, Rules Rules) Build()
    {
        var atmosphere = ParseAtmosphere();
        var userEquipment = new HashSet<string>();
        var userRules = new HashSet<string>();
        var equipment = new Equipment { Atmosphere = atmosphere };
        var rules = new Rules();
        if (Given(Atmospheric) || Given(Altitude)) userEquipment.Add("atmospheric");

        if (Given(Heating))
        {
            var medium = Heating!.Trim().ToLowerInvariant() switch
            {
                "water-bath" or "water" => HeatingMedium.WaterBath,
                "oil-bath" or "oil" => HeatingMedium.OilBath,
                "jacket" => HeatingMedium.Jacket,
                _ => throw new InputException("--heating", Heating!, "water-bath, oil-bath or jacket"),
            };
            equipment = equipment with { Heating = medium, HeatingMax = Equipment.TypicalLimit(medium) };
            userEquipment.Add("heating");
        }
        if (Given(Pump))
        {
            var kind = Pump!.Trim().ToLowerInvariant() switch
            {
                "diaphragm" => PumpKind.Diaphragm,
                "rotary-vane" or "oil" => PumpKind.RotaryVane,
                "aspirator" or "water-aspirator" => PumpKind.Aspirator,
                "liquid-ring" => PumpKind.LiquidRing,
                _ => throw new InputException("--pump", Pump!, "diaphragm, rotary-vane, aspirator or liquid-ring"),
            };
            equipment = equipment with { Pump = kind, PumpUltimate = Equipment.TypicalUltimate(kind) };
            userEquipment.Add("pump-kind");
        }
        if (Given(BathMax))
        {
            equipment = equipment with { HeatingMax = TemperatureUnits.Parse(BathMax!, "--bath-max") };
            userEquipment.Add("bath-max");
        }
        if (Given(CoolantTemp))
        {
            var t = TemperatureUnits.Parse(CoolantTemp!, "--coolant-temp");
            if (t.Celsius < -100 || t.Celsius > 60)
                throw new InputException("--coolant-temp", CoolantTemp!, "a coolant temperature from -100 °C to 60 °C");
            equipment = equipment with { Coolant = t };
            userEquipment.Add("coolant");
        }
        if (Given(PumpLimit))
        {
            var p = PressureUnits.Parse(PumpLimit!, "--pump-limit", atmosphere);
            if (p >= atmosphere)
                throw new InputException("--pump-limit", PumpLimit!, $"a pressure below the local atmosphere ({atmosphere})");
            equipment = equipment with { PumpUltimate = p };
            userEquipment.Add("pump");
        }
        if (Given(VaporTemp))
        {
            rules = rules with { PreferredVapor = TemperatureUnits.Parse(VaporTemp!, "--vapor-temp") };
            userRules.Add("vapor");
        }
        if (Given(DeltaT))
        {
            string[] parts = DeltaT!.Split(',', StringSplitOptions.TrimEntries);
            if (parts.Length > 2) throw new InputException("--delta-t", DeltaT!, "one step for both (20) or bath→vapour,vapour→condenser (25,20)");
            var bath = TemperatureUnits.ParseDifference(parts[0], "--delta-t");
            var cond = parts.Length == 2 ? TemperatureUnits.ParseDifference(parts[1], "--delta-t") : bath;
            rules = rules with { BathToVapor = bath, VaporToCondenser = cond };
            userRules.Add("delta-t");
        }
        if (Given(ProductMax))
        {
            rules = rules with { ProductMax = TemperatureUnits.Parse(ProductMax!, "--product-max") };
            userRules.Add("product-max");
        }
        return (equipment with { UserSet = userEquipment }, rules with { UserSet = userRules });
    }
}
