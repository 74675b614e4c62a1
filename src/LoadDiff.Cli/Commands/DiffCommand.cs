using System.CommandLine;
using System.Text;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats;
using LoadDiff.Formats.Source;
using LoadDiff.Reports;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff diff OLD NEW</c>: the semantic diff of two versions of a load description, also as git's external diff and textconv.</summary>
public static class DiffCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var operands = new Argument<string[]>("OLD NEW")
        {
            Description = "The two versions: files, - for standard input, or REV:PATH read through 'git show' (for example HEAD~1:model.loads.json).",
            Arity = new ArgumentArity(1, 7),
        };
        var format = CommonOptions.Format("text", "markdown", "json", "html");
        var cases = CommonOptions.Cases();
        var at = CommonOptions.At("the old version's load centroid");
        var external = new Option<bool>("--git-external")
        {
            Description = "Run as git's external diff program (diff.<driver>.command or GIT_EXTERNAL_DIFF): takes git's seven arguments "
                + "path old-file old-hex old-mode new-file new-hex new-mode, and exits 0 when differences are shown.",
        };
        var textconv = new Option<bool>("--textconv")
        {
            Description = "Run as git's textconv filter (diff.<driver>.textconv): print one file's canonical listing and its case resultants.",
        };
        var command = new Command("diff",
            "Show what changed between two versions of a load description: items added, removed and changed (matched by case "
            + "name and id), each change's own contribution ΔR_i, ΔM_i to its case resultant, every case's and combination's "
            + "resultant before and after, then a line diff of the canonical listings. Key order, item order, whitespace, "
            + "comments and number spelling are not differences. Exit code 0 when there is no difference, 1 when there are "
            + "differences, 2 on input or usage errors (with --git-external, 0 whenever the diff was shown).\n\n"
            + "Examples:\n  loaddiff diff old.loads.json new.loads.json --format markdown\n  loaddiff diff HEAD~1:model.loads.json model.loads.json")
        {
            operands, format, cases, at, external, textconv,
        };
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string[] args = parse.GetValue(operands) ?? [];
            string[] selected = parse.GetValue(cases) ?? [];
            bool colour = ReferenceEquals(output, Console.Out) && !Console.IsOutputRedirected
                && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));
            if (parse.GetValue(textconv))
            {
                return args.Length == 1 ? TextConv(args[0], output, error)
                    : throw new UsageException("--textconv takes one file (git passes it)");
            }
            if (parse.GetValue(external))
            {
                return External(args, output, error, parse.GetValue(format)!, selected, parse.GetValue(at), colour);
            }
            if (args.Length != 2)
            {
                throw new UsageException($"diff takes two operands, OLD and NEW; {args.Length} given");
            }
            if (args[0] == "-" && args[1] == "-")
            {
                throw new UsageException("only one of OLD and NEW can be read from standard input");
            }
            bool oldTable = IsTable(args[0]), newTable = IsTable(args[1]);
            if (oldTable != newTable)
            {
                throw new UsageException($"diff compares two load documents or two CSV tables; '{(oldTable ? args[0] : args[1])}' is a CSV table and "
                    + $"'{(oldTable ? args[1] : args[0])}' is not");
            }
            DocumentDiff diff = oldTable ? CompareTables(args[0], args[0], args[1], args[1], parse.GetValue(at), error)
                : Compare(args[0], Open(args[0], null), args[1], Open(args[1], null), selected, parse.GetValue(at), error, out _);
            Render(diff, parse.GetValue(format)!, output, colour);
            return diff.HasDifferences ? ExitCodes.Different : ExitCodes.Success;
        });
        return command;
    }

    private sealed record Source(string Name, byte[]? Bytes, string BaseDirectory)
    {
        /// <summary>The revision a <c>REV:PATH</c> operand was read from; its referenced files come from it too.</summary>
        public GitSource? Revision { get; init; }

        /// <summary>True when the document is read without the CSV tables it references (git's external diff gives the document only).</summary>
        public bool WithoutTables { get; init; }
    }

    private static bool IsTable(string operand) => operand.EndsWith(".csv", StringComparison.OrdinalIgnoreCase);

    // Two CSV tables given directly (files, REV:PATH, or git's copies): their rows, matched by id or position
    private static DocumentDiff CompareTables(string oldName, string oldOperand, string newName, string newOperand, ReferenceChoice? at, TextWriter error)
    {
        LoadedFile a = LoadedFile.Read(oldOperand, null, error);
        LoadedFile b = LoadedFile.Read(newOperand, a.Units, error);
        Vector3 point = a.ResolvePoint(at ?? new ReferenceChoice("centroid"), out string description);
        if (description.StartsWith("load centroid of ", StringComparison.Ordinal))
        {
            description = "load centroid of " + oldName;
        }
        return TableDiffer.Compare(oldName, a.ContentPath, a.Sink.Cases.Values.Single(), newName, b.ContentPath, b.Sink.Cases.Values.Single(),
            a.Units, point, description);
    }

    private static Source Open(string operand, string? baseDirectory)
    {
        if (operand == "-")
        {
            return new Source("-", InputFiles.ReadStandardInput(new ReadOptions().MaxJsonBytes), Directory.GetCurrentDirectory());
        }
        if (GitSource.IsRevisionPath(operand))
        {
            // the document and every file it references are read from that revision, never from the working tree
            GitSource g = GitSource.Open(operand);
            return new Source(operand, g.Bytes(), baseDirectory ?? g.BaseDirectory) { Revision = g };
        }
        return new Source(operand, null, baseDirectory ?? Path.GetDirectoryName(Path.GetFullPath(operand))!);
    }

    private static DocumentDiff Compare(string oldName, Source a, string newName, Source b, string[] selected, ReferenceChoice? at, TextWriter error, out string? failure)
    {
        failure = null;
        SourceReadResult old = Read(a, null, error);
        UnitSystem units = old.Document!.Units;
        SourceReadResult @new = Read(b, units, error);
        foreach (string name in selected)
        {
            bool Defines(LoadDocument d) => d.Cases.Any(c => c.Name == name) || d.Combinations.Any(c => c.Name == name);
            if (!Defines(old.Document) && !Defines(@new.Document!))
            {
                throw new UsageException($"--case '{name}': neither version has such a case or combination");
            }
        }
        Vector3 point = ResolvePoint(old, at, oldName, out string description);
        return DocumentDiffer.Compare(oldName, old, newName, @new, point, description, selected, referencedDataRead: !a.WithoutTables);
    }

    private static SourceReadResult Read(Source s, UnitSystem? target, TextWriter error)
    {
        var plain = new ReadOptions { TargetUnits = target };
        ReadOptions options = s.Revision?.Options(plain) ?? plain;
        SourceReadResult r = s.WithoutTables ? LoadDocumentReader.ReadDocumentOnly(s.Bytes!, s.Name, options)
            : s.Bytes is null ? LoadDocumentReader.Read(s.Name, options) : LoadDocumentReader.ReadBytes(s.Bytes, s.Name, s.BaseDirectory, options);
        FmtCommand.Report(r, error);
        return r;
    }

    private static Vector3 ResolvePoint(SourceReadResult old, ReferenceChoice? choice, string oldName, out string description)
    {
        choice ??= new ReferenceChoice("centroid");
        switch (choice.Kind)
        {
            case "centroid":
                Vector3? c = old.Resultants!.Cases.AllCases().ResultAt(Vector3.Zero).Centroid;
                description = c is null ? "origin: the old version has no forces, so no load centroid" : "load centroid of " + oldName;
                return c ?? Vector3.Zero;
            case "point":
                if (old.Document!.Point(choice.Name!) is { } p)
                {
                    description = "named point " + choice.Name + " of " + oldName;
                    return p;
                }
                throw new UsageException($"--at '{choice.Name}': {oldName} has no such named point"
                    + (old.Document.Points.Length > 0 ? "; named points are " + string.Join(", ", old.Document.Points.Select(x => x.Key)) : ""));
            default:
                description = choice.Coordinates == Vector3.Zero ? "origin" : "given point";
                return choice.Coordinates!.Value;
        }
    }

    private static void Render(DocumentDiff diff, string format, TextWriter output, bool colour)
    {
        switch (format)
        {
            case "json":
                JsonToText.Write(output, ms => DiffJsonWriter.Write(diff, ms, AppInfo.Version));
                output.WriteLine();
                break;
            case "markdown":
                DiffMarkdownRenderer.Write(diff, output);
                break;
            case "html":
                DiffHtmlRenderer.Write(diff, output, AppInfo.Version);
                break;
            default:
                DiffTextRenderer.Write(diff, output, colour);
                break;
        }
    }

    // git: path old-file old-hex old-mode new-file new-hex new-mode (one argument, the path, for an unmerged file)
    private static int External(string[] args, TextWriter output, TextWriter error, string format, string[] selected, ReferenceChoice? at, bool colour)
    {
        if (args.Length == 1)
        {
            output.WriteLine($"loaddiff: {args[0]} is unmerged; resolve the conflict first");
            return ExitCodes.Success;
        }
        if (args.Length != 7)
        {
            throw new UsageException($"--git-external expects git's 7 arguments (path old-file old-hex old-mode new-file new-hex new-mode); {args.Length} given");
        }
        string path = args[0], oldFile = args[1], newFile = args[4];
        // git hands over the two versions of this one file only: a document's referenced CSV tables are not read (neither
        // version's can be known; the working tree's would be wrong for the old side), each table shows in its own diff
        string oldName = "a/" + path, newName = "b/" + path;
        output.WriteLine($"loaddiff diff {oldName} {newName}");
        if (oldFile == "/dev/null" || newFile == "/dev/null")
        {
            bool added = oldFile == "/dev/null";
            output.WriteLine(added ? $"new load file {path}" : $"deleted load file {path}");
            InputFiles.RequireRegular(added ? newFile : oldFile, added ? newFile : oldFile);
            string text = File.ReadAllText(added ? newFile : oldFile);
            foreach (ListingLine l in ListingDiff.Lines(added ? "" : text, added ? text : ""))
            {
                output.WriteLine(l.Tag == '@' ? l.Text : l.Tag + l.Text);
            }
            return ExitCodes.Success;
        }
        InputFiles.RequireRegular(oldFile, oldName);
        InputFiles.RequireRegular(newFile, newName);
        var a = new Source(oldName, File.ReadAllBytes(oldFile), "") { WithoutTables = true };
        var b = new Source(newName, File.ReadAllBytes(newFile), "") { WithoutTables = true };
        var captured = new StringWriter();
        try
        {
            DocumentDiff diff = IsTable(path) ? CompareTables(oldName, oldFile, newName, newFile, at, captured)
                : Compare(oldName, a, newName, b, selected, at, captured, out _);
            error.Write(captured.ToString());
            Render(diff, format, output, colour);
        }
        catch (Exception e) when (e is InputFailureException or UsageException or LoadDiff.Formats.Diagnostics.UnreadableInputException)
        {
            // show the trouble where the reader looks, then the plain line diff, and let git go on to the next file
            string why = e switch
            {
                UsageException => "loaddiff: " + e.Message,
                LoadDiff.Formats.Diagnostics.UnreadableInputException u => u.Diagnostic.ToString(),
                _ => captured.ToString().TrimEnd(),
            };
            error.WriteLine(why);
            output.WriteLine(why);
            output.WriteLine("(plain line diff follows)");
            foreach (ListingLine l in ListingDiff.Lines(Encoding.UTF8.GetString(a.Bytes!), Encoding.UTF8.GetString(b.Bytes!)))
            {
                output.WriteLine(l.Tag == '@' ? l.Text : l.Tag + l.Text);
            }
        }
        return ExitCodes.Success;
    }

    /// <summary>Significant digits of the resultant lines <c>--textconv</c> prints (rounding noise stays below them, a change of 1e-9 relative shows).</summary>
    public const int TextConvDigits = 12;

    // Diagnostics and file names in textconv output: git hands over a temporary copy under a random name, and the
    // output must depend on the content alone (no directory part, so referenced files show as the document writes them).
    private const string TextConvName = "this-document";

    private const string TextConvTableName = "this-table";

    // git: textconv gets one file (often a temporary copy of a blob, elsewhere than the repository) and diffs whatever
    // this prints, so the output depends only on the content: no path, and numbers that rounding cannot change.
    private static int TextConv(string file, TextWriter output, TextWriter error)
    {
        InputFiles.RequireRegular(file, file);
        byte[] bytes = File.Exists(file) ? File.ReadAllBytes(file) : throw new UsageException($"'{file}': file not found");
        if (IsTable(file))
        {
            return TextConvTable(file, bytes, output);
        }
        var absent = new HashSet<string>(StringComparer.Ordinal);
        var options = new ReadOptions { MissingReferencedFile = rel => absent.Add(rel) };
        // git runs textconv on the working-tree file itself and on temporary copies of blobs (beside which a file of the
        // same name may lie): referenced tables are never read, so the same document always prints the same
        SourceReadResult r = LoadDocumentReader.ReadDocumentOnly(bytes, TextConvName, options);
        if (!r.Succeeded)
        {
            // not readable as a load description: show it as it is, with the reason
            output.Write(Encoding.UTF8.GetString(bytes));
            output.WriteLine($"// loaddiff: {r.Error}");
            return ExitCodes.Success;
        }
        LoadDocument doc = r.Document!;
        output.Write(CanonicalWriter.Write(doc));
        string f = doc.Units.Force.Symbol, m = doc.Units.MomentSymbol;
        output.WriteLine($"// resultants about the origin ({f}, {m}; {TextConvDigits} significant digits, rounding noise printed as 0; loaddiff)");

        // which cases hold data of a referenced table, in document order
        var needs = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        var missing = new List<string>();
        foreach (SourceCase c in doc.Cases)
        {
            foreach (SourceItem item in c.Items)
            {
                foreach (SourceField field in item.Fields)
                {
                    if (item.Kind is "mesh" or "forces" && field.Value is TextValue { Text: var rel } && field.Name is "file" or "vertices" or "triangles" && absent.Contains(rel))
                    {
                        if (!missing.Contains(rel))
                        {
                            missing.Add(rel);
                        }
                        List<string> list = needs.TryGetValue(c.Name, out var l) ? l : needs[c.Name] = [];
                        if (!list.Contains(rel))
                        {
                            list.Add(rel);
                        }
                    }
                }
            }
        }
        foreach (string rel in missing)
        {
            output.WriteLine($"// referenced file {SourceText.Quoted(rel)} is not read by textconv (git gives it this document only; "
                + "the table shows in its own diff with '*.csv diff=loaddiff'): the resultants that need it are not shown");
        }
        string Needs(IEnumerable<string> files) => "not shown: needs " + string.Join(", ", files.Distinct().Select(SourceText.Quoted));
        foreach (string name in r.Resultants!.Cases.CaseNames)
        {
            string line = needs.TryGetValue(name, out var files) ? Needs(files)
                : Resultant(r.Resultants.Cases.Cases[name].ResultAt(Vector3.Zero));
            output.WriteLine($"// case {name}: {line}");
        }
        foreach (var c in r.Resultants.Cases.Combinations)
        {
            List<string> files = [.. c.Factors.Where(x => needs.ContainsKey(x.Key)).SelectMany(x => needs[x.Key])];
            string line = files.Count > 0 ? Needs(files) : Resultant(c.Combine(r.Resultants.Cases.Cases, out _).ResultAt(Vector3.Zero));
            output.WriteLine($"// combination {c.Name}: {line}");
        }
        return ExitCodes.Success;
    }

    // A CSV table as it is (its lines diff well), then its row count and resultant about the origin at fixed digits
    private static int TextConvTable(string file, byte[] bytes, TextWriter output)
    {
        string text = Encoding.UTF8.GetString(bytes);
        output.Write(text);
        if (text.Length > 0 && !text.EndsWith('\n'))
        {
            output.WriteLine();
        }
        var captured = new StringWriter();
        try
        {
            LoadedFile table = LoadedFile.Read(file, null, captured);
            ReductionAccumulator rows = table.Sink.Cases.Values.Single();
            output.WriteLine($"// loaddiff: {rows.Count} load rows; resultant about the origin ({table.Units.Force.Symbol}, {table.Units.MomentSymbol} as written; "
                + $"{TextConvDigits} significant digits, rounding noise printed as 0): {Resultant(rows.ResultAt(Vector3.Zero))}");
        }
        catch (InputFailureException)
        {
            string why = captured.ToString().Trim();
            // the diagnostic's line and column, under a fixed name instead of the temporary file's, which differs from run to run
            output.WriteLine("// loaddiff: not readable as a load table: " + (why.StartsWith(file, StringComparison.Ordinal) ? TextConvTableName + why[file.Length..] : why));
        }
        return ExitCodes.Success;
    }

    // R and M at TextConvDigits significant digits; a component within the reduction's own rounding noise prints as 0
    private static string Resultant(LoadReduction red)
    {
        var noise = RoundingNoise.Of(red);
        string Vec(Vector3 v, double floor) => "[" + string.Join(", ", new[] { v.X, v.Y, v.Z }.Select(x =>
            Math.Abs(x) <= floor ? "0" : SourceText.Number(SourceText.RoundToSignificant(x, TextConvDigits)))) + "]";
        return $"R = {Vec(red.Force, noise.Force)} M = {Vec(red.Moment, noise.Moment)}";
    }
}
