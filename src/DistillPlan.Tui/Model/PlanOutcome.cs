using DistillPlan.Core.Planning;
using DistillPlan.Core.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The result of planning what is on screen: a plan with its report, pictures and strip, or the
/// one-line reason there is none. The views render this and nothing else.
/// </summary>
/// <param name="Plan">The plan, when the input could be planned.</param>
/// <param name="Report">The plan's report (what every output shows).</param>
/// <param name="Error">The one-line message of bad input, when it could not.</param>
/// <param name="Curve">The vapour-pressure picture of the plan.</param>
/// <param name="Ramp">The strip (Core's strip planner, as <c>distillplan strip</c> plans it).</param>
/// <param name="RampReport">The strip's report, whose steps table the ramp pane shows.</param>
/// <param name="RampNote">Why there is no ramp, when there is none.</param>
public sealed record PlanOutcome(Plan? Plan, Report? Report, string? Error, CurvePicture? Curve, StripPlan? Ramp, Report? RampReport, string? RampNote)
{
    /// <summary>No plan, for this reason.</summary>
    public static PlanOutcome Failed(string error) => new(null, null, error, null, null, null, null);
}
