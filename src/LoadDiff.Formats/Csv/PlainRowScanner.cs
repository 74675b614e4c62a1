using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// The fast path of the block reader for the common line: at most 256 bytes, no quotes, numbers written as
/// plain decimals without spaces. The whole line is classified at once (bit masks of its commas and line feed),
/// so the fields are found without a byte loop and their numbers are converted independently of each other;
/// each number's digits are converted together (SIMD multiply-add where the processor has it, else eight at a
/// time in a 64-bit word) and rounded once by Clinger's fast path, as in <see cref="DecimalFastPath"/>.
/// Anything else makes it decline, and the caller reads the line the general way, which also words every error.
/// </summary>
/// <remarks>
/// The buffer must hold <see cref="Padding"/> readable bytes past the end of the data, and the byte at the
/// end of the data must be a line feed (a sentinel), so that no look-ahead reads what it may not.
/// </remarks>
internal static class PlainRowScanner
{
    /// <summary>Readable bytes the buffer needs past the data.</summary>
    public const int Padding = 288;

    /// <summary>The longest line the scanner reads, line feed included.</summary>
    public const int LongestLine = 256;

    private const ulong MaxExact = 1UL << 53;

    private static readonly double[] Powers = [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16];

    private static readonly ulong[] IntegerPowers =
    [
        1, 10, 100, 1_000, 10_000, 100_000, 1_000_000, 10_000_000, 100_000_000, 1_000_000_000, 10_000_000_000,
        100_000_000_000, 1_000_000_000_000, 10_000_000_000_000, 100_000_000_000_000, 1_000_000_000_000_000,
        10_000_000_000_000_000,
    ];

    /// <summary>
    /// Reads the line starting at <paramref name="pos"/>: text fields are skipped, the number of field f goes to
    /// index <c>valueOfField[f] * stride + slot</c> (when not negative) of <paramref name="digits"/> and
    /// <paramref name="scales"/> as its digits (an exact, signed integer) and the power of ten to divide them by.
    /// The caller divides, many at a time: the quotient is the correctly rounded value.
    /// </summary>
    /// <remarks>
    /// <c>portable</c> takes the code written for processors without AVX2 and SSE4.1 (ARM, old x64) on any processor,
    /// for tests; an argument rather than a setting, so that a test of that code cannot change what tests beside it run.
    /// </remarks>
    /// <returns>The index of the line feed (or carriage return before it) that ends the line, or −1 to decline.</returns>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]
    public static int TryScan(byte[] buffer, int pos, int[] valueOfField, Span<double> digits, Span<double> scales, int stride, int slot,
        bool portable = false)
    {
        ref byte line = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(buffer), pos);
        // commas of the line, 64 bytes a mask; the line feed ends the line within the first 256 bytes or it is declined
        CommaMasks masks = default;
        int lineEnd = -1;
        bool quote = false;
        for (int chunk = 0; chunk < LongestLine / 64; chunk++)
        {
            Classify(ref line, 64 * chunk, portable, out ulong chunkCommas, out ulong feeds, out bool chunkQuote);
            quote |= chunkQuote;
            if (feeds != 0)
            {
                int at = BitOperations.TrailingZeroCount(feeds);
                masks[chunk] = chunkCommas & ((1UL << at) - 1);
                lineEnd = (64 * chunk) + at;
                break;
            }
            masks[chunk] = chunkCommas;
        }
        int fields = valueOfField.Length;
        if (lineEnd < 0 || quote
            || BitOperations.PopCount(masks[0]) + BitOperations.PopCount(masks[1]) + BitOperations.PopCount(masks[2]) + BitOperations.PopCount(masks[3]) != fields - 1)
        {
            return -1;
        }
        ref int fieldValue = ref MemoryMarshal.GetArrayDataReference(valueOfField);
        ref double digit = ref MemoryMarshal.GetReference(digits);
        ref double scale = ref MemoryMarshal.GetReference(scales);
        int columns = Math.Min(digits.Length, scales.Length);
        int last = Unsafe.Add(ref line, lineEnd - 1) == (byte)'\r' ? lineEnd - 1 : lineEnd;
        int start = 0;
        ulong commas = masks[0];
        int offset = 0;
        for (int f = 0; f < fields; f++)
        {
            int end;
            if (f == fields - 1)
            {
                end = last;
            }
            else
            {
                // the popcount above guarantees a comma ahead
                while (commas == 0)
                {
                    offset += 64;
                    commas = masks[offset / 64];
                }
                end = offset + BitOperations.TrailingZeroCount(commas);
                commas &= commas - 1;
            }
            int k = Unsafe.Add(ref fieldValue, f);
            if (k >= 0)
            {
                int at = (k * stride) + slot;
                if ((uint)at >= (uint)columns || !TryNumber(ref Unsafe.Add(ref line, start), end - start, portable, out double m, out double power))
                {
                    return -1;
                }
                Unsafe.Add(ref digit, at) = m;
                Unsafe.Add(ref scale, at) = power;
            }
            start = end + 1;
        }
        return pos + last;
    }

    /// <summary>The comma masks of a line, one per 64 bytes.</summary>
    [InlineArray(LongestLine / 64)]
    private struct CommaMasks
    {
        private ulong _first;
    }

    // Bit masks of the commas and line feeds among 64 bytes at offset, and whether a quote is among them.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Classify(ref byte line, int offset, bool portable, out ulong commas, out ulong feeds, out bool quote)
    {
        if (Vector256.IsHardwareAccelerated && !portable)
        {
            Vector256<byte> c = Vector256.Create((byte)','), n = Vector256.Create((byte)'\n'), q = Vector256.Create((byte)'"');
            Vector256<byte> a = Vector256.LoadUnsafe(ref line, (nuint)offset), b = Vector256.LoadUnsafe(ref line, (nuint)offset + 32);
            commas = Vector256.Equals(a, c).ExtractMostSignificantBits() | ((ulong)Vector256.Equals(b, c).ExtractMostSignificantBits() << 32);
            feeds = Vector256.Equals(a, n).ExtractMostSignificantBits() | ((ulong)Vector256.Equals(b, n).ExtractMostSignificantBits() << 32);
            quote = (Vector256.Equals(a, q) | Vector256.Equals(b, q)) != Vector256<byte>.Zero;
            return;
        }
        Vector128<byte> c1 = Vector128.Create((byte)','), n1 = Vector128.Create((byte)'\n'), q1 = Vector128.Create((byte)'"');
        commas = feeds = 0;
        Vector128<byte> quotes = Vector128<byte>.Zero;
        for (int i = 0; i < 4; i++)
        {
            Vector128<byte> v = Vector128.LoadUnsafe(ref line, (nuint)(offset + (16 * i)));
            commas |= (ulong)Vector128.Equals(v, c1).ExtractMostSignificantBits() << (16 * i);
            feeds |= (ulong)Vector128.Equals(v, n1).ExtractMostSignificantBits() << (16 * i);
            quotes |= Vector128.Equals(v, q1);
        }
        quote = quotes != Vector128<byte>.Zero;
    }

    // [+-]digits[.digits] of 1 to 16 characters in all, as ±mantissa / scale with an exact mantissa below 2⁵³ and
    // scale an exact power of ten (Clinger's condition); declines exponents and longer forms.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static bool TryNumber(ref byte s, int length, bool portable, out double value, out double scale)
    {
        value = 0;
        scale = 1;
        if ((uint)(length - 1) >= 16)
        {
            return false;
        }
        Vector128<byte> v = Vector128.LoadUnsafe(ref s);
        uint digits = Vector128.LessThan(v - Vector128.Create((byte)'0'), Vector128.Create((byte)10)).ExtractMostSignificantBits();
        uint dots = Vector128.Equals(v, Vector128.Create((byte)'.')).ExtractMostSignificantBits();
        byte first = s;
        int minus = Unsafe.BitCast<bool, byte>(first == (byte)'-');
        int sign = minus | Unsafe.BitCast<bool, byte>(first == (byte)'+');
        uint body = ((1u << length) - 1) & ~(uint)sign;
        dots &= body;
        // every character of the body a digit but at most one point, and at least one digit
        if (((digits | dots) & body) != body || (dots & (dots - 1)) != 0 || (digits & body) == 0)
        {
            return false;
        }
        int dot = dots == 0 ? length : BitOperations.TrailingZeroCount(dots);
        int whole = dot - sign;
        int fraction = dots == 0 ? 0 : length - dot - 1;
        ulong mantissa = Sse41.IsSupported && !portable
            ? DigitsSimd(v, sign, whole, fraction)
            : (Digits(ref Unsafe.Add(ref s, sign), whole) * IntegerPowers[fraction]) + Digits(ref Unsafe.Add(ref s, dot + 1), fraction);
        if (mantissa > MaxExact)
        {
            return false;
        }
        // the sign bit set without a branch: the signs of a force column are as often one as the other
        value = BitConverter.Int64BitsToDouble(BitConverter.DoubleToInt64Bits((long)mantissa) | ((long)minus << 63));
        scale = Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(Powers), fraction); // fraction ≤ 15 here
        return true;
    }

    // The digits of the number (the sign and point skipped) moved to the end of a 16-byte vector, then pairs,
    // quadruples and eights formed by multiply-add: whole + fraction ≤ 16 here since the text has at most 16 bytes.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong DigitsSimd(Vector128<byte> text, int sign, int whole, int fraction)
    {
        int count = whole + fraction;
        Vector128<sbyte> digit = Vector128.Create((sbyte)0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15) - Vector128.Create((sbyte)(16 - count));
        // byte j takes digit j − (16 − count), found after the sign and, past the whole part, after the point;
        // the lanes before the first digit get an index with the top bit set, which the shuffle turns into zero
        Vector128<sbyte> source = digit + Vector128.Create((sbyte)sign) - Vector128.GreaterThan(digit, Vector128.Create((sbyte)(whole - 1)));
        source |= Vector128.LessThan(digit, Vector128<sbyte>.Zero);
        Vector128<byte> d = Ssse3.Shuffle(text - Vector128.Create((byte)'0'), source.AsByte());
        Vector128<short> pairs = Ssse3.MultiplyAddAdjacent(d, Vector128.Create((sbyte)10, 1, 10, 1, 10, 1, 10, 1, 10, 1, 10, 1, 10, 1, 10, 1));
        Vector128<int> fours = Sse2.MultiplyAddAdjacent(pairs, Vector128.Create((short)100, 1, 100, 1, 100, 1, 100, 1));
        Vector128<ushort> packed = Sse41.PackUnsignedSaturate(fours, fours);
        Vector128<int> eights = Sse2.MultiplyAddAdjacent(packed.AsInt16(), Vector128.Create((short)10000, 1, 10000, 1, 10000, 1, 10000, 1));
        ulong both = eights.AsUInt64().ToScalar();
        return ((both & 0xFFFFFFFFUL) * 100_000_000UL) + (both >> 32);
    }

    // The value of n ≤ 16 decimal digits at s.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong Digits(ref byte s, int n)
    {
        if (n <= 8)
        {
            return n == 0 ? 0 : Eight(Unsafe.ReadUnaligned<ulong>(ref s) << (8 * (8 - n)));
        }
        ulong high = Eight(Unsafe.ReadUnaligned<ulong>(ref s));
        ulong low = Eight(Unsafe.ReadUnaligned<ulong>(ref Unsafe.Add(ref s, 8)) << (8 * (16 - n)));
        return (high * IntegerPowers[n - 8]) + low;
    }

    // Eight digit characters, first in the lowest byte (bytes shifted out count as leading zeros), to their value:
    // pairs, then quadruples, then the whole, each step one multiplication.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong Eight(ulong chunk)
    {
        ulong d = chunk & 0x0F0F0F0F0F0F0F0FUL;
        d = ((d * 10) + (d >> 8)) & 0x00FF00FF00FF00FFUL;
        d = ((d * 100) + (d >> 16)) & 0x0000FFFF0000FFFFUL;
        return ((d * 10000) + (d >> 32)) & 0xFFFFFFFFUL;
    }
}
