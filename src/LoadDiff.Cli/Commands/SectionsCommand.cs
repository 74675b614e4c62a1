using System.CommandLine;
using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;
using LoadDiff.Reports.Sections;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff sections ORIGINAL SUBSTITUTE --axis A</c>: cut-side force and moment profiles of both load sets.</summary>
public static class SectionsCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var original = new Argument<string>("ORIGINAL") { Description = "The detailed load description (.loads.json or CSV), or - for standard input." };
        var substitute = new Argument<string>("SUBSTITUTE") { Description = "The substitute to compare with it." };
        var axis = SectionOptions.Axis("--axis", "Direction of the cut axis (normal of every cut): x, y, z or dx,dy,dz (normalised).", required: true);
        var origin = SectionOptions.Origin();
        var from = SectionOptions.Station("--from", "First station (default: the lowest station of any load of either file).");
        var to = SectionOptions.Station("--to", "Last station (default: the highest station of any load of either file).");
        var stations = SectionOptions.Stations();
        var format = CommonOptions.Format("text", "json", "markdown", "svg");
        var cases = CommonOptions.Cases();
        var units = CommonOptions.Units();
        var command = new Command("sections",
            "Compare the section-cut profiles of ORIGINAL and SUBSTITUTE along an axis: at each station s, the resultant force V(s) "
            + "and moment M(s) of every load on the negative side of the cut ((x − origin)·axis ≤ s), about the cut point "
            + "origin + s·axis. Line loads, polygons and mesh triangles are split exactly at each cut. Reports the largest "
            + "deviations and where they occur. Exit code 0 on success, 2 on input or usage errors.\n\n"
            + "Example:\n  loaddiff sections fixtures/footbridge/detailed.loads.json fixtures/footbridge/simplified.loads.json --axis x --case vehicle")
        {
            original, substitute, axis, origin, from, to, stations, format, cases, units,
        };
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string originalPath = parse.GetValue(original)!, substitutePath = parse.GetValue(substitute)!;
            if (originalPath == "-" && substitutePath == "-")
            {
                throw new UsageException("only one of ORIGINAL and SUBSTITUTE can be read from standard input");
            }
            double? lo = parse.GetValue(from), hi = parse.GetValue(to);
            if (lo is { } l && hi is { } h && l > h)
            {
                throw new UsageException($"--from {l.ToString(System.Globalization.CultureInfo.InvariantCulture)} is beyond --to {h.ToString(System.Globalization.CultureInfo.InvariantCulture)}");
            }
            UnitSystem? requested = parse.GetValue(units) is { } u ? new UnitSystem(u.Force, u.Length, UnitCatalog.Kilogram) : null;
            CollectedFile a = CollectedFile.Read(originalPath, requested, error);
            CollectedFile b = CollectedFile.Read(substitutePath, a.Units, error);
            var sectionAxis = SectionAxis.Create(parse.GetValue(origin) ?? Vector3.Zero, parse.GetValue(axis)!.Value);
            SectionsResult result = Compute(a, b, sectionAxis, lo, hi, parse.GetValue(stations), parse.GetValue(cases) ?? [], error);
            switch (parse.GetValue(format))
            {
                case "json":
                    JsonToText.Write(output, ms => SectionsJsonWriter.Write(result, ms, AppInfo.Version));
                    break;
                case "markdown":
                    SectionsMarkdownRenderer.Write(result, output);
                    break;
                case "svg":
                    SectionsSvgWriter.Write(result, output);
                    break;
                default:
                    SectionsTextRenderer.Write(result, output);
                    break;
            }
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>
    /// The section comparison of every selected case (in both files) and every combination of the original, whose
    /// factors are applied to both files' cases; a case in one file only is named on <paramref name="error"/> and skipped.
    /// </summary>
    public static SectionsResult Compute(
        CollectedFile a, CollectedFile b, SectionAxis axis, double? from, double? to, int stations,
        IReadOnlyCollection<string> selected, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        ArgumentNullException.ThrowIfNull(selected);
        ArgumentNullException.ThrowIfNull(error);
        foreach (string name in selected)
        {
            if (!a.Defines(name) && !b.Defines(name))
            {
                throw new UsageException($"--case '{name}': neither file has such a case or combination (original {a.NamesList()})");
            }
        }
        bool Wanted(string name) => selected.Count == 0 || selected.Contains(name);
        var entries = new List<SectionsEntry>();
        foreach (string name in a.Sink.CaseNames.Concat(b.Sink.CaseNames.Where(n => !a.Sink.HasCase(n))).Where(Wanted))
        {
            if (!a.Sink.HasCase(name) || !b.Sink.HasCase(name))
            {
                error.WriteLine($"loaddiff: case '{name}' is only in the {(a.Sink.HasCase(name) ? "original" : "substitute")}; it is not cut");
                continue;
            }
            if (Compare(axis, from, to, stations, a.Case(name), b.Case(name)) is { } c)
            {
                entries.Add(new SectionsEntry(name, EntryKind.Case, c));
            }
            else
            {
                error.WriteLine($"loaddiff: case '{name}' has no located loads in either file; it is not cut");
            }
        }
        foreach (LoadCombination combination in a.Sink.Combinations.Where(c => Wanted(c.Name)))
        {
            if (Compare(axis, from, to, stations, a.Combination(combination), b.Combination(combination)) is { } c)
            {
                entries.Add(new SectionsEntry(combination.Name, EntryKind.Combination, c));
            }
        }
        if (entries.Count == 0)
        {
            throw new UsageException("nothing to cut: no selected case or combination has located loads in both files");
        }
        return new SectionsResult(a.Path, b.Path, a.Units, axis, entries);
    }

    private static string Invariant(double v) => v.ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    private static SectionComparison? Compare(SectionAxis axis, double? from, double? to, int stations,
        IReadOnlyList<WeightedItems> original, IReadOnlyList<WeightedItems> substitute)
    {
        // Items of zero magnitude and cases with factor 0 extend no range (SectionProfile.Extent).
        (double Min, double Max)? extent = SectionProfile.Extent(axis, original.Concat(substitute));
        if (extent is null && (from is null || to is null))
        {
            return null;
        }
        double lo = from ?? extent?.Min ?? to!.Value, hi = to ?? extent?.Max ?? lo;
        if (lo > hi)
        {
            throw new UsageException($"the station range from {Invariant(lo)} to {Invariant(hi)} is empty (the loads lie from {Invariant(extent!.Value.Min)} to {Invariant(extent.Value.Max)} along the axis)");
        }
        return SectionComparison.Compare(axis, lo, hi, stations, original, substitute);
    }
}
