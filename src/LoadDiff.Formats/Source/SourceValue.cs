using System.Collections.Immutable;
using LoadDiff.Core;

namespace LoadDiff.Formats.Source;

/// <summary>A field value as the file wrote it: a number, a vector, a named-point reference, a text or a polygon.</summary>
public abstract record SourceValue;

/// <summary>A number, in the file's own units.</summary>
/// <param name="Value">The value.</param>
public sealed record NumberValue(double Value) : SourceValue
{
    /// <inheritdoc/>
    public bool Equals(NumberValue? other) => other is not null && Value.Equals(other.Value);

    /// <inheritdoc/>
    public override int GetHashCode() => Value.GetHashCode();
}

/// <summary>A vector [x, y, z], in the file's own units.</summary>
/// <param name="Value">The vector.</param>
public sealed record VectorValue(Vector3 Value) : SourceValue;

/// <summary>A reference to a named point of the file's <c>points</c>.</summary>
/// <param name="Name">The point's name.</param>
public sealed record PointReference(string Name) : SourceValue;

/// <summary>A text value: a file reference, or <c>"normal"</c> for a direction.</summary>
/// <param name="Text">The text.</param>
public sealed record TextValue(string Text) : SourceValue;

/// <summary>A polygon: vertices, each a vector or a named-point reference.</summary>
/// <param name="Vertices">The vertices in order.</param>
public sealed record PolygonValue(ImmutableArray<SourceValue> Vertices) : SourceValue
{
    /// <inheritdoc/>
    public bool Equals(PolygonValue? other) => other is not null && Vertices.SequenceEqual(other.Vertices);

    /// <inheritdoc/>
    public override int GetHashCode() => Vertices.Length;
}
