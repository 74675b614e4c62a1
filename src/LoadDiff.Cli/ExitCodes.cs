namespace LoadDiff.Cli;

/// <summary>Process exit codes, the same for every command.</summary>
public static class ExitCodes
{
    /// <summary>Equivalent, no difference, or success.</summary>
    public const int Success = 0;

    /// <summary>Not equivalent, or differences found.</summary>
    public const int Different = 1;

    /// <summary>Input or usage error.</summary>
    public const int InputError = 2;
}
