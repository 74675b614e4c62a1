namespace LoadDiff.Formats.Source;

/// <summary>One field of a load item as written: its key and value.</summary>
/// <param name="Name">The key, such as <c>at</c> or <c>pressure</c>.</param>
/// <param name="Value">The value in the file's own units.</param>
public sealed record SourceField(string Name, SourceValue Value)
{
    /// <inheritdoc/>
    public override string ToString() => Name + ": " + SourceText.Of(Value);
}
