using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Formats.Source;

/// <summary>
/// A load description as the user wrote it (SPEC §3), for formatting and diffing: the file's own units (nothing
/// converted), named-point references kept as names, item fields as given, ids as given. Lists keep file order.
/// Equality is exact and structural; it ignores only what the model does not hold (key order, whitespace,
/// comments, number spelling, and whether <c>format</c>, <c>units</c> or <c>direction: "normal"</c> were spelled out).
/// </summary>
/// <param name="Title">The document title, or null.</param>
/// <param name="Units">The file's units (SI where the file names none).</param>
/// <param name="Gravity">The gravity vector as given (length units per s²), or null for the default.</param>
/// <param name="Points">Named points in file order, in the file's length unit.</param>
/// <param name="Cases">Load cases in file order.</param>
/// <param name="Combinations">Combinations in file order, factors in the order given.</param>
public sealed record LoadDocument(
    string? Title, UnitSystem Units, Vector3? Gravity, ImmutableArray<KeyValuePair<string, Vector3>> Points,
    ImmutableArray<SourceCase> Cases, ImmutableArray<LoadCombination> Combinations)
{
    /// <summary>The document's note (free text: where the loads came from and why), or null.</summary>
    public string? Note { get; init; }

    /// <summary>The named point, or null.</summary>
    public Vector3? Point(string name)
    {
        foreach (var p in Points)
        {
            if (p.Key == name)
            {
                return p.Value;
            }
        }
        return null;
    }

    /// <inheritdoc/>
    public bool Equals(LoadDocument? other) =>
        other is not null && Title == other.Title && Note == other.Note && Units == other.Units && Nullable.Equals(Gravity, other.Gravity)
        && Points.SequenceEqual(other.Points) && Cases.SequenceEqual(other.Cases) && Combinations.SequenceEqual(other.Combinations);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Title, Units, Points.Length, Cases.Length, Combinations.Length);

    /// <inheritdoc/>
    public override string ToString() => $"{Title ?? "(untitled)"}: {Cases.Length} cases, {Combinations.Length} combinations ({Units})";
}
