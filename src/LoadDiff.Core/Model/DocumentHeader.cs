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
    /// <summary>
    /// True when the file (or, for a CSV given directly, the user) named the force unit; false when
    /// <see cref="SourceUnits"/> holds the default newton only because nothing was said.
    /// </summary>
    public bool ForceUnitStated { get; init; }

    /// <summary>True when the file (or the user, for a CSV given directly) named the length unit; false when metres were assumed.</summary>
    public bool LengthUnitStated { get; init; }

    /// <summary>True when the file (or the user, for a CSV given directly) named the mass unit; false when kilograms were assumed.</summary>
    public bool MassUnitStated { get; init; }

    /// <inheritdoc/>
    public bool Equals(DocumentHeader? other) =>
        other is not null && Title == other.Title && SourceUnits == other.SourceUnits && Units == other.Units
        && ForceUnitStated == other.ForceUnitStated && LengthUnitStated == other.LengthUnitStated && MassUnitStated == other.MassUnitStated
        && Points.Count == other.Points.Count && Points.All(p => other.Points.TryGetValue(p.Key, out Vector3 v) && v == p.Value);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Title, SourceUnits, Units, Points.Count, ForceUnitStated, LengthUnitStated, MassUnitStated);
}
