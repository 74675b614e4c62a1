using System.Collections.Immutable;
using LoadDiff.Core.Units;

namespace LoadDiff.Formats.Source;

/// <summary>Converts a document into other units with the exact NIST SP 811 factors, field by field.</summary>
public static class DocumentConversion
{
    /// <summary>The same document written in <paramref name="target"/> units (itself when they agree).</summary>
    public static LoadDocument ConvertTo(this LoadDocument document, UnitSystem target)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(target);
        UnitSystem from = document.Units;
        if (from == target)
        {
            return document;
        }
        double length = Quantities.Factor(Quantity.Length, from, target);
        return document with
        {
            Units = target,
            Gravity = document.Gravity * length,
            Points = [.. document.Points.Select(p => new KeyValuePair<string, Core.Vector3>(p.Key, p.Value * length))],
            Cases = [.. document.Cases.Select(c => c with
            {
                Items = [.. c.Items.Select(i => i with
                {
                    Fields = [.. i.Fields.Select(f => f with { Value = Scale(f.Value, Quantities.Factor(Quantities.Of(i.Kind, f.Name), from, target)) })],
                })],
            })],
        };
    }

    /// <summary>
    /// The same document with every number (gravity, points, item fields, combination factors) rounded to
    /// <paramref name="significantDigits"/> significant digits (<see cref="SourceText.RoundToSignificant"/>): for
    /// listings compared after conversion, where the last digits are conversion noise. Not lossless.
    /// </summary>
    public static LoadDocument RoundedTo(this LoadDocument document, int significantDigits)
    {
        ArgumentNullException.ThrowIfNull(document);
        double R(double x) => SourceText.RoundToSignificant(x, significantDigits);
        Core.Vector3 V(Core.Vector3 v) => Core.Vector3.Create(R(v.X), R(v.Y), R(v.Z));
        SourceValue Round(SourceValue v) => v switch
        {
            NumberValue n => new NumberValue(R(n.Value)),
            VectorValue vec => new VectorValue(V(vec.Value)),
            PolygonValue poly => new PolygonValue([.. poly.Vertices.Select(Round)]),
            _ => v,
        };
        return document with
        {
            Gravity = document.Gravity is { } g ? V(g) : null,
            Points = [.. document.Points.Select(p => new KeyValuePair<string, Core.Vector3>(p.Key, V(p.Value)))],
            Cases = [.. document.Cases.Select(c => c with
            {
                Items = [.. c.Items.Select(i => i with { Fields = [.. i.Fields.Select(f => f with { Value = Round(f.Value) })] })],
            })],
            Combinations = [.. document.Combinations.Select(c => c with
            {
                Factors = [.. c.Factors.Select(f => new KeyValuePair<string, double>(f.Key, R(f.Value)))],
            })],
        };
    }

    private static SourceValue Scale(SourceValue v, double factor) => v switch
    {
        NumberValue n => new NumberValue(n.Value * factor),
        VectorValue vec => new VectorValue(vec.Value * factor),
        PolygonValue poly => new PolygonValue([.. poly.Vertices.Select(x => Scale(x, factor))]),
        _ => v,
    };
}
