using DistillPlan.Core.Planning;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The result of planning what is on screen: a plan with its pictures, or the one-line reason
/// there is none. The views render this and nothing else.
/// </summary>
/// <param name="Plan">The plan, when the input could be planned.</param>
/// <param name="Error">The one-line message of bad input, when it could not.</param>
/// <param name="Curve">The vapour-pressure picture of the plan.</param>
/// <param name="Ramp">The strip ramp, when a ramp source covers the charge.</param>
/// <param name="RampNote">Why there is no ramp, when there is none.</param>
public sealed record PlanOutcome(Plan? Plan, string? Error, CurvePicture? Curve, Ramp? Ramp, string? RampNote);
