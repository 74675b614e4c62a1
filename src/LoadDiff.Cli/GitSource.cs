using System.Diagnostics;
using LoadDiff.Core.Model;
using LoadDiff.Formats;

namespace LoadDiff.Cli;

/// <summary>
/// Reads <c>REV:PATH</c> operands through git, never through a shell: the document and every file it references come
/// from the same revision (written into a private snapshot folder that mirrors the repository), never from the working
/// tree. A revision that begins with <c>-</c> or holds a line break is refused, and blobs are read with
/// <c>git cat-file --end-of-options blob</c>, so no operand can become a git option.
/// </summary>
public sealed class GitSource : IDisposable
{
    private static readonly List<GitSource> Snapshots = [];
    private readonly string _revision;
    private readonly string _snapshot;

    private GitSource(string operand, string revision, string repoPath, string snapshot)
    {
        Operand = operand;
        _revision = revision;
        RepositoryPath = repoPath;
        _snapshot = snapshot;
        LocalPath = Path.Combine(snapshot, repoPath.Replace('/', Path.DirectorySeparatorChar));
    }

    /// <summary>The operand as the user wrote it.</summary>
    public string Operand { get; }

    /// <summary>The document's path from the top of the repository, with forward slashes.</summary>
    public string RepositoryPath { get; }

    /// <summary>Where the document was written in the snapshot folder.</summary>
    public string LocalPath { get; }

    /// <summary>True when the operand is no file on disk but looks like <c>REV:PATH</c>.</summary>
    public static bool IsRevisionPath(string operand)
    {
        ArgumentNullException.ThrowIfNull(operand);
        return operand != "-" && !File.Exists(operand) && !Directory.Exists(operand) && operand.IndexOf(':', StringComparison.Ordinal) > 0;
    }

    /// <summary>Reads the document of a <c>REV:PATH</c> operand into a new snapshot folder.</summary>
    /// <exception cref="UsageException">The operand is refused, git is missing, or the revision or path does not exist.</exception>
    public static GitSource Open(string operand)
    {
        ArgumentNullException.ThrowIfNull(operand);
        int colon = operand.IndexOf(':', StringComparison.Ordinal);
        string revision = operand[..colon], path = operand[(colon + 1)..];
        if (revision.StartsWith('-') || operand.IndexOfAny(['\n', '\r', '\0']) >= 0)
        {
            throw new UsageException($"'{Printable(operand)}': a revision may not begin with '-' or hold a line break");
        }
        if (path.Length == 0)
        {
            throw new UsageException($"'{operand}': no path after the revision (REV:PATH)");
        }
        // git reads REV:./x and REV:../x relative to the current folder, other paths from the top of the work tree
        string repoPath = path;
        if (path.StartsWith("./", StringComparison.Ordinal) || path.StartsWith("../", StringComparison.Ordinal))
        {
            string prefix = Text(Run(["rev-parse", "--show-prefix"], operand)).Trim();
            repoPath = Normalize(prefix + path, operand);
        }
        else
        {
            repoPath = Normalize(path, operand);
        }
        string snapshot = Path.Combine(Path.GetTempPath(), "loaddiff-rev-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(snapshot);
        var source = new GitSource(operand, revision, repoPath, snapshot);
        lock (Snapshots)
        {
            Snapshots.Add(source);
        }
        try
        {
            source.Materialize(repoPath, required: true);
            if (source.LinkInRevision(repoPath) is { } link)
            {
                // what cat-file handed over is the link's target text, not a file
                throw new UsageException($"error {LoadDiff.Formats.Diagnostics.Codes.OutsideFolder}: '{Printable(operand)}': '{link}' is stored in revision '{revision}' as a symbolic link; links in a revision are never followed");
            }
        }
        catch
        {
            source.Dispose();
            throw;
        }
        return source;
    }

    /// <summary>Reader options that take every referenced file from the same revision.</summary>
    public ReadOptions Options(ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        return options with { PrepareReferencedFile = PrepareReferenced };
    }

    /// <summary>Reads the document (JSON) or the CSV operand into <paramref name="sink"/>, its diagnostics naming REV:PATH.</summary>
    public ReadResult Read(ILoadSink sink, ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (RepositoryPath.EndsWith(".csv", StringComparison.OrdinalIgnoreCase))
        {
            // a CSV operand is read in place from the snapshot; its diagnostics name the operand, never the snapshot path
            return LoadFileReader.ReadCsv(LocalPath, Operand, sink, Options(options));
        }
        byte[] bytes = File.ReadAllBytes(LocalPath);
        return LoadFileReader.ReadJson(bytes, Operand, Path.GetDirectoryName(LocalPath)!, sink, Options(options));
    }

    /// <summary>The document's bytes.</summary>
    public byte[] Bytes() => File.ReadAllBytes(LocalPath);

    /// <summary>The folder referenced files resolve against (inside the snapshot).</summary>
    public string BaseDirectory => Path.GetDirectoryName(LocalPath)!;

    /// <summary>Removes every snapshot folder of this process (called once the command is done with its inputs).</summary>
    public static void DisposeAll()
    {
        GitSource[] all;
        lock (Snapshots)
        {
            all = [.. Snapshots];
            Snapshots.Clear();
        }
        foreach (GitSource g in all)
        {
            g.Dispose();
        }
    }

    /// <summary>
    /// Reads an operand: a <c>REV:PATH</c> through git (the document and its referenced files from that revision),
    /// anything else as a file or standard input.
    /// </summary>
    public static ReadResult ReadOperand(string operand, ILoadSink sink, ReadOptions options, out string contentPath)
    {
        ArgumentNullException.ThrowIfNull(operand);
        if (IsRevisionPath(operand))
        {
            GitSource g = Open(operand);
            contentPath = g.LocalPath;
            return g.Read(sink, options);
        }
        contentPath = operand;
        return LoadFileReader.Read(operand, sink, options);
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        try
        {
            Directory.Delete(_snapshot, recursive: true);
        }
        catch (IOException)
        {
            // a temporary folder left behind is harmless
        }
        catch (UnauthorizedAccessException)
        {
        }
    }

    private string? PrepareReferenced(string fullPath)
    {
        string root = Path.GetFullPath(_snapshot).TrimEnd(Path.DirectorySeparatorChar) + Path.DirectorySeparatorChar;
        string full = Path.GetFullPath(fullPath);
        if (!full.StartsWith(root, StringComparison.Ordinal) || File.Exists(full))
        {
            return null; // outside the repository: it does not exist in the revision, and the reader says so
        }
        string repoPath = full[root.Length..].Replace(Path.DirectorySeparatorChar, '/');
        if (LinkInRevision(repoPath) is { } link)
        {
            return $"escapes through a symbolic link: '{link}' is stored in revision '{_revision}' as a symbolic link, "
                + "and links in a revision are never followed (not even with --allow-outside)";
        }
        Materialize(repoPath, required: false);
        return null;
    }

    // The first component of the path (from the top of the repository) that the revision stores as a symbolic link
    // (mode 120000), or null. git cat-file would hand over a link's target text as if it were the file, and a path
    // through a linked folder does not exist in the tree; neither is ever followed to the working tree or elsewhere.
    private string? LinkInRevision(string repoPath)
    {
        string[] parts = repoPath.Split('/');
        for (int k = 1; k <= parts.Length; k++)
        {
            string prefix = string.Join('/', parts[..k]);
            string entry = Text(Run(["ls-tree", "-z", "--full-tree", _revision, "--", prefix], Operand));
            if (entry.Length == 0)
            {
                return null; // absent from the revision: the reader reports it missing
            }
            if (entry.StartsWith("120000 ", StringComparison.Ordinal))
            {
                return prefix;
            }
        }
        return null;
    }

    private void Materialize(string repoPath, bool required)
    {
        string target = Path.Combine(_snapshot, repoPath.Replace('/', Path.DirectorySeparatorChar));
        Directory.CreateDirectory(Path.GetDirectoryName(target)!);
        string spec = _revision + ":" + repoPath;
        var psi = new ProcessStartInfo("git") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in new[] { "cat-file", "--end-of-options", "blob", spec })
        {
            psi.ArgumentList.Add(a);
        }
        using Process p = Start(psi, Operand);
        Task<string> err = p.StandardError.ReadToEndAsync();
        using (var file = new FileStream(target, FileMode.CreateNew, FileAccess.Write))
        {
            p.StandardOutput.BaseStream.CopyTo(file);
        }
        p.WaitForExit();
        if (p.ExitCode != 0)
        {
            File.Delete(target);
            if (required)
            {
                throw new UsageException($"'{Operand}' is not a file, and git cannot read '{spec}' from the repository: {err.Result.Trim().Replace('\n', ' ')}");
            }
        }
    }

    // A repository path without "." or ".." steps; one that climbs above the top is refused.
    private static string Normalize(string path, string operand)
    {
        var parts = new List<string>();
        foreach (string part in path.Replace('\\', '/').Split('/'))
        {
            if (part is "" or ".")
            {
                continue;
            }
            if (part == "..")
            {
                if (parts.Count == 0)
                {
                    throw new UsageException($"'{operand}': the path leads out of the repository");
                }
                parts.RemoveAt(parts.Count - 1);
                continue;
            }
            parts.Add(part);
        }
        if (parts.Count == 0)
        {
            throw new UsageException($"'{operand}': no file named after the revision");
        }
        return string.Join('/', parts);
    }

    private static byte[] Run(string[] args, string operand)
    {
        var psi = new ProcessStartInfo("git") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        psi.Environment["GIT_LITERAL_PATHSPECS"] = "1"; // a path is a name, never a pattern
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        using Process p = Start(psi, operand);
        using var ms = new MemoryStream();
        Task<string> err = p.StandardError.ReadToEndAsync();
        p.StandardOutput.BaseStream.CopyTo(ms);
        p.WaitForExit();
        if (p.ExitCode != 0)
        {
            throw new UsageException($"'{operand}' is not a file, and 'git {string.Join(' ', args)}' failed: {err.Result.Trim().Replace('\n', ' ')}");
        }
        return ms.ToArray();
    }

    private static Process Start(ProcessStartInfo psi, string operand)
    {
        try
        {
            return Process.Start(psi) ?? throw new UsageException($"'{operand}': cannot start git");
        }
        catch (System.ComponentModel.Win32Exception e)
        {
            throw new UsageException($"'{operand}' is not a file, and git (needed to read REV:PATH) cannot be started: {e.Message}");
        }
    }

    private static string Text(byte[] b) => System.Text.Encoding.UTF8.GetString(b);

    private static string Printable(string s) => s.Replace("\n", "\\n", StringComparison.Ordinal).Replace("\r", "\\r", StringComparison.Ordinal).Replace("\0", "\\0", StringComparison.Ordinal);
}
