using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Units;

namespace LoadDiff.Cli;

/// <summary>How the user chose the reference point.</summary>
/// <param name="Kind">"origin", "centroid", "point" (named) or "coordinates".</param>
/// <param name="Name">The named point, for "point".</param>
/// <param name="Coordinates">The coordinates, for "coordinates".</param>
public sealed record ReferenceChoice(string Kind, string? Name = null, Vector3? Coordinates = null);

/// <summary>Options several commands share, with culture-proof parsers that report errors instead of throwing.</summary>
public static class CommonOptions
{
    /// <summary>--at x,y,z | POINT | centroid.</summary>
    public static Option<ReferenceChoice?> At(string defaultText) => new("--at")
    {
        Description = $"Reference point for moments: x,y,z (output length units), a named point of the file, or 'centroid' (the load centroid). Default: {defaultText}.",
        HelpName = "x,y,z|POINT|centroid",
        CustomParser = ParseAt,
    };

    /// <summary>--units FORCE,LENGTH.</summary>
    public static Option<(Unit Force, Unit Length)?> Units() => new("--units")
    {
        Description = "Output units, e.g. kN,m or kip,ft (default: the units of the first file). Forces: "
            + string.Join(", ", UnitCatalog.ForceUnits.Select(u => u.Symbol)) + "; lengths: "
            + string.Join(", ", UnitCatalog.LengthUnits.Select(u => u.Symbol)) + ".",
        HelpName = "FORCE,LENGTH",
        CustomParser = ParseUnits,
    };

    /// <summary>--case NAME (repeatable).</summary>
    public static Option<string[]> Cases() => new("--case")
    {
        Description = "Only this load case or combination (repeat for several).",
        HelpName = "NAME",
        AllowMultipleArgumentsPerToken = false,
        Arity = ArgumentArity.ZeroOrMore,
    };

    /// <summary>--format with a fixed list of values.</summary>
    public static Option<string> Format(params string[] formats)
    {
        var o = new Option<string>("--format")
        {
            Description = "Output format: " + string.Join(", ", formats) + ".",
            DefaultValueFactory = _ => formats[0],
            HelpName = string.Join("|", formats),
        };
        o.AcceptOnlyFromAmong(formats);
        return o;
    }

    /// <summary>Parses an invariant-culture double, rejecting NaN and infinity.</summary>
    public static bool TryParseFinite(string s, out double value) =>
        double.TryParse(s.Trim(), NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
            CultureInfo.InvariantCulture, out value) && double.IsFinite(value);

    /// <summary>The option's value as a finite number ≥ 0, or null with an error naming the option.</summary>
    public static double? ParseNonNegative(ArgumentResult r, string name)
    {
        string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        if (TryParseFinite(s, out double v) && v >= 0)
        {
            return v;
        }
        r.AddError($"{name} '{s}': expected a finite number ≥ 0 with a point as decimal separator");
        return null;
    }

    private static ReferenceChoice? ParseAt(ArgumentResult r)
    {
        string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        if (s == "centroid")
        {
            return new ReferenceChoice("centroid");
        }
        if (s == "origin")
        {
            return new ReferenceChoice("coordinates", Coordinates: Vector3.Zero);
        }
        if (s.Contains(',', StringComparison.Ordinal))
        {
            string[] parts = s.Split(',');
            if (parts.Length == 3 && TryParseFinite(parts[0], out double x) && TryParseFinite(parts[1], out double y) && TryParseFinite(parts[2], out double z))
            {
                return new ReferenceChoice("coordinates", Coordinates: Vector3.Create(x, y, z));
            }
            r.AddError($"--at '{s}': expected three numbers x,y,z with a point as decimal separator, a named point, or 'centroid'");
            return null;
        }
        if (s.Length == 0)
        {
            r.AddError("--at needs a value");
            return null;
        }
        return new ReferenceChoice("point", Name: s);
    }

    private static (Unit, Unit)? ParseUnits(ArgumentResult r)
    {
        string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        string[] parts = s.Split(',');
        if (parts.Length != 2)
        {
            r.AddError($"--units '{s}': expected FORCE,LENGTH such as kN,m");
            return null;
        }
        Unit? f = UnitCatalog.FindForce(parts[0].Trim());
        Unit? l = UnitCatalog.FindLength(parts[1].Trim());
        if (f is null)
        {
            r.AddError($"--units: unknown force unit '{parts[0]}'; expected one of {string.Join(", ", UnitCatalog.ForceUnits.Select(u => u.Symbol))}");
            return null;
        }
        if (l is null)
        {
            r.AddError($"--units: unknown length unit '{parts[1]}'; expected one of {string.Join(", ", UnitCatalog.LengthUnits.Select(u => u.Symbol))}");
            return null;
        }
        return (f, l);
    }
}
