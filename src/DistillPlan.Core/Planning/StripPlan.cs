using DistillPlan.Core.Checks;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Planning;

/// <summary>One reported step of a planned strip, with what the checks found new at this step.</summary>
/// <param name="Evaporated">Fraction of the charged solvent evaporated, on <see cref="StripPlan.Basis"/> [-].</param>
/// <param name="Pressure">Pressure at this step.</param>
/// <param name="Vapor">Vapour (boiling) temperature.</param>
/// <param name="Bath">Bath or jacket temperature.</param>
/// <param name="Liquid">Pot liquid mole fractions by solvent name (a product is left out).</param>
/// <param name="VaporComposition">Vapour mole fractions by solvent name.</param>
/// <param name="DistillateMol">Cumulative distillate [mol] by name (a product stays at 0).</param>
/// <param name="ResidueMol">What is left in the pot [mol] by name (the product included).</param>
/// <param name="Findings">Findings at this step that the strip as a whole does not already carry.</param>
public sealed record StripStepPlan(double Evaporated, Pressure Pressure, Temperature Vapor, Temperature Bath,
    IReadOnlyDictionary<string, double> Liquid, IReadOnlyDictionary<string, double> VaporComposition,
    IReadOnlyDictionary<string, double> DistillateMol, IReadOnlyDictionary<string, double> ResidueMol,
    IReadOnlyList<Finding> Findings)
{
    /// <summary>The pot's liquid phases here: one, or two layers (each composition and share) while the pot is in the two-liquid region.</summary>
    public IReadOnlyList<LiquidPhase> LiquidPhases { get; init; } = [];
    /// <summary>The heat and gas balance here, when the charge's size is known.</summary>
    public Scale.HeatState? Heat { get; init; }
    /// <summary>Time from the start of heating to this step [s] (the heat-up included), when the size is known.</summary>
    public double? TimeS { get; init; }
}

/// <summary>
/// A batch strip as planned: how it is held, every step with its checks, where and why it ends.
/// Built by <see cref="StripPlanner"/>; rendered by every front end through the report model.
/// </summary>
public sealed record StripPlan
{
    /// <summary>The setpoint plan the strip starts from (its equipment, rules and checks).</summary>
    public required Plan Setpoints { get; init; }
    /// <summary>How the strip is held.</summary>
    public required StripMode Mode { get; init; }
    /// <summary>"volume" (of the charged solvent; every solvent has a density) or "mole" (of the charged solvent).</summary>
    public required string Basis { get; init; }
    /// <summary>Reported steps from the charge to the end.</summary>
    public required IReadOnlyList<StripStepPlan> Steps { get; init; }
    /// <summary>Why it ended.</summary>
    public required StripEndReason EndReason { get; init; }
    /// <summary>The end, as a finding of code <c>strip-end</c> (its words are in <see cref="Wording"/>).</summary>
    public required Finding End { get; init; }
    /// <summary>Findings of the strip as a whole (at its start), most severe first.</summary>
    public required IReadOnlyList<Finding> Findings { get; init; }
    /// <summary>Activity model used.</summary>
    public required string Model { get; init; }
    /// <summary>Why the model is what it is, or a remark on it; null when nothing to say.</summary>
    public string? ModelNote { get; init; }
    /// <summary>Charge [mol] by name (the product included).</summary>
    public required IReadOnlyDictionary<string, double> ChargeMol { get; init; }

    /// <summary>Warming the charge before it boils, when the size is known.</summary>
    public Scale.HeatUp? HeatUp { get; init; }
    /// <summary>The total time to the end [s], when known.</summary>
    public double? TotalTimeS => Steps.Count > 0 ? Steps[^1].TimeS : null;

    /// <summary>The evaporated fraction between reported steps it was planned with.</summary>
    internal double ReportEvery { get; init; }

    /// <summary>The end in words.</summary>
    public string EndText(DisplayFormat format) => End.Message(format);
}
