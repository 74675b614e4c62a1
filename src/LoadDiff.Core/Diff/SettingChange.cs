namespace LoadDiff.Core.Diff;

/// <summary>A document-level difference: title, units, gravity, a named point, a case or a combination.</summary>
/// <param name="What">What differs, such as <c>point midspan</c> or <c>combination uls</c>.</param>
/// <param name="Change">Added, removed or changed.</param>
/// <param name="Old">The old value as text, or null.</param>
/// <param name="New">The new value as text, or null.</param>
/// <param name="Unit">The unit of the values, or empty.</param>
public sealed record SettingChange(string What, ChangeKind Change, string? Old, string? New, string Unit)
{
    /// <inheritdoc/>
    public override string ToString() => $"{What}: {Old ?? "(absent)"} → {New ?? "(absent)"} {Unit}".TrimEnd();
}
