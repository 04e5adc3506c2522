namespace DistillPlan.Core.Scale;

/// <summary>
/// Rule-of-thumb defaults for the size side of a plan (docs/methods.md, Heat and time), each
/// with the basis the assumptions list prints. Orders of magnitude from common practice, from
/// memory; every one can be overridden by a setting.
/// </summary>
public static class ScaleRules
{
    /// <summary>Basis text for the rules of thumb below.</summary>
    public const string RuleOfThumb = "rule of thumb, common practice, from memory";

    /// <summary>U of a rotating flask in a water or oil bath [W/(m²·K)]: middle of 300–600.</summary>
    public const double FlaskUWPerM2K = 450;
    /// <summary>Overall U of a glass-lined or stainless jacketed vessel [W/(m²·K)]: middle of 150–500.</summary>
    public const double VesselUWPerM2K = 300;

    /// <summary>Cooling area of a laboratory coil condenser [m²] (0.1–0.3).</summary>
    public const double FlaskCondenserAreaM2 = 0.2;
    /// <summary>U of a glass coil condenser under vacuum [W/(m²·K)]: with 0.2 m² it handles a few hundred watts.</summary>
    public const double GlassCondenserUWPerM2K = 70;
    /// <summary>Plant condenser area for a 250 L vessel [m²]; scaled with the working volume to the power 2/3.</summary>
    public const double VesselCondenserAreaPer250LM2 = 1.0;
    /// <summary>U of a plant condenser condensing under vacuum with some inert gas [W/(m²·K)].</summary>
    public const double PlantCondenserUWPerM2K = 350;
    /// <summary>Rise of the coolant through the condenser [K].</summary>
    public const double CoolantRiseK = 3;

    /// <summary>Air leaking into tight laboratory glassware [Pa·m³/s]: 0.5 mbar·L/s (0.1–1).</summary>
    public const double GlasswareLeakPaM3PerS = 0.05;
    /// <summary>Air leaking into a plant vessel of 1 m³ [kg/h] (0.5–5 for plant vessels); scaled with volume^(2/3), at least 0.5.</summary>
    public const double VesselLeakPerM3KgPerH = 1.0;

    /// <summary>Minimum stirred volume as a share of a vessel's working volume (the impeller and the lowest jacket level covered).</summary>
    public const double VesselMinimumShare = 0.25;

    /// <summary>Pumping speed of a laboratory pump of each kind [m³/h].</summary>
    public static double LabPumpSpeedM3PerH(Planning.PumpKind kind) => kind switch
    {
        Planning.PumpKind.RotaryVane => 6,      // small two-stage oil pump
        Planning.PumpKind.Aspirator => 0.5,     // water-jet pump on a tap
        Planning.PumpKind.LiquidRing => 25,     // the smallest liquid-ring pumps
        _ => 2,                                 // chemistry diaphragm pump, 1–4 m³/h
    };

    /// <summary>Pumping speed for a vessel [m³/h]: 40 m³/h per m³ of working volume, at least 10 (evacuates it in minutes with room for leak air).</summary>
    public static double VesselPumpSpeedM3PerH(double workingVolumeM3) => Math.Max(10, 40 * workingVolumeM3);
}
