using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Cli;

/// <summary>A load file read and reduced case by case, with its header; diagnostics go to standard error.</summary>
public sealed class LoadedFile
{
    private LoadedFile(string path, ReductionSink sink, DocumentHeader header, IReadOnlyList<(string FullPath, string Display)> referenced)
    {
        Path = path;
        Sink = sink;
        Header = header;
        ReferencedFiles = referenced;
    }

    /// <summary>The CSV files the load description referenced, in the order they were opened.</summary>
    public IReadOnlyList<(string FullPath, string Display)> ReferencedFiles { get; }

    /// <summary>Where the file's bytes can be read again (for a <c>REV:PATH</c> operand, its copy from that revision).</summary>
    public string ContentPath { get; private init; } = "";

    /// <summary>The file as the user named it.</summary>
    public string Path { get; }

    /// <summary>Per-case accumulators and combinations.</summary>
    public ReductionSink Sink { get; }

    /// <summary>Title, units and named points.</summary>
    public DocumentHeader Header { get; }

    /// <summary>The units values are in.</summary>
    public UnitSystem Units => Header.Units;

    /// <summary>Reads and reduces a file; prints its warnings and, on failure, its error, then throws <see cref="InputFailureException"/>.</summary>
    /// <param name="path">The file as the user named it, or - for standard input.</param>
    /// <param name="targetUnits">Units to convert into; null keeps the file's.</param>
    /// <param name="error">Standard error: diagnostics, and a progress line when it is a terminal.</param>
    /// <param name="topContributors">How many of the largest items per case to keep.</param>
    /// <param name="alsoInto">Another sink fed in the same pass (a report's sketch), or null.</param>
    /// <param name="options">Reader options from the command line (threads, limits); defaults when null.</param>
    public static LoadedFile Read(string path, UnitSystem? targetUnits, TextWriter error, int topContributors = 0, ILoadSink? alsoInto = null, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(error);
        var sink = new ReductionSink(topContributors: topContributors);
        var referenced = new List<(string, string)>();
        ReadResult result;
        string contentPath;
        using (ProgressDisplay? progress = ProgressDisplay.ForStandardError(error, path))
        {
            // A sketch needs the items one by one; the reduction alone takes reduced blocks of large CSV files.
            ILoadSink target = alsoInto is null && progress is null ? sink
                : alsoInto is null ? new BlockFanOutSink(progress, sink) : new FanOutSink(progress, sink, alsoInto);
            ReadOptions chosen = (options ?? new ReadOptions()) with
            {
                TargetUnits = targetUnits,
                BytesRead = progress is null ? null : progress.AddBytes,
                ReferencedFileOpened = (full, display) => referenced.Add((full, display)),
            };
            result = GitSource.ReadOperand(path, target, chosen, out contentPath);
        }
        foreach (Diagnostic d in result.Diagnostics)
        {
            error.WriteLine(d.ToString());
        }
        if (!result.Succeeded || result.Header is null)
        {
            throw new InputFailureException(path);
        }
        return new LoadedFile(path, sink, result.Header, referenced) { ContentPath = contentPath };
    }

    /// <summary>This file as one side of a check.</summary>
    public CheckSide Side => new(Path, Sink, Header);

    /// <summary>True when the file defines a case or a combination of this name.</summary>
    public bool Defines(string name) => Sink.Cases.ContainsKey(name) || Sink.Combinations.Any(c => c.Name == name);

    /// <summary>The names of cases and combinations, for messages.</summary>
    public string NamesList() =>
        "cases: " + string.Join(", ", Sink.CaseNames)
        + (Sink.Combinations.Count > 0 ? "; combinations: " + string.Join(", ", Sink.Combinations.Select(c => c.Name)) : "");

    /// <summary>The accumulator of a combination of this file's cases.</summary>
    public ReductionAccumulator Combine(LoadCombination combination) => combination.Combine(Sink.Cases, out _);

    /// <summary>Resolves the reference point choice against this file; <paramref name="description"/> says how it was chosen.</summary>
    public Vector3 ResolvePoint(ReferenceChoice? choice, out string description)
    {
        switch (choice?.Kind)
        {
            case null:
                description = "origin";
                return Vector3.Zero;
            case "centroid":
                Vector3? c = Sink.AllCases().ResultAt(Vector3.Zero).Centroid;
                description = c is null ? "origin: the file has no forces, so no load centroid" : "load centroid of " + Path;
                return c ?? Vector3.Zero;
            case "point":
                if (Header.Points.TryGetValue(choice.Name!, out Vector3 p))
                {
                    description = "named point " + choice.Name;
                    return p;
                }
                throw new UsageException(Header.Points.Count == 0
                    ? $"--at '{choice.Name}': {Path} defines no named points (give x,y,z or 'centroid')"
                    : $"--at '{choice.Name}': no such named point in {Path}; named points are {string.Join(", ", Header.Points.Keys)}");
            default:
                description = choice.Coordinates == Vector3.Zero ? "origin" : "given point";
                return choice.Coordinates!.Value;
        }
    }
}
