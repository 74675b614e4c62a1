using LoadDiff.Core.Units;

namespace LoadDiff.Formats.Source;

/// <summary>The physical quantity of an item field, for its unit and for exact conversion.</summary>
public enum Quantity
{
    /// <summary>No unit (file references, "normal").</summary>
    None,

    /// <summary>Length, such as a position.</summary>
    Length,

    /// <summary>Force.</summary>
    Force,

    /// <summary>Force × length.</summary>
    Moment,

    /// <summary>Force per length (line-load intensity).</summary>
    LineIntensity,

    /// <summary>Force per area.</summary>
    Pressure,

    /// <summary>Force per volume (pressure gradient).</summary>
    PressureGradient,

    /// <summary>Mass.</summary>
    Mass,

    /// <summary>Length per s² (gravity).</summary>
    Acceleration,
}

/// <summary>Which quantity each field of each kind holds, its unit symbol, and the exact factor between unit systems.</summary>
public static class Quantities
{
    /// <summary>The canonical key order of each kind's fields (after <c>id</c> and <c>kind</c>).</summary>
    public static IReadOnlyList<string> FieldOrder(string kind) => kind switch
    {
        "force" => ["at", "value"],
        "couple" => ["value"],
        "line" => ["from", "to", "start", "end"],
        "area" => ["polygon", "pressure", "direction", "gradient", "origin"],
        "mass" => ["at", "value"],
        "mesh" => ["file", "vertices", "triangles", "direction"],
        "forces" => ["file"],
        _ => [],
    };

    /// <summary>The quantity of a field of a kind.</summary>
    public static Quantity Of(string kind, string field) => (kind, field) switch
    {
        (_, "at" or "from" or "to" or "polygon" or "origin") => Quantity.Length,
        ("force", "value") => Quantity.Force,
        ("couple", "value") => Quantity.Moment,
        ("mass", "value") => Quantity.Mass,
        ("line", "start" or "end") => Quantity.LineIntensity,
        ("area", "pressure") => Quantity.Pressure,
        ("area", "gradient") => Quantity.PressureGradient,
        _ => Quantity.None,
    };

    /// <summary>The unit symbol of a quantity in a unit system (empty for <see cref="Quantity.None"/>).</summary>
    public static string Symbol(Quantity q, UnitSystem u)
    {
        ArgumentNullException.ThrowIfNull(u);
        string f = u.Force.Symbol, l = u.Length.Symbol;
        return q switch
        {
            Quantity.Length => l,
            Quantity.Force => f,
            Quantity.Moment => f + "·" + l,
            Quantity.LineIntensity => f + "/" + l,
            Quantity.Pressure => f + "/" + l + "²",
            Quantity.PressureGradient => f + "/" + l + "³",
            Quantity.Mass => u.Mass.Symbol,
            Quantity.Acceleration => l + "/s²",
            _ => "",
        };
    }

    /// <summary>The exact factor that takes a value of quantity <paramref name="q"/> from <paramref name="from"/> to <paramref name="to"/>.</summary>
    public static double Factor(Quantity q, UnitSystem from, UnitSystem to)
    {
        ArgumentNullException.ThrowIfNull(from);
        ArgumentNullException.ThrowIfNull(to);
        double f = from.Force.FactorTo(to.Force), l = from.Length.FactorTo(to.Length);
        return q switch
        {
            Quantity.Length or Quantity.Acceleration => l,
            Quantity.Force => f,
            Quantity.Moment => f * l,
            Quantity.LineIntensity => f / l,
            Quantity.Pressure => f / (l * l),
            Quantity.PressureGradient => f / (l * l * l),
            Quantity.Mass => from.Mass.FactorTo(to.Mass),
            _ => 1,
        };
    }
}
