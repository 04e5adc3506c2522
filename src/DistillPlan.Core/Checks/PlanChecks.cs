using DistillPlan.Core.Library;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Checks;

/// <summary>
/// The checks of a plan (DESIGN §3). Each rule is one method that returns its finding or
/// nothing; all wording lives here, the CLI and TUI only render it.
/// </summary>
public static class PlanChecks
{
    /// <summary>Components below this liquid mole fraction are ignored by per-solvent checks.</summary>
    private const double TraceFraction = 0.005;

    /// <summary>All findings, most severe first.</summary>
    public static IReadOnlyList<Check> Evaluate(CheckContext c)
    {
        var found = new List<Check>();
        var present = c.Charge.Components.Zip(c.Charge.MoleFractions())
            .Where(p => p.Second >= TraceFraction).Select(p => p.First.Solvent).ToList();

        foreach (var s in present)
        {
            Add(found, PeroxideFormer(s));
            Add(found, CondenserFreeze(s, c));
            Add(found, Autoignition(s, c));
            Add(found, FlammableExhaust(s, c));
            Add(found, ToxicVapor(s));
        }
        Add(found, BumpingRisk(present, c));
        Add(found, Breakthrough(c));
        Add(found, PumpLimit(c));
        Add(found, BathLimit(c));
        Add(found, ProductLimit(c));
        Add(found, ExtrapolatedCurve(c));
        foreach (var a in c.Azeotropes) Add(found, AzeotropeCheck(a, c));
        return found.OrderByDescending(f => f.Severity).ToList();
    }

    private static void Add(List<Check> list, Check? check) { if (check is not null) list.Add(check); }

    private static Dictionary<string, double> V(params (string, double)[] values) => values.ToDictionary(v => v.Item1, v => Math.Round(v.Item2, 4));

    /// <summary>peroxide-former: classes after Kelly (1996).</summary>
    public static Check? PeroxideFormer(Solvent s) => s.PeroxideClass switch
    {
        PeroxideClass.Severe => new("peroxide-former", Severity.Danger,
            $"{s.Name} forms explosive peroxides even in storage.",
            "Do not evaporate old or untested stock; test for peroxides first, never evaporate to dryness, keep a residue; ask your safety officer before concentrating.", V()),
        PeroxideClass.OnConcentration => new("peroxide-former", Severity.Warning,
            $"{s.Name} forms peroxides that become a hazard when concentrated.",
            "Test for peroxides before concentrating; never evaporate to dryness; keep a residue in the flask.", V()),
        PeroxideClass.Slow => new("peroxide-former", Severity.Caution,
            $"{s.Name} forms peroxides slowly.",
            "Test old stock for peroxides before concentrating; do not evaporate to dryness.", V()),
        _ => null,
    };

    /// <summary>condenser-freeze: coolant at or near the melting point (CRC melting points).</summary>
    public static Check? CondenserFreeze(Solvent s, CheckContext c)
    {
        if (s.MeltingPointK is not double tm) return null;
        var melt = Temperature.FromKelvin(tm);
        double margin = c.Equipment.Coolant.Kelvin - tm;
        if (margin > 3) return null;
        var values = V(("coolant_c", c.Equipment.Coolant.Celsius), ("melting_point_c", melt.Celsius));
        return margin <= 0
            ? new("condenser-freeze", Severity.Warning,
                $"{s.Name} melts at {melt}; the coolant at {c.Equipment.Coolant} will freeze it in the condenser and block the coil.",
                $"Set the coolant above {Temperature.FromKelvin(tm + 3)}, or expect to thaw the condenser; check the receiver flow.", values)
            : new("condenser-freeze", Severity.Caution,
                $"{s.Name} melts at {melt}, only {margin:0.#} K below the coolant at {c.Equipment.Coolant}; the coil surface may freeze over.",
                "Keep the coolant a few kelvin warmer and watch the coil for crystals.", values);
    }

    /// <summary>autoignition: bath or jacket near the autoignition temperature (NFPA 497 / IEC 60079-20-1 values).</summary>
    public static Check? Autoignition(Solvent s, CheckContext c)
    {
        if (s.AutoignitionK is not double ait) return null;
        var aitT = Temperature.FromKelvin(ait);
        var hottest = Temperature.Max(c.Bath, c.Equipment.HeatingMax);
        var values = V(("bath_c", c.Bath.Celsius), ("heating_max_c", c.Equipment.HeatingMax.Celsius), ("autoignition_c", aitT.Celsius));
        if (c.Bath >= aitT)
            return new("autoignition", Severity.Danger,
                $"The bath at {c.Bath} is at or above the autoignition temperature of {s.Name} ({aitT}).",
                "Do not run: vapour touching the bath or heater can ignite without a spark. Lower the bath well below the autoignition temperature.", values);
        // Hot surfaces are commonly kept below 80 % of the autoignition temperature in °C (from memory, after EN 1127-1).
        if (hottest.Celsius >= 0.8 * aitT.Celsius)
            return new("autoignition", Severity.Warning,
                $"The heating medium may reach {hottest}, within 80 % of the autoignition temperature of {s.Name} ({aitT}).",
                "Limit the heater to well below the autoignition temperature; keep vapour away from hot plates and heating elements.", values);
        return null;
    }

    /// <summary>flammable-exhaust: flash point below room temperature means flammable vapour at the pump exhaust.</summary>
    public static Check? FlammableExhaust(Solvent s, CheckContext c)
    {
        if (s.FlashPointK is not double fp || fp >= c.Equipment.Ambient.Kelvin) return null;
        var fpT = Temperature.FromKelvin(fp);
        return new("flammable-exhaust", Severity.Warning,
            $"{s.Name} has a flash point of {fpT}, below room temperature ({c.Equipment.Ambient}): the pump exhaust carries flammable vapour.",
            "Vent the pump exhaust to extraction; keep ignition sources away; use a pump rated for flammable vapours.",
            V(("flash_point_c", fpT.Celsius), ("ambient_c", c.Equipment.Ambient.Celsius)));
    }

    /// <summary>toxic-vapor: vapours that must go to extraction.</summary>
    public static Check? ToxicVapor(Solvent s) => s.Flags.HasFlag(SolventFlags.ToxicVapor)
        ? new("toxic-vapor", Severity.Warning, $"{s.Name} vapour is toxic.",
            "Exhaust the pump to extraction and work in a fume hood; see the SDS for exposure limits.", V())
        : null;

    /// <summary>bumping-risk: bumping-prone solvents, and a bath above the atmospheric boiling point (superheat if vacuum is pulled fast).</summary>
    public static Check? BumpingRisk(IReadOnlyList<Solvent> present, CheckContext c)
    {
        var prone = present.Where(s => s.Flags.HasFlag(SolventFlags.BumpingProne)).Select(s => s.Name).ToList();
        double superheat = c.Bath.Kelvin - c.Vapor.Kelvin;
        var values = V(("bath_c", c.Bath.Celsius), ("vapor_c", c.Vapor.Celsius), ("superheat_k", superheat));
        const string action = "Flask at most half full, rotation on before vacuum, lower the pressure in the approach steps shown, use a bump trap.";
        if (prone.Count > 0)
            return new("bumping-risk", Severity.Warning,
                $"{string.Join(" and ", prone)} {(prone.Count == 1 ? "tends" : "tend")} to bump; the bath is {superheat:0} K above the boiling point at the setpoint.", action, values);
        if (superheat > 30)
            return new("bumping-risk", Severity.Caution,
                $"The bath is {superheat:0} K above the boiling point at the setpoint; superheated liquid can bump.", action, values);
        return null;
    }

    /// <summary>
    /// condenser-breakthrough and solvent-loss: the gas leaving the condenser is saturated at the
    /// coolant temperature; solvent carried by leak air, per mass of air, is
    /// (M_solvent/M_air)·Psat(Tc)/(P − Psat(Tc)) (vent relation for vacuum operations, from memory).
    /// </summary>
    public static Check? Breakthrough(CheckContext c)
    {
        var tc = c.Equipment.Coolant;
        double pCond;
        try { pCond = c.System.BubblePressure(tc.Kelvin, c.StartVapor).PressurePa; }
        catch (DistillPlanException) { return null; }
        double p = c.Setpoint.Pascal;
        var values = V(("coolant_c", tc.Celsius), ("condenser_pressure_mbar", pCond / 100), ("setpoint_mbar", p / 100));
        if (pCond >= p)
            return new("condenser-breakthrough", Severity.Warning,
                $"At the coolant temperature {tc} the condensate's vapour pressure ({pCond / 100:0.0} mbar) is above the setpoint ({p / 100:0.0} mbar): nothing condenses, the vapour goes to the pump.",
                $"Cool the condenser below {c.CondenserMax} or raise the setpoint; add a cold trap before the pump.", values);

        double mVapor = c.System.Components.Zip(c.StartVapor).Sum(t => t.First.MolarMassGPerMol * t.Second);
        double perAir = mVapor / PhysicalConstants.AirMolarMassGPerMol * pCond / (p - pCond);
        values["solvent_per_air_g_per_g"] = Math.Round(perAir, 4);
        if (perAir < 0.2) return null;
        return new("solvent-loss", perAir >= 1 ? Severity.Warning : Severity.Caution,
            $"Gas leaving the condenser at {tc} carries {perAir:0.##} g of solvent per g of leak air ({pCond / 100:0.0} of {p / 100:0.0} mbar is solvent vapour).",
            "Use colder coolant, tighten leaks, and put a cold trap before the pump.", values);
    }

    /// <summary>pump-limit: the setpoint is below what the pump can hold.</summary>
    public static Check? PumpLimit(CheckContext c)
    {
        double hold = c.Equipment.PumpUltimate.Pascal * c.Rules.PumpMarginFactor;
        if (c.Setpoint.Pascal >= hold) return null;
        var values = V(("setpoint_mbar", c.Setpoint.Millibar), ("pump_ultimate_mbar", c.Equipment.PumpUltimate.Millibar));
        bool unreachable = c.Setpoint <= c.Equipment.PumpUltimate;
        return new("pump-limit", unreachable ? Severity.Warning : Severity.Caution,
            unreachable
                ? $"The setpoint {c.Setpoint} is below the pump's ultimate pressure {c.Equipment.PumpUltimate}: the charge will not boil at {c.Vapor}."
                : $"The setpoint {c.Setpoint} is close to the pump's ultimate pressure {c.Equipment.PumpUltimate}: the pump may not hold it.",
            "Use a better pump (an oil pump with a cold trap), or accept a hotter bath if the heating medium and the product allow it.", values);
    }

    /// <summary>bath-limit: the heating limit decided or blocked the plan.</summary>
    public static Check? BathLimit(CheckContext c) => LimitCheck(c, "bath-limit", "the heating medium's limit", c.Equipment.HeatingMax);

    /// <summary>product-limit: the product's maximum temperature decided or blocked the plan.</summary>
    public static Check? ProductLimit(CheckContext c)
    {
        var max = c.Rules.ProductMax ?? (c.Charge.Product?.MaxTemperatureK is double k ? Temperature.FromKelvin(k) : null);
        return max is Temperature m ? LimitCheck(c, "product-limit", "the product's maximum temperature", m) : null;
    }

    private static Check? LimitCheck(CheckContext c, string code, string what, Temperature limit)
    {
        var conflict = c.Conflicts.FirstOrDefault(k => k.Constraints.Contains(code));
        var values = V(("limit_c", limit.Celsius), ("bath_c", c.Bath.Celsius), ("vapor_c", c.Vapor.Celsius));
        if (conflict is not null)
            return new(code, Severity.Warning, $"Conflict: {conflict.Message}", "Resolve with: " + string.Join("; or ", conflict.Remedies) + ".", values);
        if (c.Bath.Kelvin >= limit.Kelvin - 1e-6)
            return new(code, Severity.Info, $"The bath is held at {what} ({limit}); the vapour temperature was lowered to {c.Vapor}.",
                "Nothing to change; a deeper vacuum does the work instead of heat.", values);
        return null;
    }

    /// <summary>
    /// azeotrope: a pair of the charge forms an azeotrope at the setpoint pressure; evaporation
    /// cannot take the composition past it.
    /// </summary>
    public static Check AzeotropeCheck(Mixtures.Azeotrope a, CheckContext c)
    {
        var names = a.MoleFractions.Keys.ToList();
        string first = names[0], second = names[1];
        double xAz = a.MoleFractions[first];
        var fractions = c.Charge.Components.Zip(c.Charge.MoleFractions()).ToDictionary(t => t.First.Solvent.Name, t => t.Second);
        double xFirst = fractions[first] / (fractions[first] + fractions[second]);
        var t = Temperature.FromKelvin(a.TemperatureK);
        string where = $"{xAz:0.###} mole fraction {first} ({t} at {a.PressurePa / 100:0.#} mbar)";
        var values = V(("azeotrope_mole_fraction", xAz), ("charge_mole_fraction", xFirst), ("temperature_c", t.Celsius), ("pressure_mbar", a.PressurePa / 100));
        bool predicted = c.System.Model == "unifac";
        string basis = predicted ? " (predicted by UNIFAC)" : "";
        if (a.Kind == Mixtures.AzeotropeKind.MinimumBoiling)
        {
            // Gibbs–Konovalov: the vapour lies between the liquid and the azeotrope, so the residue moves away from it.
            string side = xFirst > xAz ? first : second, other = side == first ? second : first;
            return new("azeotrope", Severity.Warning,
                $"{first} and {second} form a minimum-boiling azeotrope at {where}{basis}; evaporation cannot take the composition past it.",
                $"The distillate comes over near the azeotrope and the residue moves towards pure {side}. Evaporation alone cannot free {other} of {side}: use a drying agent, an entrainer or a solvent swap.",
                values);
        }
        string excess = xFirst > xAz ? first : second;
        return new("azeotrope", Severity.Warning,
            $"{first} and {second} form a maximum-boiling azeotrope at {where}{basis}; evaporation cannot take the composition past it.",
            $"The excess {excess} distils first; the residue moves towards the azeotrope and then boils unchanged at its higher temperature. Evaporation alone cannot remove the rest.",
            values);
    }

    /// <summary>extrapolated-curve: a vapour pressure was taken outside the fitted range of its curve.</summary>
    public static Check? ExtrapolatedCurve(CheckContext c)
    {
        var outside = c.System.Components.Where(s =>
            !s.VaporPressure.Curves.Any(k => k.Covers(c.Vapor.Kelvin))
            // The coolant side matters only while the condensate is liquid.
            || (c.Equipment.Coolant.Kelvin > (s.MeltingPointK ?? 0) && !s.VaporPressure.Curves.Any(k => k.Covers(c.Equipment.Coolant.Kelvin))))
            .Select(s => s.Name).ToList();
        if (!c.Extrapolated && outside.Count == 0) return null;
        return new("extrapolated-curve", Severity.Caution,
            $"Vapour pressure of {string.Join(", ", outside.DefaultIfEmpty("the charge"))} was extrapolated beyond the fitted range of its curves (at {c.Vapor} or {c.Equipment.Coolant}).",
            "Treat the setpoint as an estimate: approach it from above and watch the boiling.", V(("vapor_c", c.Vapor.Celsius), ("coolant_c", c.Equipment.Coolant.Celsius)));
    }
}
