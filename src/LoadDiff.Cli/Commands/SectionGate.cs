using System.CommandLine;
using LoadDiff.Core;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;
using LoadDiff.Reports;
using LoadDiff.Reports.Html;
using LoadDiff.Reports.Sections;

namespace LoadDiff.Cli.Commands;

/// <summary>
/// The optional gate of <c>check</c> on internal effects: <c>--sections AXIS --section-tol REL</c> fails a case when the
/// cut-side moment of the substitute deviates anywhere along the axis by more than REL of the original's peak cut moment,
/// the peak taken over the extent of the original's own loads (the rule and the verdict are Core's <see cref="SectionGateVerdict"/>;
/// this class reads the files and evaluates it; the check result carries it to every format). The files are read a second time with every item in memory, only when the gate is asked for.
/// </summary>
public sealed class SectionGate
{
    /// <summary>--sections AXIS.</summary>
    public Option<Vector3?> Axis { get; } = SectionOptions.Axis("--sections",
        "Also gate on internal effects: cut along this axis (x, y, z or dx,dy,dz, origin 0,0,0, over the extent of the loads) and fail "
        + "when the cut-side moment deviates by more than --section-tol of the original's peak (taken over the extent of the original's loads). Needs --section-tol.", required: false);

    /// <summary>--section-tol REL.</summary>
    public Option<double?> Tolerance { get; } = new("--section-tol")
    {
        Description = "Allowed largest cut-side moment deviation as a fraction of the original's peak cut moment over the extent of its loads, for --sections "
            + "(no default: no published figure exists, choose it for the member at hand).",
        HelpName = "REL",
        CustomParser = r => CommonOptions.ParseNonNegative(r, "--section-tol"),
    };

    /// <summary>Rejects inconsistent gate options before anything is written.</summary>
    /// <exception cref="UsageException">One of the two options without the other, or standard input as an operand.</exception>
    public void Validate(ParseResult parse, string originalPath, string substitutePath)
    {
        ArgumentNullException.ThrowIfNull(parse);
        bool axis = parse.GetValue(Axis) is not null, tolerance = parse.GetValue(Tolerance) is not null;
        if (tolerance && !axis)
        {
            throw new UsageException("--section-tol needs --sections AXIS");
        }
        if (axis && !tolerance)
        {
            throw new UsageException("--sections needs --section-tol REL (the allowed moment deviation as a fraction of the original's peak)");
        }
        if (axis && (originalPath == "-" || substitutePath == "-"))
        {
            throw new UsageException("--sections reads the files a second time and cannot be used with standard input");
        }
    }

    /// <summary>
    /// Runs the gate when asked for: reads both files with their items and evaluates Core's gate rule. Null when the gate
    /// was not asked for; the verdict goes into the check's result, which every format renders.
    /// </summary>
    public SectionGateVerdict? Evaluate(ParseResult parse, string originalPath, string substitutePath, UnitSystem units,
        IReadOnlyCollection<string> selected, TextWriter error, out SectionsResult? profiles)
    {
        profiles = null;
        ArgumentNullException.ThrowIfNull(parse);
        ArgumentNullException.ThrowIfNull(error);
        Vector3? direction = parse.GetValue(Axis);
        double? tolerance = parse.GetValue(Tolerance);
        Validate(parse, originalPath, substitutePath);
        if (direction is null || tolerance is not { } rel)
        {
            return null;
        }
        CollectedFile a = CollectedFile.Read(originalPath, units, error);
        CollectedFile b = CollectedFile.Read(substitutePath, units, error);
        var axis = SectionAxis.Create(Vector3.Zero, direction.Value);
        SectionsResult result = SectionsCommand.Compute(a, b, axis, null, null, SectionOptions.DefaultStations, selected, error);
        SectionGateVerdict verdict = SectionGateVerdict.Evaluate(axis, rel, result.Entries.Select(e => (e.Name, e.Kind, e.Comparison)));
        profiles = result with { Gate = verdict };
        return verdict;
    }

    /// <summary>The peak and the stretch of the axis it was taken over, in words.</summary>
    private static string Peak(SectionGateCase c, string moment, string length) => c.PeakExtent is { } e
        ? $"peak {NumberText.Readable(c.PeakMoment)} {moment} over the original's loads, s = {NumberText.Readable(e.Min)} … {NumberText.Readable(e.Max)} {length}"
        : $"peak {NumberText.Readable(c.PeakMoment)} {moment}: the original has no located loads";

    /// <summary>One chart per case and combination for the HTML report (inline SVG, no namespace URL needed inside HTML).</summary>
    public static IReadOnlyList<SectionChart> Charts(SectionsResult profiles)
    {
        ArgumentNullException.ThrowIfNull(profiles);
        var charts = new List<SectionChart>();
        string m = profiles.Units.MomentSymbol, l = profiles.Units.Length.Symbol;
        for (int i = 0; i < profiles.Entries.Count; i++)
        {
            SectionsEntry e = profiles.Entries[i];
            using var w = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
            SectionsSvgWriter.Write(profiles with { Entries = [e] }, w);
            string svg = w.ToString().Replace(" xmlns=\"http://www.w3.org/2000/svg\"", "", StringComparison.Ordinal);
            string caption = $"Largest |ΔM| = {NumberText.Readable(e.Comparison.MaxMomentDeviation)} {m} at s = {NumberText.Readable(e.Comparison.MaxMomentDeviationAt)} {l}";
            if (profiles.Gate?.Cases[i] is { } c)
            {
                caption += $"; allowed {NumberText.Readable(c.AllowedMoment)} {m} ({Peak(c, m, l)}): {(c.Passes ? "PASS" : "FAIL")}";
            }
            charts.Add(new SectionChart($"Section cuts: {e.Name}", svg, caption));
        }
        return charts;
    }
}
