using System.Runtime.InteropServices;

namespace LoadDiff.Cli;

/// <summary>
/// The one way output files are written: into a temporary file <c>.NAME.xxxxxxxx.tmp</c> beside the target, flushed,
/// then renamed over it. The temporary file is removed on failure, on SIGINT and SIGTERM, and (when a killed run left
/// one) by the next write of the same target. SIGXFSZ is ignored so that a file-size limit makes the write fail with
/// EFBIG, reported as one line, instead of killing the process.
/// </summary>
internal static class TemporaryWrite
{
    private static readonly HashSet<string> Pending = [];
    private static readonly Lock Gate = new();
    private static List<PosixSignalRegistration>? _signals;

    /// <summary>Writes <paramref name="full"/> (an absolute path) through a temporary file.</summary>
    /// <param name="full">The file to create or replace.</param>
    /// <param name="shown">The name the user gave, for messages.</param>
    /// <param name="write">Writes the content.</param>
    /// <param name="keepMode">Give the new file the permissions of the one it replaces.</param>
    /// <exception cref="UsageException">LD082: the write failed; the target is as it was.</exception>
    public static void Replace(string full, string shown, Action<Stream> write, bool keepMode)
    {
        string dir = Path.GetDirectoryName(full)!;
        string name = Path.GetFileName(full);
        RemoveStale(dir, name);
        ListenForSignals();
        string temp = Path.Combine(dir, "." + name + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        bool existed = File.Exists(full);
        lock (Gate)
        {
            Pending.Add(temp);
        }
        try
        {
            using (var s = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            {
                write(s);
                s.Flush(flushToDisk: true);
            }
            if (keepMode && existed && !OperatingSystem.IsWindows())
            {
                File.SetUnixFileMode(temp, File.GetUnixFileMode(full));
            }
            File.Move(temp, full, overwrite: true);
        }
        // .NET reports EFBIG (file-size limit reached) as ArgumentOutOfRangeException from the write
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentOutOfRangeException)
        {
            TryDelete(temp);
            string why = e is ArgumentOutOfRangeException || e.Message.Contains("too large", StringComparison.OrdinalIgnoreCase)
                ? "the file-size limit was reached (ulimit -f)"
                : e.Message;
            throw new UsageException($"error {OutputCodes.WriteFailed}: cannot write '{shown}': {why}; "
                + (existed ? "the file is unchanged" : "nothing was written"));
        }
        finally
        {
            lock (Gate)
            {
                Pending.Remove(temp);
            }
        }
    }

    /// <summary>True for a name this class gives temporary files of <paramref name="target"/>: <c>.TARGET.</c>, 8 hex digits, <c>.tmp</c>.</summary>
    internal static bool IsTemporaryOf(string fileName, string target) =>
        fileName.Length == target.Length + 14
        && fileName.StartsWith("." + target + ".", StringComparison.Ordinal)
        && fileName.EndsWith(".tmp", StringComparison.Ordinal)
        && !fileName.AsSpan(target.Length + 2, 8).ContainsAnyExcept(LowerHex);

    private static readonly System.Buffers.SearchValues<char> LowerHex = System.Buffers.SearchValues.Create("0123456789abcdef");

    // A run killed by SIGKILL (or a power cut) cannot clean up; the next write of the same target does
    private static void RemoveStale(string dir, string name)
    {
        try
        {
            foreach (string f in Directory.EnumerateFiles(dir, "*.tmp"))
            {
                if (IsTemporaryOf(Path.GetFileName(f), name) && !File.GetAttributes(f).HasFlag(FileAttributes.ReparsePoint))
                {
                    TryDelete(f);
                }
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // a folder that cannot be listed fails the write itself, with its own message
        }
    }

    private static void ListenForSignals()
    {
        lock (Gate)
        {
            if (_signals is not null || OperatingSystem.IsWindows())
            {
                return;
            }
            _signals =
            [
                PosixSignalRegistration.Create(PosixSignal.SIGINT, RemovePending),
                PosixSignalRegistration.Create(PosixSignal.SIGTERM, RemovePending),
            ];
            if (OperatingSystem.IsLinux())
            {
                // SIGXFSZ is 25 on Linux; a raw signal number is accepted cast to PosixSignal. Handled and cancelled,
                // it no longer ends the process, and the write that passed the limit returns EFBIG.
                _signals.Add(PosixSignalRegistration.Create((PosixSignal)25, c => c.Cancel = true));
            }
        }
    }

    // Removes the temporary files and lets the signal end the process as it would have
    private static void RemovePending(PosixSignalContext context)
    {
        string[] files;
        lock (Gate)
        {
            files = [.. Pending];
        }
        foreach (string f in files)
        {
            TryDelete(f);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // the target is intact; a stray temporary file is the lesser harm (the next write removes it)
        }
    }
}
