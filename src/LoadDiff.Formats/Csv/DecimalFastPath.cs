namespace LoadDiff.Formats.Csv;

/// <summary>
/// Clinger's fast path for decimal numbers: with at most 15 significant digits and a decimal exponent
/// within ±22, both the digits and the power of ten are exact doubles, so one multiplication or division
/// gives the correctly rounded value. Anything else is left to the general parser.
/// </summary>
internal static class DecimalFastPath
{
    private static readonly double[] Powers =
    [
        1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22,
    ];

    /// <summary>Parses <c>[+-]digits[.digits][(e|E)[+-]digits]</c>; false when the text is of another form or too long for the fast path.</summary>
    public static bool TryParse(ReadOnlySpan<byte> s, out double value) =>
        TryParsePrefix(s, out value, out int used) && used == s.Length;

    /// <summary>As <see cref="TryParse"/> for the number at the start of <paramref name="s"/>; <paramref name="used"/> is its length.</summary>
    public static bool TryParsePrefix(ReadOnlySpan<byte> s, out double value, out int used)
    {
        value = 0;
        used = 0;
        int i = 0;
        bool negative = false;
        if (i < s.Length && (s[i] == (byte)'-' || s[i] == (byte)'+'))
        {
            negative = s[i] == (byte)'-';
            i++;
        }
        long mantissa = 0;
        int digits = 0;
        int start = i;
        if (!TakeDigits(s, ref i, ref mantissa, ref digits))
        {
            return false;
        }
        bool any = i > start;
        int scale = 0;
        if (i < s.Length && s[i] == (byte)'.')
        {
            i++;
            int fractionStart = i;
            if (!TakeDigits(s, ref i, ref mantissa, ref digits))
            {
                return false;
            }
            scale = fractionStart - i;
            any |= i > fractionStart;
        }
        if (!any)
        {
            return false;
        }
        if (i < s.Length && (s[i] == (byte)'e' || s[i] == (byte)'E'))
        {
            i++;
            bool expNegative = false;
            if (i < s.Length && (s[i] == (byte)'-' || s[i] == (byte)'+'))
            {
                expNegative = s[i] == (byte)'-';
                i++;
            }
            int exp = 0, expDigits = 0;
            while (i < s.Length && (uint)(s[i] - '0') <= 9)
            {
                if (++expDigits > 4)
                {
                    return false;
                }
                exp = (exp * 10) + (s[i] - '0');
                i++;
            }
            if (expDigits == 0)
            {
                return false;
            }
            scale += expNegative ? -exp : exp;
        }
        if (scale < -22 || scale > 22)
        {
            return false;
        }
        used = i;
        double m = mantissa;
        value = scale >= 0 ? m * Powers[scale] : m / Powers[-scale];
        if (negative)
        {
            value = -value;
        }
        return true;
    }

    // Appends the digits at i to the mantissa (leading zeros do not count as significant); false past 15 significant digits.
    private static bool TakeDigits(ReadOnlySpan<byte> s, ref int i, ref long mantissa, ref int digits)
    {
        while (i < s.Length && (uint)(s[i] - '0') <= 9)
        {
            if (mantissa != 0 || s[i] != (byte)'0')
            {
                if (++digits > 15)
                {
                    return false;
                }
                mantissa = (mantissa * 10) + (s[i] - '0');
            }
            i++;
        }
        return true;
    }
}
