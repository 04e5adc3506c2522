namespace DistillPlan.Core.Planning.Settings;

/// <summary>
/// The plan settings as the user wrote them (command-line options, text-UI fields, plan files),
/// by setting key, before parsing. Absent or blank means "use the default". Compared by value,
/// so an edited document knows whether it differs from the saved one.
/// </summary>
public sealed class PlanInputs : IEquatable<PlanInputs>
{
    private readonly SortedDictionary<string, string> _values = new(StringComparer.Ordinal);

    /// <summary>No settings given.</summary>
    public PlanInputs() { }

    private PlanInputs(SortedDictionary<string, string> values) => _values = values;

    /// <summary>Settings given as (key, text) pairs.</summary>
    public static PlanInputs Of(params (string Key, string Text)[] settings) =>
        settings.Aggregate(new PlanInputs(), (inputs, s) => inputs.With(s.Key, s.Text));

    /// <summary>The text given for a setting, or null when it was not given (blank counts as not given).</summary>
    public string? Get(string key) => _values.TryGetValue(key, out var v) && !string.IsNullOrWhiteSpace(v) ? v : null;

    /// <summary>A copy with one setting's text replaced (null or blank removes it).</summary>
    public PlanInputs With(string key, string? text)
    {
        PlanSettings.Get(key); // only known keys
        var copy = new SortedDictionary<string, string>(_values, StringComparer.Ordinal);
        if (string.IsNullOrWhiteSpace(text)) copy.Remove(key); else copy[key] = text;
        return new PlanInputs(copy);
    }

    /// <summary>These settings with <paramref name="overrides"/> given on top (options beside a plan file).</summary>
    public PlanInputs Over(PlanInputs overrides)
    {
        var copy = new SortedDictionary<string, string>(_values, StringComparer.Ordinal);
        foreach (var (k, v) in overrides._values) copy[k] = v;
        return new PlanInputs(copy);
    }

    /// <summary>The settings given, by key.</summary>
    public IEnumerable<KeyValuePair<string, string>> Given => _values.Where(kv => !string.IsNullOrWhiteSpace(kv.Value));

    /// <summary>Parses everything into a plan setup; bad values throw <see cref="InputException"/>.</summary>
    public PlanSetup Build() => PlanSettings.Build(this);

    /// <inheritdoc />
    public bool Equals(PlanInputs? other) => other is not null && Given.SequenceEqual(other.Given);
    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as PlanInputs);
    /// <inheritdoc />
    public override int GetHashCode() => Given.Aggregate(0, (h, kv) => HashCode.Combine(h, kv.Key, kv.Value));
}
