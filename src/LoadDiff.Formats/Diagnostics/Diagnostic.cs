namespace LoadDiff.Formats.Diagnostics;

/// <summary>One finding of a reader: a stable code, a message and where it applies.</summary>
/// <param name="Code">Stable code such as <c>LD020</c>; tests and scripts match on it.</param>
/// <param name="Severity">Error or warning.</param>
/// <param name="Message">What is wrong and what was expected.</param>
/// <param name="Location">Where.</param>
public sealed record Diagnostic(string Code, Severity Severity, string Message, SourceLocation Location)
{
    /// <summary>One line: <c>file:line:column: error LD020: message (at $.path)</c>.</summary>
    public override string ToString()
    {
        string kind = Severity == Severity.Error ? "error" : "warning";
        string path = Location.JsonPath is { } p ? $" (at {p})" : "";
        return $"{Location}: {kind} {Code}: {Message}{path}";
    }
}
