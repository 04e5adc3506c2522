using DistillPlan.Core.Planning;

namespace DistillPlan.Tui.Model;

/// <summary>One step of a strip: the state after a fraction of the solvent has left.</summary>
/// <param name="EvaporatedFraction">Fraction of the charged solvent moles evaporated (0 … 1).</param>
/// <param name="PressurePa">Pressure at this step [Pa].</param>
/// <param name="VaporK">Vapour (boiling) temperature [K].</param>
/// <param name="BathK">Bath or jacket temperature [K].</param>
/// <param name="Liquid">Liquid mole fractions by solvent name.</param>
/// <param name="Vapor">Vapour mole fractions by solvent name.</param>
public sealed record RampStep(double EvaporatedFraction, double PressurePa, double VaporK, double BathK,
    IReadOnlyDictionary<string, double> Liquid, IReadOnlyDictionary<string, double> Vapor);

/// <summary>The pressure ramp of a strip, as the ramp pane shows it.</summary>
/// <param name="Steps">Steps in order of evaporated fraction.</param>
/// <param name="EndReason">Why the ramp ends where it does.</param>
/// <param name="Method">How it was computed, in one line.</param>
public sealed record Ramp(IReadOnlyList<RampStep> Steps, string EndReason, string Method);

/// <summary>Computes the ramp of a planned charge; one implementation per kind of charge.</summary>
public interface IRampSource
{
    /// <summary>The ramp for the charge under the plan's vapour temperature and ΔT rule.</summary>
    Ramp Compute(Charge charge, Plan plan);
}
