namespace LoadDiff.Cli;

/// <summary>A command-line value that cannot be used; reported as one line on standard error, exit code 2.</summary>
public sealed class UsageException : Exception
{
    /// <summary>Creates the error with its message.</summary>
    public UsageException(string message)
        : base(message)
    {
    }

    /// <summary>Creates an empty error.</summary>
    public UsageException()
    {
    }

    /// <summary>Creates the error with an inner exception.</summary>
    public UsageException(string message, Exception inner)
        : base(message, inner)
    {
    }
}
