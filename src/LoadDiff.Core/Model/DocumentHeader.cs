using System.Collections.Immutable;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Model;

/// <summary>What a load description says before its cases: title, units and named points.</summary>
/// <param name="Title">Free-text title, or null.</param>
/// <param name="SourceUnits">The units the file is written in.</param>
/// <param name="Units">The units the items are delivered in (the file's own unless the reader was asked to convert).</param>
/// <param name="Points">Named points, in <paramref name="Units"/>.</param>
public sealed record DocumentHeader(string? Title, UnitSystem SourceUnits, UnitSystem Units, ImmutableSortedDictionary<string, Vector3> Points)
{
    /// <inheritdoc/>
    public bool Equals(DocumentHeader? other) =>
        other is not null && Title == other.Title && SourceUnits == other.SourceUnits && Units == other.Units
        && Points.Count == other.Points.Count && Points.All(p => other.Points.TryGetValue(p.Key, out Vector3 v) && v == p.Value);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Title, SourceUnits, Units, Points.Count);
}
