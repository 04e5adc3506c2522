using DistillPlan.Core.Checks;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Planning;

/// <summary>One reported point of a planned swap.</summary>
/// <param name="Liquid">Pot liquid mole fractions by name.</param>
/// <param name="Vapor">Vapour (boiling) temperature.</param>
/// <param name="Pressure">Pressure.</param>
/// <param name="VolumeL">Pot volume [L].</param>
/// <param name="NewSolventL">New solvent added so far [L].</param>
/// <param name="DistillateL">Distillate so far [L].</param>
/// <param name="ResidualMassFraction">Old solvents in the liquid, by mass.</param>
/// <param name="TimeS">Time so far [s] (heat-up included), or null without a rate.</param>
/// <param name="Cycle">Put-and-take: refills so far; constant-volume: 0 in the first strip, 1 while feeding.</param>
public sealed record SwapStepPlan(IReadOnlyDictionary<string, double> Liquid, Temperature Vapor, Pressure Pressure, double VolumeL,
    double NewSolventL, double DistillateL, double ResidualMassFraction, double? TimeS, int Cycle)
{
    /// <summary>Vapour mole fractions leaving the pot here, by name.</summary>
    public IReadOnlyDictionary<string, double> VaporComposition { get; init; } = new Dictionary<string, double>();
    /// <summary>The heat and gas balance here (duty, rate, condenser and pump load).</summary>
    public HeatState? Heat { get; init; }
}

/// <summary>One method of a planned swap, with its totals.</summary>
public sealed record SwapMethodPlan
{
    /// <summary>Which method.</summary>
    public required SwapMethod Method { get; init; }
    /// <summary>Why it stopped.</summary>
    public required SwapEnd End { get; init; }
    /// <summary>New solvent used [L].</summary>
    public required double NewSolventL { get; init; }
    /// <summary>Distillate collected [L].</summary>
    public required double DistillateL { get; init; }
    /// <summary>Old solvents left in the liquid, by mass.</summary>
    public required double ResidualMassFraction { get; init; }
    /// <summary>Old solvents left in the liquid, by moles.</summary>
    public required double ResidualMoleFraction { get; init; }
    /// <summary>Total time [s] (heat-up included), or null.</summary>
    public double? TimeS { get; init; }
    /// <summary>Put-and-take: the number of refills.</summary>
    public int Refills { get; init; }
    /// <summary>The pot's volume at the end [L].</summary>
    public required double FinalVolumeL { get; init; }
    /// <summary>Reported points.</summary>
    public required IReadOnlyList<SwapStepPlan> Steps { get; init; }
    /// <summary>New solvent added [L] when the pot was first seen in two liquid layers, or null when it stayed one liquid.</summary>
    public double? TwoLiquidsAt { get; init; }
    /// <summary>True when the target was reached.</summary>
    public bool Reached => End == SwapEnd.TargetReached;

    /// <summary>The method's name as scripts spell it.</summary>
    public string Name => Method == SwapMethod.ConstantVolume ? "constant-volume" : "put-and-take";
}

/// <summary>A solvent swap as planned: the methods compared, the one recommended and why, and the checks.</summary>
public sealed record SwapPlan
{
    /// <summary>The setpoint plan of the charge (equipment, rules, the vapour temperature held).</summary>
    public required Plan Setpoints { get; init; }
    /// <summary>The new solvent.</summary>
    public required string NewSolvent { get; init; }
    /// <summary>The new solvent's library entry (for its cautions and sources).</summary>
    public Library.Solvent? NewSolventEntry { get; init; }
    /// <summary>The old solvents (the charge's others).</summary>
    public required IReadOnlyList<string> OldSolvents { get; init; }
    /// <summary>The target.</summary>
    public required SwapTarget Target { get; init; }
    /// <summary>The methods planned.</summary>
    public required IReadOnlyList<SwapMethodPlan> Methods { get; init; }
    /// <summary>The recommended method, or null when none reaches the target.</summary>
    public SwapMethodPlan? Recommended { get; init; }
    /// <summary>Why that one (or why none).</summary>
    public required string Reason { get; init; }
    /// <summary>Lowest and highest pot volume used [L].</summary>
    public required (double MinimumL, double MaximumL) Volumes { get; init; }
    /// <summary>How it is held, in words.</summary>
    public required string Held { get; init; }
    /// <summary>Checks at the start and the end, and swap notes (azeotrope, two liquids).</summary>
    public required IReadOnlyList<Finding> Findings { get; init; }
    /// <summary>Activity model used.</summary>
    public required string Model { get; init; }
}
