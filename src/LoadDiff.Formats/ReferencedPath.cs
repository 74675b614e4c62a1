namespace LoadDiff.Formats;

/// <summary>
/// Where a referenced file really is: its path with every symbolic link resolved, component by component, so that a
/// link (to a file or to a folder) cannot carry a reference out of the load file's folder. The one function every
/// command's reads go through (the reader of a load description calls it for each referenced file).
/// </summary>
public static class ReferencedPath
{
    // As POSIX systems do: more links than this on one path is a loop (or a maze), never followed further.
    private const int MaxLinks = 40;

    /// <summary>
    /// The absolute path with every symbolic link resolved. Components that do not exist are kept as written (so a
    /// missing file still resolves and is reported as missing); null when the links loop or nest too deep.
    /// </summary>
    public static string? RealPath(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        string full = Path.GetFullPath(path);
        string root = Path.GetPathRoot(full) ?? "";
        var pending = new Stack<string>(Components(full[root.Length..]).Reverse());
        string current = root;
        int links = 0;
        bool missing = false;
        while (pending.Count > 0)
        {
            string part = pending.Pop();
            if (part is "" or ".")
            {
                continue;
            }
            if (part == "..")
            {
                current = Path.GetDirectoryName(current) ?? current;
                continue;
            }
            string next = Path.Combine(current, part);
            string? target = missing ? null : LinkTarget(next);
            if (target is null)
            {
                // once a component is absent, nothing below it can be a link
                missing = missing || !Path.Exists(next);
                current = next;
                continue;
            }
            if (++links > MaxLinks)
            {
                return null;
            }
            if (Path.IsPathRooted(target))
            {
                string targetFull = Path.GetFullPath(target);
                current = Path.GetPathRoot(targetFull) ?? "";
                target = targetFull[current.Length..];
            }
            foreach (string t in Components(target).Reverse())
            {
                pending.Push(t);
            }
        }
        return current;
    }

    /// <summary>
    /// True when <paramref name="file"/>, with its links resolved, lies inside <paramref name="folder"/> with its links
    /// resolved; false when it lies outside or its links loop.
    /// </summary>
    public static bool StaysInside(string file, string folder)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(folder);
        string? realFile = RealPath(file), realFolder = RealPath(folder);
        if (realFile is null || realFolder is null)
        {
            return false;
        }
        string inside = realFolder.TrimEnd(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar) + Path.DirectorySeparatorChar;
        return realFile.StartsWith(inside, StringComparison.Ordinal);
    }

    private static string[] Components(string path) => path.Split([Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar]);

    // The target of the link at this path as stored (one step, not followed further); null when it is no link or absent.
    private static string? LinkTarget(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget;
        }
        catch (IOException)
        {
            return null;
        }
        catch (UnauthorizedAccessException)
        {
            return null;
        }
    }
}
