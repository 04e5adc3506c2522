using System.Text;
using System.Text.RegularExpressions;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Checks;

/// <summary>
/// The one wording catalogue: every message and action of every finding, as a template whose
/// {placeholders} are the finding's typed values, rendered in the reader's display unit. A new
/// check adds its lines here; no front end words a finding itself.
/// </summary>
public static partial class Wording
{
    private sealed record Entry(string Message, string Action);

    private const string BumpAction = "Flask at most half full, rotation on before vacuum, lower the pressure in the approach steps shown, use a bump trap.";

    private static readonly Dictionary<string, Entry> Entries = new()
    {
        ["peroxide-former/severe"] = new("{solvent} forms explosive peroxides even in storage.",
            "Do not evaporate old or untested stock; test for peroxides first, never evaporate to dryness, keep a residue; ask your safety officer before concentrating."),
        ["peroxide-former/on-concentration"] = new("{solvent} forms peroxides that become a hazard when concentrated.",
            "Test for peroxides before concentrating; never evaporate to dryness; keep a residue in the flask."),
        ["peroxide-former/slow"] = new("{solvent} forms peroxides slowly.",
            "Test old stock for peroxides before concentrating; do not evaporate to dryness."),

        ["condenser-freeze/freezes"] = new("{solvent} melts at {melting_point}; the coolant at {coolant} will freeze it in the condenser and block the coil.",
            "Set the coolant above {safe_coolant}, or expect to thaw the condenser; check the receiver flow."),
        ["condenser-freeze/near"] = new("{solvent} melts at {melting_point}, only {margin} below the coolant at {coolant}; the coil surface may freeze over.",
            "Keep the coolant a few kelvin warmer and watch the coil for crystals."),

        ["autoignition/at-bath"] = new("The bath at {bath} is at or above the autoignition temperature of {solvent} ({autoignition}).",
            "Do not run: vapour touching the bath or heater can ignite without a spark. Lower the bath well below the autoignition temperature."),
        ["autoignition/surfaces"] = new("Heater surfaces can reach {hottest} (the bath plus {margin}, or the heating medium's limit), at or above the autoignition temperature of {solvent} ({autoignition}).",
            "Do not run with this heating: limit the medium well below the autoignition temperature (a lower --bath-max and a cut-out), keep vapour away from heating elements, or use a different heating medium."),
        ["autoignition/near"] = new("The heating medium may reach {hottest}, within 80 % of the autoignition temperature of {solvent} ({autoignition}).",
            "Limit the heater to well below the autoignition temperature; keep vapour away from hot plates and heating elements."),
        ["autoignition/not-evaluated"] = new("Autoignition check not evaluated: autoignition temperature {reason}.",
            "Look up the autoignition temperature in the SDS and keep every heated surface well below it."),

        ["flammable-exhaust/"] = new("{solvent} has a flash point of {flash_point}, below the pump exhaust temperature ({ambient}): the exhaust carries flammable vapour.",
            "Vent the pump exhaust to extraction; keep ignition sources away; use a pump rated for flammable vapours."),
        ["flammable-exhaust/not-evaluated"] = new("Flash-point check not evaluated: flash point {reason}.",
            "Look up the flash point in the SDS; until then treat the pump exhaust as flammable and vent it to extraction."),

        ["toxic-vapor/"] = new("{solvent} vapour is toxic.",
            "Exhaust the pump to extraction and work in a fume hood; see the SDS for exposure limits."),

        ["bumping-risk/prone-one"] = new("{solvents} tends to bump; the bath is {superheat} above the boiling point at the setpoint.", BumpAction),
        ["bumping-risk/prone-many"] = new("{solvents} tend to bump; the bath is {superheat} above the boiling point at the setpoint.", BumpAction),
        ["bumping-risk/superheat"] = new("The bath is {superheat} above the boiling point at the setpoint; superheated liquid can bump.", BumpAction),
        ["bumping-risk/pressure-step"] = new("The pressure halves or more in this step ({from} to {to}).",
            "Lower the pressure gradually through this step; watch for bumping."),

        ["condenser-breakthrough/"] = new("At the coolant temperature {coolant} the condensate's vapour pressure ({condensate_pressure}) is at or above the pressure ({pressure}): nothing condenses, the vapour goes to the pump.",
            "Cool the condenser below {condenser_max} or raise the pressure; add a cold trap before the pump."),
        ["condenser-breakthrough/not-evaluated"] = new("Condenser capture not evaluated: {reason}.",
            "Watch the receiver: if little condenses, raise the pressure or cool the condenser; add a cold trap before the pump."),
        ["solvent-loss/"] = new("Gas leaving the condenser at {coolant} carries about {loss_rate} of solvent to the pump with an air leak of {leak} ({condensate_pressure} of {pressure} is solvent vapour).",
            "Use colder coolant, tighten leaks, and put a cold trap before the pump; give the amounts (250mL) to see it as a share of the evaporation."),
        ["solvent-loss/share"] = new("About {loss_rate} of solvent goes past the condenser to the pump, {loss_share} of what evaporates ({condensate_pressure} of {pressure} is solvent vapour at the coolant's {coolant}).",
            "Use colder coolant, tighten leaks, and put a cold trap before the pump."),
        ["condenser-capacity/over"] = new("The heat going in ({duty}) is more than the condenser can take ({capacity}): uncondensed vapour goes to the pump.",
            "Lower the bath to about {bath_fits}, use a larger condenser or colder coolant."),
        ["condenser-capacity/bath-lowered"] = new("The condenser takes about {capacity}: at the ΔT rule's bath ({rule_bath}) the duty would be {rule_duty}, so the bath is held at {bath} (duty {duty}).",
            "For the full bath step use a larger condenser or colder coolant; the evaporation is slower meanwhile."),
        ["condenser-capacity/too-small"] = new("The condenser takes only about {capacity}: even a bath {step} above the vapour puts {duty} into the charge.",
            "Use a larger condenser or colder coolant; until then expect vapour past the condenser (a cold trap before the pump)."),
        ["pump-capacity/over"] = new("The pump must carry {gas_load} at {pressure} (leak air and solvent vapour) but moves {speed} ({share}): it cannot hold the pressure.",
            "Find and fix leaks, cool the condenser, or use a pump with more speed."),
        ["pump-capacity/near"] = new("The gas to be pumped at {pressure}, {gas_load}, is {share} of the pump's {speed}: little is left for a surge.",
            "Check for leaks before starting; a larger pump or a colder condenser gives margin."),
        ["swap/dilution-only"] = new("At the end of the {method} swap the old solvent is {vapor} of the vapour but {liquid} of the liquid: it leaves more slowly than {solvent}, so the swap works by dilution alone and takes much solvent.",
            "Check the pair for an azeotrope; a different pressure, or a final strip at higher temperature, may help."),
        ["swap/two-liquids"] = new("In the {method} swap the pot splits into two liquid layers (from about {added} of {solvent} added): while both layers are there it boils as a heteroazeotrope and the distillate separates in the receiver.",
            "That helps to take the old solvent off (azeotropic drying is common practice); keep stirring so both layers boil, and check the receiver for a second layer."),
        ["swap/not-reached"] = new("The {method} swap stops before the target: {reason}; the old solvent is still {residual} by mass.",
            "Raise the heating limit if the product allows, hold a lower pressure, or accept a higher residual."),
        ["scale/not-computed"] = new("Heat duty, rates and time not worked out: {reason}.",
            "Give the amounts with units (250mL, 2L, 180kg) and the flask or vessel (--flask 1L, --vessel 250L)."),
        ["fill-level/flask"] = new("The charge ({charge}) fills {share} of the {flask} flask; a flask more than half full foams and bumps over.",
            "Use a flask of at least {needed} or evaporate in portions."),
        ["fill-level/below-minimum"] = new("The charge ({charge}) is below the vessel's minimum stirred volume ({minimum}): the stirrer and the jacket are not covered.",
            "Charge at least {minimum}, or use a smaller vessel."),

        ["coolant-limit/condensate"] = new("The first vapour is mostly {light} ({light_fraction} mole fraction): with the coolant at {coolant} it cannot be condensed at any pressure the heating limits allow (at most {pressure}, vapour {vapor}); uncondensed vapour would go to the pump.",
            "Use a coolant at or below {needed_coolant} (a chiller, or dry ice in a cold-finger condenser), or evaporate the light component first at atmospheric pressure."),
        ["pump-limit/unreachable"] = new("The pressure {pressure} is below the pump's ultimate pressure {pump_ultimate}: the charge will not boil at {vapor}.",
            "Use a better pump (an oil pump with a cold trap), or accept a hotter bath if the heating medium and the product allow it."),
        ["pump-limit/close"] = new("The pressure {pressure} is close to the pump's ultimate pressure {pump_ultimate}: the pump may not hold it.",
            "Use a better pump (an oil pump with a cold trap), or accept a hotter bath if the heating medium and the product allow it."),

        ["bath-limit/held"] = new("The bath is held at the heating medium's limit ({limit}); the vapour temperature was lowered to {vapor}.",
            "Nothing to change; a deeper vacuum does the work instead of heat."),
        ["product-limit/held"] = new("The bath is held at the product's maximum temperature ({limit}); the vapour temperature was lowered to {vapor}.",
            "Nothing to change; a deeper vacuum does the work instead of heat."),

        ["azeotrope/minimum"] = new("{first} and {second} form a minimum-boiling azeotrope at {azeotrope_mole_fraction} mole fraction {first}, {temperature} at {pressure}{basis}; evaporation cannot take the composition past it.",
            "The distillate comes over near the azeotrope and the residue moves towards pure {side}. Evaporation alone cannot free {other} of {side}: use a drying agent, an entrainer or a solvent swap."),
        ["azeotrope/maximum"] = new("{first} and {second} form a maximum-boiling azeotrope at {azeotrope_mole_fraction} mole fraction {first}, {temperature} at {pressure}{basis}; evaporation cannot take the composition past it.",
            "The excess {side} distils first; the residue moves towards the azeotrope and then boils unchanged at its higher temperature. Evaporation alone cannot remove the rest."),
        ["azeotrope/heterogeneous"] = new("{first} and {second} form a heteroazeotrope (two liquid layers) at {azeotrope_mole_fraction} mole fraction {first}, {temperature} at {pressure}{basis}: while both layers are in the pot the vapour comes over at this composition.",
            "Azeotropic drying works (common practice): the vapour carries {second} over with {first} and the condensate separates into two layers in the receiver. Once one layer is gone the rest boils as one liquid."),
        ["azeotrope/not-evaluated"] = new("Azeotrope check not evaluated: {reason}.",
            "Look up the pair in an azeotrope table before relying on a clean separation."),

        ["two-liquids/water"] = new("Two liquid phases in the pot at {vapor}: a layer of {layer_a} ({layer_a_fraction} mole fraction {layer_a}, {layer_a_share} of the liquid) and a layer of water ({layer_b_fraction} water, {layer_b_share}){basis}. While both layers are there the vapour composition is fixed ({vapor_a} {layer_a}, {vapor_b} water) and water comes off with the {layer_a}.",
            "Expect a wet distillate that separates into two layers; azeotropic drying works this way (common practice). A two-layer pot bumps easily: rotate well, lower the pressure in the approach steps, use a bump trap."),
        ["two-liquids/"] = new("Two liquid phases in the pot at {vapor}: a layer of {layer_a} ({layer_a_fraction} mole fraction {layer_a}, {layer_a_share} of the liquid) and a layer of {layer_b} ({layer_b_fraction} {layer_b}, {layer_b_share}){basis}. While both layers are there the vapour composition is fixed ({vapor_a} {layer_a}, {vapor_b} {layer_b}) and both come off together.",
            "Expect a distillate that separates into two layers. A two-layer pot bumps easily: rotate well, lower the pressure in the approach steps, use a bump trap."),

        ["pot-freezing/freezes"] = new("The pot boils at {vapor} at {pressure}, at or below the freezing limit of {solvent}, {melting_point}{estimate}: the pot freezes, stops evaporating and can crack the flask.",
            "Keep the pot above {safe_vapor}: raise the pressure to at least {safe_pressure}, or use a different solvent plan."),
        ["pot-freezing/near"] = new("The pot boils at {vapor} at {pressure}, less than 2 K above the freezing limit of {solvent}, {melting_point}{estimate}: crystals may form on the flask wall.",
            "Keep the pot above {safe_vapor}: raise the pressure to at least {safe_pressure}."),
        ["pot-freezing/not-evaluated"] = new("Pot-freezing check not evaluated: {reason}.",
            "Watch the pot for crystals; keep it warmer than the highest melting point of its components if in doubt."),

        ["estimated-curve/"] = new("{note}; the setpoint carries that uncertainty.",
            "Approach the setpoint from above and watch the boiling; with a few measured points of your own, fit a curve (distillplan fit) and use it instead."),
        ["extrapolated-curve/"] = new("Vapour pressure of {solvents} was extrapolated beyond the fitted range of its curves (at {vapor} or {coolant}).",
            "Treat the setpoint as an estimate: approach it from above and watch the boiling."),

        // Notes: what the plan did and why (severity info).
        ["model/"] = new("{note}.", ""),
        ["model/approximate"] = new("Model answer is {note}.", "Treat setpoints and the ramp as rough: approach the setpoint from above and watch the boiling."),
        ["no-vacuum-needed/"] = new("The charge boils at {boiling} at the local atmospheric pressure ({atmosphere}), at or below the preferred vapour temperature: no vacuum is needed; heat gently.", ""),
        ["pressure-ramp/"] = new("Hold the vapour at {vapor}: the pressure must fall from {from} to {to} as the light component leaves ({end}); the residue is then {residue_share} {residue}.", ""),
        ["pressure-ramp/two-liquids"] = new("Hold the vapour at {vapor}: both liquid layers stay in the pot to the end ({end}), so the pressure stays at {from} (three-phase boiling); {first} leaves first and {residue} remains: the residue is then {residue_share} {residue}.", ""),
        ["pressure-ramp/two-liquids-then-one"] = new("Hold the vapour at {vapor}: while both liquid layers are in the pot the pressure stays near {from} (three-phase boiling), then falls to {to} as one liquid ({end}); {first} leaves first and {residue} remains: the residue is then {residue_share} {residue}.", ""),
        ["pressure-ramp/held-pressure"] = new("Hold the pressure at {from} while {first} leaves: the boiling temperature rises from {vapor} to {end_vapor} ({end}); the residue is then {residue_share} {residue}. Lower the pressure only once {first} is gone, or the condenser cannot hold it.", ""),
        ["condensate-capture/raised"] = new("The first vapour is mostly {light} ({light_fraction} mole fraction); at the coolant {coolant} + {margin} its condensate boils at {condensate_pressure}, above {before} at {before_vapor}: the vapour temperature was raised to {vapor} and the setpoint to {pressure}, so the condenser captures it.",
            "A colder coolant lets the plan run at a lower pressure."),
        ["liquid-phases/one"] = new("One liquid phase in the pot at the setpoint: {basis}.", ""),
        ["published-azeotrope/"] = new("{note}.", ""),
        ["strip-not-computed/"] = new("The pressure ramp could not be computed: {reason}. The setpoints still stand.", ""),

        // How a strip ended (StripPlanner).
        ["strip-end/fraction-left"] = new("{left} of the charge ({basis}) is left", ""),
        ["strip-end/minimum-residue"] = new("minimum residue reached: {left} of the charge ({basis}) is kept because {solvents} forms peroxides; do not evaporate further", ""),
        ["strip-end/residual"] = new("{component} is down to mole fraction {reached} in the liquid (target {target})", ""),
        ["strip-end/pump-limit"] = new("the pressure has fallen to what the pump can hold, {floor} (twice its ultimate pressure {pump_ultimate})", ""),
        ["strip-end/temperature-limit"] = new("the boiling temperature has reached {vapor}, where the heating reaches {limit} ({bath})", ""),
        ["strip-end/dry"] = new("practically dry: less than 1 ppm of the solvent is left", ""),
        ["strip-end/failed"] = new("the strip stopped early: {reason}", "Treat the last steps as approximate; stop the evaporation by hand before this point."),
    };

    private static readonly Dictionary<string, string> ConflictNeeds = new()
    {
        ["coolant"] = "the coolant needs a vapour temperature of at least {needed} (coolant + ΔT)",
        ["pump-limit"] = "the pump can only hold pressures that boil the charge at {needed} or above",
        ["pot-freezing"] = "the pot must boil at {needed} or above to stay clear of its freezing point",
    };

    private static readonly Dictionary<string, string> ConflictAllows = new()
    {
        ["bath-limit"] = "the heating limit allows at most {allowed} (limit − ΔT)",
        ["product-limit"] = "the product's maximum temperature allows at most {allowed} (limit − ΔT)",
        ["atmospheric-boiling-point"] = "the charge boils at {allowed} at atmospheric pressure",
    };

    /// <summary>A conflict is reported under the code of the limit that won, or else of the bound it broke.</summary>
    internal static string ConflictCode(string low, string high) =>
        high is "bath-limit" or "product-limit" ? high : low == "coolant" ? "coolant-limit" : low;

    /// <summary>The finding's message, its numbers in the display format.</summary>
    public static string Message(Finding f, DisplayFormat format)
    {
        if (f.Variant.StartsWith("conflict:", StringComparison.Ordinal))
        {
            var parts = f.Variant.Split(':');
            return Fill($"Conflict: {ConflictNeeds[parts[1]]}, but {ConflictAllows[parts[2]]}; the vapour is held at {{vapor}}.", f, format);
        }
        return Fill(Find(f).Message, f, format);
    }

    /// <summary>What to do about the finding.</summary>
    public static string Action(Finding f, DisplayFormat format)
    {
        if (f.Variant.StartsWith("conflict:", StringComparison.Ordinal))
        {
            var parts = f.Variant.Split(':');
            var remedies = new List<string>
            {
                parts[1] switch
                {
                    "coolant" => ColderCoolant(f),
                    "pot-freezing" => "a higher limit for the heating or the product, so the pot can stay liquid",
                    _ => "a better pump (lower ultimate pressure)",
                },
            };
            if (parts[2] == "bath-limit") remedies.Add(HigherHeatingLimit(f));
            if (parts[2] != "atmospheric-boiling-point") remedies.Add("smaller ΔT steps (--delta-t)");
            return "Resolve with: " + string.Join("; or ", remedies) + ".";
        }
        return Fill(Find(f).Action, f, format);
    }

    // A vessel's finding takes the vessel's wording where it differs (Wording.Vessel.cs).
    private static Entry Find(Finding f) =>
        f.Apparatus == Planning.ApparatusKind.JacketedVessel && VesselEntries.TryGetValue(f.Code + "/" + f.Variant, out var v) ? v
        : Entries.TryGetValue(f.Code + "/" + f.Variant, out var e) ? e
        : throw new InvalidOperationException($"no wording for finding {f.Code}/{f.Variant}");

    [GeneratedRegex(@"\{([a-z_]+)\}")]
    private static partial Regex Placeholder();

    private static string Fill(string template, Finding f, DisplayFormat format) =>
        Placeholder().Replace(template, m => f.Values.TryGetValue(m.Groups[1].Value, out var q)
            ? format.Format(q)
            : throw new InvalidOperationException($"finding {f.Code}/{f.Variant} has no value '{m.Groups[1].Value}'"));
}
