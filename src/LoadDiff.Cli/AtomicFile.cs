namespace LoadDiff.Cli;

/// <summary>Writes output files through a temporary file in the same folder and a rename, so no reader ever sees half a file.</summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="path"/> atomically; refuses to write over any of <paramref name="inputs"/>.</summary>
    /// <param name="path">The output file.</param>
    /// <param name="inputs">Every file read: the inputs as named and the files they reference (- is standard input).</param>
    /// <param name="write">Writes the content.</param>
    /// <exception cref="UsageException">The target is an input, a directory, or cannot be written.</exception>
    public static void Write(string path, IEnumerable<string> inputs, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(inputs);
        ArgumentNullException.ThrowIfNull(write);
        string full = Path.GetFullPath(path);
        RefuseInputs(path, inputs);
        if (Directory.Exists(full))
        {
            throw new UsageException($"'{path}' is a directory; give a file name");
        }
        string dir = Path.GetDirectoryName(full)!;
        if (!Directory.Exists(dir))
        {
            throw new UsageException($"cannot write '{path}': folder '{dir}' does not exist");
        }
        TemporaryWrite.Replace(full, path, write, keepMode: false);
    }

    /// <summary>
    /// Refuses <paramref name="path"/> when it is one of <paramref name="inputs"/>: the same path once symbolic links are
    /// resolved, or (where the system tells) the same device and inode, which also catches hard links.
    /// </summary>
    /// <exception cref="UsageException">LD080, naming the input.</exception>
    public static void RefuseInputs(string path, IEnumerable<string> inputs)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(inputs);
        string real = FileIdentity.RealPath(path);
        FileIdentity? id = FileIdentity.Of(path);
        foreach (string input in inputs.Where(i => i != "-" && !GitSource.IsRevisionPath(i)).Distinct(StringComparer.Ordinal))
        {
            if (FileIdentity.RealPath(input) == real || (id is not null && FileIdentity.Of(input) is { } other && other.Device == id.Value.Device && other.Inode == id.Value.Inode))
            {
                throw new UsageException($"error {OutputCodes.OverInput}: '{path}' is the same file as the input file '{input}'; refusing to write over it (give another output name)");
            }
        }
    }
}
