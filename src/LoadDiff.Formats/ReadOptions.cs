using LoadDiff.Core.Units;

namespace LoadDiff.Formats;

/// <summary>How a load description is read.</summary>
public sealed record ReadOptions
{
    /// <summary>Deliver items in these units (exact factor conversion); null keeps the file's own units.</summary>
    public UnitSystem? TargetUnits { get; init; }

    // Null until set: a CSV carries no units of its own, so only a value set here counts as units stated.
    private readonly UnitSystem? _csvUnits;

    /// <summary>Units of a CSV file given directly (a CSV carries no units of its own); SI by default.</summary>
    public UnitSystem CsvUnits
    {
        get => _csvUnits ?? UnitSystem.Si;
        init => _csvUnits = value;
    }

    /// <summary>True when <see cref="CsvUnits"/> was set, so the header of a CSV given directly reports its units as stated.</summary>
    internal bool CsvUnitsGiven => _csvUnits is not null;

    /// <summary>Accept referenced files outside the model's folder (absolute paths, <c>..</c>, or symbolic links that lead out).</summary>
    public bool AllowOutside { get; init; }

    /// <summary>Unknown fields are errors instead of warnings.</summary>
    public bool Strict { get; init; }

    /// <summary>Largest JSON file read, in bytes (the JSON is held in memory; large data belongs in CSV).</summary>
    public long MaxJsonBytes { get; init; } = 512L * 1024 * 1024;

    /// <summary>Largest CSV file read, in bytes (CSV is streamed).</summary>
    public long MaxCsvBytes { get; init; } = 64L * 1024 * 1024 * 1024;

    /// <summary>JSON files larger than this are streamed (two forward passes, constant memory) instead of read whole.</summary>
    public long StreamJsonAbove { get; init; } = 32L * 1024 * 1024;

    /// <summary>Deepest JSON nesting accepted.</summary>
    public int MaxDepth { get; init; } = 64;

    /// <summary>Most items accepted in one file, CSV rows and mesh triangles included.</summary>
    public long MaxItems { get; init; } = 1_000_000_000;

    /// <summary>Threads that parse blocks of large CSV files (1 parses on the calling thread); the result does not depend on it.</summary>
    public int Threads { get; init; } = Environment.ProcessorCount;

    /// <summary>Longest CSV line accepted, in characters.</summary>
    public int MaxLineLength { get; init; } = 1 << 20;

    /// <summary>Bytes per block of the parallel CSV reader when set (tests cut small blocks to reach every boundary case).</summary>
    internal int? CsvBlockSize { get; init; }

    /// <summary>
    /// Called with a count of bytes each time the reader takes more input: CSV files as they stream, a JSON file once
    /// it is in memory. For progress displays; null for none.
    /// </summary>
    public Action<long>? BytesRead { get; init; }

    /// <summary>
    /// Called with the full path and the display name of every CSV file a load description references, as it is
    /// opened; for reports that list (and hash) every input. Null for none.
    /// </summary>
    public Action<string, string>? ReferencedFileOpened { get; init; }

    /// <summary>
    /// Called with the full path of every file a load description references, before the reader checks that it exists:
    /// a caller reading a document from somewhere other than the working tree (a git revision) creates the file there
    /// from the same source, so no referenced file is ever read from elsewhere. It returns null, or why the file must
    /// not be read (the reader refuses it with LD050 at the reference; a symbolic link stored in a revision is never
    /// followed). Null for plain files.
    /// </summary>
    public Func<string, string?>? PrepareReferencedFile { get; init; }

    /// <summary>
    /// When set, a mesh or forces item whose referenced file does not exist is kept without its data (it carries no
    /// load) instead of failing, and this is called with the file's path as the document writes it. For a caller that
    /// has the document only (git's textconv gets a temporary copy of it) and says which data are missing. A name
    /// outside the folder or an empty one is still an error. Null (the default): a missing file is an error (LD051).
    /// </summary>
    public Action<string>? MissingReferencedFile { get; init; }

    /// <summary>
    /// When true, no referenced file is opened or looked for: every mesh or forces item that references one is kept
    /// without its data, as if the file were absent, and <see cref="MissingReferencedFile"/> (when set) is told each name.
    /// For a caller that has the document only (git's external diff and textconv, a report re-reading its notes), where
    /// a file beside the document's copy would be some other version's, or a stray one.
    /// </summary>
    public bool ReferencedFilesSkipped { get; init; }
}
