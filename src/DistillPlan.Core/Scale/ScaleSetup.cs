using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Scale;

/// <summary>The condenser's capacity: a rated figure, or U·A times the mean temperature difference to the coolant.</summary>
/// <param name="RatedW">The rating the user gave [W], or null.</param>
/// <param name="AreaM2">Cooling area [m²] (unused with a rating).</param>
/// <param name="UWPerM2K">Its U [W/(m²·K)].</param>
public sealed record CondenserRating(double? RatedW, double AreaM2, double UWPerM2K)
{
    /// <summary>
    /// Heat it can take from vapour condensing at <paramref name="vapor"/> with coolant entering
    /// at <paramref name="coolant"/> [W]: the rating, or U·A·ΔT_lm with the coolant warming by
    /// <see cref="ScaleRules.CoolantRiseK"/> (docs/methods.md, Heat and time). Zero when the
    /// vapour is no warmer than the coolant.
    /// </summary>
    public double CapacityW(Temperature vapor, Temperature coolant)
    {
        if (RatedW is double w) return w;
        double inlet = vapor.Kelvin - coolant.Kelvin, outlet = inlet - ScaleRules.CoolantRiseK;
        if (inlet <= 0) return 0;
        double lmtd = outlet <= 0 ? inlet / 2 : (inlet - outlet) / Math.Log(inlet / outlet);
        return UWPerM2K * AreaM2 * lmtd;
    }
}

/// <summary>
/// The size side of a plan, resolved: the heated geometry, U, the condenser, the pump's speed,
/// the leak, the charge's volume and the start temperature, with the defaults listed as
/// assumptions. Built from the equipment settings and the charge.
/// </summary>
public sealed record ScaleSetup
{
    /// <summary>The heated wall.</summary>
    public required IHeatedGeometry Geometry { get; init; }
    /// <summary>Overall U, bath or jacket to the boiling liquid [W/(m²·K)].</summary>
    public required double UWPerM2K { get; init; }
    /// <summary>The condenser.</summary>
    public required CondenserRating Condenser { get; init; }
    /// <summary>Pumping speed [m³/s].</summary>
    public required double PumpSpeedM3PerS { get; init; }
    /// <summary>Air leaking in [kg/s].</summary>
    public required double LeakAirKgPerS { get; init; }
    /// <summary>The charge's temperature before heating.</summary>
    public required Temperature Start { get; init; }
    /// <summary>Liquid volume of the charge [m³] (solvents at their tabulated densities, ideal mixing).</summary>
    public required double ChargeM3 { get; init; }
    /// <summary>Flask size or vessel working volume [m³].</summary>
    public required double ContainerM3 { get; init; }
    /// <summary>Lowest volume to keep (vessel: stirred and wetted) [m³].</summary>
    public required double MinimumM3 { get; init; }
    /// <summary>Highest fill [m³].</summary>
    public required double MaximumM3 { get; init; }
    /// <summary>Multiply the charge's moles by this to get real amounts (1 unless the size was assumed for a relative charge).</summary>
    public required double MolesScale { get; init; }
    /// <summary>True for a jacketed vessel.</summary>
    public required bool Vessel { get; init; }
    /// <summary>The size values the plan assumed, with their bases.</summary>
    public required IReadOnlyList<Assumption> Assumptions { get; init; }

    /// <summary>
    /// Resolves the setup, or returns null with the reason when the size is unknown (a relative
    /// charge and no flask or vessel, a solvent without a density, a charge beyond a 20 L flask
    /// with no vessel given). A container smaller than the charge is bad input.
    /// </summary>
    public static ScaleSetup? Resolve(Charge charge, Equipment e, out string? reason)
    {
        reason = null;
        var solvents = charge.Components.Select(c => c.Solvent).ToList();
        if (solvents.Any(s => s.MolarVolumeM3PerMol is null))
        {
            reason = "no liquid density for " + string.Join(", ", solvents.Where(s => s.MolarVolumeM3PerMol is null).Select(s => s.Name));
            return null;
        }
        var list = new List<Assumption>();
        double volume = charge.Components.Sum(c => c.Moles * c.Solvent.MolarVolumeM3PerMol!.Value);
        double scale = 1;
        double container;
        if (charge.IsRelative)
        {
            if (e.NominalVolumeM3 is not double given)
            {
                reason = "the charge has no amounts; give them with units (250mL, 2L, 180kg) or a --flask or --vessel";
                return null;
            }
            // Only the composition is known: fill a flask half (the usual limit), a vessel to its working volume.
            double fill = e.IsVessel ? given : 0.5 * given;
            fill = e.MaximumVolumeM3 is double max ? Math.Min(fill, max) : fill;
            scale = fill / volume;
            volume = fill;
            list.Add(new("charge-volume", "charge volume", Quantity.Number(volume * 1e3, "L"), true,
                e.IsVessel ? "the charge has no amounts: the vessel filled to its working volume" : "the charge has no amounts: the flask filled half, the usual limit; " + ScaleRules.RuleOfThumb));
            container = given;
        }
        else if (e.NominalVolumeM3 is double given)
        {
            if (volume > given * (1 + 1e-9))
                throw new InputException(e.IsVessel ? "--vessel" : "--flask", ScaleUnits.Litres(given),
                    $"a {(e.IsVessel ? "vessel" : "flask")} that holds the charge ({ScaleUnits.Litres(volume)})");
            container = given;
        }
        else if (FlaskGeometry.SmallestHolding(volume) is double flask)
        {
            container = flask;
            list.Add(new("flask", "evaporator flask", Quantity.Number(flask * 1e3, "L"), true,
                "the smallest usual flask the charge fills at most half; " + ScaleRules.RuleOfThumb));
        }
        else
        {
            reason = $"the charge ({ScaleUnits.Litres(volume)}) is more than a 20 L flask holds half full; give --vessel for a jacketed vessel (or --flask)";
            return null;
        }

        IHeatedGeometry geometry = e.HeatTransferAreaM2 is double area ? new FixedArea(area)
            : e.IsVessel ? new VesselGeometry(container) : new FlaskGeometry(container);
        list.Add(new("geometry", "heated area from", Quantity.Words(geometry.Describe()), e.HeatTransferAreaM2 is null, e.HeatTransferAreaM2 is null ? ScaleRules.RuleOfThumb : "given"));

        double u = e.HeatTransferWPerM2K ?? (e.IsVessel ? ScaleRules.VesselUWPerM2K : ScaleRules.FlaskUWPerM2K);
        if (e.HeatTransferWPerM2K is null)
            list.Add(new("heat-transfer", "overall heat-transfer coefficient U", Quantity.Number(u, "W/(m² K)"), true,
                (e.IsVessel ? "jacketed vessel, 150–500 W/(m² K); " : "rotating flask in a bath, 300–600 W/(m² K); ") + ScaleRules.RuleOfThumb));

        CondenserRating condenser;
        if (e.CondenserCapacityW is double rated) condenser = new(rated, 0, 0);
        else
        {
            double uc = e.IsVessel ? ScaleRules.PlantCondenserUWPerM2K : ScaleRules.GlassCondenserUWPerM2K;
            double ac = e.CondenserAreaM2 ?? (e.IsVessel ? ScaleRules.VesselCondenserAreaPer250LM2 * Math.Pow(container / 0.25, 2.0 / 3) : ScaleRules.FlaskCondenserAreaM2);
            condenser = new(null, ac, uc);
            if (e.CondenserAreaM2 is null)
                list.Add(new("condenser-area", "condenser area", Quantity.Number(ac, "m²"), true,
                    (e.IsVessel ? "plant condenser, 1 m² per 250 L scaled with volume^(2/3); " : "laboratory coil condenser, 0.1–0.3 m²; ") + ScaleRules.RuleOfThumb));
            list.Add(new("condenser-u", "condenser U", Quantity.Number(uc, "W/(m² K)"), true,
                (e.IsVessel ? "plant condenser under vacuum with some inert gas; " : "glass coil under vacuum: 0.2 m² handles a few hundred watts; ") + ScaleRules.RuleOfThumb
                + $"; coolant warms {ScaleRules.CoolantRiseK:0} K through it"));
        }

        double speed = e.PumpSpeedM3PerS ?? (e.IsVessel ? ScaleRules.VesselPumpSpeedM3PerH(container) : ScaleRules.LabPumpSpeedM3PerH(e.Pump)) / 3600;
        if (e.PumpSpeedM3PerS is null)
            list.Add(new("pump-speed", "pumping speed", Quantity.Number(speed * 3600, "m³/h"), true,
                (e.IsVessel ? "40 m³/h per m³ of working volume, at least 10 m³/h; " : $"a laboratory {Equipment.Word(e.Pump)}; ") + ScaleRules.RuleOfThumb));

        double leak = LeakKgPerS(e, container);
        if (e.LeakAirKgPerS is null)
            list.Add(new("leak-rate", "air leak into the vacuum", Quantity.Number(leak * 3.6e6, "g/h"), true,
                (e.IsVessel ? "plant vessel, 0.5–5 kg/h; 1 kg/h per m³^(2/3), at least 0.5 kg/h; " : "tight laboratory glassware leaks 0.4–4 g/h of air; ") + ScaleRules.RuleOfThumb));

        double minimum = e.MinimumVolumeM3 ?? (e.IsVessel ? ScaleRules.VesselMinimumShare * container : 0);
        if (e.IsVessel && e.MinimumVolumeM3 is null)
            list.Add(new("min-volume", "minimum (stirred) volume", Quantity.Number(minimum * 1e3, "L"), true,
                "a quarter of the working volume keeps the impeller and the lowest jacket level covered; " + ScaleRules.RuleOfThumb));
        double maximum = e.MaximumVolumeM3 ?? (e.IsVessel ? container : 0.5 * container);

        return new ScaleSetup
        {
            Geometry = geometry, UWPerM2K = u, Condenser = condenser, PumpSpeedM3PerS = speed, LeakAirKgPerS = leak,
            Start = e.StartTemperature ?? Temperature.FromCelsius(20), ChargeM3 = volume, ContainerM3 = container,
            MinimumM3 = minimum, MaximumM3 = maximum, MolesScale = scale, Vessel = e.IsVessel, Assumptions = list,
        };
    }

    /// <summary>The air leak [kg/s]: the one given, else the rule of thumb for glassware or for a vessel of this size.</summary>
    public static double LeakKgPerS(Equipment e, double containerM3) => e.LeakAirKgPerS ?? (e.IsVessel
        ? Math.Max(0.5, ScaleRules.VesselLeakPerM3KgPerH * Math.Pow(containerM3, 2.0 / 3)) / 3600
        : ScaleUnits.ThroughputToKgPerS(ScaleRules.GlasswareLeakPaM3PerS));
}
