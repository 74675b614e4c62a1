namespace LoadDiff.Formats.Diagnostics;

/// <summary>
/// An input that was read successfully once could not be read again (a CSV table re-read for its rows, changed or
/// removed in between): the caller reports <see cref="Diagnostic"/> like any input error.
/// </summary>
public sealed class UnreadableInputException : Exception
{
    /// <summary>Creates the failure from its diagnostic.</summary>
    public UnreadableInputException(Diagnostic diagnostic)
        : base(diagnostic?.Message)
    {
        Diagnostic = diagnostic ?? throw new ArgumentNullException(nameof(diagnostic));
    }

    /// <summary>Creates the failure with a message only (no position).</summary>
    public UnreadableInputException()
        : this(new Diagnostic(Codes.FileUnreadable, Severity.Error, "cannot read the input", new SourceLocation("-")))
    {
    }

    /// <summary>Creates the failure with a message only (no position).</summary>
    public UnreadableInputException(string message)
        : this(new Diagnostic(Codes.FileUnreadable, Severity.Error, message, new SourceLocation("-")))
    {
    }

    /// <summary>Creates the failure with a message and the exception that caused it.</summary>
    public UnreadableInputException(string message, Exception inner)
        : base(message, inner)
    {
        Diagnostic = new Diagnostic(Codes.FileUnreadable, Severity.Error, message, new SourceLocation("-"));
    }

    /// <summary>What went wrong, where.</summary>
    public Diagnostic Diagnostic { get; }
}
