namespace LoadDiff.Cli;

/// <summary>
/// Replaces an existing file's content atomically: the new content goes to a temporary file in the same folder,
/// which is flushed and then renamed over the original. On any failure the temporary file is removed and the
/// original is left as it was.
/// </summary>
public static class AtomicReplace
{
    /// <summary>Replaces <paramref name="path"/> with <paramref name="content"/>, keeping its permissions.</summary>
    /// <exception cref="UsageException">The file cannot be replaced; the original is untouched.</exception>
    public static void Write(string path, byte[] content)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(content);
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full)!;
        string temp = Path.Combine(dir, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            using (var s = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            {
                s.Write(content);
                s.Flush(flushToDisk: true);
            }
            if (!OperatingSystem.IsWindows())
            {
                File.SetUnixFileMode(temp, File.GetUnixFileMode(full));
            }
            File.Move(temp, full, overwrite: true);
        }
        // .NET reports EFBIG (file-size limit reached) as ArgumentOutOfRangeException from the write
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentOutOfRangeException)
        {
            try
            {
                File.Delete(temp);
            }
            catch (Exception cleanup) when (cleanup is IOException or UnauthorizedAccessException)
            {
                // the original is intact; a stray temporary file is the lesser harm
            }
            throw new UsageException($"cannot write '{path}': {e.Message} (the file is unchanged)");
        }
    }
}
