using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;

namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// A saved plan (docs/plan-file.md): everything the user typed, as text, so that a file means
/// the same in the text UI and on the command line and nothing the user wrote is reinterpreted.
/// Settings not given mean "use the default".
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
    /// <summary>Every setting, by key of <see cref="PlanSettings"/> (basis, model, product, equipment, rules, strip).</summary>
    public PlanInputs Inputs { get; init; } = new();
    /// <summary>The pressure unit the plan is shown in (mbar, Torr …).</summary>
    public string PressureUnit { get; init; } = "mbar";

    /// <summary>Parses the settings and the charge (with its product); throws <see cref="InputException"/> on bad input.</summary>
    public (Charge Charge, PlanSetup Setup) Build(SolventLibrary library)
    {
        var setup = Inputs.Build();
        var charge = ChargeParser.Parse(Charge, setup.Basis, library);
        return (setup.Product is null ? charge : charge with { Product = setup.Product }, setup);
    }

    /// <summary>Every input as the user gave it, for a report: the charge, then each setting given.</summary>
    public IReadOnlyList<KeyValuePair<string, string>> InputList() =>
        [new("charge", Charge), .. Inputs.Given];
}
