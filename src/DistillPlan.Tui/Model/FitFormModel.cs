using DistillPlan.Core;
using DistillPlan.Core.Fitting;
using DistillPlan.Core.Library;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Tui.Model;

/// <summary>
/// Behind the text UI's fit form: what the user typed, the fit it gives (refitted on every edit,
/// by the same <see cref="CompoundFit"/> as <c>distillplan fit</c>) and the text shown for it
/// (<see cref="FitText"/>, the CLI's layout). Adding writes to the user's library through
/// <see cref="UserLibraryFile"/>. It never touches a view.
/// </summary>
/// <param name="userLibraryPath">The user's library file that "add" writes to.</param>
public sealed class FitFormModel(string userLibraryPath)
{
    /// <summary>The file "add" writes to.</summary>
    public string UserLibraryPath { get; } = userLibraryPath;
    /// <summary>Compound name as typed.</summary>
    public string Name { get; set; } = "";
    /// <summary>Molar mass as typed (g/mol).</summary>
    public string MolarMass { get; set; } = "";
    /// <summary>Points as typed, <c>30C:42.5mbar,50C:123mbar</c> (one point without a pressure is a boiling point at 1 atm).</summary>
    public string Points { get; set; } = "";
    /// <summary>Form as typed (blank: auto).</summary>
    public string Form { get; set; } = "";
    /// <summary>Alcohol-like liquid (one-point estimate).</summary>
    public bool Associating { get; set; }
    /// <summary>The last good fit for the current input, or null.</summary>
    public CompoundFit? Result { get; private set; }
    /// <summary>Why there is no fit (one line), or null.</summary>
    public string? Error { get; private set; }

    /// <summary>Fits what is typed; afterwards <see cref="Result"/> or <see cref="Error"/> is set.</summary>
    public void Refit()
    {
        Result = null;
        Error = null;
        try
        {
            var atmosphere = Pressure.FromPascal(PhysicalConstants.StandardAtmospherePa);
            string pts = Points.Trim();
            // A lone temperature is a boiling point: "150C" at 1 atm, or "78C@100mbar".
            var measured = pts.Length > 0 && !pts.Contains(':')
                ? [MeasuredPoints.ParseBoilingPoint(pts, "points", atmosphere)]
                : MeasuredPoints.ParseList(pts, "points", atmosphere);
            Result = CompoundFit.Make(Name, measured, CompoundFit.ParseForm(Form, "form"), Associating, CompoundFit.ParseMolarMass(MolarMass, "molar mass"));
        }
        catch (DistillPlanException e) { Error = e.Message; }
    }

    /// <summary>The text the form shows: the fit in the CLI's layout, or what to fix.</summary>
    public IReadOnlyList<string> Lines(PressureUnit unit) =>
        Result is { } r ? FitText.Lines(r, unit)
        : string.IsNullOrWhiteSpace(Points) ? ["Type the measured points, e.g. 30C:42.5mbar,50C:123mbar,70C:300mbar", "(one temperature alone, e.g. 150C, is a boiling point at 1 atm: a Trouton estimate)."]
        : ["No fit: " + Error];

    /// <summary>Adds the fitted compound to the user's library; returns the loaded library with it, and one line saying what happened.</summary>
    public (SolventLibrary? Library, string Message) AddToLibrary()
    {
        if (Result is not { } r) return (null, "Nothing to add: " + (Error ?? "type the points first"));
        if (r.MolarMassGPerMol is null) return (null, "Not added: a library entry needs the molar mass; type it in g/mol.");
        try
        {
            var added = UserLibraryFile.Add(UserLibraryPath, r.EntryFile(null, "add"), replace: false, field: "add");
            return (SolventLibrary.LoadWithUser(added.Path),
                $"Added '{r.Name}' to {added.Path}{(added.Created ? " (new file)" : "")}; type {SolventLibrary.Normalise(r.Name)} in the charge (F2).");
        }
        catch (DistillPlanException e) { return (null, "Not added: " + e.Message); }
    }
}
