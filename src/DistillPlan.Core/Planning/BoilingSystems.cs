using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Planning;

/// <summary>Chooses the equilibrium model for a charge.</summary>
public static class BoilingSystems
{
    /// <summary>
    /// A pure solvent boils at its saturation point; a mixture uses modified Raoult's law with
    /// the requested activity model (dortmund by default, original UNIFAC where a Dortmund pair
    /// is missing, ideal last, with the reason).
    /// </summary>
    public static IBoilingSystem For(Charge charge, string? model)
    {
        var kind = ParseModel(model);
        if (charge.IsPure) return new PureSolventSystem(charge.Components[0].Solvent);
        return new MixtureBoilingSystem(charge.Components.Select(c => c.Solvent).ToList(), kind);
    }

    /// <summary>The activity model a user named: dortmund (default), unifac (original) or ideal.</summary>
    public static ActivityModelKind ParseModel(string? model) =>
        string.IsNullOrWhiteSpace(model) ? ActivityModelKind.Dortmund
        : ActivityModelChoice.TryParse(model, out var kind) ? kind
        : throw new InputException("--model", model, "dortmund, unifac or ideal");
}
