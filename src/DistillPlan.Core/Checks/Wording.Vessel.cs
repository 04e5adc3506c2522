namespace DistillPlan.Core.Checks;

/// <summary>
/// The wordings that differ in a jacketed vessel: a jacket instead of a bath, a stirrer instead of
/// rotation, the vessel's wall and bottom outlet instead of a glass flask. A finding of a vessel
/// plan (<see cref="Finding.Apparatus"/>) takes its words from here where an entry exists, else
/// from the common catalogue, which must then hold no glassware words.
/// </summary>
public static partial class Wording
{
    private const string VesselBumpAction = "Stirrer on before vacuum, lower the pressure in the approach steps shown, keep the jacket no hotter than the plan says, and watch the sight glass for foam.";

    private static readonly Dictionary<string, Entry> VesselEntries = new()
    {
        ["scale/not-computed"] = new("Heat duty, rates and time not worked out: {reason}.",
            "Give the amounts with units (150L, 180kg) and the vessel's working volume (--vessel 250L)."),
        // Raised for flasks only; here so the catalogue stays complete should a vessel ever be checked for it.
        ["fill-level/flask"] = new("The charge ({charge}) fills {share} of the container; above its working level it foams over.",
            "Use a container of at least {needed} or charge in portions."),
        ["condenser-capacity/over"] = new("The heat going in ({duty}) is more than the condenser can take ({capacity}): uncondensed vapour goes to the vent condenser and the pump.",
            "Lower the jacket to about {bath_fits}, use a larger condenser or colder coolant."),
        ["condenser-capacity/bath-lowered"] = new("The condenser takes about {capacity}: at the ΔT rule's jacket temperature ({rule_bath}) the duty would be {rule_duty}, so the jacket is held at {bath} (duty {duty}).",
            "For the full jacket step use a larger condenser or colder coolant; the evaporation is slower meanwhile."),
        ["condenser-capacity/too-small"] = new("The condenser takes only about {capacity}: even a jacket {step} above the vapour puts {duty} into the charge.",
            "Use a larger condenser or colder coolant; until then expect vapour past the condenser (a vent condenser or cold trap before the pump)."),

        ["peroxide-former/on-concentration"] = new("{solvent} forms peroxides that become a hazard when concentrated.",
            "Test for peroxides before concentrating; never evaporate to dryness; keep a heel in the vessel."),

        ["autoignition/at-bath"] = new("The jacket at {bath} is at or above the autoignition temperature of {solvent} ({autoignition}).",
            "Do not run: vapour touching the hot wall or the heating-medium lines can ignite without a spark. Lower the jacket well below the autoignition temperature."),
        ["autoignition/surfaces"] = new("Heated surfaces can reach {hottest} (the jacket plus {margin}, or the heating medium's limit), at or above the autoignition temperature of {solvent} ({autoignition}).",
            "Do not run with this heating: limit the heating medium well below the autoignition temperature (a lower --bath-max and a high-temperature trip), insulate hot lines, or use a cooler heating medium."),
        ["autoignition/near"] = new("The heating medium may reach {hottest}, within 80 % of the autoignition temperature of {solvent} ({autoignition}).",
            "Limit the heating medium to well below the autoignition temperature; insulate hot lines and check the temperature class of the area."),

        ["bumping-risk/prone-one"] = new("{solvents} tends to bump; the jacket is {superheat} above the boiling point at the setpoint.", VesselBumpAction),
        ["bumping-risk/prone-many"] = new("{solvents} tend to bump; the jacket is {superheat} above the boiling point at the setpoint.", VesselBumpAction),
        ["bumping-risk/superheat"] = new("The jacket is {superheat} above the boiling point at the setpoint; superheated liquid can boil over.", VesselBumpAction),

        ["coolant-limit/condensate"] = new("The first vapour is mostly {light} ({light_fraction} mole fraction): with the coolant at {coolant} it cannot be condensed at any pressure the heating limits allow (at most {pressure}, vapour {vapor}); uncondensed vapour would go to the pump.",
            "Use a coolant at or below {needed_coolant} (a brine or glycol chiller on the condenser, and a vent condenser before the pump), or evaporate the light component first at atmospheric pressure."),
        ["pump-limit/unreachable"] = new("The pressure {pressure} is below the pump's ultimate pressure {pump_ultimate}: the charge will not boil at {vapor}.",
            "Use a pump that reaches a lower pressure (a dry pump with a booster), or accept a hotter jacket if the heating medium and the product allow it."),
        ["pump-limit/close"] = new("The pressure {pressure} is close to the pump's ultimate pressure {pump_ultimate}: the pump may not hold it.",
            "Use a pump that reaches a lower pressure (a dry pump with a booster), or accept a hotter jacket if the heating medium and the product allow it."),

        ["bath-limit/held"] = new("The jacket is held at the heating medium's limit ({limit}); the vapour temperature was lowered to {vapor}.",
            "Nothing to change; a deeper vacuum does the work instead of heat."),
        ["product-limit/held"] = new("The jacket is held at the product's maximum temperature ({limit}); the vapour temperature was lowered to {vapor}.",
            "Nothing to change; a deeper vacuum does the work instead of heat."),

        ["two-liquids/water"] = new("Two liquid phases in the pot at {vapor}: a layer of {layer_a} ({layer_a_fraction} mole fraction {layer_a}, {layer_a_share} of the liquid) and a layer of water ({layer_b_fraction} water, {layer_b_share}){basis}. While both layers are there the vapour composition is fixed ({vapor_a} {layer_a}, {vapor_b} water) and water comes off with the {layer_a}.",
            "Expect a wet distillate that separates into two layers; azeotropic drying works this way (common practice). A two-layer batch boils unevenly: stir well, lower the pressure in the approach steps, watch the sight glass."),
        ["two-liquids/"] = new("Two liquid phases in the pot at {vapor}: a layer of {layer_a} ({layer_a_fraction} mole fraction {layer_a}, {layer_a_share} of the liquid) and a layer of {layer_b} ({layer_b_fraction} {layer_b}, {layer_b_share}){basis}. While both layers are there the vapour composition is fixed ({vapor_a} {layer_a}, {vapor_b} {layer_b}) and both come off together.",
            "Expect a distillate that separates into two layers. A two-layer batch boils unevenly: stir well, lower the pressure in the approach steps, watch the sight glass."),

        ["pot-freezing/freezes"] = new("The pot boils at {vapor} at {pressure}, at or below the freezing limit of {solvent}, {melting_point}{estimate}: the batch freezes, stops evaporating and can seize the stirrer or block the bottom outlet.",
            "Keep the pot above {safe_vapor}: raise the pressure to at least {safe_pressure}, or use a different solvent plan."),
        ["pot-freezing/near"] = new("The pot boils at {vapor} at {pressure}, less than 2 K above the freezing limit of {solvent}, {melting_point}{estimate}: crystals may form on the vessel wall.",
            "Keep the pot above {safe_vapor}: raise the pressure to at least {safe_pressure}."),
    };

    /// <summary>What a conflict with the heating limit suggests instead, per apparatus.</summary>
    private static string HigherHeatingLimit(Finding f) => f.Apparatus == Planning.ApparatusKind.JacketedVessel
        ? "a heating medium with a higher limit in the jacket (thermal oil or steam)"
        : "a heating medium with a higher limit (oil bath or jacket)";

    /// <summary>What a conflict with the coolant suggests instead, per apparatus.</summary>
    private static string ColderCoolant(Finding f) => f.Apparatus == Planning.ApparatusKind.JacketedVessel
        ? "colder coolant (a brine or glycol chiller on the condenser)"
        : "colder coolant (a chiller, or dry ice in a cold-finger condenser)";
}
