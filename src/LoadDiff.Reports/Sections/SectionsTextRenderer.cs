using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;

namespace LoadDiff.Reports.Sections;

/// <summary>Section-cut profiles as aligned plain text, in the axis frame (e₁ along the axis, e₂ and e₃ across it).</summary>
public static class SectionsTextRenderer
{
    /// <summary>Writes the result.</summary>
    public static void Write(SectionsResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        SectionAxis a = result.Axis;
        w.WriteLine("Section cuts");
        w.WriteLine($"  original:    {result.OriginalPath}");
        w.WriteLine($"  substitute:  {result.SubstitutePath}");
        w.WriteLine($"  units:       force {f}, length {l}, moment {m}");
        w.WriteLine($"  axis:        e1 = {NumberText.Readable(a.Direction)} through origin {NumberText.Readable(a.Origin)} {l}; e2 = {NumberText.Readable(a.Lateral)}, e3 = {NumberText.Readable(a.Transverse)}");
        w.WriteLine($"  convention:  {SectionsResult.Convention}");
        foreach (SectionsEntry e in result.Entries)
        {
            SectionComparison c = e.Comparison;
            w.WriteLine();
            w.WriteLine($"{(e.Kind == EntryKind.Case ? "Case" : "Combination")} \"{e.Name}\": {c.Stations.Count} stations from {NumberText.Readable(c.Stations[0].S)} to {NumberText.Readable(c.Stations[^1].S)} {l}");
            string header = $"  {"s",-10}  {"V original (e1, e2, e3)",-36}  {"V substitute",-36}  {"M original (e1, e2, e3)",-36}  {"M substitute",-36}  {"|ΔV|",-11}  |ΔM|";
            w.WriteLine(header);
            w.WriteLine("  " + new string('-', header.Length - 2));
            double fn = Noise(c, x => x.Force), mn = Noise(c, x => x.Moment);
            foreach (SectionStation s in c.Stations)
            {
                w.WriteLine($"  {NumberText.Readable(s.S),-10}  {NumberText.Readable(a.Local(s.Original.Force), fn),-36}  {NumberText.Readable(a.Local(s.Substitute.Force), fn),-36}  "
                    + $"{NumberText.Readable(a.Local(s.Original.Moment), mn),-36}  {NumberText.Readable(a.Local(s.Substitute.Moment), mn),-36}  "
                    + $"{NumberText.Readable(s.ForceDeviation, fn),-11}  {NumberText.Readable(s.MomentDeviation, mn)}");
            }
            w.WriteLine($"  (V in {f}, M in {m}, s in {l})");
            w.WriteLine($"  largest |ΔV| = {NumberText.Readable(c.MaxForceDeviation, fn)} {f} at s = {NumberText.Readable(c.MaxForceDeviationAt)} {l}; {Relative(c.MaxForceDeviationRelative, "|V|", c.OriginalPeakForce, f)}");
            w.WriteLine($"  largest |ΔM| = {NumberText.Readable(c.MaxMomentDeviation, mn)} {m} at s = {NumberText.Readable(c.MaxMomentDeviationAt)} {l}; {Relative(c.MaxMomentDeviationRelative, "|M|", c.OriginalPeakMoment, m)}");
            foreach (string note in Notes(c, result))
            {
                w.WriteLine("  note: " + note);
            }
        }
        w.WriteLine();
        w.WriteLine(SectionsResult.SectionCaution);
        w.WriteLine(Caution.Text);
    }

    /// <summary>"0.125 of the original's largest |M| (…)" or why there is no relative value.</summary>
    internal static string Relative(double? relative, string what, double peak, string unit) => relative is { } r
        ? $"{NumberText.Readable(r)} of the original's largest {what} ({NumberText.Readable(peak)} {unit})"
        : $"the original has no cut {(what == "|V|" ? "force" : "moment")} anywhere, so no relative value";

    /// <summary>Notes a reader must see: couples left out, boundaries not all added.</summary>
    internal static IEnumerable<string> Notes(SectionComparison c, SectionsResult r)
    {
        if (!c.OriginalExcludedCouple.IsZero || !c.SubstituteExcludedCouple.IsZero)
        {
            yield return $"free couples have no position and are left out of every cut: original Σ = {NumberText.Readable(c.OriginalExcludedCouple)}, "
                + $"substitute Σ = {NumberText.Readable(c.SubstituteExcludedCouple)} {r.Units.MomentSymbol}";
        }
        if (!c.BoundariesIncluded)
        {
            yield return $"more than {SectionProfile.MaxBoundaryStations} item boundaries: only the even stations are used (raise --stations for a finer profile)";
        }
    }

    // What rounding can produce: 1e-12 of the largest value of either profile.
    internal static double Noise(SectionComparison c, Func<Core.Reduction.ForceCoupleSystem, Vector3> pick) =>
        Core.Reduction.WrenchAnalysis.RoundingThreshold * c.Stations.Max(x => Math.Max(pick(x.Original).Length, pick(x.Substitute).Length));
}
