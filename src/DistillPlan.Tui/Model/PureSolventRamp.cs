using DistillPlan.Core.Planning;

namespace DistillPlan.Tui.Model;

/// <summary>
/// A single solvent boils at one pressure from start to end: the ramp is flat at the setpoint.
/// It stops short of dryness on purpose (a residue protects the product and, for peroxide
/// formers, the chemist), which is where a non-volatile product would start to matter.
/// </summary>
public sealed class PureSolventRamp : IRampSource
{
    /// <summary>The last step, as a fraction evaporated (keep a residue; common practice).</summary>
    public const double StopFraction = 0.9;

    /// <inheritdoc />
    public Ramp Compute(Charge charge, Plan plan)
    {
        if (!charge.IsPure) throw new ArgumentException("a pure-solvent ramp needs a single solvent", nameof(charge));
        string name = charge.Components[0].Solvent.Name;
        var one = new Dictionary<string, double> { [name] = 1.0 };
        var steps = Enumerable.Range(0, 10)
            .Select(i => i / 10.0)
            .Select(f => new RampStep(f, plan.VacuumSetpoint.Pascal, plan.Vapor.Kelvin, plan.Bath.Kelvin, one, one))
            .ToList();
        return new Ramp(steps,
            $"Stops at {StopFraction:P0} evaporated: keep a residue, never evaporate to dryness.",
            $"Pure {name}: constant pressure at the setpoint.");
    }
}
