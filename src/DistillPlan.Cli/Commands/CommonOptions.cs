using System.CommandLine;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Cli.Commands;

/// <summary>Options shared by several verbs, with the spellings of DESIGN §5.</summary>
internal sealed class CommonOptions
{
    public Option<bool> Json { get; } = new("--json") { Description = "Write JSON (mbar and °C, snake_case fields) instead of text." };
    public Option<string> Unit { get; } = new("--unit") { Description = "Pressure unit for text output: mbar, hPa, Pa, kPa, bar, Torr, mmHg, inHg, psia, atm.", DefaultValueFactory = _ => "mbar" };
    public Option<string?> Library { get; } = new("--library") { Description = "A solvents YAML file merged over the shipped library (default: ~/.config/distillplan/solvents.yaml when present)." };
    public Option<string> Basis { get; } = new("--basis") { Description = "What bare numbers in a charge mean: volume, mass or mole.", DefaultValueFactory = _ => "volume" };

    /// <summary>Adds the output and library options to a command.</summary>
    public void AddOutput(Command c)
    {
        c.Options.Add(Json);
        c.Options.Add(Unit);
        c.Options.Add(Library);
    }

    public SolventLibrary LoadLibrary(ParseResult r) => SolventLibrary.LoadWithUser(r.GetValue(Library));

    public PressureUnit DisplayUnit(ParseResult r) => PressureUnits.ForDisplay(r.GetValue(Unit) ?? "mbar");

    public Basis ParseBasis(ParseResult r) => (r.GetValue(Basis) ?? "volume").ToLowerInvariant() switch
    {
        "volume" => Core.Planning.Basis.Volume,
        "mass" => Core.Planning.Basis.Mass,
        "mole" or "mol" or "molar" => Core.Planning.Basis.Mole,
        var other => throw new Core.InputException("--basis", other, "volume, mass or mole"),
    };
}

/// <summary>The options that tune a plan (DESIGN §5 spellings), read into <see cref="PlanInputs"/>.</summary>
internal sealed class PlanOptions
{
    public Option<string?> VaporTemp { get; } = new("--vapor-temp") { Description = "Preferred vapour temperature (default 40 °C; 40, 40C, 313K, 104F)." };
    public Option<string?> BathMax { get; } = new("--bath-max") { Description = "Highest bath or jacket temperature (default 95 °C for a water bath)." };
    public Option<string?> CoolantTemp { get; } = new("--coolant-temp") { Description = "Coolant temperature at the condenser (default 10 °C)." };
    public Option<string?> PumpLimit { get; } = new("--pump-limit") { Description = "The pump's ultimate pressure (default 5 mbar; 5mbar, 3 Torr, -0.99barg)." };
    public Option<string?> DeltaT { get; } = new("--delta-t") { Description = "ΔT steps in K: one for both (20), or bath→vapour,vapour→condenser (25,20)." };
    public Option<string?> ProductMax { get; } = new("--product-max") { Description = "Highest temperature the product may see; the bath stays at or below it." };
    public Option<string?> Atmospheric { get; } = new("--atmospheric") { Description = "Local atmospheric pressure (default 1013.25 mbar)." };
    public Option<string?> Altitude { get; } = new("--altitude") { Description = "Altitude in metres, for the ICAO standard atmosphere (instead of --atmospheric)." };
    public Option<string?> Heating { get; } = new("--heating") { Description = "Heating medium: water-bath (95 °C), oil-bath (180 °C) or jacket (150 °C); sets the default limit." };
    public Option<string?> Pump { get; } = new("--pump") { Description = "Pump kind: diaphragm (5 mbar), rotary-vane (0.05 mbar), aspirator (25 mbar), liquid-ring (35 mbar); sets the default limit." };

    public void AddTo(Command c)
    {
        foreach (var o in new Option[] { VaporTemp, BathMax, CoolantTemp, PumpLimit, DeltaT, ProductMax, Atmospheric, Altitude, Heating, Pump })
            c.Options.Add(o);
    }

    public PlanInputs Read(ParseResult r) => new()
    {
        VaporTemp = r.GetValue(VaporTemp),
        BathMax = r.GetValue(BathMax),
        CoolantTemp = r.GetValue(CoolantTemp),
        PumpLimit = r.GetValue(PumpLimit),
        DeltaT = r.GetValue(DeltaT),
        ProductMax = r.GetValue(ProductMax),
        Atmospheric = r.GetValue(Atmospheric),
        Altitude = r.GetValue(Altitude),
        Heating = r.GetValue(Heating),
        Pump = r.GetValue(Pump),
    };
}
