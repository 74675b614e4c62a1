namespace LoadDiff.Core.Diff;

/// <summary>One field of an item, old → new, as written (shortest round-trip numbers).</summary>
/// <param name="Field">The field's key, such as <c>at</c> or <c>pressure</c>.</param>
/// <param name="Old">The old value as text, or null when the field was absent.</param>
/// <param name="New">The new value as text, or null when the field is absent now.</param>
/// <param name="Unit">The unit of the value (such as <c>kN/m²</c>), or empty when it has none.</param>
public sealed record FieldChange(string Field, string? Old, string? New, string Unit)
{
    /// <inheritdoc/>
    public override string ToString() => $"{Field}: {Old ?? "(absent)"} → {New ?? "(absent)"} {Unit}".TrimEnd();
}
