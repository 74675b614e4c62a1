namespace LoadDiff.Cli;

/// <summary>
/// Replaces an existing file's content atomically: the new content goes to a temporary file in the folder of the file
/// itself (a symbolic link is followed, so the link stays a link), which is flushed and then renamed over it with its
/// permissions. On any failure the temporary file is removed and the file is left as it was.
/// </summary>
public static class AtomicReplace
{
    /// <summary>Replaces <paramref name="path"/> (or the file its symbolic link points to) with <paramref name="content"/>.</summary>
    /// <param name="path">The file as the user named it.</param>
    /// <param name="content">The new content.</param>
    /// <param name="readOnlyAllowed">Replace a file without write permission for its owner.</param>
    /// <param name="splitLinksAllowed">Replace a file with more than one hard link (the other names keep the old content).</param>
    /// <param name="referenced">Files the content was read with (never written over).</param>
    /// <exception cref="UsageException">The file is protected or cannot be replaced; it is untouched.</exception>
    public static void Write(string path, byte[] content, bool readOnlyAllowed = false, bool splitLinksAllowed = false, IEnumerable<string>? referenced = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(content);
        // the rename must replace the file the link points to, in that file's folder, not the link
        string target = FileIdentity.RealPath(path);
        AtomicFile.RefuseInputs(target, referenced ?? []);
        if (!OperatingSystem.IsWindows() && !readOnlyAllowed && !File.GetUnixFileMode(target).HasFlag(UnixFileMode.UserWrite))
        {
            throw new UsageException($"error {OutputCodes.ProtectedTarget}: '{path}' is read-only; the file is unchanged "
                + $"(give {FmtOptionNames.ReplaceReadOnly} to replace it anyway, keeping its permissions)");
        }
        if (!splitLinksAllowed && FileIdentity.Of(target) is { LinkCount: > 1 } id)
        {
            throw new UsageException($"error {OutputCodes.ProtectedTarget}: '{path}' has {id.LinkCount} hard links; replacing it would leave the other names "
                + $"with the old content, so the file is unchanged (give {FmtOptionNames.SplitHardLinks} to replace this name only)");
        }
        TemporaryWrite.Replace(target, path, s => s.Write(content), keepMode: true);
    }
}

/// <summary>Names of the fmt options that lift a refusal of <see cref="AtomicReplace"/>, for its messages and the help.</summary>
public static class FmtOptionNames
{
    /// <summary>Replace a read-only file.</summary>
    public const string ReplaceReadOnly = "--replace-read-only";

    /// <summary>Replace a file with several hard links, breaking the link.</summary>
    public const string SplitHardLinks = "--split-hard-links";
}
