using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Planning.Settings;

/// <summary>Which part of a plan a setting belongs to; decides where front ends show it.</summary>
public enum SettingGroup
{
    /// <summary>How the charge is read (basis, model, product).</summary>
    Charge,
    /// <summary>The equipment (heating, coolant, pump, atmosphere).</summary>
    Equipment,
    /// <summary>The ΔT rule and the limits a plan follows.</summary>
    Rules,
    /// <summary>The size of the equipment: flask or vessel, areas, condenser, pump speed, leak (heat, time and capacity).</summary>
    Size,
    /// <summary>How a strip is held and where it ends.</summary>
    Strip,
}

/// <summary>
/// One plan setting, declared once in <see cref="PlanSettings"/>: its key (the command-line
/// option without "--" and the plan-file key), its words for help, fields and the assumptions
/// list, how its text is read, and its default with the basis of that default. The CLI
/// options, the plan-file reader and writer, the text-UI fields and the assumptions list are
/// all generated from this table.
/// </summary>
public sealed class PlanSetting
{
    /// <summary>The key: <c>--KEY</c> on the command line, <c>KEY:</c> in its plan-file section.</summary>
    public required string Key { get; init; }
    /// <summary>What it is, in words, for the assumptions list ("coolant temperature").</summary>
    public required string Label { get; init; }
    /// <summary>Short caption of the text-UI field (at most 14 characters).</summary>
    public required string Caption { get; init; }
    /// <summary>Help text for <c>--help</c> and the text UI.</summary>
    public required string Help { get; init; }
    /// <summary>A short hint for the text-UI field when the setting has no default value to show (at most 40 characters).</summary>
    public string? Hint { get; init; }
    /// <summary>Where it belongs.</summary>
    public required SettingGroup Group { get; init; }
    /// <summary>The plan-file section it is written under (settings, charge, product, strip).</summary>
    public string FileSection { get; init; } = "settings";
    /// <summary>The key inside that section (the setting key unless the file spells it otherwise).</summary>
    public string? FileKeyOverride { get; init; }
    /// <summary>The key in the plan file.</summary>
    public string FileKey => FileKeyOverride ?? Key;

    /// <summary>Reads the user's text into the build; throws <see cref="InputException"/> naming <c>--KEY</c>.</summary>
    internal Action<PlanBuild, string> Apply { get; init; } = (_, _) => { };
    /// <summary>The value the plan used, for the assumptions list; null when the setting is not listed there.</summary>
    internal Func<PlanBuild, Quantity?> Value { get; init; } = _ => null;
    /// <summary>Where the default comes from, for the value the build holds (common practice, a standard …).</summary>
    internal Func<PlanBuild, string> DefaultBasis { get; init; } = _ => "";
    /// <summary>True when the user gave this setting (some settings count as given when a sibling is given).</summary>
    internal Func<PlanBuild, bool>? GivenOverride { get; init; }
    /// <summary>The basis shown for a given value ("given" unless the setting says more).</summary>
    internal Func<PlanBuild, string>? GivenBasis { get; init; }

    /// <summary>The option spelling, e.g. <c>--coolant-temp</c>.</summary>
    public string Option => "--" + Key;

    internal bool IsGiven(PlanBuild b) => GivenOverride?.Invoke(b) ?? b.Given.Contains(Key);
}
