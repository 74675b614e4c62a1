using System.Text;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Json;

/// <summary>One case of a written load description: its name, title and items (forces and couples).</summary>
/// <param name="Name">Case name.</param>
/// <param name="Title">Free-text title, or null.</param>
/// <param name="Items">Point forces and free couples, written in order.</param>
public sealed record WrittenCase(string Name, string? Title, IReadOnlyList<LoadItem> Items);

/// <summary>
/// Writes a <c>.loads.json</c> document (SPEC §3) of point forces and free couples in the canonical form of
/// <c>loaddiff fmt</c> (<see cref="CanonicalWriter"/>), so <c>fmt --check</c> accepts it and reading it back gives
/// exactly the values written.
/// </summary>
public static class LoadFileWriter
{
    /// <summary>Writes the document as UTF-8.</summary>
    /// <param name="output">Where to write.</param>
    /// <param name="note">The document's note (where the loads came from), or null.</param>
    /// <param name="title">The document's title, or null.</param>
    /// <param name="units">The units of every value.</param>
    /// <param name="cases">The cases, in order.</param>
    /// <param name="combinations">The combinations, in order.</param>
    /// <exception cref="ArgumentException">An item kind this writer does not handle.</exception>
    public static void Write(Stream output, string? note, string? title, UnitSystem units,
        IReadOnlyList<WrittenCase> cases, IReadOnlyList<LoadCombination> combinations)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(cases);
        ArgumentNullException.ThrowIfNull(combinations);
        var document = new LoadDocument(title, units, null, [],
            [.. cases.Select(c => new SourceCase(c.Name, c.Title, [.. c.Items.Select(Item)]))], [.. combinations]) { Note = note };
        output.Write(new UTF8Encoding(false).GetBytes(CanonicalWriter.Write(document)));
    }

    private static SourceItem Item(LoadItem item) => item switch
    {
        PointForce f => new SourceItem(f.Id, "force", [new SourceField("at", new VectorValue(f.At)), new SourceField("value", new VectorValue(f.Value))]),
        FreeCouple m => new SourceItem(m.Id, "couple", [new SourceField("value", new VectorValue(m.Value))]),
        _ => throw new ArgumentException($"cannot write a {item.Kind} item", nameof(item)),
    };
}
