namespace LoadDiff.Formats.Diagnostics;

/// <summary>One finding of a reader: a stable code, a message and where it applies.</summary>
/// <param name="Code">Stable code such as <c>LD020</c>; tests and scripts match on it.</param>
/// <param name="Severity">Error or warning.</param>
/// <param name="Message">What is wrong and what was expected.</param>
/// <param name="Location">Where.</param>
public sealed record Diagnostic(string Code, Severity Severity, string Message, SourceLocation Location)
{
    /// <summary>One line: <c>file:line:column: error LD020: message (at $.path)</c>.</summary>
    public override string ToString()
    {
        string kind = Severity == Severity.Error ? "error" : "warning";
        string path = Location.JsonPath is { } p ? $" (at {OneLine(p)})" : "";
        return $"{OneLine(Location.ToString())}: {kind} {Code}: {OneLine(Message)}{path}";
    }

    // Keys and values quoted from a file may hold control, line-separator or bidi characters; a diagnostic stays one line, in visible order.
    private static string OneLine(string s)
    {
        if (!s.Any(LoadDiff.Core.Text.NameCharacters.IsForbidden))
        {
            return s;
        }
        var b = new System.Text.StringBuilder(s.Length + 8);
        foreach (char c in s)
        {
            _ = c switch
            {
                '\n' => b.Append("\\n"),
                '\r' => b.Append("\\r"),
                '\t' => b.Append("\\t"),
                _ when LoadDiff.Core.Text.NameCharacters.IsForbidden(c) => b.Append("\\u").Append(((int)c).ToString("x4", System.Globalization.CultureInfo.InvariantCulture)),
                _ => b.Append(c),
            };
        }
        return b.ToString();
    }
}
