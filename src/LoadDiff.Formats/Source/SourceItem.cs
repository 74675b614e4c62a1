using System.Collections.Immutable;

namespace LoadDiff.Formats.Source;

/// <summary>A load item as written: id (null when the file gives none), kind, its fields in canonical order and an optional note.</summary>
/// <param name="Id">The id as given, or null.</param>
/// <param name="Kind">force, couple, line, area, mass, mesh or forces.</param>
/// <param name="Fields">The fields other than id and kind, in the canonical order of the kind.</param>
public sealed record SourceItem(string? Id, string Kind, ImmutableArray<SourceField> Fields)
{
    /// <summary>The item's note (free text: where the load came from and why), or null.</summary>
    public string? Note { get; init; }

    /// <summary>The field with this key, or null.</summary>
    public SourceValue? this[string name] => Fields.FirstOrDefault(f => f.Name == name)?.Value;

    /// <inheritdoc/>
    public bool Equals(SourceItem? other) =>
        other is not null && Id == other.Id && Kind == other.Kind && Note == other.Note && Fields.SequenceEqual(other.Fields);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Id, Kind, Fields.Length);

    /// <inheritdoc/>
    public override string ToString() => $"{Kind} {Id ?? "(no id)"}: {string.Join("; ", Fields)}";
}
