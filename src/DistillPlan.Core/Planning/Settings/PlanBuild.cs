using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Planning.Settings;

/// <summary>The state a plan's settings are read into, setting by setting, in table order; what a setting leaves alone keeps its default.</summary>
internal sealed class PlanBuild
{
    public HashSet<string> Given { get; } = [];
    public Equipment Equipment { get; set; } = new();
    public Rules Rules { get; set; } = new();
    public double? AltitudeM { get; set; }
    public Basis Basis { get; set; } = Basis.Volume;
    public string? Model { get; set; }
    public double? ProductMassG { get; set; }
    public double? ProductMolarMassGPerMol { get; set; }
    public Pressure? StripPressure { get; set; }
    public StripEnd StripEnd { get; set; } = StripEnd.Default;
    /// <summary>The named unit of the user's equipment file the settings came from, if any.</summary>
    public string? UnitName { get; set; }
    /// <summary>Where that unit is written (file:line).</summary>
    public string? UnitFile { get; set; }
    /// <summary>Keys whose value came from that unit (not typed by the user).</summary>
    public HashSet<string> FromUnit { get; } = [];
}
