namespace LoadDiff.Cli;

/// <summary>Codes of the refusals and failures of writing an output file (the reading codes are in LoadDiff.Formats).</summary>
public static class OutputCodes
{
    /// <summary>The output names an input, or a file an input references (same resolved path, or same device and inode).</summary>
    public const string OverInput = "LD080";

    /// <summary>fmt --write on a read-only file or a file with more than one hard link, without the option that allows it.</summary>
    public const string ProtectedTarget = "LD081";

    /// <summary>Writing failed (file-size limit, full disk, no permission); the file is as it was.</summary>
    public const string WriteFailed = "LD082";

    /// <summary>Standard output was closed before the start: a result written nowhere would leave only an exit code.</summary>
    public const string OutputClosed = "LD083";
}
