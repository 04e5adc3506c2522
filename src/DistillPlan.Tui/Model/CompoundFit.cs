using System.Globalization;
using DistillPlan.Core;
using DistillPlan.Core.Fitting;

namespace DistillPlan.Tui.Model;

/// <summary>
/// A user's own compound fitted from measured points, as the <c>fit</c> verb and the text-UI fit
/// form both make it: the same parsing of form and molar mass, the same fit and the same library
/// entry, so the two can never disagree.
/// </summary>
/// <param name="Name">The compound's name.</param>
/// <param name="Fit">The fitted curve.</param>
/// <param name="MolarMassGPerMol">Molar mass [g/mol], needed for a library entry.</param>
public sealed record CompoundFit(string Name, VaporPressureFitResult Fit, double? MolarMassGPerMol)
{
    /// <summary>The spellings of <see cref="FitForm"/> on the command line and in the form.</summary>
    public static readonly IReadOnlyList<(string Text, FitForm Form)> Forms =
    [
        ("auto", FitForm.Auto), ("antoine", FitForm.Antoine), ("clausius-clapeyron", FitForm.ClausiusClapeyron), ("trouton", FitForm.Trouton),
    ];

    /// <summary>What <c>--form</c> accepts.</summary>
    public static string FormsText => string.Join("|", Forms.Select(f => f.Text));

    /// <summary>Reads a form name (blank is auto).</summary>
    public static FitForm ParseForm(string? text, string field)
    {
        string t = (text ?? "").Trim().ToLowerInvariant().Replace('_', '-').Replace(' ', '-');
        if (t.Length == 0) return FitForm.Auto;
        return Forms.Where(f => f.Text == t || (t == "cc" && f.Form == FitForm.ClausiusClapeyron)).Select(f => (FitForm?)f.Form).FirstOrDefault()
            ?? throw new InputException(field, text!, "one of " + string.Join(", ", Forms.Select(f => f.Text)));
    }

    /// <summary>Reads a molar mass, <c>46.07</c> or <c>46.07 g/mol</c>; blank is none.</summary>
    public static double? ParseMolarMass(string? text, string field)
    {
        string t = (text ?? "").Trim();
        if (t.Length == 0) return null;
        if (t.EndsWith("g/mol", StringComparison.OrdinalIgnoreCase)) t = t[..^5].Trim();
        if (double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double m) && double.IsFinite(m) && m > 0 && m < 10000)
            return m;
        throw new InputException(field, text!, "a molar mass in g/mol above 0 and below 10000 (e.g. 46.07)");
    }

    /// <summary>Fits the points; the curve's source key is the one the compound's library entry will use.</summary>
    /// <param name="name">The compound's name (not blank).</param>
    /// <param name="points">Measured points (T [K], P [Pa]).</param>
    /// <param name="form">The form to fit.</param>
    /// <param name="associating">Alcohol-like (Trouton 109 J/(mol K)) for a one-point estimate.</param>
    /// <param name="molarMassGPerMol">Molar mass, when known.</param>
    public static CompoundFit Make(string name, IReadOnlyList<(double TK, double PPa)> points, FitForm form, bool associating, double? molarMassGPerMol)
    {
        if (string.IsNullOrWhiteSpace(name)) throw new InputException("name", name ?? "", "a name for the compound");
        var fit = VaporPressureFit.Fit(points, form, associating, UserLibraryFile.SourceKeyFor(name));
        return new CompoundFit(name.Trim(), fit, molarMassGPerMol);
    }

    /// <summary>The library file of this compound (docs/solvents-schema.md); needs the molar mass.</summary>
    /// <param name="citation">Where the points come from; a plain default when blank.</param>
    /// <param name="field">The option or field to name when the molar mass is missing.</param>
    public string EntryFile(string? citation, string field)
    {
        if (MolarMassGPerMol is not double m)
            throw new InputException("--molar-mass", "missing", "", $"--molar-mass: a library entry needs the molar mass in g/mol (e.g. --molar-mass 46.07) for {field}");
        string cite = string.IsNullOrWhiteSpace(citation)
            ? $"measured vapour pressures of {Name} entered by the user ({Fit.Residuals.Count} point{(Fit.Residuals.Count == 1 ? "" : "s")})"
            : citation.Trim();
        return LibraryEntryWriter.Write(new FittedCompound(Name, m, cite), Fit, UserLibraryFile.SourceKeyFor(Name));
    }
}
