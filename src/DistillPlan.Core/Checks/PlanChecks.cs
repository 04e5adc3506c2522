using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Quantities;
using static DistillPlan.Core.Checks.F;

namespace DistillPlan.Core.Checks;

/// <summary>
/// The checks of a plan and of every strip step (docs/methods.md, Safety checks). Each rule is
/// one method that returns its finding or nothing. Findings are data; their words live in
/// <see cref="Wording"/>. A check that cannot be evaluated says so instead of disappearing.
/// </summary>
public static class PlanChecks
{
    /// <summary>Components below this liquid mole fraction are ignored by per-solvent checks.</summary>
    private const double TraceFraction = 0.005;

    /// <summary>The condenser-freeze check warns this close to the melting point [K] (common practice).</summary>
    public const double FreezeMarginK = 3;

    /// <summary>Below this much solvent per gram of leak air the loss is not worth a line.</summary>
    private const double LossWorthSaying = 0.2;

    private static readonly string[] Coolant = ["coolant-temp"];
    private static readonly string[] Heating = ["heating", "bath-max"];
    private static readonly string[] PumpSettings = ["pump", "pump-limit"];

    /// <summary>All findings, most severe first.</summary>
    public static IReadOnlyList<Finding> Evaluate(CheckContext c)
    {
        var found = new List<Finding>();
        var present = c.Components.Where((_, i) => c.Liquid[i] >= TraceFraction).ToList();

        foreach (var s in present)
        {
            Add(found, PeroxideFormer(s));
            Add(found, CondenserFreeze(s, c));
            Add(found, Autoignition(s, c));
            Add(found, FlammableExhaust(s, c));
            Add(found, ToxicVapor(s));
        }
        Add(found, BumpingRisk(present, c));
        Add(found, TwoLiquids(c));
        Add(found, PotFreezing(present, c));
        Add(found, Breakthrough(c));
        Add(found, CondenserCapacity(c));
        Add(found, PumpCapacity(c));
        Add(found, PumpLimit(c));
        foreach (var conflict in c.Conflicts) found.Add(ConflictFinding(conflict));
        Add(found, HeldAtLimit(c, "bath-limit", c.Equipment.HeatingMax, Heating));
        if (c.ProductMax is Temperature pm) Add(found, HeldAtLimit(c, "product-limit", pm, ["product-max"]));
        Add(found, ExtrapolatedCurve(c));
        foreach (var s in present) Add(found, EstimatedCurve(s));
        if (c.AzeotropeProblem is string why) found.Add(NotEvaluated("azeotrope", why, []));
        foreach (var a in c.Azeotropes) found.Add(AzeotropeCheck(a, c));
        // Worded for the equipment the plan runs on (a jacket and a stirrer, or a bath and a flask).
        return found.OrderByDescending(f => f.Severity).Select(f => f with { Apparatus = c.Equipment.Apparatus }).ToList();
    }

    private static void Add(List<Finding> list, Finding? f) { if (f is not null) list.Add(f); }

    /// <summary>peroxide-former: classes after Kelly (1996).</summary>
    public static Finding? PeroxideFormer(Solvent s) => s.PeroxideClass switch
    {
        PeroxideClass.Severe => Make("peroxide-former", Severity.Danger, "severe", [], W("solvent", s.Name)),
        PeroxideClass.OnConcentration => Make("peroxide-former", Severity.Warning, "on-concentration", [], W("solvent", s.Name)),
        PeroxideClass.Slow => Make("peroxide-former", Severity.Caution, "slow", [], W("solvent", s.Name)),
        _ => null,
    };

    /// <summary>condenser-freeze: coolant at or within 3 K of the melting point (CRC melting points).</summary>
    public static Finding? CondenserFreeze(Solvent s, CheckContext c)
    {
        if (s.MeltingPointK is not double tm) return null;
        double margin = c.Equipment.Coolant.Kelvin - tm;
        if (margin > FreezeMarginK) return null;
        var values = new[] { W("solvent", s.Name), TK("melting_point", tm), T("coolant", c.Equipment.Coolant), TK("safe_coolant", tm + FreezeMarginK), DT("margin", margin) };
        return margin <= 0
            ? Make("condenser-freeze", Severity.Warning, "freezes", Coolant, values)
            : Make("condenser-freeze", Severity.Caution, "near", Coolant, values);
    }

    /// <summary>Heater surfaces run hotter than the bath or jacket they heat [K] (rule of thumb, from memory; docs/methods.md, Safety checks).</summary>
    public const double HeaterSurfaceMarginK = 20;

    /// <summary>
    /// autoignition: bath or jacket near the autoignition temperature (the lower of NFPA 497 and
    /// IEC 60079-20-1). A danger when the bath plus the heater-surface margin, or the heating
    /// medium's own limit, reaches it; a warning when the hottest surface is within 80 % of it in
    /// °C (from memory, after EN 1127-1).
    /// </summary>
    public static Finding? Autoignition(Solvent s, CheckContext c)
    {
        if (s.AutoignitionK is not double ait)
            return Missing(s.AutoignitionRecord, s.AutoignitionMissingReason, "autoignition", Heating, s);
        var hottest = Temperature.Max(c.Bath + new TemperatureDifference(HeaterSurfaceMarginK), c.Equipment.HeatingMax);
        var values = new[] { W("solvent", s.Name), T("bath", c.Bath), T("hottest", hottest), TK("autoignition", ait), DT("margin", HeaterSurfaceMarginK) };
        if (c.Bath.Kelvin >= ait) return Make("autoignition", Severity.Danger, "at-bath", Heating, values);
        if (hottest.Kelvin >= ait) return Make("autoignition", Severity.Danger, "surfaces", Heating, values);
        if (hottest.Celsius >= 0.8 * (ait - PhysicalConstants.ZeroCelsiusK)) return Make("autoignition", Severity.Warning, "near", Heating, values);
        return null;
    }

    /// <summary>flammable-exhaust: a flash point below the pump exhaust's temperature means flammable vapour at the exhaust.</summary>
    public static Finding? FlammableExhaust(Solvent s, CheckContext c)
    {
        if (s.FlashPointK is not double fp)
            return Missing(s.FlashPointRecord, s.FlashPointMissingReason, "flammable-exhaust", ["exhaust-temp"], s);
        if (fp >= c.Equipment.Ambient.Kelvin) return null;
        return Make("flammable-exhaust", Severity.Warning, "", ["exhaust-temp"], W("solvent", s.Name), TK("flash_point", fp), T("ambient", c.Equipment.Ambient));
    }

    /// <summary>
    /// A flammability figure the library lacks: "not evaluated" with why, never a silent pass.
    /// Only a stated reason the figure does not exist (water does not burn) answers the check.
    /// </summary>
    private static Finding? Missing(FlammabilityRecord record, string? why, string code, string[] settings, Solvent s) =>
        record.Reason is not null && record.Unpublished ? null
            : NotEvaluated(code, $"{why ?? "not recorded in the library"} for {s.Name}", settings, W("solvent", s.Name));

    /// <summary>toxic-vapor: vapours that must go to extraction.</summary>
    public static Finding? ToxicVapor(Solvent s) =>
        s.Flags.HasFlag(SolventFlags.ToxicVapor) ? Make("toxic-vapor", Severity.Warning, "", [], W("solvent", s.Name)) : null;

    /// <summary>bumping-risk: bumping-prone solvents, and a bath far above the boiling point (superheat).</summary>
    public static Finding? BumpingRisk(IReadOnlyList<Solvent> present, CheckContext c)
    {
        var prone = present.Where(s => s.Flags.HasFlag(SolventFlags.BumpingProne)).Select(s => s.Name).ToList();
        double superheat = c.Bath.Kelvin - c.Vapor.Kelvin;
        var values = new[] { T("bath", c.Bath), T("vapor", c.Vapor), DT("superheat", superheat) };
        if (prone.Count > 0)
            return Make("bumping-risk", Severity.Warning, prone.Count == 1 ? "prone-one" : "prone-many", ["delta-t"], [W("solvents", string.Join(" and ", prone)), .. values]);
        if (superheat > 30) return Make("bumping-risk", Severity.Caution, "superheat", ["delta-t"], values);
        return null;
    }

    /// <summary>
    /// condenser-breakthrough and solvent-loss: the gas leaving the condenser is saturated at the
    /// coolant temperature with the condensate, which has the vapour's composition. Solvent carried
    /// by leak air, per mass of air, is (M_solvent/M_air)·Psat(Tc)/(P − Psat(Tc)) (docs/methods.md,
    /// Condenser capture and solvent loss).
    /// </summary>
    public static Finding? Breakthrough(CheckContext c)
    {
        var tc = c.Equipment.Coolant;
        double pCond;
        try { pCond = c.System.BubblePressure(tc.Kelvin, c.VaporComposition).PressurePa; }
        catch (DistillPlanException e)
        {
            return NotEvaluated("condenser-breakthrough", "the condensate's vapour pressure at the coolant temperature could not be computed: " + e.Message, Coolant, T("coolant", tc));
        }
        double p = c.Pressure.Pascal;
        var values = new List<(string, Reports.Quantity)> { T("coolant", tc), PPa("condensate_pressure", pCond), P("pressure", c.Pressure), T("condenser_max", c.CondenserMax) };
        if (pCond >= p) return Make("condenser-breakthrough", Severity.Warning, "", Coolant, [.. values]);

        double mVapor = c.Components.Zip(c.VaporComposition).Sum(t => t.First.MolarMassGPerMol * t.Second);
        double perAir = mVapor / PhysicalConstants.AirMolarMassGPerMol * pCond / (p - pCond);
        if (c.Heat is Scale.HeatState heat && heat.LossShare is double share)
        {
            // With the charge's size known the loss is a rate and a share of what evaporates.
            if (share < LossShareWorthSaying) return null;
            values.Add(N("loss_rate", heat.SolventToPumpGPerH, "g/h"));
            values.Add(("loss_share", Reports.Quantity.Percent(share)));
            return Make("solvent-loss", share >= 0.05 ? Severity.Warning : Severity.Caution, "share", Coolant, [.. values]);
        }
        if (perAir < LossWorthSaying) return null;
        double leakKgPerS = Scale.ScaleSetup.LeakKgPerS(c.Equipment, c.Equipment.NominalVolumeM3 ?? 0);
        values.Add(N("loss_rate", perAir * leakKgPerS * 3.6e6, "g/h"));
        values.Add(N("leak", leakKgPerS * 3.6e6, "g/h"));
        return Make("solvent-loss", perAir >= 1 ? Severity.Warning : Severity.Caution, "", [.. Coolant, "leak-rate"], [.. values]);
    }

    /// <summary>
    /// condenser-capacity: the heat going in must come out at the condenser; vapour it cannot
    /// take goes to the pump (docs/methods.md, Heat and time).
    /// </summary>
    public static Finding? CondenserCapacity(CheckContext c)
    {
        if (c.Heat is not Scale.HeatState h || h.Breakthrough || h.HeatDutyW <= h.CondenserCapacityW * (1 + 1e-9)) return null;
        // The bath that would fit: the same U·A at 90 % of the capacity.
        double fitsK = c.Vapor.Kelvin + Scale.ScalePlanner.CondenserLoadTarget * h.CondenserCapacityW / Math.Max(h.HeatDutyW, 1e-9) * (c.Bath.Kelvin - c.Vapor.Kelvin);
        return Make("condenser-capacity", Severity.Warning, "over", ["condenser-area", "condenser-capacity", "coolant-temp", "bath-max"],
            N("duty", h.HeatDutyW, "W"), N("capacity", h.CondenserCapacityW, "W"), T("bath", c.Bath), TK("bath_fits", fitsK));
    }

    /// <summary>pump-capacity: the gas to be pumped at the pressure (leak air and solvent vapour) against the pumping speed.</summary>
    public static Finding? PumpCapacity(CheckContext c)
    {
        if (c.Heat is not Scale.HeatState h || h.PumpShare <= PumpShareWorthSaying) return null;
        return Make("pump-capacity", h.PumpShare > 1 ? Severity.Warning : Severity.Caution, h.PumpShare > 1 ? "over" : "near",
            ["pump-speed", "leak-rate", "coolant-temp"],
            N("gas_load", h.GasLoadM3PerS * 3600, "m³/h"), N("speed", h.PumpSpeedM3PerS * 3600, "m³/h"), P("pressure", c.Pressure),
            ("share", Reports.Quantity.Percent(h.PumpShare)));
    }

    /// <summary>Below this share of the evaporation, solvent to the pump is not worth a line.</summary>
    private const double LossShareWorthSaying = 0.005;

    /// <summary>Above this share of the pumping speed the gas load is worth a line (the pump has little left for a surge).</summary>
    private const double PumpShareWorthSaying = 0.8;

    /// <summary>pump-limit: the pressure is below what the pump can hold (twice its ultimate, common practice).</summary>
    public static Finding? PumpLimit(CheckContext c)
    {
        double hold = c.Equipment.PumpUltimate.Pascal * c.Rules.PumpMarginFactor;
        if (c.Pressure.Pascal >= hold * (1 - 1e-9)) return null;
        bool unreachable = c.Pressure <= c.Equipment.PumpUltimate;
        return Make("pump-limit", unreachable ? Severity.Warning : Severity.Caution, unreachable ? "unreachable" : "close", PumpSettings,
            P("pressure", c.Pressure), P("pump_ultimate", c.Equipment.PumpUltimate), T("vapor", c.Vapor));
    }

    /// <summary>A conflict of limits, as one finding named after the limit that won.</summary>
    public static Finding ConflictFinding(Conflict k)
    {
        string code = Wording.ConflictCode(k.LowerCode, k.UpperCode);
        string[] settings = [.. SettingsOf(k.LowerCode), .. SettingsOf(k.UpperCode), "delta-t"];
        return Make(code, Severity.Warning, $"conflict:{k.LowerCode}:{k.UpperCode}", settings,
            T("needed", k.Lower), T("allowed", k.Upper), T("vapor", k.Chosen));
    }

    private static string[] SettingsOf(string constraint) => constraint switch
    {
        "coolant" => Coolant,
        "pump-limit" => PumpSettings,
        "bath-limit" => Heating,
        "product-limit" => ["product-max"],
        "pot-freezing" => ["vapor-temp"],
        _ => [],
    };

    /// <summary>bath-limit / product-limit: the limit decided the plan (said once; a conflict says it instead).</summary>
    private static Finding? HeldAtLimit(CheckContext c, string code, Temperature limit, string[] settings)
    {
        if (c.Conflicts.Any(k => k.UpperCode == code)) return null;
        if (c.Bath.Kelvin < limit.Kelvin - 1e-6) return null;
        return Make(code, Severity.Info, "held", settings, T("limit", limit), T("bath", c.Bath), T("vapor", c.Vapor));
    }

    /// <summary>
    /// azeotrope: a pair of the pot forms an azeotrope at the pressure; evaporation cannot take
    /// the composition past it.
    /// </summary>
    public static Finding AzeotropeCheck(Mixtures.Azeotrope a, CheckContext c)
    {
        var names = a.MoleFractions.Keys.ToList();
        string first = names[0], second = names[1];
        double xAz = a.MoleFractions[first];
        var fractions = c.Components.Select((s, i) => (s.Name, c.Liquid[i])).ToDictionary(t => t.Name, t => t.Item2);
        double xFirst = fractions[first] / Math.Max(fractions[first] + fractions[second], 1e-300);
        string variant = a.Kind switch
        {
            Mixtures.AzeotropeKind.MinimumBoiling => "minimum",
            Mixtures.AzeotropeKind.Heterogeneous => "heterogeneous",
            _ => "maximum",
        };
        // Gibbs–Konovalov: at a minimum-boiling azeotrope the residue moves away from it, at a maximum towards it.
        string side = xFirst > xAz ? first : second, other = side == first ? second : first;
        string basis = a.Source is string source ? $", published: {source}" : c.System.Model switch
        {
            "dortmund" => ", as predicted by modified UNIFAC (Dortmund)",
            "unifac" => ", as predicted by UNIFAC",
            _ => "",
        };
        // A heteroazeotrope is a working route (azeotropic drying), not a dead end: said, not warned.
        var severity = a.Kind == Mixtures.AzeotropeKind.Heterogeneous ? Severity.Caution : Severity.Warning;
        return Make("azeotrope", severity, variant, ["model"],
            W("first", first), W("second", second), X("azeotrope_mole_fraction", xAz), X("charge_mole_fraction", xFirst),
            TK("temperature", a.TemperatureK), PPa("pressure", a.PressurePa), W("basis", basis), W("side", side), W("other", other));
    }

    /// <summary>
    /// two-liquids: the pot holds two liquid layers at this state (docs/methods.md, Mixtures, two
    /// liquid phases). While both are there the pot boils at the three-phase point: the vapour has
    /// one fixed composition (the heteroazeotrope's for a pair), the pressure at a held vapour
    /// temperature does not fall, and the layers bump. A caution, not a warning: the plan works and
    /// azeotropic drying is common practice; the bumping itself is the bumping-risk check's.
    /// </summary>
    public static Finding? TwoLiquids(CheckContext c)
    {
        if (c.LiquidPhases is not { Count: > 1 } phases) return null;
        var names = c.Components.Select(s => s.Name).ToList();
        (string Main, double X, double Share) Layer(Mixtures.LiquidPhase p)
        {
            var main = p.MoleFractions.MaxBy(kv => kv.Value);
            return (main.Key, main.Value, p.Share);
        }
        var (a, b) = (Layer(phases[0]), Layer(phases[1]));
        // The organic layer first, so "water comes off with toluene" reads the usual way round.
        if (a.Main == "water") (a, b) = (b, a);
        int ia = names.IndexOf(a.Main), ib = names.IndexOf(b.Main);
        bool water = b.Main == "water" && a.Main != "water";
        return Make("two-liquids", Severity.Caution, water ? "water" : "", ["model"],
            T("vapor", c.Vapor), P("pressure", c.Pressure),
            W("layer_a", a.Main), X("layer_a_fraction", a.X), (("layer_a_share"), Reports.Quantity.Percent(a.Share)),
            W("layer_b", b.Main), X("layer_b_fraction", b.X), (("layer_b_share"), Reports.Quantity.Percent(b.Share)),
            X("vapor_a", ia >= 0 ? c.VaporComposition[ia] : 0), X("vapor_b", ib >= 0 ? c.VaporComposition[ib] : 0),
            W("basis", c.LiquidPhaseBasis is string why ? " (" + why + ")" : ""));
    }

    /// <summary>
    /// pot-freezing: the pot would sit at or near its freezing limit (a pure solvent's CRC melting
    /// point; a mixture's dominant component's, see <see cref="Planning.PotFreezing"/>). A frozen pot
    /// stops evaporating and can crack the flask. Where no limit can be given but a component present
    /// melts above the pot's temperature, the check says it was not evaluated.
    /// </summary>
    public static Finding? PotFreezing(IReadOnlyList<Solvent> present, CheckContext c)
    {
        var limit = Planning.PotFreezing.Limit(c.Components, c.Liquid);
        if (limit is null)
        {
            var above = present.Where(s => s.MeltingPointK is double tm && tm >= c.Vapor.Kelvin).MaxBy(s => s.MeltingPointK);
            return above is null ? null
                : NotEvaluated("pot-freezing", $"no component is over half of the pot and the library has no enthalpy of fusion to estimate its solid–liquid limit, while {above.Name} melts at {above.MeltingPointK - PhysicalConstants.ZeroCelsiusK:0.0} °C, above the pot at {c.Vapor.Celsius:0.0} °C",
                    ["vapor-temp"], W("solvent", above.Name));
        }
        double margin = c.Vapor.Kelvin - limit.LimitK;
        if (margin >= Planning.PotFreezing.MarginK - 1e-6) return null;
        double safeK = limit.LimitK + Planning.PotFreezing.MarginK;
        double? safeP = null;
        try { safeP = c.System.BubblePressure(safeK, c.Liquid).PressurePa; } catch (DistillPlanException) { /* the action then names the temperature only */ }
        var values = new List<(string, Reports.Quantity)>
        {
            W("solvent", limit.Solvent.Name), TK("melting_point", limit.LimitK), T("vapor", c.Vapor), P("pressure", c.Pressure),
            TK("safe_vapor", safeK), safeP is double sp ? PPa("safe_pressure", sp) : W("safe_pressure", "the pressure where it boils there"),
            W("estimate", limit.Basis == "dominant" ? $" (the pure melting point of {limit.Solvent.Name}, over half of the pot; an estimate: the other components lower it)" : ""),
        };
        return margin <= 0
            ? Make("pot-freezing", Severity.Warning, "freezes", ["vapor-temp", "pressure"], [.. values])
            : Make("pot-freezing", Severity.Caution, "near", ["vapor-temp", "pressure"], [.. values]);
    }

    /// <summary>extrapolated-curve: a vapour pressure was taken outside the fitted range of its curve.</summary>
    public static Finding? ExtrapolatedCurve(CheckContext c)
    {
        var outside = c.Components.Where(s =>
            !s.VaporPressure.Curves.Any(k => k.Covers(c.Vapor.Kelvin))
            // The coolant side matters only while the condensate is liquid.
            || (c.Equipment.Coolant.Kelvin > (s.MeltingPointK ?? 0) && !s.VaporPressure.Curves.Any(k => k.Covers(c.Equipment.Coolant.Kelvin))))
            .Select(s => s.Name).ToList();
        if (!c.Extrapolated && outside.Count == 0) return null;
        return Make("extrapolated-curve", Severity.Caution, "", [],
            W("solvents", string.Join(", ", outside.DefaultIfEmpty("the charge"))), T("vapor", c.Vapor), T("coolant", c.Equipment.Coolant));
    }

    /// <summary>estimated-curve: the vapour pressure rests on an estimate, not a published curve; the setpoint carries its error.</summary>
    public static Finding? EstimatedCurve(Solvent s) =>
        s.VaporPressure.EstimatedErrorPercent is double error
            ? Make("estimated-curve", Severity.Caution, "", [], W("solvent", s.Name), W("note", s.EstimatedCurveNote!), N("error", error, "%"))
            : null;

    /// <summary>bumping-risk in a strip: the pressure falls by half or more within one step.</summary>
    public static Finding? PressureStep(Pressure before, Pressure after) =>
        before.Pascal / after.Pascal > 2
            ? Make("bumping-risk", Severity.Caution, "pressure-step", [], P("from", before), P("to", after))
            : null;
}
