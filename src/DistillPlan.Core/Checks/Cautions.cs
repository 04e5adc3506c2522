namespace DistillPlan.Core.Checks;

/// <summary>The general cautions every plan carries, worded in one place.</summary>
public static class Cautions
{
    /// <summary>Shown with every plan, in the CLI, the JSON and the text UI.</summary>
    public static IReadOnlyList<string> General { get; } =
    [
        "DistillPlan plans; a trained person decides. Follow your site's safety rules, the SDS of every substance and local codes.",
        "Glassware under vacuum can implode: inspect it for cracks and star marks, use coated flasks or a shield.",
        "Do not heat residues of unknown thermal stability to dryness; respect the product's maximum temperature.",
        "Lower the pressure in steps from above, with rotation on, and keep the flask at most half full.",
    ];
}
