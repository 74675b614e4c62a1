using LoadDiff.Core;
using LoadDiff.Core.Diff;

namespace LoadDiff.Reports;

/// <summary>Wording shared by the diff renderers.</summary>
public static class DiffWords
{
    /// <summary>The caution a diff carries: an unchanged resultant is not an unchanged structure.</summary>
    public const string Caution =
        "Caution: an unchanged resultant means the same effect on a rigid body only; internal forces, local stresses and deflections "
        + "can still change when loads move (Saint-Venant's principle). Review against the governing design codes and with licensed engineering judgement.";

    /// <summary>"changed", "added" or "removed".</summary>
    public static string Change(ChangeKind k) => k switch
    {
        ChangeKind.Added => "added",
        ChangeKind.Removed => "removed",
        _ => "changed",
    };

    /// <summary>The one-line verdict.</summary>
    public static string Summary(DocumentDiff d)
    {
        ArgumentNullException.ThrowIfNull(d);
        if (!d.HasDifferences)
        {
            return "No differences: the two versions describe the same loads (order, spelling, whitespace and comments aside).";
        }
        int ch = d.Items.Count(i => i.Change == ChangeKind.Changed), add = d.Items.Count(i => i.Change == ChangeKind.Added),
            rem = d.Items.Count(i => i.Change == ChangeKind.Removed);
        return $"Differences: {ch} item{S(ch)} changed, {add} added, {rem} removed; {d.Settings.Count} document setting{S(d.Settings.Count)} changed.";
    }

    /// <summary>
    /// What the listing diff compares: the exact canonical listings, or, when the units differ, both in the old
    /// version's units with numbers rounded to <see cref="DocumentDiff.ListingSignificantDigits"/> significant digits.
    /// </summary>
    public static string ListingBasis(DocumentDiff d)
    {
        ArgumentNullException.ThrowIfNull(d);
        return d.ListingSignificantDigits is { } digits
            ? $"both in the units of {d.OldName} ({d.Units}), {d.NewName} converted with the exact NIST SP 811 factors, numbers rounded to {digits.ToString(System.Globalization.CultureInfo.InvariantCulture)} significant digits"
            : "exact";
    }

    /// <summary>The point moments are taken about, with how it was chosen.</summary>
    public static string Point(DocumentDiff d)
    {
        ArgumentNullException.ThrowIfNull(d);
        return $"{NumberText.Readable(d.ReferencePoint)} {d.Units.Length.Symbol} ({d.ReferenceDescription})";
    }

    /// <summary>The noise threshold for readable numbers of a vector difference: zero (differences are exact).</summary>
    public static string Vec(Vector3 v) => NumberText.Readable(v);

    /// <summary>One referenced table's row changes in a line: what was matched how, and the counts.</summary>
    public static string DataHeading(DataChange c)
    {
        ArgumentNullException.ThrowIfNull(c);
        string files = c.OldFile == c.NewFile ? c.OldFile : c.OldFile + " → " + c.NewFile;
        string shown = c.Shown.Count < c.Differing ? $"; the first {c.Shown.Count} shown" : "";
        return $"rows of the {c.Table} {files} (matched by {c.MatchedBy}){shown}:";
    }

    /// <summary>One row change in a line: its key and lines, old → new, and its own ΔR_i, ΔM_i where a row has them.</summary>
    public static string Row(RowChange r, string forceUnit, string momentUnit)
    {
        ArgumentNullException.ThrowIfNull(r);
        static string Line(long n) => n.ToString(System.Globalization.CultureInfo.InvariantCulture);
        string where = r.Change switch
        {
            ChangeKind.Added => "line " + Line(r.NewLine),
            ChangeKind.Removed => "line " + Line(r.OldLine),
            _ => r.OldLine == r.NewLine ? "line " + Line(r.OldLine) : $"line {Line(r.OldLine)} → {Line(r.NewLine)}",
        };
        string values = r.Change switch
        {
            ChangeKind.Added => r.New!,
            ChangeKind.Removed => r.Old!,
            _ => $"{r.Old} → {r.New}",
        };
        string delta = r.DeltaForce is { } df && r.DeltaMoment is { } dm ? $"; ΔR_i = {Vec(df)} {forceUnit}, ΔM_i = {Vec(dm)} {momentUnit}" : "";
        return $"{Change(r.Change)} {r.Key} ({where}): {values}{delta}";
    }

    private static string Count(long n) => n.ToString(System.Globalization.CultureInfo.InvariantCulture) + (n == 1 ? " row" : " rows");

    private static string S(int n) => n == 1 ? "" : "s";
}
