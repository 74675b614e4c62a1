using System.Buffers.Binary;
using System.Runtime.InteropServices;

namespace LoadDiff.Cli;

/// <summary>
/// What makes two names the same file: the device and inode number (from <c>stat(2)</c> in libc on Linux), and the
/// link count. Where that call is not available (Windows, macOS, other processors) only the resolved path is known.
/// </summary>
public readonly partial record struct FileIdentity(ulong Device, ulong Inode, ulong LinkCount)
{
    /// <summary>The identity of the file <paramref name="path"/> names (symbolic links followed); null when it does not exist or is not known here.</summary>
    public static FileIdentity? Of(string path)
    {
        if (!OperatingSystem.IsLinux() || RuntimeInformation.ProcessArchitecture is not (Architecture.X64 or Architecture.Arm64))
        {
            return null;
        }
        Span<byte> buffer = stackalloc byte[256];
        try
        {
            if (Native.Stat(path, ref MemoryMarshal.GetReference(buffer)) != 0)
            {
                return null;
            }
        }
        catch (Exception e) when (e is EntryPointNotFoundException or DllNotFoundException)
        {
            return null; // a C library without a 'stat' symbol (glibc before 2.33): fall back to paths
        }
        // struct stat of the Linux kernel ABI: x86-64 has a 64-bit st_nlink before st_mode; the generic layout (arm64)
        // has st_mode then a 32-bit st_nlink
        ulong device = BinaryPrimitives.ReadUInt64LittleEndian(buffer);
        ulong inode = BinaryPrimitives.ReadUInt64LittleEndian(buffer[8..]);
        ulong links = RuntimeInformation.ProcessArchitecture == Architecture.X64
            ? BinaryPrimitives.ReadUInt64LittleEndian(buffer[16..])
            : BinaryPrimitives.ReadUInt32LittleEndian(buffer[20..]);
        return new FileIdentity(device, inode, links);
    }

    /// <summary>The path with every symbolic link resolved (of the folders and of the file itself), as far as it exists.</summary>
    public static string RealPath(string path)
    {
        string full = Path.GetFullPath(path);
        try
        {
            string? dir = Path.GetDirectoryName(full);
            if (dir is null)
            {
                return full;
            }
            string here = Path.Combine(RealFolder(dir), Path.GetFileName(full));
            var info = new FileInfo(here);
            return info.LinkTarget is not null && info.ResolveLinkTarget(returnFinalTarget: true) is { } target ? RealPath(target.FullName) : here;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return full; // a loop of links, or a folder that cannot be read: the path as given
        }
    }

    private static string RealFolder(string dir)
    {
        string? parent = Path.GetDirectoryName(dir);
        string here = parent is null ? dir : Path.Combine(RealFolder(parent), Path.GetFileName(dir));
        var info = new DirectoryInfo(here);
        return info.LinkTarget is not null && info.ResolveLinkTarget(returnFinalTarget: true) is { } target ? RealFolder(Path.GetFullPath(target.FullName)) : here;
    }

    private static partial class Native
    {
        [LibraryImport("libc", EntryPoint = "stat", SetLastError = true, StringMarshalling = StringMarshalling.Utf8)]
        internal static partial int Stat(string path, ref byte buffer);
    }
}
