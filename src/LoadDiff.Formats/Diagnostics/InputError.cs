namespace LoadDiff.Formats.Diagnostics;

/// <summary>Unwinds a reader at the first error; readers turn it back into a <see cref="Diagnostic"/> at their boundary.</summary>
internal sealed class InputError : Exception
{
    public InputError(Diagnostic diagnostic)
        : base(diagnostic.Message)
    {
        Diagnostic = diagnostic;
    }

    public InputError()
    {
        Diagnostic = new Diagnostic("LD000", Severity.Error, "input error", new SourceLocation("?"));
    }

    public InputError(string message)
        : base(message)
    {
        Diagnostic = new Diagnostic("LD000", Severity.Error, message, new SourceLocation("?"));
    }

    public InputError(string message, Exception inner)
        : base(message, inner)
    {
        Diagnostic = new Diagnostic("LD000", Severity.Error, message, new SourceLocation("?"));
    }

    public Diagnostic Diagnostic { get; }
}
