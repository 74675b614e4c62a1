using System.CommandLine;
using LoadDiff.Core;
using LoadDiff.Core.Distribution;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Json;
using LoadDiff.Reports;

namespace LoadDiff.Cli.Commands;

/// <summary>
/// <c>loaddiff distribute FILE --onto POINTS.csv</c>: a substitute of forces at the given points (and optionally couples),
/// statically equivalent to each case and of minimum (weighted) norm. The substitute is written only after it has passed
/// the check's own rule (<see cref="EquivalenceCheck.Run"/>) against FILE, read back from the bytes about to be written.
/// </summary>
public static class DistributeCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var file = new Argument<string>("FILE") { Description = "The load description to distribute (.loads.json or CSV)." };
        var onto = new Option<string>("--onto")
        {
            Description = "CSV of the points to distribute onto: columns " + SupportPointReader.Layout
                + " (coordinates in FILE's length units; weight is a relative stiffness, default 1). REV:PATH reads it from a git revision.",
            HelpName = "POINTS.csv",
            Required = true,
        };
        var cases = CommonOptions.Cases();
        var couples = new Option<bool>("--couples")
        {
            Description = "Also place a couple at each point (needed when the points lie on one line and the load twists about it).",
        };
        var forceTol = CheckCommand.Tolerance("--force-tol", "Absolute force tolerance F the substitute is verified with, as for 'loaddiff check' (default 0).", 0);
        var momentTol = CheckCommand.Tolerance("--moment-tol", "Absolute moment tolerance M the substitute is verified with, as for 'loaddiff check' (default 0).", 0);
        var output = new Option<string?>("--output", "-o")
        {
            Description = "Write the substitute to this .loads.json file (atomically; never over an input). Default: standard output.",
            HelpName = "OUT.loads.json",
        };
        var command = new Command("distribute",
            "Distribute every load case of FILE onto the points of POINTS.csv: forces at the points (and couples with --couples) "
            + "that are statically equivalent to the case and minimise Σ|F_i|²/w_i, which for equal bolts in a "
            + "plane is the elastic method. Before anything is written the result is checked against FILE with the rule of "
            + "'loaddiff check' (default tolerances, or --force-tol/--moment-tol); exit code 1, and nothing written, when it would fail. "
            + "Refuses, with exit code 2, when the points cannot carry a case (for example a twist about the line of collinear points) "
            + "or are too close together for it (condition number above " + ConditionLimitText + ").\n\n"
            + "Example:\n  loaddiff distribute fixtures/equipment-skid/vendor-anchor-loads.loads.json --onto fixtures/equipment-skid/support-points.csv -o skid-supports.loads.json")
        {
            file, onto, cases, couples, forceTol, momentTol, output,
        };
        command.SetAction(parse =>
        {
            TextWriter stdout = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string path = parse.GetValue(file)!, pointsPath = parse.GetValue(onto)!;
            string? outPath = parse.GetValue(output);
            if (outPath is not null && !outPath.EndsWith(".loads.json", StringComparison.OrdinalIgnoreCase))
            {
                throw new UsageException($"-o '{outPath}': the substitute is a load description; give a name ending in .loads.json");
            }
            // REV:PATH reads the points from that revision; a plain path (even beside a REV:PATH FILE) from the working tree
            (IReadOnlyList<SupportPoint>? points, Diagnostic? bad) = GitSource.IsRevisionPath(pointsPath)
                ? SupportPointReader.Read(GitSource.Open(pointsPath).LocalPath, pointsPath)
                : SupportPointReader.Read(pointsPath);
            if (points is null)
            {
                error.WriteLine(bad!.ToString());
                throw new InputFailureException(pointsPath);
            }
            LoadedFile loaded = LoadedFile.Read(path, null, error);
            string[] selected = parse.GetValue(cases) ?? [];
            var distributor = new LoadDistributor(points, parse.GetValue(couples));
            (List<WrittenCase> written, List<LoadCombination> combinations) = Distribute(loaded, distributor, pointsPath, selected, error);
            var tolerance = ToleranceSpec.Create(ToleranceSpec.DefaultRelative, parse.GetValue(forceTol), parse.GetValue(momentTol));

            string note = $"Written by loaddiff {AppInfo.Version} distribute: minimum-norm {(parse.GetValue(couples) ? "forces and couples" : "forces")} at the "
                + $"{points.Count} points of {Path.GetFileName(pointsPath)}, statically equivalent to each case of {Path.GetFileName(path)} "
                + "(checked with the rule of 'loaddiff check' before it was written). "
                + "Static equivalence is not equivalence of internal forces or stresses: see 'loaddiff sections'.";
            string title = $"{loaded.Header.Title ?? Path.GetFileName(path)}, distributed onto {Path.GetFileName(pointsPath)}";
            using var ms = new MemoryStream();
            LoadFileWriter.Write(ms, note, title, loaded.Units, written, combinations);
            byte[] bytes = ms.ToArray();
            if (Verify(loaded, bytes, outPath ?? "the substitute", written, combinations, tolerance) is { } failure)
            {
                error.WriteLine(failure.ToString());
                return ExitCodes.Different;
            }
            if (outPath is null)
            {
                stdout.Write(System.Text.Encoding.UTF8.GetString(bytes));
            }
            else
            {
                // never over FILE, POINTS.csv or a CSV table FILE references
                AtomicFile.Write(outPath, [path, pointsPath, .. loaded.ReferencedFiles.Select(r => r.FullPath)], s => s.Write(bytes));
                Summary(stdout, loaded, distributor, written, outPath);
            }
            return ExitCodes.Success;
        });
        return command;
    }

    private static (List<WrittenCase>, List<LoadCombination>) Distribute(
        LoadedFile loaded, LoadDistributor distributor, string pointsPath, string[] selected, TextWriter error)
    {
        var wanted = new HashSet<string>(StringComparer.Ordinal);
        foreach (string name in selected)
        {
            if (loaded.Sink.Cases.ContainsKey(name))
            {
                wanted.Add(name);
            }
            else if (loaded.Sink.Combinations.FirstOrDefault(c => c.Name == name) is { } combination)
            {
                wanted.UnionWith(combination.Factors.Select(f => f.Key).Where(loaded.Sink.Cases.ContainsKey));
            }
            else
            {
                throw new UsageException($"--case '{name}': {loaded.Path} has no such case or combination ({loaded.NamesList()})");
            }
        }
        string u = loaded.Units.Force.Symbol, m = loaded.Units.MomentSymbol, l = loaded.Units.Length.Symbol;
        IReadOnlyList<string> coupleIds = CoupleIds.For(distributor.Points);
        var written = new List<WrittenCase>();
        foreach (string name in loaded.Sink.CaseNames.Where(n => wanted.Count == 0 || wanted.Contains(n)))
        {
            LoadReduction r = loaded.Sink.Cases[name].ResultAt(distributor.Centroid);
            Distribution d = distributor.Distribute(r.System, r.GrossForce, r.MomentScale(distributor.Centroid));
            if (!d.Feasible)
            {
                string geometry = distributor.Rank switch
                {
                    3 => " (the points coincide, so they cannot resist a moment)",
                    5 => " (the points lie on one line, so they cannot resist a twist about it)",
                    _ => "",
                };
                throw new UsageException(
                    $"case '{name}': the points of {pointsPath} cannot carry this load: the equilibrium equations have rank {distributor.Rank} of 6{geometry}; "
                    + $"the part that cannot be carried is a force {NumberText.Readable(d.UncarriedForce, LoadDistributor.FeasibilityTolerance * r.GrossForce)} {u} "
                    + $"and a moment {NumberText.Readable(d.UncarriedMoment, LoadDistributor.FeasibilityTolerance * r.MomentScale(distributor.Centroid))} {m} "
                    + $"about their centroid {NumberText.Readable(distributor.Centroid)} {l}. Add a point off that line or plane, or give --couples.");
            }
            double condition = distributor.ConditionNumber(r.Bounds);
            if (!(condition <= LoadDistributor.ConditionLimit))
            {
                error.WriteLine(new Diagnostic(Codes.IllConditionedPoints, Severity.Error,
                    $"case '{name}': the points are too close together for this load: the equilibrium equations have condition number "
                    + $"{condition.ToString("0.#e+0", System.Globalization.CultureInfo.InvariantCulture)} (the limit is {ConditionLimitText}; their spread about the centroid is "
                    + $"{NumberText.Readable(distributor.LengthScale)} {l}, the load reaches {NumberText.Readable(Reach(r.Bounds, distributor.Centroid))} {l} from it), "
                    + "so the forces would be about that many times the load and lose as many digits; spread the points or merge them into one",
                    new SourceLocation(pointsPath)).ToString());
                throw new InputFailureException(pointsPath);
            }
            var items = new List<LoadItem>();
            for (int i = 0; i < distributor.Points.Count; i++)
            {
                SupportPoint p = distributor.Points[i];
                items.Add(new PointForce(p.Id, p.At, d.Forces[i]));
            }
            for (int i = 0; i < distributor.Points.Count; i++)
            {
                if (!d.Couples[i].IsZero)
                {
                    items.Add(new FreeCouple(coupleIds[i], d.Couples[i]));
                }
            }
            written.Add(new WrittenCase(name, loaded.Sink.CaseTitle(name), items));
        }
        var names = written.Select(w => w.Name).ToHashSet(StringComparer.Ordinal);
        var combinations = loaded.Sink.Combinations.Where(c => c.Factors.All(f => names.Contains(f.Key))).ToList();
        return (written, combinations);
    }

    private static string ConditionLimitText => LoadDistributor.ConditionLimit.ToString("0e+0", System.Globalization.CultureInfo.InvariantCulture);

    private static double Reach(Box? loaded, Vector3 centroid) => loaded?.Corners.Max(c => (c - centroid).Length) ?? 0;

    // The check itself, not a copy of its rule: the bytes about to be written are read back by the load-file reader and
    // compared with FILE by EquivalenceCheck.Run, the code path of 'loaddiff check FILE OUT'. Null when they pass.
    private static Diagnostic? Verify(LoadedFile loaded, byte[] bytes, string outName, List<WrittenCase> written, List<LoadCombination> combinations,
        ToleranceSpec tolerance)
    {
        var sink = new ReductionSink();
        ReadResult back = LoadFileReader.ReadJson(bytes, outName, Directory.GetCurrentDirectory(), sink, new ReadOptions { TargetUnits = loaded.Units });
        var where = new SourceLocation(loaded.Path);
        if (!back.Succeeded || back.Header is null)
        {
            Diagnostic first = back.Diagnostics.First(d => d.Severity == Severity.Error);
            return new Diagnostic(Codes.DistributionFailsCheck, Severity.Error,
                $"the substitute would not be read back ({first.Code}: {first.Message}), so nothing was written", where);
        }
        string[] selected = [.. written.Select(w => w.Name), .. combinations.Select(c => c.Name)];
        Vector3 point = loaded.ResolvePoint(new ReferenceChoice("centroid"), out string description);
        CheckResult result = EquivalenceCheck.Run(loaded.Side, new CheckSide(outName, sink, back.Header), loaded.Units, point, description, tolerance, selected);
        if (result.Equivalent)
        {
            return null;
        }
        CaseComparison failed = result.Comparisons.First(c => !c.Equivalent);
        string f = loaded.Units.Force.Symbol, m = loaded.Units.MomentSymbol;
        string residual = failed.Residual is { } res && failed.Tolerance is { } tol
            ? $": |ΔR| = {NumberText.Readable(res.ForceNorm)} {f} (allowed {NumberText.Readable(tol.Force)}), "
                + $"worst |ΔM| = {NumberText.Readable(res.WorstMomentNorm)} {m} (allowed {NumberText.Readable(tol.Moment)})"
            : "";
        string hint = failed.Original is { GrossForce: 0 } ? "; it has no forces, so |ΔR| is allowed only rounding: give a small --force-tol (and the same to check)" : "";
        return new Diagnostic(Codes.DistributionFailsCheck, Severity.Error,
            $"{(failed.Kind == EntryKind.Case ? "case" : "combination")} '{failed.Name}': the forces found at the points would fail 'loaddiff check' "
            + $"against {loaded.Path}{residual}; rounding swamps them at these points{hint}. Nothing was written",
            where);
    }

    private static void Summary(TextWriter w, LoadedFile loaded, LoadDistributor d, List<WrittenCase> cases, string outPath)
    {
        string f = loaded.Units.Force.Symbol, l = loaded.Units.Length.Symbol;
        w.WriteLine($"Distributed {cases.Count} case{(cases.Count == 1 ? "" : "s")} of {loaded.Path} onto {d.Points.Count} points (centroid "
            + $"{NumberText.Readable(d.Centroid)} {l}; equilibrium equations of rank {d.Rank} of 6); wrote {outPath}");
        int width = Math.Max(5, d.Points.Max(p => p.Id.Length));
        foreach (WrittenCase c in cases)
        {
            w.WriteLine();
            w.WriteLine($"Case \"{c.Name}\"");
            w.WriteLine($"  {"point".PadRight(width)}  {"weight",-8}  {"force (" + f + ")",-36}  |F|");
            foreach (PointForce p in c.Items.OfType<PointForce>())
            {
                double weight = d.Points.First(x => x.Id == p.Id).Weight;
                w.WriteLine($"  {p.Id.PadRight(width)}  {NumberText.Readable(weight),-8}  {NumberText.Readable(p.Value),-36}  {NumberText.Readable(p.Value.Length)}");
            }
            foreach (FreeCouple m in c.Items.OfType<FreeCouple>())
            {
                w.WriteLine($"  {m.Id.PadRight(width)}  couple {NumberText.Readable(m.Value)} {loaded.Units.MomentSymbol}");
            }
        }
        w.WriteLine();
        w.WriteLine("Statically equivalent: checked against the original with the rule of 'loaddiff check' before writing. " + Caution.Text);
    }
}
