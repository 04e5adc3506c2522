using System.Globalization;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;

namespace DistillPlan.Core.Checks;

/// <summary>
/// The general cautions a plan carries, worded in one place and chosen by the equipment: glassware
/// cautions for a rotary evaporator, plant cautions for a jacketed vessel (common practice;
/// docs/methods.md, Safety checks). They never replace the site's rules, the SDS, local codes or
/// licensed practice, and the first line says so.
/// </summary>
public static class Cautions
{
    /// <summary>The cautions every plan carries, whatever it runs in.</summary>
    public static IReadOnlyList<string> General { get; } =
    [
        "DistillPlan plans; a trained person decides. These cautions are general: your site's safety rules, the SDS of every substance, local codes and licensed practice come first.",
        "Do not heat residues of unknown thermal stability to dryness; respect the product's maximum temperature.",
    ];

    /// <summary>Cautions for glassware on a rotary evaporator.</summary>
    public static IReadOnlyList<string> Glassware { get; } =
    [
        "Glassware under vacuum can implode: inspect it for cracks and star marks, use coated flasks or a shield.",
        "Lower the pressure in steps from above, with rotation on, and keep the flask at most half full.",
    ];

    /// <summary>The cautions for a plan: <see cref="General"/>, then those of its apparatus.</summary>
    /// <param name="equipment">What the charge is evaporated in.</param>
    /// <param name="solvents">The solvents of the charge (the static-charge caution names the low-conductivity ones).</param>
    public static IReadOnlyList<string> For(Equipment equipment, IEnumerable<Solvent> solvents) =>
        equipment.IsVessel ? [.. General, .. Vessel(equipment, solvents)] : [.. General, .. Glassware];

    /// <summary>Cautions for a jacketed plant vessel (pilot plant and kilo lab, common practice).</summary>
    private static IEnumerable<string> Vessel(Equipment equipment, IEnumerable<Solvent> solvents)
    {
        yield return "Inert the vessel with nitrogen before heating a flammable solvent, and break the vacuum with nitrogen, never with air: " +
            "air let into hot solvent vapour can make an ignitable mixture.";

        var low = solvents.Where(s => s.Flags.HasFlag(SolventFlags.LowConductivity)).Select(s => s.Name).ToList();
        string which = low.Count switch
        {
            0 => "low-conductivity solvents (hydrocarbons, ethers) charge up when they flow, are stirred or sprayed",
            1 => $"{low[0]} has a low conductivity and charges up when it flows, is stirred or sprayed",
            _ => $"{string.Join(", ", low.Take(low.Count - 1))} and {low[^1]} have a low conductivity and charge up when they flow, are stirred or sprayed",
        };
        yield return "Earth the vessel, its lines and receivers and bond them together; " + which +
            ": no free fall into the vessel, modest transfer rates, follow the site's static procedure.";

        string volume = equipment.MinimumVolumeM3 is double v
            ? string.Create(CultureInfo.InvariantCulture, $" ({v * 1000:0.#} L here)") : "";
        yield return $"Keep the batch above the minimum stirred volume{volume} and the lowest jacket level, so the heat-transfer area stays wetted; " +
            "lower the pressure in steps from above with the stirrer running.";

        yield return "Classify the hazardous area (zone, gas group, temperature class of the vapours) under your local codes, " +
            "and use only equipment rated for it.";
    }
}
