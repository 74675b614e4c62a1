using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Source;

/// <summary>The outcome of reading a load description at source level.</summary>
/// <param name="Document">The document as written, when it was accepted.</param>
/// <param name="Resultants">What each case and item applies (in the units asked for), when accepted.</param>
/// <param name="HasComments">True when the file holds comments (the model does not keep them).</param>
/// <param name="DroppedFields">JSON paths of unknown fields the model does not keep (each also a warning).</param>
/// <param name="Diagnostics">Warnings, and the error that stopped the reader if any.</param>
public sealed record SourceReadResult(
    LoadDocument? Document, DocumentResultants? Resultants, bool HasComments, IReadOnlyList<string> DroppedFields,
    IReadOnlyList<Diagnostic> Diagnostics)
{
    /// <summary>Every comment of the file in file order, each with the element it directly precedes (empty when there are none).</summary>
    public IReadOnlyList<SourceComment> Comments { get; init; } = [];

    /// <summary>True when no error was found (warnings allowed).</summary>
    public bool Succeeded => Document is not null && Diagnostics.All(d => d.Severity != Severity.Error);

    /// <summary>The first error, if any.</summary>
    public Diagnostic? Error => Diagnostics.FirstOrDefault(d => d.Severity == Severity.Error);
}
