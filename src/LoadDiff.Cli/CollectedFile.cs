using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;
using LoadDiff.Formats;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Cli;

/// <summary>
/// A load file read with every item kept in memory (section cuts need the items, not a running reduction);
/// diagnostics go to standard error. Memory grows with the number of items, unlike <see cref="LoadedFile"/>.
/// </summary>
public sealed class CollectedFile
{
    private CollectedFile(string path, CollectingSink sink, DocumentHeader header)
    {
        Path = path;
        Sink = sink;
        Header = header;
    }

    /// <summary>The file as the user named it.</summary>
    public string Path { get; }

    /// <summary>Items by case, and combinations.</summary>
    public CollectingSink Sink { get; }

    /// <summary>Title, units and named points.</summary>
    public DocumentHeader Header { get; }

    /// <summary>The units values are in.</summary>
    public UnitSystem Units => Header.Units;

    /// <summary>Reads a file; prints its warnings and, on failure, its error, then throws <see cref="InputFailureException"/>.</summary>
    public static CollectedFile Read(string path, UnitSystem? targetUnits, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var sink = new CollectingSink();
        ReadResult result = GitSource.ReadOperand(path, sink, new ReadOptions { TargetUnits = targetUnits }, out _);
        foreach (Diagnostic d in result.Diagnostics)
        {
            error.WriteLine(d.ToString());
        }
        if (!result.Succeeded || result.Header is null)
        {
            throw new InputFailureException(path);
        }
        return new CollectedFile(path, sink, result.Header);
    }

    /// <summary>True when the file defines a case or a combination of this name.</summary>
    public bool Defines(string name) => Sink.HasCase(name) || Sink.Combinations.Any(c => c.Name == name);

    /// <summary>The names of cases and combinations, for messages.</summary>
    public string NamesList() =>
        "cases: " + string.Join(", ", Sink.CaseNames)
        + (Sink.Combinations.Count > 0 ? "; combinations: " + string.Join(", ", Sink.Combinations.Select(c => c.Name)) : "");

    /// <summary>The items of a case as one group with factor 1 (none when the file lacks the case).</summary>
    public IReadOnlyList<WeightedItems> Case(string name) => Sink.HasCase(name) ? [new WeightedItems(Sink.Items(name), 1)] : [];

    /// <summary>The factored items of a combination's cases that this file has.</summary>
    public IReadOnlyList<WeightedItems> Combination(LoadCombination combination)
    {
        ArgumentNullException.ThrowIfNull(combination);
        return [.. combination.Factors.Where(f => Sink.HasCase(f.Key)).Select(f => new WeightedItems(Sink.Items(f.Key), f.Value))];
    }
}
