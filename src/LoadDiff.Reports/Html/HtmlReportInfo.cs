namespace LoadDiff.Reports.Html;

/// <summary>One input file named in a report, with its SHA-256 so a checker can tell exactly which data was checked.</summary>
/// <param name="Role">What the file is, e.g. "original", "substitute", "referenced by the original".</param>
/// <param name="Name">The file as the user named it (or as the load file referenced it).</param>
/// <param name="Sha256">Lower-case hex digest; null when the bytes could not be hashed (standard input).</param>
/// <param name="Bytes">Size in bytes, when known.</param>
public sealed record ReportInput(string Role, string Name, string? Sha256, long? Bytes);

/// <summary>A note (the basis of a load: where it came from and why) written in an input, listed in the report.</summary>
/// <param name="Input">The input file as the user named it.</param>
/// <param name="Where">What the note is on: <c>document</c>, <c>case NAME</c> or <c>case NAME, item ID</c>.</param>
/// <param name="Text">The note as written.</param>
public sealed record ReportNote(string Input, string Where, string Text);

/// <summary>A section-cut chart supplied by the section-cut command, drawn in the report as given.</summary>
/// <param name="Title">Heading of the chart.</param>
/// <param name="Svg">A complete, self-contained <c>&lt;svg&gt;</c> element (no external references).</param>
/// <param name="Caption">Optional sentence under the chart (largest deviation and where).</param>
public sealed record SectionChart(string Title, string Svg, string? Caption = null);

/// <summary>What a report states about its own making: tool version, date, inputs, and optional section-cut charts.</summary>
/// <param name="ToolVersion">The tool's version.</param>
/// <param name="Created">When the report was made (UTC).</param>
/// <param name="Inputs">Files read, with digests.</param>
/// <param name="SectionCharts">Charts of the section cuts when they were asked for; empty otherwise.</param>
public sealed record HtmlReportInfo(string ToolVersion, DateTimeOffset Created, IReadOnlyList<ReportInput> Inputs, IReadOnlyList<SectionChart> SectionCharts)
{
    /// <summary>The notes written in the inputs (document, cases, items), in file order.</summary>
    public IReadOnlyList<ReportNote> Notes { get; init; } = [];

    /// <inheritdoc/>
    public override string ToString() => $"loaddiff {ToolVersion}, {Created:u}, {Inputs.Count} inputs";
}
