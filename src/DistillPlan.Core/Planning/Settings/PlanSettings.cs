using System.Globalization;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Planning.Settings;

/// <summary>
/// The table of every plan setting (see <see cref="PlanSetting"/>), in the order they are read:
/// the atmosphere first (gauge readings add it), a heating medium before its limit, a pump kind
/// before its ultimate pressure. A new setting is one entry here; the CLI option, the plan-file
/// key, the text-UI field, the help and the assumptions row follow from it.
/// </summary>
public static class PlanSettings
{
    private const string CommonPractice = "common practice";

    /// <summary>Every setting, in reading order.</summary>
    public static IReadOnlyList<PlanSetting> All { get; } =
    [
        new()
        {
            Key = "basis", Hint = "volume (default), mass, mole", Label = "charge basis", Caption = "Basis:", Group = SettingGroup.Charge, FileSection = "charge",
            Help = "What bare numbers in a charge mean: volume (default), mass or mole.",
            Apply = (b, v) => b.Basis = ParseBasis(v, "--basis"),
        },
        new()
        {
            Key = "model", Hint = "dortmund (default), unifac, ideal", Label = "activity model", Caption = "Model:", Group = SettingGroup.Charge, FileSection = "charge",
            Help = "Activity model for mixtures: dortmund (modified UNIFAC, the default where it covers every pair), unifac (original UNIFAC) or ideal.",
            Apply = (b, v) => b.Model = ParseModel(v, "--model"),
        },
        new()
        {
            Key = "product-mass", Hint = "optional, non-volatile; g, mg, kg", Label = "product mass", Caption = "Product mass:", Group = SettingGroup.Charge,
            FileSection = "product", FileKeyOverride = "mass",
            Help = "Non-volatile product dissolved in the charge: its mass (20g, 1.5kg; bare number: g).",
            Apply = (b, v) => b.ProductMassG = ReadMassG(v, "--product-mass"),
        },
        new()
        {
            Key = "product-molar-mass", Hint = "g/mol, with the product mass", Label = "product molar mass", Caption = " molar mass:", Group = SettingGroup.Charge,
            FileSection = "product", FileKeyOverride = "molar-mass",
            Help = "Molar mass of the product in g/mol (with --product-mass).",
            Apply = (b, v) => b.ProductMolarMassGPerMol = ReadPositive(v.Replace("g/mol", "").Trim(), "--product-molar-mass", "a molar mass in g/mol above zero, e.g. 320", 1e6),
        },
        new()
        {
            Key = "equipment", Hint = "a unit of your equipment file", Label = "equipment unit", Caption = "Unit:", Group = SettingGroup.Equipment,
            Help = "A named unit of your equipment file (rotavap-2, R-101) that fills in its equipment settings; options given beside it override them.",
            // Read before the loop (see Read): the unit's values stand in for settings the user did not give.
            Value = b => b.UnitName is string n ? Quantity.Words(n) : null,
            GivenBasis = b => "equipment file " + (b.UnitFile ?? ""),
        },
        new()
        {
            Key = "equipment-file", Hint = "default: your config folder", Label = "equipment file", Caption = "Unit file:", Group = SettingGroup.Equipment,
            Help = "The equipment file to take --equipment from (default: equipment.yaml in your config folder, ~/.config/distillplan/).",
        },
        new()
        {
            Key = "atmospheric", Label = "atmospheric pressure", Caption = "Atmospheric:", Group = SettingGroup.Equipment,
            Help = "Local atmospheric pressure (default 1013.25 mbar, sea level); or give --altitude.",
            Apply = (b, v) =>
            {
                var p = PressureUnits.Parse(v, "--atmospheric", b.Equipment.Atmosphere);
                if (p.Millibar < 500 || p.Millibar > 1100)
                    throw new InputException("--atmospheric", v, "a barometric pressure from 500 to 1100 mbar (absolute)");
                b.Equipment = b.Equipment with { Atmosphere = p };
            },
            Value = b => Quantity.Of(b.Equipment.Atmosphere),
            DefaultBasis = _ => "ICAO standard atmosphere at sea level",
            // An altitude is the user's statement of the atmosphere too.
            GivenOverride = b => b.Given.Contains("atmospheric") || b.Given.Contains("altitude"),
            GivenBasis = b => !b.Given.Contains("atmospheric") && b.AltitudeM is double h
                ? $"ICAO standard atmosphere at the given altitude, {h.ToString("0.#", CultureInfo.InvariantCulture)} m"
                : "given",
        },
        new()
        {
            Key = "altitude", Hint = "metres; instead of atmospheric", Label = "altitude", Caption = " or altitude:", Group = SettingGroup.Equipment,
            Help = "Altitude in metres, for the ICAO standard atmosphere (instead of --atmospheric).",
            Apply = (b, v) =>
            {
                if (b.Given.Contains("atmospheric"))
                    throw new InputException("--altitude", v, "either --atmospheric or --altitude, not both");
                string metres = v.Trim();
                if (metres.EndsWith('m') && !metres.EndsWith("mm", StringComparison.Ordinal)) metres = metres[..^1].Trim();
                if (!double.TryParse(metres, NumberStyles.Float, CultureInfo.InvariantCulture, out double h))
                    throw new InputException("--altitude", v, "an altitude in metres, e.g. 450 or 450m");
                b.AltitudeM = h;
                b.Equipment = b.Equipment with { Atmosphere = Pressure.AtAltitude(h) };
            },
        },
        new()
        {
            Key = "heating", Label = "heating medium", Caption = "Heating:", Group = SettingGroup.Equipment,
            Help = "Heating medium: water-bath (95 °C), oil-bath (180 °C) or jacket (150 °C); sets the default limit.",
            Apply = (b, v) =>
            {
                var medium = v.Trim().ToLowerInvariant() switch
                {
                    "water-bath" or "water" => HeatingMedium.WaterBath,
                    "oil-bath" or "oil" => HeatingMedium.OilBath,
                    "jacket" => HeatingMedium.Jacket,
                    _ => throw new InputException("--heating", v, "water-bath, oil-bath or jacket"),
                };
                b.Equipment = b.Equipment with { Heating = medium, HeatingMax = Equipment.TypicalLimit(medium) };
            },
            Value = b => Quantity.Words(Equipment.Word(b.Equipment.Heating)),
            DefaultBasis = b => (b.Equipment.IsVessel ? "a jacketed vessel is heated through its jacket, " : "a rotary evaporator's water bath, ") + CommonPractice,
        },
        new()
        {
            Key = "bath-max", Label = "heating limit", Caption = "Heating limit:", Group = SettingGroup.Equipment,
            Help = "Highest bath or jacket temperature (default: the heating medium's usual limit, 95 °C for a water bath).",
            Apply = (b, v) => b.Equipment = b.Equipment with { HeatingMax = ReadTemperature(v, "--bath-max", -50, 400) },
            Value = b => Quantity.Of(b.Equipment.HeatingMax),
            DefaultBasis = b => $"usual limit for the {Equipment.Word(b.Equipment.Heating)}, {CommonPractice}",
        },
        new()
        {
            Key = "coolant-temp", Label = "coolant temperature", Caption = "Coolant temp:", Group = SettingGroup.Equipment,
            Help = "Coolant temperature at the condenser (default 10 °C).",
            Apply = (b, v) => b.Equipment = b.Equipment with { Coolant = ReadTemperature(v, "--coolant-temp", -100, 60) },
            Value = b => Quantity.Of(b.Equipment.Coolant),
            DefaultBasis = _ => "recirculating chiller or cold tap water, " + CommonPractice,
        },
        new()
        {
            Key = "exhaust-temp", Label = "pump exhaust temperature", Caption = "Exhaust temp:", Group = SettingGroup.Equipment,
            Help = "Temperature of the gas at the pump exhaust, for the flash-point check (default 40 °C: exhausts run warmer than the room).",
            Apply = (b, v) => b.Equipment = b.Equipment with { Ambient = ReadTemperature(v, "--exhaust-temp", -40, 150) },
            Value = b => Quantity.Of(b.Equipment.Ambient),
            DefaultBasis = _ => "a pump exhaust runs tens of kelvin above a 20 °C room; rule of thumb, from memory",
        },
        new()
        {
            Key = "pump", Label = "pump", Caption = "Pump:", Group = SettingGroup.Equipment,
            Help = "Pump kind: diaphragm (5 mbar), rotary-vane (0.05 mbar), aspirator (25 mbar), liquid-ring (35 mbar); sets the default limit.",
            Apply = (b, v) =>
            {
                var kind = v.Trim().ToLowerInvariant() switch
                {
                    "diaphragm" => PumpKind.Diaphragm,
                    "rotary-vane" or "oil" => PumpKind.RotaryVane,
                    "aspirator" or "water-aspirator" => PumpKind.Aspirator,
                    "liquid-ring" => PumpKind.LiquidRing,
                    _ => throw new InputException("--pump", v, "diaphragm, rotary-vane, aspirator or liquid-ring"),
                };
                b.Equipment = b.Equipment with { Pump = kind, PumpUltimate = Equipment.TypicalUltimate(kind) };
            },
            Value = b => Quantity.Words(Equipment.Word(b.Equipment.Pump)),
            DefaultBasis = b => (b.Equipment.IsVessel ? "a plant vessel's liquid-ring pump, " : "a chemistry diaphragm pump, ") + CommonPractice,
        },
        new()
        {
            Key = "pump-limit", Label = "pump ultimate pressure", Caption = "Pump ultimate:", Group = SettingGroup.Equipment,
            Help = "The pump's ultimate pressure (default: the pump kind's usual value, 5 mbar for a diaphragm pump; 5mbar, 3 Torr, -0.99barg).",
            Apply = (b, v) =>
            {
                var p = PressureUnits.Parse(v, "--pump-limit", b.Equipment.Atmosphere);
                if (p >= b.Equipment.Atmosphere)
                    throw new InputException("--pump-limit", v, $"a pressure below the local atmosphere ({b.Equipment.Atmosphere})");
                b.Equipment = b.Equipment with { PumpUltimate = p };
            },
            Value = b => Quantity.Of(b.Equipment.PumpUltimate),
            DefaultBasis = b => $"usual ultimate of the {Equipment.Word(b.Equipment.Pump)}, {CommonPractice}",
        },
        new()
        {
            Key = "flask", Hint = "rotary evaporator flask; 250mL, 1L", Label = "evaporator flask", Caption = "Flask size:", Group = SettingGroup.Size,
            Help = "Rotary evaporator flask size (250mL, 1L, 20L); the charge sets the fill. Default: the smallest usual flask the charge fills at most half.",
            Apply = (b, v) =>
            {
                if (b.Given.Contains("vessel")) throw new InputException("--flask", v, "either --flask or --vessel, not both");
                b.Equipment = b.Equipment with { Apparatus = ApparatusKind.RotaryEvaporator, NominalVolumeM3 = ScaleUnits.VolumeM3(v, "--flask", 0.1) };
            },
            Value = b => b.Equipment.IsVessel || b.Equipment.NominalVolumeM3 is not double f ? null : Quantity.Number(f * 1e3, "L"),
        },
        new()
        {
            Key = "vessel", Hint = "jacketed vessel working volume; 250L", Label = "jacketed vessel, working volume", Caption = "Vessel size:", Group = SettingGroup.Size,
            Help = "Jacketed vessel by working volume (250L, 1.6m3): a stirred vessel with a jacket; sets the jacket as heating medium.",
            Apply = (b, v) =>
            {
                if (b.Given.Contains("flask")) throw new InputException("--vessel", v, "either --flask or --vessel, not both");
                double m3 = ScaleUnits.VolumeM3(v, "--vessel", 100);
                // A vessel is heated through its jacket unless the user said otherwise (the heating setting is read before).
                var heating = b.Given.Contains("heating") ? b.Equipment.Heating : HeatingMedium.Jacket;
                var max = b.Given.Contains("heating") || b.Given.Contains("bath-max") ? b.Equipment.HeatingMax : Equipment.TypicalLimit(heating);
                b.Equipment = b.Equipment with { Apparatus = ApparatusKind.JacketedVessel, NominalVolumeM3 = m3, Heating = heating, HeatingMax = max };
                // A plant vessel is pumped by a liquid-ring pump unless the user said otherwise (common practice).
                if (!b.Given.Contains("pump"))
                    b.Equipment = b.Equipment with
                    {
                        Pump = PumpKind.LiquidRing,
                        PumpUltimate = b.Given.Contains("pump-limit") ? b.Equipment.PumpUltimate : Equipment.TypicalUltimate(PumpKind.LiquidRing),
                    };
            },
            Value = b => b.Equipment.IsVessel && b.Equipment.NominalVolumeM3 is double m3 ? Quantity.Number(m3 * 1e3, "L") : null,
        },
        new()
        {
            Key = "area", Hint = "m2; default: wetted area at the fill", Label = "heat-transfer area", Caption = "Heated area:", Group = SettingGroup.Size,
            Help = "Heat-transfer area in m2 (0.05m2, 1.2m2), instead of the wetted area worked out from the flask or vessel geometry at each level.",
            Apply = (b, v) => b.Equipment = b.Equipment with { HeatTransferAreaM2 = ScaleUnits.AreaM2(v, "--area") },
            Value = b => b.Equipment.HeatTransferAreaM2 is double a ? Quantity.Number(a, "m²") : null,
        },
        new()
        {
            Key = "heat-transfer", Hint = "W/(m2 K); default by apparatus", Label = "overall heat-transfer coefficient U", Caption = "U (W/m2K):", Group = SettingGroup.Size,
            Help = "Overall heat-transfer coefficient U from bath or jacket to the boiling liquid, W/(m2 K) (default 450 for a rotating flask, 300 for a jacketed vessel; rules of thumb).",
            Apply = (b, v) => b.Equipment = b.Equipment with { HeatTransferWPerM2K = ScaleUnits.HeatTransferWPerM2K(v, "--heat-transfer") },
            Value = b => b.Equipment.HeatTransferWPerM2K is double u ? Quantity.Number(u, "W/(m² K)") : null,
        },
        new()
        {
            Key = "condenser-capacity", Hint = "rated W or kW; or give its area", Label = "condenser capacity (rated)", Caption = "Cond. rating:", Group = SettingGroup.Size,
            Help = "The condenser's rated capacity (400W, 12kW), instead of one worked out from its area.",
            Apply = (b, v) => b.Equipment = b.Equipment with { CondenserCapacityW = ScaleUnits.PowerW(v, "--condenser-capacity") },
            Value = b => b.Equipment.CondenserCapacityW is double w ? Quantity.Number(w, "W") : null,
        },
        new()
        {
            Key = "condenser-area", Hint = "m2; default by apparatus", Label = "condenser area", Caption = "Cond. area:", Group = SettingGroup.Size,
            Help = "Condenser cooling area in m2 (default 0.2 m2 for a laboratory coil; a rule of thumb for a vessel); its capacity is U·A·ΔT to the coolant.",
            Apply = (b, v) => b.Equipment = b.Equipment with { CondenserAreaM2 = ScaleUnits.AreaM2(v, "--condenser-area") },
            Value = b => b.Equipment.CondenserAreaM2 is double a ? Quantity.Number(a, "m²") : null,
        },
        new()
        {
            Key = "pump-speed", Hint = "m3/h; default by pump kind", Label = "pumping speed", Caption = "Pump speed:", Group = SettingGroup.Size,
            Help = "The pump's pumping speed (2m3/h, 30L/min; bare number: m3/h).",
            Apply = (b, v) => b.Equipment = b.Equipment with { PumpSpeedM3PerS = ScaleUnits.VolumeFlowM3PerS(v, "--pump-speed") },
            Value = b => b.Equipment.PumpSpeedM3PerS is double s ? Quantity.Number(s * 3600, "m³/h") : null,
        },
        new()
        {
            Key = "leak-rate", Hint = "kg/h, g/h or mbar.L/s", Label = "air leak into the vacuum", Caption = "Leak rate:", Group = SettingGroup.Size,
            Help = "Air leaking into the vacuum: 1kg/h, 5g/h or 0.5mbar.L/s (bare number: kg/h). Default: a rule of thumb for tight glassware or a plant vessel.",
            Apply = (b, v) => b.Equipment = b.Equipment with { LeakAirKgPerS = ScaleUnits.LeakKgPerS(v, "--leak-rate") },
            Value = b => b.Equipment.LeakAirKgPerS is double k ? Quantity.Number(k * 3.6e6, "g/h") : null,
        },
        new()
        {
            Key = "start-temp", Label = "charge temperature at the start", Caption = "Start temp:", Group = SettingGroup.Size,
            Help = "Temperature of the charge before heating, for the heat-up time (default 20 °C).",
            Apply = (b, v) => b.Equipment = b.Equipment with { StartTemperature = ReadTemperature(v, "--start-temp", -50, 200) },
            Value = b => Quantity.Of(b.Equipment.StartTemperature ?? Temperature.FromCelsius(20)),
            DefaultBasis = _ => "room temperature, " + CommonPractice,
        },
        new()
        {
            Key = "min-volume", Hint = "vessel: lowest stirred volume", Label = "minimum (stirred) volume", Caption = "Min volume:", Group = SettingGroup.Size,
            Help = "Lowest volume that keeps the vessel stirred and its jacket wetted (50L; bare number: L). Default: a quarter of a vessel's working volume (rule of thumb).",
            Apply = (b, v) => b.Equipment = b.Equipment with { MinimumVolumeM3 = ScaleUnits.VolumeM3(v, "--min-volume", 100) },
            Value = b => b.Equipment.MinimumVolumeM3 is double m ? Quantity.Number(m * 1e3, "L") : null,
        },
        new()
        {
            Key = "max-volume", Hint = "highest fill; default working volume", Label = "maximum fill", Caption = "Max volume:", Group = SettingGroup.Size,
            Help = "Highest fill (a swap refills to it; 200L; bare number: L). Default: a vessel's working volume, or half the flask.",
            Apply = (b, v) => b.Equipment = b.Equipment with { MaximumVolumeM3 = ScaleUnits.VolumeM3(v, "--max-volume", 100) },
            Value = b => b.Equipment.MaximumVolumeM3 is double m ? Quantity.Number(m * 1e3, "L") : null,
        },
        new()
        {
            Key = "vapor-temp", Label = "preferred vapour temperature", Caption = "Vapour pref.:", Group = SettingGroup.Rules,
            Help = "Preferred vapour temperature (default 40 °C; 40, 40C, 313K, 104F).",
            Apply = (b, v) => b.Rules = b.Rules with { PreferredVapor = ReadTemperature(v, "--vapor-temp", -80, 300) },
            Value = b => Quantity.Of(b.Rules.PreferredVapor),
            DefaultBasis = _ => "ΔT rule 20/40/60, " + CommonPractice,
        },
        new()
        {
            Key = "delta-t", Label = "ΔT steps (bath → vapour, vapour → condenser)", Caption = "ΔT steps:", Group = SettingGroup.Rules,
            Help = "ΔT steps in K: one for both (20), or bath→vapour,vapour→condenser (25,20).",
            Apply = (b, v) =>
            {
                string[] parts = v.Split(',', StringSplitOptions.TrimEntries);
                if (parts.Length > 2) throw new InputException("--delta-t", v, "one step for both (20) or bath→vapour,vapour→condenser (25,20)");
                var bath = ReadDifference(parts[0], "--delta-t");
                var cond = parts.Length == 2 ? ReadDifference(parts[1], "--delta-t") : bath;
                b.Rules = b.Rules with { BathToVapor = bath, VaporToCondenser = cond };
            },
            Value = b => Quantity.Words($"{b.Rules.BathToVapor}, {b.Rules.VaporToCondenser}"),
            DefaultBasis = _ => "ΔT rule, " + CommonPractice,
        },
        new()
        {
            Key = "product-max", Hint = "none unless given; 60, 333K", Label = "product maximum temperature", Caption = " max temp:", Group = SettingGroup.Rules,
            Help = "Highest temperature the product may see; the bath stays at or below it.",
            Apply = (b, v) => b.Rules = b.Rules with { ProductMax = ReadTemperature(v, "--product-max", -80, 400) },
            Value = b => b.Rules.ProductMax is Temperature t ? Quantity.Of(t) : null,
        },
        new()
        {
            Key = "pressure", Hint = "strip: hold it (default: hold vapour T)", Label = "strip pressure", Caption = "Hold pressure:", Group = SettingGroup.Strip, FileSection = "strip",
            Help = "Strip: hold this pressure and let the boiling temperature rise (default: hold the plan's vapour temperature and let the pressure fall).",
            Apply = (b, v) => b.StripPressure = PressureUnits.Parse(v, "--pressure", b.Equipment.Atmosphere),
        },
        new()
        {
            Key = "end", Hint = "left=10%, residual=thf:0.01, pump, dry", Label = "strip end", Caption = "Strip end:", Group = SettingGroup.Strip, FileSection = "strip",
            Help = "Strip: where to stop: " + StripEnd.Allowed + ". Default: what the pump can hold, or 5 % left.",
            Apply = (b, v) => b.StripEnd = StripEnd.Parse(v),
        },
    ];

    /// <summary>The setting with this key.</summary>
    public static PlanSetting Get(string key) => All.FirstOrDefault(s => s.Key == key) ?? throw new ArgumentException($"no setting '{key}'", nameof(key));

    /// <summary>Reads the settings the user gave into a plan setup, defaults for the rest.</summary>
    public static PlanSetup Build(PlanInputs inputs)
    {
        var b = Read(inputs, stopBefore: null, lenient: false);
        Product? product = (b.ProductMassG, b.ProductMolarMassGPerMol) switch
        {
            (double m, double mm) => new Product(m, mm, null),
            (null, null) => null,
            (null, _) => throw new InputException("--product-mass", "", "a mass such as 2.5g when a product molar mass is given"),
            _ => throw new InputException("--product-molar-mass", "", "a molar mass in g/mol such as 320 when a product mass is given"),
        };
        var assumptions = All.Select(s => (s, v: s.Value(b))).Where(t => t.v is not null)
            .Select(t => new Assumption(t.s.Key, t.s.Label, t.v!.Value, !t.s.IsGiven(b), BasisOf(t.s, b)))
            .ToList();
        return new PlanSetup(b.Equipment, b.Rules, b.Basis, b.Model, product, new StripRequest(b.StripPressure, b.StripEnd), assumptions);
    }

    private static string BasisOf(PlanSetting s, PlanBuild b) =>
        !s.IsGiven(b) ? s.DefaultBasis(b)
        : b.FromUnit.Contains(s.Key) ? $"equipment unit {b.UnitName}"
        : s.GivenBasis?.Invoke(b) ?? "given";

    /// <summary>A vessel's volumes must nest: minimum below maximum, both within the working volume.</summary>
    private static void CheckVolumes(Equipment e)
    {
        static string L(double m3) => ScaleUnits.Litres(m3);
        if (e.MinimumVolumeM3 is double min && e.MaximumVolumeM3 is double max && min >= max)
            throw new InputException("--min-volume", L(min), $"a minimum volume below the maximum fill ({L(max)})");
        if (e.NominalVolumeM3 is double v)
        {
            if (e.MinimumVolumeM3 is double m && m >= v)
                throw new InputException("--min-volume", L(m), $"a minimum volume below the {(e.IsVessel ? "vessel's working volume" : "flask size")} ({L(v)})");
            if (e.MaximumVolumeM3 is double x && x > v)
                throw new InputException("--max-volume", L(x), $"a fill at most the {(e.IsVessel ? "vessel's working volume" : "flask size")} ({L(v)})");
        }
    }

    /// <summary>
    /// What a field left empty would mean, given the other inputs: "default 5.0 mbar (usual ultimate
    /// of a diaphragm pump …)". Shown beside text-UI fields. Bad other inputs give the plain defaults.
    /// </summary>
    public static string DefaultHint(PlanSetting setting, PlanInputs inputs, DisplayFormat format)
    {
        // The settings read before this one decide its default (a pump kind its ultimate pressure).
        var b = Read(inputs, stopBefore: setting, lenient: true);
        return setting.Value(b) is Quantity q ? $"default {format.Format(q)}" : setting.Hint ?? "";
    }

    /// <summary>Reads the given settings in table order, up to <paramref name="stopBefore"/>; a lenient read skips bad values.</summary>
    private static PlanBuild Read(PlanInputs inputs, PlanSetting? stopBefore, bool lenient)
    {
        var b = new PlanBuild();
        // A named unit's settings stand in for those the user did not give.
        EquipmentUnit? unit = null;
        if (inputs.Get("equipment") is string name)
        {
            try { unit = EquipmentFile.Find(name, inputs.Get("equipment-file")); }
            catch (DistillPlanException) when (lenient) { }
            if (unit is not null) (b.UnitName, b.UnitFile) = (unit.Name, unit.Origin);
        }
        foreach (var s in All)
        {
            if (s == stopBefore) break;
            string? text = inputs.Get(s.Key);
            if (text is null && unit is not null && unit.Settings.TryGetValue(s.Key, out var fromUnit))
            {
                text = fromUnit;
                b.FromUnit.Add(s.Key);
            }
            if (text is null) continue;
            b.Given.Add(s.Key);
            try { s.Apply(b, text); }
            catch (InputException e) when (b.FromUnit.Contains(s.Key) && !lenient)
            {
                throw new InputException(e.Field, e.Value, e.Allowed, $"{unit!.Origin}: {e.Message}");
            }
            catch (DistillPlanException) when (lenient) { }
        }
        if (!lenient) CheckVolumes(b.Equipment);
        return b;
    }

    internal static Basis ParseBasis(string text, string field) => text.Trim().ToLowerInvariant() switch
    {
        "" or "volume" => Basis.Volume,
        "mass" => Basis.Mass,
        "mole" or "mol" or "molar" => Basis.Mole,
        _ => throw new InputException(field, text, "volume, mass or mole"),
    };

    internal static string ParseModel(string text, string field) =>
        Mixtures.ActivityModelChoice.TryParse(text.Trim(), out var kind) ? Mixtures.ActivityModelChoice.NameOf(kind)
        : throw new InputException(field, text, "dortmund, unifac or ideal");

    private static Temperature ReadTemperature(string text, string field, double minC, double maxC)
    {
        var t = TemperatureUnits.Parse(text, field);
        if (t.Celsius < minC || t.Celsius > maxC)
            throw new InputException(field, text, $"a temperature from {minC} °C to {maxC} °C");
        return t;
    }

    private static TemperatureDifference ReadDifference(string text, string field)
    {
        var d = TemperatureUnits.ParseDifference(text, field);
        if (!(d.Kelvin > 0) || d.Kelvin > 100) throw new InputException(field, text, "a step above 0 K and at most 100 K");
        return d;
    }

    private static double ReadMassG(string text, string field)
    {
        string t = text.Trim();
        (string unit, double factor) = t.EndsWith("mg", StringComparison.Ordinal) ? ("mg", 1e-3)
            : t.EndsWith("kg", StringComparison.Ordinal) ? ("kg", 1e3)
            : t.EndsWith('g') ? ("g", 1.0) : ("", 1.0);
        return factor * ReadPositive(t[..^unit.Length].Trim(), field, "a mass above zero in mg, g or kg (e.g. 20g; bare number: g)", 1e9);
    }

    private static double ReadPositive(string text, string field, string allowed, double max) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) && v > 0 && v <= max
            ? v
            : throw new InputException(field, text, allowed);
}
