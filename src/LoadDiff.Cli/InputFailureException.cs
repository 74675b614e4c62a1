namespace LoadDiff.Cli;

/// <summary>An input file was rejected; its diagnostic has already been written to standard error.</summary>
public sealed class InputFailureException : Exception
{
    /// <summary>Creates the failure.</summary>
    public InputFailureException()
    {
    }

    /// <summary>Creates the failure with a message.</summary>
    public InputFailureException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the failure with an inner exception.</summary>
    public InputFailureException(string message, Exception inner)
        : base(message, inner)
    {
    }
}
