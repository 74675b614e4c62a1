namespace LoadDiff.Formats.Diagnostics;

/// <summary>Where in an input a diagnostic points: file, 1-based line and column, and the JSON path when there is one.</summary>
/// <param name="File">The file as named on the command line (or "-" for standard input).</param>
/// <param name="Line">1-based line, or null when the whole file is meant.</param>
/// <param name="Column">1-based column in characters, or null.</param>
/// <param name="JsonPath">Path of the JSON value, such as <c>$.cases.dead.loads[2].at</c>, or null.</param>
public sealed record SourceLocation(string File, int? Line = null, int? Column = null, string? JsonPath = null)
{
    /// <summary>Compiler-style location, <c>file:line:column</c>.</summary>
    public override string ToString()
    {
        string s = File;
        if (Line is { } l)
        {
            s += ":" + l.ToString(System.Globalization.CultureInfo.InvariantCulture);
            if (Column is { } c)
            {
                s += ":" + c.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }
        }
        return s;
    }
}
