using System.Diagnostics;

namespace LoadDiff.Cli;

/// <summary>Reads <c>REV:PATH</c> operands through <c>git show</c>, git's own documented interface.</summary>
public static class GitSource
{
    /// <summary>True when the operand is no file on disk but looks like <c>REV:PATH</c>.</summary>
    public static bool IsRevisionPath(string operand)
    {
        ArgumentNullException.ThrowIfNull(operand);
        return operand != "-" && !File.Exists(operand) && !Directory.Exists(operand) && operand.IndexOf(':', StringComparison.Ordinal) > 0;
    }

    /// <summary>The blob's bytes, and the working-tree folder its referenced files resolve against.</summary>
    /// <exception cref="UsageException">git is missing or cannot show the blob.</exception>
    public static (byte[] Bytes, string BaseDirectory) Show(string operand)
    {
        ArgumentNullException.ThrowIfNull(operand);
        int colon = operand.IndexOf(':', StringComparison.Ordinal);
        string path = operand[(colon + 1)..];
        byte[] bytes = Run(["show", operand], operand);
        string top = System.Text.Encoding.UTF8.GetString(Run(["rev-parse", "--show-toplevel"], operand)).Trim();
        // git reads REV:./x and REV:../x relative to the current folder, other paths from the top of the work tree
        string full = path.StartsWith("./", StringComparison.Ordinal) || path.StartsWith("../", StringComparison.Ordinal)
            ? Path.GetFullPath(path) : Path.GetFullPath(Path.Combine(top, path));
        return (bytes, Path.GetDirectoryName(full)!);
    }

    private static byte[] Run(string[] args, string operand)
    {
        var psi = new ProcessStartInfo("git") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        Process p;
        try
        {
            p = Process.Start(psi) ?? throw new UsageException($"'{operand}': cannot start git");
        }
        catch (System.ComponentModel.Win32Exception e)
        {
            throw new UsageException($"'{operand}' is not a file, and git (needed to read REV:PATH) cannot be started: {e.Message}");
        }
        using (p)
        {
            using var ms = new MemoryStream();
            Task<string> err = p.StandardError.ReadToEndAsync();
            p.StandardOutput.BaseStream.CopyTo(ms);
            p.WaitForExit();
            if (p.ExitCode != 0)
            {
                string msg = err.Result.Trim().Replace('\n', ' ');
                throw new UsageException($"'{operand}' is not a file, and 'git {string.Join(' ', args)}' failed: {msg}");
            }
            return ms.ToArray();
        }
    }
}
