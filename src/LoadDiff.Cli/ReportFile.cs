using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using LoadDiff.Core.Equivalence;
using LoadDiff.Reports;
using LoadDiff.Reports.Html;

namespace LoadDiff.Cli;

/// <summary>
/// The <c>--report FILE</c> option of check and reduce: Markdown (.md) or a self-contained HTML page with drawings
/// (.html), written atomically, never over an input.
/// </summary>
public static class ReportFile
{
    /// <summary>Help text of the option.</summary>
    public const string Description =
        "Also write a report to this file: Markdown (.md) for a review comment, or one self-contained HTML page (.html) "
        + "with plan and elevation drawings, the method, the inputs' SHA-256 and the caution, for a checker.";

    /// <summary>True for an HTML report.</summary>
    public static bool IsHtml(string? path) =>
        path is not null && (path.EndsWith(".html", StringComparison.OrdinalIgnoreCase) || path.EndsWith(".htm", StringComparison.OrdinalIgnoreCase));

    /// <summary>Refuses a report path whose kind is not known.</summary>
    /// <exception cref="UsageException">Neither .md nor .html.</exception>
    public static void Validate(string? path)
    {
        if (path is not null && !IsHtml(path) && !path.EndsWith(".md", StringComparison.OrdinalIgnoreCase))
        {
            throw new UsageException($"--report '{path}': the name must end in .md (Markdown) or .html (a self-contained page with drawings)");
        }
    }

    /// <summary>A sketch sink to feed while reading, when the report will have drawings.</summary>
    public static SketchSink? SketchFor(string? path) => IsHtml(path) ? new SketchSink() : null;

    /// <summary>Writes the check's report.</summary>
    /// <param name="path">The report file.</param>
    /// <param name="result">The check.</param>
    /// <param name="original">The original as read.</param>
    /// <param name="substitute">The substitute as read.</param>
    /// <param name="originalSketch">The original's sketch (HTML reports).</param>
    /// <param name="substituteSketch">The substitute's sketch (HTML reports).</param>
    /// <param name="sectionCharts">Section-cut charts to include, when they were asked for.</param>
    public static void WriteCheck(
        string path, CheckResult result, LoadedFile original, LoadedFile substitute, SketchSink? originalSketch, SketchSink? substituteSketch,
        IReadOnlyList<SectionChart>? sectionCharts = null)
    {
        ArgumentNullException.ThrowIfNull(original);
        ArgumentNullException.ThrowIfNull(substitute);
        Write(path, [original, substitute], w =>
        {
            if (IsHtml(path))
            {
                HtmlReportCheck.Write(result, originalSketch, substituteSketch, Info([("original", original), ("substitute", substitute)], sectionCharts), w);
            }
            else
            {
                CheckMarkdownRenderer.Write(result, w, Notes([original, substitute]));
            }
        });
    }

    /// <summary>Writes the reduction's report.</summary>
    public static void WriteReduce(string path, ReduceResult result, LoadedFile file, SketchSink? sketch)
    {
        ArgumentNullException.ThrowIfNull(file);
        Write(path, [file], w =>
        {
            if (IsHtml(path))
            {
                HtmlReportReduce.Write(result, sketch, Info([("load file", file)], null), w);
            }
            else
            {
                ReduceMarkdownRenderer.Write(result, w, Notes([file]));
            }
        });
    }

    /// <summary>
    /// The date a report states: SOURCE_DATE_EPOCH (seconds since 1970, the reproducible-builds convention) when set,
    /// otherwise now; always UTC.
    /// </summary>
    public static DateTimeOffset Now()
    {
        string? epoch = Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH");
        return long.TryParse(epoch, NumberStyles.None, CultureInfo.InvariantCulture, out long seconds)
            ? DateTimeOffset.FromUnixTimeSeconds(seconds)
            : DateTimeOffset.UtcNow;
    }

    private static HtmlReportInfo Info(IReadOnlyList<(string Role, LoadedFile File)> files, IReadOnlyList<SectionChart>? sectionCharts)
    {
        var inputs = new List<ReportInput>();
        foreach ((string role, LoadedFile f) in files)
        {
            inputs.Add(Fingerprint(role, f.Path, f.Path == "-" ? null : f.ContentPath));
            foreach ((string full, string display) in f.ReferencedFiles.DistinctBy(r => r.FullPath))
            {
                inputs.Add(Fingerprint($"referenced by the {role}", display, full));
            }
        }
        return new HtmlReportInfo(AppInfo.Version, Now(), inputs, sectionCharts ?? []) { Notes = Notes([.. files.Select(f => f.File)]) };
    }

    // The notes (basis of each load) of the load documents among the inputs, read again from their bytes: the source
    // model only, no referenced table is read
    private static List<ReportNote> Notes(IReadOnlyList<LoadedFile> files)
    {
        var notes = new List<ReportNote>();
        foreach (LoadedFile f in files.DistinctBy(f => f.Path))
        {
            if (f.Path == "-" || f.ContentPath.EndsWith(".csv", StringComparison.OrdinalIgnoreCase) || !File.Exists(f.ContentPath))
            {
                continue;
            }
            var read = LoadDiff.Formats.Source.LoadDocumentReader.ReadDocumentOnly(File.ReadAllBytes(f.ContentPath), f.Path);
            if (read.Document is not { } doc)
            {
                continue;
            }
            if (doc.Note is { } dn)
            {
                notes.Add(new ReportNote(f.Path, "document", dn));
            }
            foreach (var c in doc.Cases)
            {
                if (c.Note is { } cn)
                {
                    notes.Add(new ReportNote(f.Path, "case " + c.Name, cn));
                }
                for (int i = 0; i < c.Items.Length; i++)
                {
                    if (c.Items[i].Note is { } inote)
                    {
                        string id = c.Items[i].Id ?? $"#{(i + 1).ToString(CultureInfo.InvariantCulture)} (no id)";
                        notes.Add(new ReportNote(f.Path, $"case {c.Name}, item {id}", inote));
                    }
                }
            }
        }
        return notes;
    }

    private static ReportInput Fingerprint(string role, string name, string? path)
    {
        if (path is null)
        {
            return new ReportInput(role, "standard input", null, null);
        }
        try
        {
            using var s = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
            byte[] hash = SHA256.HashData(s);
            return new ReportInput(role, name, Convert.ToHexStringLower(hash), s.Length);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new UsageException($"cannot read '{name}' again to compute its SHA-256 for the report: {e.Message}");
        }
    }

    private static void Write(string path, IReadOnlyList<LoadedFile> inputs, Action<TextWriter> render)
    {
        var protectedPaths = inputs.SelectMany(f => f.ReferencedFiles.Select(r => r.FullPath).Prepend(f.Path)).ToList();
        AtomicFile.Write(path, protectedPaths, s =>
        {
            using var writer = new StreamWriter(s, new UTF8Encoding(false), leaveOpen: true) { NewLine = "\n" };
            render(writer);
        });
    }
}
