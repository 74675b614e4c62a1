using System.Globalization;
using CsCheck;

namespace LoadDiff.Formats.Tests.Source;

/// <summary>Generators of valid load descriptions as JSON text (invented test data; validity by construction).</summary>
internal static class SourceSamples
{
    private static Gen<string> Pick(params string[] options) => Gen.Int[0, options.Length - 1].Select(i => options[i]);

    private static string N(double d) => d.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Finite doubles from all bit patterns up to 1e60 in magnitude (subnormals, −0, long mantissas). The reader accepts up to 1e100, but line-load gross integrals overflow near that bound (a known limit of Core).</summary>
    public static readonly Gen<double> AnyNumber = Gen.Long.Select(BitConverter.Int64BitsToDouble)
        .Where(d => double.IsFinite(d) && Math.Abs(d) <= 1e60);

    /// <summary>A moderate number for geometry that must stay well conditioned.</summary>
    public static readonly Gen<double> Moderate = Gen.Double[-1000, 1000];

    // line intensities stay moderate: Core's closed-form ∫|w| overflows for some mixes of huge and subnormal components (left for Core)
    private static readonly Gen<string> ModerateVec = Gen.Select(Moderate, Moderate, Moderate, (x, y, z) => $"[{N(x)}, {N(y)}, {N(z)}]");

    public static readonly Gen<string> Vec = Gen.Select(AnyNumber, AnyNumber, AnyNumber, (x, y, z) => $"[{N(x)}, {N(y)}, {N(z)}]");

    private static readonly Gen<string> Rectangle = Gen.Select(Moderate, Moderate, Moderate, Gen.Double[0.1, 50], Gen.Double[0.1, 50],
        (x, y, z, a, b) => $"[[{N(x)}, {N(y)}, {N(z)}], [{N(x + a)}, {N(y)}, {N(z)}], [{N(x + a)}, {N(y + b)}, {N(z)}], [{N(x)}, {N(y + b)}, {N(z)}]]");

    /// <summary>One item's fields (without id) of a random kind.</summary>
    public static readonly Gen<string> ItemBody = Gen.OneOf(
        Gen.Select(Vec, Vec, (a, v) => $"\"kind\": \"force\", \"at\": {a}, \"value\": {v}"),
        Vec.Select(v => $"\"kind\": \"couple\", \"value\": {v}"),
        Gen.Select(Gen.Select(Moderate, Moderate, Moderate, (x, y, z) => (x, y, z)), Gen.Double[0.5, 30], ModerateVec, ModerateVec,
            (a, l, w1, w2) => $"\"kind\": \"line\", \"from\": [{N(a.x)}, {N(a.y)}, {N(a.z)}], \"to\": [{N(a.x + l)}, {N(a.y)}, {N(a.z)}], \"start\": {w1}, \"end\": {w2}"),
        Gen.Select(Rectangle, AnyNumber, Gen.Bool, Vec, (poly, p, normal, g) =>
            $"\"kind\": \"area\", \"polygon\": {poly}, \"pressure\": {N(p)}" + (normal ? "" : $", \"direction\": [0, 0, -1], \"gradient\": {g}")),
        Gen.Select(Vec, AnyNumber, (a, m) => $"\"kind\": \"mass\", \"at\": {a}, \"value\": {N(m)}"));

    // Unicode scalar values of every kind a note may hold: control characters, ASCII, the BMP on both sides of the
    // surrogates, and supplementary planes (a lone surrogate is not text, and the reader rejects it).
    private static readonly Gen<string> NoteChar = Gen.OneOf(
        Gen.Int[0, 0x1F], Gen.Int[0x20, 0x7E], Gen.Int[0x7F, 0xD7FF], Gen.Int[0xE000, 0xFFFF], Gen.Int[0x10000, 0x10FFFF]).Select(char.ConvertFromUtf32);

    /// <summary>A note as a JSON string literal (escaped by the BCL's encoder, not by the code under test), or null for none.</summary>
    public static readonly Gen<string?> Note = Gen.Select(Gen.Bool, NoteChar.Array[0, 12],
        (present, chars) => present ? "\"" + System.Text.Json.JsonEncodedText.Encode(string.Concat(chars)).Value + "\"" : null);

    private static readonly Gen<string> NotedItemBody = Gen.Select(ItemBody, Note, (body, note) => note is null ? body : body + ", \"note\": " + note);

    private static readonly Gen<(string? Note, string[] Items)> NotedCase = Gen.Select(Note, NotedItemBody.Array[1, 5], (note, items) => (note, items));

    /// <summary>A whole document: units, optional gravity and points, one to three cases, a combination; notes here and there.</summary>
    public static readonly Gen<string> Document =
        Gen.Select(
            Pick("N", "kN", "MN", "lbf", "kip", "kgf", "tf"),
            Pick("m", "mm", "cm", "ft", "in"),
            Pick("kg", "t", "lb"),
            Gen.Bool,
            NotedCase.Array[1, 3],
            AnyNumber,
            Note,
            (force, length, mass, gravity, cases, factor, note) =>
            {
                var sb = new System.Text.StringBuilder();
                sb.Append("{ \"title\": \"random \\u00e9 \\\"q\\\"\", ");
                if (note is not null)
                {
                    sb.Append("\"note\": ").Append(note).Append(", ");
                }
                sb.Append($"\"units\": {{ \"force\": \"{force}\", \"length\": \"{length}\", \"mass\": \"{mass}\" }}, ");
                if (gravity)
                {
                    sb.Append("\"gravity\": [0, 0, -32.174], ");
                }
                sb.Append("\"points\": { \"P\": [1, 2, 3] }, \"cases\": {");
                for (int c = 0; c < cases.Length; c++)
                {
                    sb.Append(c == 0 ? "" : ", ").Append($"\"c{c}\": {{ ");
                    if (cases[c].Note is { } caseNote)
                    {
                        sb.Append("\"note\": ").Append(caseNote).Append(", ");
                    }
                    sb.Append("\"loads\": [");
                    for (int i = 0; i < cases[c].Items.Length; i++)
                    {
                        string id = i % 2 == 0 ? $"\"id\": \"i{i}\", " : "";
                        sb.Append(i == 0 ? "" : ", ").Append("{ ").Append(id).Append(cases[c].Items[i]).Append(" }");
                    }
                    sb.Append("] }");
                }
                sb.Append($"}}, \"combinations\": {{ \"k\": {{ \"c0\": {N(factor)} }} }} }}");
                return sb.ToString();
            });
}
