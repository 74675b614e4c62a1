using System.CommandLine;
using System.CommandLine.Parsing;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;
using LoadDiff.Reports;
using LoadDiff.Reports.Html;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff check ORIGINAL SUBSTITUTE</c>: the equivalence verdict per case and combination.</summary>
public static class CheckCommand
{
    /// <summary>How many of the largest items per case and file are kept to search for one that accounts for a residual.</summary>
    public const int CandidateCount = 4096;

    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var original = new Argument<string>("ORIGINAL") { Description = "The detailed load description (.loads.json or CSV), or - for standard input." };
        var substitute = new Argument<string>("SUBSTITUTE") { Description = "The simplified substitute to prove equivalent to it." };
        var at = CommonOptions.At("the original's load centroid");
        var rel = Tolerance("--rel-tol", "Relative tolerance, a fraction of the original's gross force G_F and gross moment G_M (default 1e-3: common practice, no published source).", ToleranceSpec.DefaultRelative);
        var forceTol = Tolerance("--force-tol", "Absolute force tolerance F, in output force units (default 0).", 0);
        var momentTol = Tolerance("--moment-tol", "Absolute moment tolerance M, in output force × length units (default 0).", 0);
        var length = new Option<double?>("--length")
        {
            Description = "The length D in G_M = Σ|C| + G_F·D, in output length units (default: the diagonal of the box of the original's loaded geometry).",
            HelpName = "L",
            CustomParser = r => CommonOptions.ParseNonNegative(r, "--length"),
        };
        var cases = CommonOptions.Cases();
        var format = CommonOptions.Format("text", "json", "markdown", "junit");
        var units = CommonOptions.Units();
        var input = new InputOptions();
        var report = new Option<string?>("--report") { Description = ReportFile.Description, HelpName = "FILE.md|FILE.html" };
        var sectionGate = new SectionGate();
        var command = new Command("check",
            "Check that SUBSTITUTE is statically equivalent to ORIGINAL for every load case and combination: "
            + "pass iff |ΔR| ≤ max(F, rel·G_F) and |ΔM| ≤ max(M, rel·G_M) at every corner of the bounding box of both "
            + "systems' loaded geometry, G_M = Σ|C| + G_F·D with D the diagonal of the original's loaded box. Reports the residual "
            + "(substitute − original) and explains it: a misplaced resultant, a missing force along a line, or an item left out. "
            + "Exit code 0 when equivalent, 1 when not, 2 on input or usage errors.\n\n"
            + "Example:\n  loaddiff check fixtures/footbridge/detailed.loads.json fixtures/footbridge/simplified.loads.json --rel-tol 1e-4")
        {
            original, substitute, at, rel, forceTol, momentTol, length, cases, format, units, report,
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
            LoadedFile a = LoadedFile.Read(originalPath, requested, error, CandidateCount, sketchA, input.From(parse));
            LoadedFile b = LoadedFile.Read(substitutePath, a.Units, error, CandidateCount, sketchB, input.From(parse));
            var tolerance = ToleranceSpec.Create(parse.GetValue(rel), parse.GetValue(forceTol), parse.GetValue(momentTol), parse.GetValue(length));
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
            CheckResult result = EquivalenceCheck.Run(a.Side, b.Side, a.Units, point, description, tolerance, selected);
            SectionGateVerdict? gate = sectionGate.Evaluate(parse, originalPath, substitutePath, a.Units, selected, error, out var profiles);
            result = result with { SectionGate = gate };
            Render(result, parse.GetValue(format)!, output);
            if (reportPath is not null)
            {
                ReportFile.WriteCheck(reportPath, result, a, b, sketchA, sketchB, profiles is null ? null : SectionGate.Charts(profiles));
            }
            return result.Equivalent ? ExitCodes.Success : ExitCodes.Different;
        });
        return command;
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

    /// <summary>A non-negative tolerance option with a default (shared with 'distribute', which verifies with the same rule).</summary>
    internal static Option<double> Tolerance(string name, string description, double fallback) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => fallback,
        HelpName = "NUMBER",
        CustomParser = r => CommonOptions.ParseNonNegative(r, name) ?? fallback,
    };
}
