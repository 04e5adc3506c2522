using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Planning.Settings;

/// <summary>One value a plan used, and whether the user set it or it is a default.</summary>
/// <param name="Key">The setting key (or a rule's name when it is not a setting).</param>
/// <param name="Label">What it is (coolant temperature …).</param>
/// <param name="Value">The value.</param>
/// <param name="IsDefault">True when the user did not set it.</param>
/// <param name="Basis">Where the value comes from: "given" for the user's, else the default's basis.</param>
public sealed record Assumption(string Key, string Label, Quantity Value, bool IsDefault, string Basis);

/// <summary>How a strip is held: a fixed pressure, or (null) the plan's vapour temperature.</summary>
/// <param name="FixedPressure">The pressure to hold, or null.</param>
/// <param name="End">Where it ends.</param>
public sealed record StripRequest(Pressure? FixedPressure, StripEnd End);

/// <summary>Everything the settings say, parsed: the equipment, the rules, how to read the charge, and the assumptions.</summary>
/// <param name="Equipment">The equipment.</param>
/// <param name="Rules">The ΔT rule and limits.</param>
/// <param name="Basis">What bare numbers in the charge mean.</param>
/// <param name="Model">The activity model asked for, or null for the default.</param>
/// <param name="Product">The dissolved product, when given (its maximum temperature is in <see cref="Rules"/>).</param>
/// <param name="Strip">How a strip is held and where it ends.</param>
/// <param name="Assumptions">Every listed setting with its value and basis, defaults marked.</param>
public sealed record PlanSetup(Equipment Equipment, Rules Rules, Basis Basis, string? Model, Product? Product,
    StripRequest Strip, IReadOnlyList<Assumption> Assumptions);
