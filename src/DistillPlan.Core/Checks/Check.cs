namespace DistillPlan.Core.Checks;

/// <summary>How serious a check is. Shown as a word, never by colour alone.</summary>
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
/// One finding about a plan: a stable code, a severity, a one-line message with the numbers
/// behind it, what to do, and the numbers themselves (SI or °C/mbar as the key says).
/// </summary>
/// <param name="Code">Stable code (DESIGN §5): peroxide-former, bumping-risk …</param>
/// <param name="Severity">Severity word.</param>
/// <param name="Message">One line with the numbers behind it.</param>
/// <param name="Action">What to do about it.</param>
/// <param name="Values">The numbers that triggered it, keyed with their unit (e.g. coolant_c).</param>
public sealed record Check(string Code, Severity Severity, string Message, string Action, IReadOnlyDictionary<string, double> Values)
{
    /// <summary>The severity as the lower-case word used in output.</summary>
    public string SeverityWord => Severity.ToString().ToLowerInvariant();
}
