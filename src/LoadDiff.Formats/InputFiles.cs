using System.Runtime.InteropServices;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats;

/// <summary>
/// What may be read as an input: a regular file, or standard input when it is open. Devices (<c>/dev/zero</c>
/// never ends), FIFOs (opening one blocks until a writer comes), sockets and directories are refused before any
/// byte is read, with one diagnostic naming the operand.
/// </summary>
public static class InputFiles
{
    /// <summary>The kind of a file system entry, after following symbolic links.</summary>
    public enum Kind
    {
        /// <summary>No such entry (or the platform gave no answer: the caller's own checks then decide).</summary>
        Unknown,

        /// <summary>A regular file.</summary>
        Regular,

        /// <summary>A directory.</summary>
        Directory,

        /// <summary>A character device such as <c>/dev/zero</c>.</summary>
        CharacterDevice,

        /// <summary>A block device.</summary>
        BlockDevice,

        /// <summary>A named pipe.</summary>
        Fifo,

        /// <summary>A Unix domain socket.</summary>
        Socket,
    }

    /// <summary>
    /// Refuses <paramref name="path"/> unless it is a regular file (a missing file is left to the caller, which names
    /// it in its own words). Throws <see cref="UnreadableInputException"/> with code LD001.
    /// </summary>
    /// <param name="path">The file on disk.</param>
    /// <param name="display">The operand as the user wrote it, for the message.</param>
    public static void RequireRegular(string path, string display)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Contains('\0', StringComparison.Ordinal))
        {
            throw Refuse("the file name holds a NUL character", display);
        }
        string? what = Describe(KindOf(path));
        if (what is not null)
        {
            throw Refuse($"is {what}, not a regular file; give a file (or '-' for standard input)", display);
        }
    }

    /// <summary>Reads standard input whole, refusing it when it is closed, and when it grows past <paramref name="limit"/> bytes.</summary>
    public static byte[] ReadStandardInput(long limit)
    {
        if (StandardInputIsClosed())
        {
            throw Refuse("standard input is closed; give a file, or pipe the document in", "-");
        }
        try
        {
            using Stream stdin = Console.OpenStandardInput();
            using var ms = new MemoryStream();
            byte[] buffer = new byte[1 << 16];
            int n;
            while ((n = stdin.Read(buffer, 0, buffer.Length)) > 0)
            {
                ms.Write(buffer, 0, n);
                if (ms.Length > limit)
                {
                    throw new UnreadableInputException(new Diagnostic(Codes.FileTooLarge, Severity.Error,
                        $"input is larger than the limit of {limit} bytes (raise --max-file-size)", new SourceLocation("-")));
                }
            }
            return ms.ToArray();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw Refuse("cannot read standard input: " + e.Message, "-");
        }
    }

    /// <summary>The kind of <paramref name="path"/> after following links; <see cref="Kind.Unknown"/> when it does not exist or the platform cannot tell.</summary>
    public static Kind KindOf(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        byte[]? buffer = StatusOf(path);
        if (buffer is null)
        {
            return !Path.Exists(path) ? Kind.Unknown : Directory.Exists(path) ? Kind.Directory : Kind.Regular;
        }
        int type = BitConverter.ToUInt16(buffer, 28) & 0xF000;
        return type switch
        {
            0x8000 => Kind.Regular,
            0x4000 => Kind.Directory,
            0x2000 => Kind.CharacterDevice,
            0x6000 => Kind.BlockDevice,
            0x1000 => Kind.Fifo,
            0xC000 => Kind.Socket,
            _ => Kind.Unknown,
        };
    }

    /// <summary>
    /// The device, inode number and link count of the file <paramref name="path"/> names (links followed): two names with
    /// the same device and inode are one file. Null when it does not exist or the platform cannot tell (not Linux).
    /// </summary>
    public static (ulong Device, ulong Inode, uint Links)? IdentityOf(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        byte[]? buffer = StatusOf(path);
        if (buffer is null)
        {
            return null;
        }
        ulong device = ((ulong)BitConverter.ToUInt32(buffer, 136) << 32) | BitConverter.ToUInt32(buffer, 140);
        return (device, BitConverter.ToUInt64(buffer, 32), BitConverter.ToUInt32(buffer, 16));
    }

    // struct statx (Linux uapi, the same layout on every architecture): stx_nlink u32 at byte 16, stx_mode u16 at 28,
    // stx_ino u64 at 32, stx_dev_major and stx_dev_minor u32 at 136 and 140. Null off Linux, for a missing file, and
    // with a C library that has no statx (glibc before 2.28).
    private static byte[]? StatusOf(string path)
    {
        if (!OperatingSystem.IsLinux() || path.Contains('\0', StringComparison.Ordinal))
        {
            return null;
        }
        var buffer = new byte[StatxSize];
        try
        {
            return Statx(AtWorkingDirectory, path, 0, StatxBasicStats, buffer) == 0 ? buffer : null;
        }
        catch (Exception e) when (e is EntryPointNotFoundException or DllNotFoundException)
        {
            return null;
        }
    }

    /// <summary>
    /// True when descriptor 0 was closed before the tool started: the runtime then reuses it for a pipe whose write
    /// end it holds itself, and reading it would wait forever. (Linux, through /proc; false elsewhere.)
    /// </summary>
    public static bool StandardInputIsClosed()
    {
        if (!OperatingSystem.IsLinux())
        {
            return false;
        }
        try
        {
            string? zero = new FileInfo("/proc/self/fd/0").LinkTarget;
            if (zero is null)
            {
                return Directory.Exists("/proc/self/fd") && !File.Exists("/proc/self/fd/0");
            }
            if (!zero.StartsWith("pipe:", StringComparison.Ordinal))
            {
                return false;
            }
            foreach (string fd in Directory.EnumerateFileSystemEntries("/proc/self/fd"))
            {
                string name = Path.GetFileName(fd);
                if (name != "0" && new FileInfo(fd).LinkTarget == zero && AccessMode(name) is 1 or 2)
                {
                    return true;
                }
            }
            return false;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or FormatException)
        {
            return false;
        }
    }

    /// <summary>
    /// True when descriptor 1 was closed before the tool started (missing, or reused by the runtime for a file it
    /// opened for reading), so that nothing written to standard output could arrive. (Linux; false elsewhere.)
    /// </summary>
    public static bool StandardOutputIsClosed()
    {
        if (!OperatingSystem.IsLinux() || !Directory.Exists("/proc/self/fd"))
        {
            return false;
        }
        try
        {
            return !File.Exists("/proc/self/fdinfo/1") || AccessMode("1") == 0;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or FormatException)
        {
            return false;
        }
    }

    // /proc/self/fdinfo/N: "flags:" in octal; the access mode is its low two bits (0 read-only, 1 write-only, 2 both).
    private static int AccessMode(string fd)
    {
        foreach (string line in File.ReadLines("/proc/self/fdinfo/" + fd))
        {
            if (line.StartsWith("flags:", StringComparison.Ordinal))
            {
                return (int)(Convert.ToInt64(line["flags:".Length..].Trim(), 8) & 3);
            }
        }
        return -1;
    }

    private static string? Describe(Kind kind) => kind switch
    {
        Kind.Directory => "a directory",
        Kind.CharacterDevice => "a character device",
        Kind.BlockDevice => "a block device",
        Kind.Fifo => "a named pipe (FIFO)",
        Kind.Socket => "a socket",
        _ => null,
    };

    private static UnreadableInputException Refuse(string message, string display) =>
        new(new Diagnostic(Codes.FileUnreadable, Severity.Error, message, new SourceLocation(display.Replace("\0", "\\0", StringComparison.Ordinal))));

    private const int AtWorkingDirectory = -100;
    private const uint StatxBasicStats = 0x7FF; // STATX_BASIC_STATS: type, mode, links, ids, inode, size, blocks, times
    private const int StatxSize = 256;

    [DllImport("libc", EntryPoint = "statx")]
    private static extern int Statx(int directory, [MarshalAs(UnmanagedType.LPUTF8Str)] string path, int flags, uint mask, [Out] byte[] buffer);
}
