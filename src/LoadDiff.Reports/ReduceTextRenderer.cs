using System.Globalization;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>Plain aligned text for a terminal or a CI log (no colour needed to read it).</summary>
public static class ReduceTextRenderer
{
    /// <summary>Writes the reduction.</summary>
    public static void Write(ReduceResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        w.WriteLine($"Reduction of {SafeText.Visible(result.Source)}");
        if (result.Title is { } t)
        {
            w.WriteLine($"Title:            {SafeText.Visible(t)}");
        }
        w.WriteLine($"Units:            force {f}, length {l}, moment {m}");
        w.WriteLine($"Reference point:  {NumberText.Readable(result.ReferencePoint)} {l} ({result.ReferenceDescription})");
        w.WriteLine($"Numbers:          {NumberText.ReadableDigits} significant digits; --format json gives exact values");
        foreach (ReducedEntry e in result.Entries)
        {
            w.WriteLine();
            LoadReduction r = e.Reduction;
            string head = e.Kind == EntryKind.Case ? $"Case \"{SafeText.Visible(e.Name)}\"" : $"Combination \"{SafeText.Visible(e.Name)}\" = {Describe.Factors(e.Combination!)}";
            if (e.Title is { } title)
            {
                head += " — " + SafeText.Visible(title);
            }
            w.WriteLine(head + $" ({r.ItemCount.ToString(CultureInfo.InvariantCulture)} item{(r.ItemCount == 1 ? "" : "s")})");
            double fn = WrenchAnalysis.RoundingThreshold * r.GrossForce;
            double mn = WrenchAnalysis.RoundingThreshold * r.MomentScale(r.ReferencePoint);
            double ln = WrenchAnalysis.RoundingThreshold * r.LengthScale;
            Row(w, "Resultant force R", $"{NumberText.Readable(r.Force, fn)} {f}", $"|R| = {NumberText.Readable(r.Force.Length, fn)} {f}");
            Row(w, "Moment M about the point", $"{NumberText.Readable(r.Moment, mn)} {m}", $"|M| = {NumberText.Readable(r.Moment.Length, mn)} {m}");
            Row(w, "Gross force G_F", $"{NumberText.Readable(r.GrossForce)} {f}", "");
            if (r.GrossCouple > 0)
            {
                Row(w, "Gross couple", $"{NumberText.Readable(r.GrossCouple)} {m}", "");
            }
            if (r.Centroid is { } c)
            {
                Row(w, "Load centroid", $"{NumberText.Readable(c, ln)} {l}", "");
            }
            WrenchAnalysis wr = e.Wrench;
            Row(w, "Reduces to", Describe.System(wr, r.AllForcesParallel), "");
            switch (wr.Kind)
            {
                case SystemKind.Force:
                    Row(w, "Line of action", $"through {NumberText.Readable(wr.AxisPoint!.Value, ln)} {l}", $"along {NumberText.Readable(wr.AxisDirection!.Value, 1e-12)}");
                    if (wr.CentreOfParallelForces is { } cp)
                    {
                        Row(w, "Centre of parallel forces", $"{NumberText.Readable(cp.Point, ln)} {l}", $"in the plane {cp.AxisName} = {NumberText.Readable(r.ReferencePoint[cp.Axis])}");
                    }
                    foreach (PlaneCrossing x in wr.Crossings)
                    {
                        if (!ReferenceEquals(x, wr.CentreOfParallelForces))
                        {
                            Row(w, $"Crosses plane {x.AxisName} = {NumberText.Readable(r.ReferencePoint[x.Axis])}", $"at {NumberText.Readable(x.Point, ln)} {l}", "");
                        }
                    }
                    break;
                case SystemKind.Wrench:
                    Row(w, "Central axis", $"through {NumberText.Readable(wr.AxisPoint!.Value, ln)} {l}", $"along {NumberText.Readable(wr.AxisDirection!.Value, 1e-12)}");
                    Row(w, "Pitch p", $"{NumberText.Readable(wr.Pitch!.Value)} {l}", "");
                    Row(w, "Minimum couple p·R", $"{NumberText.Readable(wr.MinimumCouple)} {m}", $"|p·R| = {NumberText.Readable(wr.MinimumCouple.Length)} {m}");
                    break;
                case SystemKind.Couple:
                    Row(w, "Couple", $"{NumberText.Readable(wr.MinimumCouple, mn)} {m}", "the same about every point");
                    break;
                default:
                    break;
            }
        }
        w.WriteLine();
        w.WriteLine(Caution.Text);
    }

    private static void Row(TextWriter w, string label, string value, string note)
    {
        string line = "  " + label.PadRight(28) + value;
        if (note.Length > 0)
        {
            line = line.PadRight(72) + "  " + note;
        }
        w.WriteLine(line.TrimEnd());
    }
}
