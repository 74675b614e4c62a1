namespace LoadDiff.Cli;

/// <summary>Writes output files through a temporary file in the same folder and a rename, so no reader ever sees half a file.</summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="path"/> atomically; refuses to write over any of <paramref name="inputs"/>.</summary>
    /// <exception cref="UsageException">The target is an input, a directory, or cannot be written.</exception>
    public static void Write(string path, IEnumerable<string> inputs, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(inputs);
        ArgumentNullException.ThrowIfNull(write);
        string full = Path.GetFullPath(path);
        if (inputs.Any(i => i != "-" && Path.GetFullPath(i) == full))
        {
            throw new UsageException($"'{path}' is an input file; refusing to write over it");
        }
        if (Directory.Exists(full))
        {
            throw new UsageException($"'{path}' is a directory; give a file name");
        }
        string dir = Path.GetDirectoryName(full)!;
        if (!Directory.Exists(dir))
        {
            throw new UsageException($"cannot write '{path}': folder '{dir}' does not exist");
        }
        string temp = Path.Combine(dir, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            using (var s = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            {
                write(s);
                s.Flush(flushToDisk: true);
            }
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            throw new UsageException($"cannot write '{path}': {e.Message}");
        }
    }

    private static void TryDelete(string temp)
    {
        try
        {
            File.Delete(temp);
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
