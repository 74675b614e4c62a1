using LoadDiff.Core.Model;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats;

/// <summary>The outcome of reading a load description into a sink.</summary>
/// <param name="Header">The document header, when the reader got that far.</param>
/// <param name="Diagnostics">Warnings, and the error that stopped the reader if any.</param>
public sealed record ReadResult(DocumentHeader? Header, IReadOnlyList<Diagnostic> Diagnostics)
{
    /// <summary>True when no error was found (warnings allowed). On failure the sink holds partial data: discard it.</summary>
    public bool Succeeded => Diagnostics.All(d => d.Severity != Severity.Error);

    /// <summary>The first error, if any.</summary>
    public Diagnostic? Error => Diagnostics.FirstOrDefault(d => d.Severity == Severity.Error);
}
