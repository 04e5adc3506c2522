namespace DistillPlan.Core.Planning;

/// <summary>Chooses the equilibrium model for a charge.</summary>
public static class BoilingSystems
{
    /// <summary>
    /// A pure solvent boils at its saturation point; a mixture uses modified Raoult's law with
    /// the requested activity model ("unifac" or "ideal"; default unifac where parameters exist).
    /// </summary>
    public static IBoilingSystem For(Charge charge, string? model)
    {
        if (model is not (null or "unifac" or "ideal"))
            throw new InputException("--model", model, "unifac or ideal");
        if (charge.IsPure) return new PureSolventSystem(charge.Components[0].Solvent);
        return MixtureFactory?.Invoke(charge, model)
               ?? throw new InputException("charge", charge.Describe(), "a single solvent in this build");
    }

    /// <summary>Set by the mixture engine at start-up.</summary>
    public static Func<Charge, string?, IBoilingSystem>? MixtureFactory { get; set; }
}
