using LoadDiff.Formats;

namespace LoadDiff.Cli;

/// <summary>
/// What makes two names the same file: the device and inode number and the link count (<see cref="InputFiles.IdentityOf"/>,
/// Linux), and the path with every link resolved (<see cref="ReferencedPath.RealPath"/>). Where the identity is not
/// known (other systems) only the resolved path is compared.
/// </summary>
public readonly record struct FileIdentity(ulong Device, ulong Inode, ulong LinkCount)
{
    /// <summary>The identity of the file <paramref name="path"/> names (symbolic links followed); null when it does not exist or is not known here.</summary>
    public static FileIdentity? Of(string path) =>
        InputFiles.IdentityOf(path) is { } id ? new FileIdentity(id.Device, id.Inode, id.Links) : null;

    /// <summary>The path with every symbolic link resolved (of the folders and of the file itself), as far as it exists; the full path as given when its links loop.</summary>
    public static string RealPath(string path) => ReferencedPath.RealPath(path) ?? Path.GetFullPath(path);
}
