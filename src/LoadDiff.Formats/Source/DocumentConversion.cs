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

    private static SourceValue Scale(SourceValue v, double factor) => v switch
    {
        NumberValue n => new NumberValue(n.Value * factor),
        VectorValue vec => new VectorValue(vec.Value * factor),
        PolygonValue poly => new PolygonValue([.. poly.Vertices.Select(x => Scale(x, factor))]),
        _ => v,
    };
}
