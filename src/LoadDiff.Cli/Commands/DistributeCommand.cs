using System.CommandLine;
using LoadDiff.Core;
using LoadDiff.Core.Distribution;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Json;
using LoadDiff.Reports;

namespace LoadDiff.Cli.Commands;

/// <summary>
/// <c>loaddiff distribute FILE --onto POINTS.csv</c>: a substitute of forces at the given points (and optionally couples),
/// statically equivalent to each case by construction and of minimum (weighted) norm.
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
        var output = new Option<string?>("--output", "-o")
        {
            Description = "Write the substitute to this .loads.json file (atomically; never over an input). Default: standard output.",
            HelpName = "OUT.loads.json",
        };
        var command = new Command("distribute",
            "Distribute every load case of FILE onto the points of POINTS.csv: forces at the points (and couples with --couples) "
            + "that are statically equivalent to the case by construction and minimise Σ|F_i|²/w_i, which for equal bolts in a "
            + "plane is the elastic method. The result is a load file that 'loaddiff check FILE OUT' accepts and passes. "
            + "Refuses, with exit code 2, when the points cannot carry a case (for example a twist about the line of collinear points).\n\n"
            + "Example:\n  loaddiff distribute fixtures/equipment-skid/vendor-anchor-loads.loads.json --onto fixtures/equipment-skid/support-points.csv -o skid-supports.loads.json")
        {
            file, onto, cases, couples, output,
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

            string note = $"Written by loaddiff {AppInfo.Version} distribute: minimum-norm {(parse.GetValue(couples) ? "forces and couples" : "forces")} at the "
                + $"{points.Count} points of {Path.GetFileName(pointsPath)}, statically equivalent by construction to each case of {Path.GetFileName(path)}. "
                + "Static equivalence is not equivalence of internal forces or stresses: see 'loaddiff sections'.";
            string title = $"{loaded.Header.Title ?? Path.GetFileName(path)}, distributed onto {Path.GetFileName(pointsPath)}";
            void WriteTo(Stream s) => LoadFileWriter.Write(s, note, title, loaded.Units, written, combinations);
            if (outPath is null)
            {
                using var ms = new MemoryStream();
                WriteTo(ms);
                stdout.Write(System.Text.Encoding.UTF8.GetString(ms.ToArray()));
            }
            else
            {
                // never over FILE, POINTS.csv or a CSV table FILE references
                AtomicFile.Write(outPath, [path, pointsPath, .. loaded.ReferencedFiles.Select(r => r.FullPath)], WriteTo);
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
            if (r.GrossCouple > 0 && r.GrossForce * distributor.LengthScale <= 1e-10 * r.GrossCouple)
            {
                error.WriteLine($"loaddiff: note: case '{name}' has (next to) no forces, only couples, so 'check' allows |ΔR| ≈ 0 and the rounding of the "
                    + "cancelling forces written here can fail it; give check a small --force-tol (for example 1e-9) for this case");
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
                    items.Add(new FreeCouple(distributor.Points[i].Id + "-couple", d.Couples[i]));
                }
            }
            written.Add(new WrittenCase(name, loaded.Sink.CaseTitle(name), items));
        }
        var names = written.Select(w => w.Name).ToHashSet(StringComparer.Ordinal);
        var combinations = loaded.Sink.Combinations.Where(c => c.Factors.All(f => names.Contains(f.Key))).ToList();
        return (written, combinations);
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
        w.WriteLine("Statically equivalent by construction; verify with 'loaddiff check'. " + Caution.Text);
    }
}
