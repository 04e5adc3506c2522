using DistillPlan.Core.Library;

namespace DistillPlan.Core.Planning;

/// <summary>What bare numbers in a charge mean.</summary>
public enum Basis
{
    /// <summary>Parts by liquid volume (the default: chemists measure solvents by volume).</summary>
    Volume,
    /// <summary>Parts by mass.</summary>
    Mass,
    /// <summary>Parts by amount of substance (mole).</summary>
    Mole,
}

/// <summary>One solvent of a charge and its amount [mol].</summary>
/// <param name="Solvent">The library entry.</param>
/// <param name="Moles">Amount [mol]; for a relative charge the amounts add to 1 mol.</param>
public sealed record ChargeComponent(Solvent Solvent, double Moles)
{
    /// <summary>Amount [mol]: finite and above zero, or the charge is refused naming the solvent (a NaN must not reach a solver).</summary>
    public double Moles { get; init; } = double.IsFinite(Moles) && Moles > 0
        ? Moles
        : throw new InputException($"charge ({Solvent.Name})", Moles.ToString(System.Globalization.CultureInfo.InvariantCulture) + " mol",
            "a finite amount above zero");
}

/// <summary>A non-volatile product dissolved in the charge.</summary>
/// <param name="MassG">Mass [g].</param>
/// <param name="MolarMassGPerMol">Molar mass [g/mol].</param>
/// <param name="MaxTemperatureK">Highest temperature it may see [K], when known.</param>
public sealed record Product(double MassG, double MolarMassGPerMol, double? MaxTemperatureK)
{
    /// <summary>Mass [g]: finite and above zero.</summary>
    public double MassG { get; init; } = double.IsFinite(MassG) && MassG > 0
        ? MassG : throw new InputException("--product-mass", MassG.ToString(System.Globalization.CultureInfo.InvariantCulture) + " g", "a finite mass above zero");
    /// <summary>Molar mass [g/mol]: finite and above zero.</summary>
    public double MolarMassGPerMol { get; init; } = double.IsFinite(MolarMassGPerMol) && MolarMassGPerMol > 0
        ? MolarMassGPerMol : throw new InputException("--product-molar-mass", MolarMassGPerMol.ToString(System.Globalization.CultureInfo.InvariantCulture) + " g/mol", "a finite molar mass above zero");

    /// <summary>Amount [mol].</summary>
    public double Moles => MassG / MolarMassGPerMol;
}

/// <summary>
/// What is in the flask or vessel: solvents with amounts, and an optional non-volatile product.
/// A relative charge (parts or percentages only) fixes the composition but not the size.
/// </summary>
public sealed record Charge
{
    /// <summary>The solvents, in the order given.</summary>
    public required IReadOnlyList<ChargeComponent> Components { get; init; }
    /// <summary>True when only the composition is known (parts or percentages).</summary>
    public bool IsRelative { get; init; }
    /// <summary>The dissolved product, when given.</summary>
    public Product? Product { get; init; }

    /// <summary>Total solvent amount [mol].</summary>
    public double SolventMoles => Components.Sum(c => c.Moles);

    /// <summary>True for a single solvent.</summary>
    public bool IsPure => Components.Count == 1;

    /// <summary>Liquid mole fractions of the solvents (product excluded), by component order.</summary>
    public double[] MoleFractions() => Components.Select(c => c.Moles / SolventMoles).ToArray();

    /// <summary>A one-solvent charge of 1 mol.</summary>
    public static Charge Pure(Solvent s) => new() { Components = [new ChargeComponent(s, 1.0)], IsRelative = true };

    /// <summary>Short text such as "ethyl acetate 50 % + heptane 50 % (mol)".</summary>
    public string Describe() => IsPure
        ? Components[0].Solvent.Name
        : string.Join(" + ", Components.Select(c => $"{c.Solvent.Name} {100 * c.Moles / SolventMoles:0.#} %")) + " (mol)";
}
