using System.Globalization;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;

namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// A saved plan (docs/plan-file.md): everything the user typed, as text, so that a file means
/// the same in the text UI and on the command line and nothing the user wrote is reinterpreted.
/// Empty strings mean "use the default".
/// </summary>
public sealed record PlanDocument
{
    /// <summary>The format tag written on the first line of every plan file.</summary>
    public const string FormatTag = "distillplan-plan/1";

    /// <summary>A short title (what is being evaporated, for whom).</summary>
    public string Title { get; init; } = "";
    /// <summary>Free text: batch numbers, observations, who planned it.</summary>
    public string Notes { get; init; } = "";
    /// <summary>The charge as on the command line, e.g. <c>ethanol=30,water=70</c>.</summary>
    public string Charge { get; init; } = "";
    /// <summary>What bare numbers in the charge mean.</summary>
    public Basis Basis { get; init; } = Basis.Volume;
    /// <summary>Activity model for mixtures: empty (automatic), "unifac" or "ideal".</summary>
    public string Model { get; init; } = "";
    /// <summary>Mass of the dissolved non-volatile product, e.g. <c>2.5 g</c> (bare number: g); empty when none.</summary>
    public string ProductMass { get; init; } = "";
    /// <summary>Molar mass of the product in g/mol, e.g. <c>320</c>; empty when none.</summary>
    public string ProductMolarMass { get; init; } = "";
    /// <summary>The plan settings, in the spellings of the command-line options.</summary>
    public PlanInputs Inputs { get; init; } = new();
    /// <summary>The pressure unit the plan is shown in (mbar, Torr …).</summary>
    public string PressureUnit { get; init; } = "mbar";

    /// <summary>Parses the charge and attaches the product; throws <see cref="InputException"/> on bad input.</summary>
    public Charge BuildCharge(SolventLibrary library)
    {
        var charge = ChargeParser.Parse(Charge, Basis, library);
        var product = BuildProduct();
        return product is null ? charge : charge with { Product = product };
    }

    /// <summary>The product, when both its mass and its molar mass are given; a half-given product is an error.</summary>
    public Product? BuildProduct()
    {
        bool hasMass = !string.IsNullOrWhiteSpace(ProductMass), hasMolar = !string.IsNullOrWhiteSpace(ProductMolarMass);
        if (!hasMass && !hasMolar) return null;
        if (!hasMass) throw new InputException("product mass", "", "a mass such as 2.5 g when a molar mass is given");
        if (!hasMolar) throw new InputException("product molar mass", "", "a molar mass in g/mol such as 320 when a mass is given");
        return new Product(ReadMassG(ProductMass), ReadPositive(ProductMolarMass.Trim().Replace("g/mol", "").Trim(), "product molar mass", "a molar mass in g/mol above zero, e.g. 320"), null);
    }

    private static double ReadMassG(string text)
    {
        string t = text.Trim();
        (string unit, double factor) = t.EndsWith("mg", StringComparison.Ordinal) ? ("mg", 1e-3)
            : t.EndsWith("kg", StringComparison.Ordinal) ? ("kg", 1e3)
            : t.EndsWith('g') ? ("g", 1.0) : ("", 1.0);
        return factor * ReadPositive(t[..^unit.Length].Trim(), "product mass", "a mass above zero in mg, g or kg (bare number: g)");
    }

    private static double ReadPositive(string text, string field, string allowed) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) && v > 0
            ? v
            : throw new InputException(field, text, allowed);

    /// <summary>The basis as written in files and on the command line.</summary>
    public static string BasisWord(Basis basis) => basis switch { Basis.Mass => "mass", Basis.Mole => "mole", _ => "volume" };

    /// <summary>Reads a basis word (volume, mass, mole); throws with the allowed words otherwise.</summary>
    public static Basis ParseBasis(string text, string field = "basis") => text.Trim().ToLowerInvariant() switch
    {
        "" or "volume" => Basis.Volume,
        "mass" => Basis.Mass,
        "mole" or "mol" or "molar" => Basis.Mole,
        _ => throw new InputException(field, text, "volume, mass or mole"),
    };
}
