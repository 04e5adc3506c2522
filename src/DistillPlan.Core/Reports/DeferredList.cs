using System.Collections;

namespace DistillPlan.Core.Reports;

/// <summary>A read-only list built on first use (a report part that costs computation and that
/// most outputs never read, such as a plot's curve).</summary>
/// <typeparam name="T">Element type.</typeparam>
/// <param name="build">Makes the items; called at most once, on first access.</param>
public sealed class DeferredList<T>(Func<IReadOnlyList<T>> build) : IReadOnlyList<T>
{
    private readonly Lazy<IReadOnlyList<T>> _items = new(build ?? throw new ArgumentNullException(nameof(build)));

    /// <inheritdoc />
    public T this[int index] => _items.Value[index];

    /// <inheritdoc />
    public int Count => _items.Value.Count;

    /// <inheritdoc />
    public IEnumerator<T> GetEnumerator() => _items.Value.GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
