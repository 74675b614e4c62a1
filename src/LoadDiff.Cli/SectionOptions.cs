using System.CommandLine;
using System.CommandLine.Parsing;
using LoadDiff.Core;

namespace LoadDiff.Cli;

/// <summary>Options of section cuts, shared by <c>sections</c> and the section gate of <c>check</c>.</summary>
public static class SectionOptions
{
    /// <summary>Even stations when --stations is not given.</summary>
    public const int DefaultStations = 21;

    /// <summary>An axis option: x, y, z or dx,dy,dz.</summary>
    public static Option<Vector3?> Axis(string name, string description, bool required) => new(name)
    {
        Description = description,
        HelpName = "x|y|z|dx,dy,dz",
        Required = required,
        CustomParser = r => ParseAxis(r, name),
    };

    /// <summary>--origin x,y,z.</summary>
    public static Option<Vector3?> Origin() => new("--origin")
    {
        Description = "The point of station 0 on the axis, x,y,z in output length units (default 0,0,0).",
        HelpName = "x,y,z",
        CustomParser = r =>
        {
            string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
            if (TryVector(s, out Vector3 v))
            {
                return v;
            }
            r.AddError($"--origin '{s}': expected three numbers x,y,z with a point as decimal separator");
            return null;
        },
    };

    /// <summary>A station bound, --from or --to.</summary>
    public static Option<double?> Station(string name, string description) => new(name)
    {
        Description = description,
        HelpName = "S",
        CustomParser = r =>
        {
            string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
            if (CommonOptions.TryParseFinite(s, out double v))
            {
                return v;
            }
            r.AddError($"{name} '{s}': expected a finite number with a point as decimal separator");
            return null;
        },
    };

    /// <summary>--stations N.</summary>
    public static Option<int> Stations() => new("--stations")
    {
        Description = $"Number of evenly spaced stations from --from to --to (default {DefaultStations}); every item boundary in the range is added.",
        HelpName = "N",
        DefaultValueFactory = _ => DefaultStations,
        CustomParser = r =>
        {
            string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
            if (int.TryParse(s, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int n) && n >= 2 && n <= 100_000)
            {
                return n;
            }
            r.AddError($"--stations '{s}': expected a whole number from 2 to 100000");
            return DefaultStations;
        },
    };

    private static Vector3? ParseAxis(ArgumentResult r, string name)
    {
        string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        switch (s)
        {
            case "x":
                return Vector3.UnitX;
            case "y":
                return Vector3.UnitY;
            case "z":
                return Vector3.UnitZ;
        }
        if (TryVector(s, out Vector3 v) && !v.IsZero)
        {
            return v;
        }
        r.AddError($"{name} '{s}': expected x, y, z or a direction dx,dy,dz that is not zero");
        return null;
    }

    private static bool TryVector(string s, out Vector3 v)
    {
        string[] p = s.Split(',');
        v = Vector3.Zero;
        if (p.Length == 3 && CommonOptions.TryParseFinite(p[0], out double x) && CommonOptions.TryParseFinite(p[1], out double y)
            && CommonOptions.TryParseFinite(p[2], out double z))
        {
            v = Vector3.Create(x, y, z);
            return true;
        }
        return false;
    }
}
