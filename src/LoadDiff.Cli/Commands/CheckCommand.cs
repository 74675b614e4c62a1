using System.CommandLine;
using System.CommandLine.Parsing;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Reports;
using LoadDiff.Reports.Html;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff check ORIGINAL SUBSTITUTE</c>: the equivalence verdict per case and combination.</summary>
public static class CheckCommand
{
    /// <summary>How many of the largest items per case are listed for the reviewer.</summary>
    public const int ContributorCount = 3;

    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var original = new Argument<string>("ORIGINAL") { Description = "The detailed load description (.loads.json or CSV), or - for standard input." };
        var substitute = new Argument<string>("SUBSTITUTE") { Description = "The simplified substitute to prove equivalent to it." };
        var at = CommonOptions.At("the original's load centroid");
        var rel = Tolerance("--rel-tol", "Relative tolerance, a fraction of the original's gross force G_F and gross moment G_M (default 1e-3: common practice, no published source).", ToleranceSpec.DefaultRelative);
        var forceTol = Tolerance("--force-tol", "Absolute force tolerance F, in output force units (default 0).", 0);
        var momentTol = Tolerance("--moment-tol", "Absolute moment tolerance M, in output force × length units (default 0).", 0);
        var cases = CommonOptions.Cases();
        var format = CommonOptions.Format("text", "json", "markdown", "junit");
        var units = CommonOptions.Units();
        var input = new InputOptions();
        var report = new Option<string?>("--report") { Description = ReportFile.Description, HelpName = "FILE.md|FILE.html" };
        var sectionGate = new SectionGate();
        var command = new Command("check",
            "Check that SUBSTITUTE is statically equivalent to ORIGINAL for every load case and combination: "
            + "pass iff |ΔR| ≤ max(F, rel·G_F) and |ΔM| ≤ max(M, rel·G_M) at every corner of the bounding box of both "
            + "load systems. Reports the residual (substitute − original) and the line along which the missing force acts. "
            + "Exit code 0 when equivalent, 1 when not, 2 on input or usage errors.\n\n"
            + "Example:\n  loaddiff check fixtures/footbridge/detailed.loads.json fixtures/footbridge/simplified.loads.json --rel-tol 1e-4")
        {
            original, substitute, at, rel, forceTol, momentTol, cases, format, units, report,
            sectionGate.Axis, sectionGate.Tolerance,
        };
        input.AddTo(command);
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string originalPath = parse.GetValue(original)!, substitutePath = parse.GetValue(substitute)!;
            if (originalPath == "-" && substitutePath == "-")
            {
                throw new UsageException("only one of ORIGINAL and SUBSTITUTE can be read from standard input");
            }
            sectionGate.Validate(parse, originalPath, substitutePath);
            string? reportPath = parse.GetValue(report);
            ReportFile.Validate(reportPath);
            SketchSink? sketchA = ReportFile.SketchFor(reportPath), sketchB = ReportFile.SketchFor(reportPath);
            UnitSystem? requested = parse.GetValue(units) is { } u ? new UnitSystem(u.Force, u.Length, UnitCatalog.Kilogram) : null;
            LoadedFile a = LoadedFile.Read(originalPath, requested, error, ContributorCount, sketchA, input.From(parse));
            LoadedFile b = LoadedFile.Read(substitutePath, a.Units, error, ContributorCount, sketchB, input.From(parse));
            var tolerance = ToleranceSpec.Create(parse.GetValue(rel), parse.GetValue(forceTol), parse.GetValue(momentTol));
            string[] selected = parse.GetValue(cases) ?? [];
            foreach (string name in selected)
            {
                if (!a.Defines(name) && !b.Defines(name))
                {
                    throw new UsageException($"--case '{name}': neither file has such a case or combination (original {a.NamesList()})");
                }
            }
            ReferenceChoice choice = parse.GetValue(at) ?? new ReferenceChoice("centroid");
            Vector3 point = a.ResolvePoint(choice, out string description);
            CheckResult result = Check(a, b, point, description, tolerance, selected);
            Render(result, parse.GetValue(format)!, output);
            bool sectionsPass = sectionGate.Run(parse, originalPath, substitutePath, a.Units, selected, parse.GetValue(format)!, output, error, out var profiles);
            if (reportPath is not null)
            {
                ReportFile.WriteCheck(reportPath, result, a, b, sketchA, sketchB, profiles is null ? null : SectionGate.Charts(profiles));
            }
            return result.Equivalent && sectionsPass ? ExitCodes.Success : ExitCodes.Different;
        });
        return command;
    }

    /// <summary>Compares every selected case and combination of two loaded files about one point.</summary>
    public static CheckResult Check(LoadedFile a, LoadedFile b, Vector3 point, string description, ToleranceSpec tolerance, IReadOnlyCollection<string> selected)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        ArgumentNullException.ThrowIfNull(selected);
        bool Wanted(string name) => selected.Count == 0 || selected.Contains(name);
        var comparisons = new List<CaseComparison>();
        var contributors = new Dictionary<string, CaseContributors>(StringComparer.Ordinal);

        foreach (string name in a.Sink.CaseNames.Concat(b.Sink.CaseNames.Where(n => !a.Sink.Cases.ContainsKey(n))).Where(Wanted))
        {
            LoadReduction? ra = a.Sink.Cases.TryGetValue(name, out var accA) ? accA.ResultAt(point) : null;
            LoadReduction? rb = b.Sink.Cases.TryGetValue(name, out var accB) ? accB.ResultAt(point) : null;
            comparisons.Add(ra is not null && rb is not null
                ? EquivalenceChecker.Compare(name, EntryKind.Case, ra, rb, tolerance)
                : EquivalenceChecker.Missing(name, EntryKind.Case, ra, rb));
            contributors[name] = new CaseContributors(Largest(a, name), Largest(b, name));
        }

        foreach (LoadCombination c in a.Sink.Combinations.Where(c => Wanted(c.Name)))
        {
            var notes = new List<string>();
            string[] absent = c.Factors.Select(f => f.Key).Where(k => !b.Sink.Cases.ContainsKey(k)).ToArray();
            if (absent.Length > 0)
            {
                notes.Add($"the substitute lacks case{(absent.Length > 1 ? "s" : "")} {string.Join(", ", absent)}, so this combination is incomplete there");
            }
            LoadCombination? own = b.Sink.Combinations.FirstOrDefault(x => x.Name == c.Name);
            if (own is not null && !own.Equals(c))
            {
                notes.Add($"the substitute defines '{c.Name}' as {Describe.Factors(own)}; the original's factors {Describe.Factors(c)} were applied to both");
            }
            CaseComparison cmp = EquivalenceChecker.Compare(c.Name, EntryKind.Combination, a.Combine(c).ResultAt(point), b.Combine(c).ResultAt(point), tolerance, notes);
            comparisons.Add(absent.Length > 0 ? cmp with { Equivalent = false } : cmp);
        }
        foreach (LoadCombination c in b.Sink.Combinations.Where(c => Wanted(c.Name) && a.Sink.Combinations.All(x => x.Name != c.Name)))
        {
            comparisons.Add(EquivalenceChecker.Missing(c.Name, EntryKind.Combination, null, b.Combine(c).ResultAt(point)));
        }
        return new CheckResult(a.Path, b.Path, a.Units, point, description, tolerance, comparisons, contributors);
    }

    private static void Render(CheckResult result, string format, TextWriter output)
    {
        switch (format)
        {
            case "json":
                JsonToText.Write(output, ms => CheckJsonWriter.Write(result, ms, AppInfo.Version));
                break;
            case "markdown":
                CheckMarkdownRenderer.Write(result, output);
                break;
            case "junit":
                CheckJUnitWriter.Write(result, output);
                break;
            default:
                CheckTextRenderer.Write(result, output);
                break;
        }
    }

    private static List<Contributor> Largest(LoadedFile f, string name) =>
        f.Sink.Contributors(name) is { } t ? [.. t.Forces, .. t.Couples] : [];

    private static Option<double> Tolerance(string name, string description, double fallback) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => fallback,
        HelpName = "NUMBER",
        CustomParser = r => CommonOptions.ParseNonNegative(r, name) ?? fallback,
    };
}
