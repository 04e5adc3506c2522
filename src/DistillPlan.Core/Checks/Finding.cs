using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Checks;

/// <summary>How serious a finding is. Shown as a word, never by colour alone.</summary>
public enum Severity
{
    /// <summary>Worth knowing; nothing to change.</summary>
    Info,
    /// <summary>Take care; the plan works but has a weak point.</summary>
    Caution,
    /// <summary>Act before starting: the plan as set up will lose solvent, freeze, bump or fail.</summary>
    Warning,
    /// <summary>Do not run as planned: fire, explosion or toxic exposure is possible.</summary>
    Danger,
}

/// <summary>
/// One finding about a plan or a strip step, as data: a stable code, a severity, which wording
/// of the catalogue (<see cref="Wording"/>) describes it, the typed numbers behind it and the
/// settings it concerns. Front ends never word a finding themselves; they ask the catalogue
/// for the message in their display unit.
/// </summary>
public sealed record Finding
{
    /// <summary>Stable code (docs/methods.md, Safety checks): peroxide-former, bumping-risk … Never renamed.</summary>
    public required string Code { get; init; }
    /// <summary>Severity word.</summary>
    public required Severity Severity { get; init; }
    /// <summary>Which of the code's wordings applies ("" for the only one, "freezes", "near" …).</summary>
    public string Variant { get; init; } = "";
    /// <summary>The numbers and names behind it, by placeholder name, in the order they read.</summary>
    public IReadOnlyDictionary<string, Quantity> Values { get; init; } = new Dictionary<string, Quantity>();
    /// <summary>Keys of the plan settings this finding is about (<see cref="Planning.Settings.PlanSettings"/>).</summary>
    public IReadOnlyList<string> Settings { get; init; } = [];
    /// <summary>False when the check could not be evaluated; <see cref="Values"/> then holds the reason.</summary>
    public bool Evaluated { get; init; } = true;
    /// <summary>
    /// The equipment the finding is worded for: a vessel's finding speaks of the jacket and the
    /// stirrer, a rotary evaporator's of the bath, the flask and rotation (<see cref="Wording"/>).
    /// </summary>
    public Planning.ApparatusKind Apparatus { get; init; } = Planning.ApparatusKind.RotaryEvaporator;

    /// <summary>The severity as the lower-case word used in output.</summary>
    public string SeverityWord => Severity.ToString().ToLowerInvariant();

    /// <summary>The value names that say what a finding is about (not why or how it is worded).</summary>
    private static readonly string[] SubjectKeys = ["solvent", "solvents", "first", "second", "layer_a", "layer_b", "component"];

    /// <summary>Same code, variant and subjects (solvents, pairs, layers): what a strip step compares with the plan to show only what changed.</summary>
    public string Identity => Code + "/" + Variant + "/" + string.Join("/", SubjectKeys.Where(Values.ContainsKey).Select(k => Values[k].Text));

    /// <summary>The message in a display format (the one wording catalogue).</summary>
    public string Message(DisplayFormat format) => Wording.Message(this, format);

    /// <summary>What to do, in a display format.</summary>
    public string Action(DisplayFormat format) => Wording.Action(this, format);
}
