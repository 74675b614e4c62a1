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

    private static string S(int n) => n == 1 ? "" : "s";
}
