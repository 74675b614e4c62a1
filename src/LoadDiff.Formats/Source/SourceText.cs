using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using LoadDiff.Core;

namespace LoadDiff.Formats.Source;

/// <summary>Canonical JSON text of numbers, vectors, strings and field values (invariant culture, exact round trip).</summary>
public static class SourceText
{
    private static readonly JavaScriptEncoder Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping;

    /// <summary>The shortest text that reads back as exactly this double, with a lowercase exponent (<c>1e-7</c>, <c>2.5e20</c>).</summary>
    public static string Number(double value)
    {
        string s = value.ToString("R", CultureInfo.InvariantCulture);
        int e = s.IndexOf('E', StringComparison.Ordinal);
        if (e < 0)
        {
            return s;
        }
        string mantissa = s[..e];
        string exponent = s[(e + 1)..].TrimStart('+');
        bool negative = exponent.StartsWith('-');
        exponent = exponent.TrimStart('-').TrimStart('0');
        return mantissa + "e" + (negative ? "-" : "") + (exponent.Length == 0 ? "0" : exponent);
    }

    /// <summary>
    /// The double nearest to <paramref name="value"/> rounded (correctly, from its exact binary value) to
    /// <paramref name="significantDigits"/> significant decimal digits; <see cref="Number(double)"/> of it is the
    /// shortest text of that rounded value (<c>2.8000000000000003</c> → <c>2.8</c> at 12 digits).
    /// </summary>
    public static double RoundToSignificant(double value, int significantDigits)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(significantDigits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(significantDigits, 17);
        if (value == 0 || !double.IsFinite(value))
        {
            return value;
        }
        string e = value.ToString("E" + (significantDigits - 1).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return double.Parse(e, NumberStyles.Float, CultureInfo.InvariantCulture);
    }

    /// <summary>A vector on one line: <c>[x, y, z]</c>.</summary>
    public static string Vector(Vector3 v) => "[" + Number(v.X) + ", " + Number(v.Y) + ", " + Number(v.Z) + "]";

    /// <summary>A JSON string literal with quotes; non-ASCII text stays readable.</summary>
    public static string Quoted(string s)
    {
        var sb = new StringBuilder(s.Length + 2);
        sb.Append('"').Append(JsonEncodedText.Encode(s, Encoder).Value).Append('"');
        return sb.ToString();
    }

    /// <summary>A field value as canonical JSON.</summary>
    public static string Of(SourceValue value) => value switch
    {
        NumberValue n => Number(n.Value),
        VectorValue v => Vector(v.Value),
        PointReference p => Quoted(p.Name),
        TextValue t => Quoted(t.Text),
        PolygonValue poly => "[" + string.Join(", ", poly.Vertices.Select(Of)) + "]",
        _ => throw new ArgumentOutOfRangeException(nameof(value), value, "unknown value type"),
    };
}
