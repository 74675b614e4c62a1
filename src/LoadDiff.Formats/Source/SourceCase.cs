using System.Collections.Immutable;

namespace LoadDiff.Formats.Source;

/// <summary>A load case as written: name, optional title and note, and its items in file order.</summary>
/// <param name="Name">The case name.</param>
/// <param name="Title">The title, or null.</param>
/// <param name="Items">The items in file order.</param>
public sealed record SourceCase(string Name, string? Title, ImmutableArray<SourceItem> Items)
{
    /// <summary>The case's note (free text: the basis of its loads), or null.</summary>
    public string? Note { get; init; }

    /// <inheritdoc/>
    public bool Equals(SourceCase? other) =>
        other is not null && Name == other.Name && Title == other.Title && Note == other.Note && Items.SequenceEqual(other.Items);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Name, Title, Items.Length);

    /// <inheritdoc/>
    public override string ToString() => $"case {Name} ({Items.Length} items)";
}
