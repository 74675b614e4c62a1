using System.CommandLine;
using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Reports;
using LoadDiff.Reports.Html;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff reduce FILE</c>: each case and combination reduced to a force-couple system and a wrench.</summary>
public static class ReduceCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var file = new Argument<string>("FILE") { Description = "Load description (.loads.json), a point-load or mesh CSV, or - for standard input." };
        var cases = CommonOptions.Cases();
        var at = CommonOptions.At("the origin");
        var format = CommonOptions.Format("text", "json", "markdown");
        var units = CommonOptions.Units();
        var input = new InputOptions();
        var report = new Option<string?>("--report") { Description = ReportFile.Description, HelpName = "FILE.md|FILE.html" };
        var command = new Command("reduce",
            "Reduce each load case and combination to its resultant force and moment about one point, with the wrench "
            + "(pitch, central axis, minimum couple) and the single-force line of action where one exists.\n\n"
            + "Example:\n  loaddiff reduce fixtures/footbridge/detailed.loads.json --at centroid --format json")
        {
            file, cases, at, format, units, report,
        };
        input.AddTo(command);
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            UnitSystem? target = parse.GetValue(units) is { } u ? new UnitSystem(u.Force, u.Length, UnitCatalog.Kilogram) : null;
            string? reportPath = parse.GetValue(report);
            ReportFile.Validate(reportPath);
            SketchSink? sketch = ReportFile.SketchFor(reportPath);
            LoadedFile loaded = LoadedFile.Read(parse.GetValue(file)!, target, error, alsoInto: sketch, options: input.From(parse));
            string[] selected = parse.GetValue(cases) ?? [];
            foreach (string name in selected)
            {
                if (!loaded.Defines(name))
                {
                    throw new UsageException($"--case '{name}': {loaded.Path} has no such case or combination ({loaded.NamesList()})");
                }
            }
            Vector3 point = loaded.ResolvePoint(parse.GetValue(at), out string description);
            ReduceResult result = Reduce(loaded, point, description, selected);
            switch (parse.GetValue(format))
            {
                case "json":
                    JsonToText.Write(output, ms => ReduceJsonWriter.Write(result, ms, AppInfo.Version));
                    break;
                case "markdown":
                    ReduceMarkdownRenderer.Write(result, output);
                    break;
                default:
                    ReduceTextRenderer.Write(result, output);
                    break;
            }
            if (reportPath is not null)
            {
                ReportFile.WriteReduce(reportPath, result, loaded, sketch);
            }
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>Reduces the selected cases and combinations (all when none are selected) about a point.</summary>
    public static ReduceResult Reduce(LoadedFile loaded, Vector3 point, string description, IReadOnlyCollection<string> selected)
    {
        ArgumentNullException.ThrowIfNull(loaded);
        ArgumentNullException.ThrowIfNull(selected);
        bool Wanted(string name) => selected.Count == 0 || selected.Contains(name);
        var entries = new List<ReducedEntry>();
        foreach (string name in loaded.Sink.CaseNames.Where(Wanted))
        {
            LoadReduction result;
            try
            {
                result = loaded.Sink.Cases[name].ResultAt(point);
            }
            catch (OverflowException)
            {
                throw new OverflowException($"the case '{name}' of {loaded.Path} overflowed the range of double when its loads were summed");
            }
            entries.Add(new ReducedEntry(name, EntryKind.Case, loaded.Sink.CaseTitle(name), result, null));
        }
        foreach (LoadCombination c in loaded.Sink.Combinations.Where(c => Wanted(c.Name)))
        {
            LoadReduction result;
            try
            {
                result = loaded.Combine(c).ResultAt(point);
            }
            catch (OverflowException)
            {
                throw new OverflowException($"the combination '{c.Name}' of {loaded.Path} (at $.combinations) overflowed the range of double when its factors were applied");
            }
            entries.Add(new ReducedEntry(c.Name, EntryKind.Combination, null, result, c));
        }
        return new ReduceResult(loaded.Path, loaded.Header.Title, loaded.Units, point, description, entries);
    }
}
