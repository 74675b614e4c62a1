using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// The checks every CSV path makes before reading a file, so that the streamed row reader and the block
/// reducer refuse the same files with the same code.
/// </summary>
internal static class CsvFileGate
{
    /// <summary>Refuses a missing file, one over the size limit, and one that is not a regular file.</summary>
    public static void Check(string path, string display, ReadOptions options)
    {
        LoadFileReader.RequireRegular(path, display);
        var info = new FileInfo(path);
        if (info.LinkTarget is not null && info.ResolveLinkTarget(returnFinalTarget: true) is FileInfo target)
        {
            info = target; // a link's own size is the length of the path it holds
        }
        if (!info.Exists)
        {
            throw new InputError(new Diagnostic(Codes.ReferencedFileMissing, Severity.Error, "file not found", new SourceLocation(display)));
        }
        if (info.Length > options.MaxCsvBytes)
        {
            throw new InputError(new Diagnostic(Codes.FileTooLarge, Severity.Error,
                $"file is {info.Length} bytes, more than the limit of {options.MaxCsvBytes}", new SourceLocation(display)));
        }
        if (info.Length == 0 && HasContent(path, display))
        {
            // A device such as /dev/zero reports no size but never ends: the block reducer would read it as
            // empty and the row reader would read it forever.
            throw new InputError(new Diagnostic(Codes.FileUnreadable, Severity.Error,
                "not a regular file: its size reads as 0 bytes but it yields data (a device or a pipe?)", new SourceLocation(display)));
        }
    }

    private static bool HasContent(string path, string display)
    {
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 12, FileOptions.SequentialScan);
            return stream.ReadByte() >= 0;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputError(new Diagnostic(Codes.FileUnreadable, Severity.Error, "cannot read the file: " + e.Message, new SourceLocation(display)));
        }
    }
}
