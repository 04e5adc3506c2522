using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning;

/// <summary>Kinds of vacuum source, each with its usual limit.</summary>
public enum PumpKind
{
    /// <summary>Chemistry diaphragm pump (dry; usual ultimate 2–10 mbar, common practice).</summary>
    Diaphragm,
    /// <summary>Oil-sealed rotary-vane pump (far below 1 mbar; needs a cold trap, common practice).</summary>
    RotaryVane,
    /// <summary>Water aspirator: cannot go below the vapour pressure of its water.</summary>
    Aspirator,
    /// <summary>Liquid-ring pump: limited by the vapour pressure of its seal liquid.</summary>
    LiquidRing,
}

/// <summary>What the charge is evaporated in: glassware at the bench, or a plant vessel.</summary>
public enum ApparatusKind
{
    /// <summary>A rotary evaporator: a round glass flask turning in a bath, a glass coil condenser.</summary>
    RotaryEvaporator,
    /// <summary>A jacketed vessel (reactor or still) with a jacket, a stirrer and a plant condenser.</summary>
    JacketedVessel,
}

/// <summary>Kinds of heating medium, each with its usual upper limit.</summary>
public enum HeatingMedium
{
    /// <summary>Water bath (usual limit 95 °C, common practice).</summary>
    WaterBath,
    /// <summary>Oil bath (usual limit 180 °C for silicone oil, common practice).</summary>
    OilBath,
    /// <summary>Jacketed vessel with a thermal fluid or steam; the limit is site-specific.</summary>
    Jacket,
}

/// <summary>
/// The equipment a plan runs on. Every value has a default marked as such, so a plan can
/// list what it assumed.
/// </summary>
public sealed record Equipment
{
    /// <summary>Coolant temperature at the condenser coil.</summary>
    public Temperature Coolant { get; init; } = Temperature.FromCelsius(10);
    /// <summary>Vacuum source.</summary>
    public PumpKind Pump { get; init; } = PumpKind.Diaphragm;
    /// <summary>The pump's ultimate (lowest reachable) pressure.</summary>
    public Pressure PumpUltimate { get; init; } = Pressure.FromMillibar(5);
    /// <summary>Heating medium.</summary>
    public HeatingMedium Heating { get; init; } = HeatingMedium.WaterBath;
    /// <summary>Highest temperature the heating medium may be set to.</summary>
    public Temperature HeatingMax { get; init; } = Temperature.FromCelsius(95);
    /// <summary>Local atmospheric pressure.</summary>
    public Pressure Atmosphere { get; init; } = Pressure.FromPascal(PhysicalConstants.StandardAtmospherePa);
    /// <summary>Gas temperature at the pump exhaust, for the flash-point check (warmer than the room).</summary>
    public Temperature Ambient { get; init; } = Temperature.FromCelsius(40);

    /// <summary>Rotary evaporator (the default) or jacketed vessel.</summary>
    public ApparatusKind Apparatus { get; init; } = ApparatusKind.RotaryEvaporator;
    /// <summary>Flask size or vessel working volume [m³]; null: a flask is chosen from the charge.</summary>
    public double? NominalVolumeM3 { get; init; }
    /// <summary>Heat-transfer area given by the user [m²], instead of the one from the geometry (the wetted area at the fill).</summary>
    public double? HeatTransferAreaM2 { get; init; }
    /// <summary>Overall heat-transfer coefficient, bath or jacket to boiling liquid [W/(m²·K)]; null: a rule-of-thumb default.</summary>
    public double? HeatTransferWPerM2K { get; init; }
    /// <summary>Rated condenser capacity [W]; null: from the condenser area.</summary>
    public double? CondenserCapacityW { get; init; }
    /// <summary>Condenser area [m²]; null: a rule-of-thumb default for the apparatus.</summary>
    public double? CondenserAreaM2 { get; init; }
    /// <summary>Pumping speed [m³/s]; null: a rule-of-thumb default for the pump kind and apparatus.</summary>
    public double? PumpSpeedM3PerS { get; init; }
    /// <summary>Air leaking into the vacuum [kg/s]; null: a rule-of-thumb default for the apparatus.</summary>
    public double? LeakAirKgPerS { get; init; }
    /// <summary>Temperature of the charge before heating; null: 20 °C.</summary>
    public Temperature? StartTemperature { get; init; }
    /// <summary>Lowest volume that keeps a vessel stirred and its heated wall wetted [m³]; null: a rule-of-thumb share of the working volume.</summary>
    public double? MinimumVolumeM3 { get; init; }
    /// <summary>Highest fill [m³] (a swap's refill); null: the working volume (vessel) or half the flask.</summary>
    public double? MaximumVolumeM3 { get; init; }
    /// <summary>True for a jacketed vessel.</summary>
    public bool IsVessel => Apparatus == ApparatusKind.JacketedVessel;

    /// <summary>A pump kind in words ("diaphragm pump").</summary>
    public static string Word(PumpKind kind) => kind switch
    {
        PumpKind.RotaryVane => "rotary-vane pump",
        PumpKind.Aspirator => "water aspirator",
        PumpKind.LiquidRing => "liquid-ring pump",
        _ => "diaphragm pump",
    };

    /// <summary>A heating medium in words ("water bath").</summary>
    public static string Word(HeatingMedium medium) => medium switch
    {
        HeatingMedium.OilBath => "oil bath",
        HeatingMedium.Jacket => "jacket",
        _ => "water bath",
    };

    /// <summary>Usual ultimate pressure of a pump kind (common practice).</summary>
    public static Pressure TypicalUltimate(PumpKind kind) => kind switch
    {
        PumpKind.Diaphragm => Pressure.FromMillibar(5),
        PumpKind.RotaryVane => Pressure.FromMillibar(0.05),
        PumpKind.Aspirator => Pressure.FromMillibar(25),    // about Psat of water at 21 °C, plus a little
        PumpKind.LiquidRing => Pressure.FromMillibar(35),   // water seal at about 25 °C
        _ => Pressure.FromMillibar(5),
    };

    /// <summary>Usual upper limit of a heating medium (common practice).</summary>
    public static Temperature TypicalLimit(HeatingMedium medium) => medium switch
    {
        HeatingMedium.WaterBath => Temperature.FromCelsius(95),
        HeatingMedium.OilBath => Temperature.FromCelsius(180),
        _ => Temperature.FromCelsius(150),
    };
}

/// <summary>The ΔT rule and the preferences a plan follows (common practice, often taught as 20/40/60).</summary>
public sealed record Rules
{
    /// <summary>Preferred vapour (boiling) temperature.</summary>
    public Temperature PreferredVapor { get; init; } = Temperature.FromCelsius(40);
    /// <summary>Step from vapour down to condenser.</summary>
    public TemperatureDifference VaporToCondenser { get; init; } = new(20);
    /// <summary>Step from bath up to vapour.</summary>
    public TemperatureDifference BathToVapor { get; init; } = new(20);
    /// <summary>The setpoint must be at least this many times the pump's ultimate pressure, so the pump can hold it (common practice).</summary>
    public double PumpMarginFactor { get; init; } = 2.0;
    /// <summary>Highest temperature the product may see (the bath is kept at or below it).</summary>
    public Temperature? ProductMax { get; init; }
}
