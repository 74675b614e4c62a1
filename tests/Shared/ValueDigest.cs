using System.Buffers.Binary;
using System.Collections;
using System.Reflection;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Security.Cryptography;
using System.Text;

namespace LoadDiff.Tests.Support;

/// <summary>
/// Feeds a generated value into a hash by its exact state, so that two runs can be compared bit for bit: doubles by
/// their bits, strings by their UTF-16 code units, tuples and sequences item by item, a delegate by its method and
/// captured values, any other object by its instance fields (public or not) in name order.
/// </summary>
public static class ValueDigest
{
    // Generated values are trees; the limit only stops a cyclic object from recursing for ever.
    private const int DepthLimit = 32;

    /// <summary>Adds <paramref name="value"/> to <paramref name="hash"/>.</summary>
    public static void Add(IncrementalHash hash, object? value)
    {
        ArgumentNullException.ThrowIfNull(hash);
        Write(hash, value, 0);
    }

    /// <summary>The SHA-256 of one value, in lower-case hexadecimal.</summary>
    public static string Of(object? value)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        Write(hash, value, 0);
        return Convert.ToHexStringLower(hash.GetCurrentHash());
    }

    private static void Write(IncrementalHash h, object? v, int depth)
    {
        if (v is null)
        {
            Tag(h, "null");
            return;
        }
        if (depth > DepthLimit)
        {
            Tag(h, "deep");
            return;
        }
        switch (v)
        {
            case double d:
                Tag(h, "f64");
                Int64(h, BitConverter.DoubleToInt64Bits(d));
                return;
            case float f:
                Tag(h, "f32");
                Int64(h, BitConverter.SingleToInt32Bits(f));
                return;
            case decimal m:
                Tag(h, "dec");
                foreach (int part in decimal.GetBits(m))
                {
                    Int64(h, part);
                }
                return;
            case string s:
                Tag(h, "str");
                Int64(h, s.Length);
                h.AppendData(MemoryMarshal.AsBytes(s.AsSpan()));
                return;
            case byte[] bytes:
                Tag(h, "bytes");
                Int64(h, bytes.Length);
                h.AppendData(bytes);
                return;
            case Enum e:
                Tag(h, e.GetType().FullName!);
                Write(h, Convert.ChangeType(e, Enum.GetUnderlyingType(e.GetType()), System.Globalization.CultureInfo.InvariantCulture), depth + 1);
                return;
            case bool b:
                Tag(h, "bool");
                Int64(h, b ? 1 : 0);
                return;
            case char c:
                Tag(h, "char");
                Int64(h, c);
                return;
            case sbyte or short or int or long:
                Tag(h, "int");
                Int64(h, Convert.ToInt64(v, System.Globalization.CultureInfo.InvariantCulture));
                return;
            case byte or ushort or uint or ulong:
                Tag(h, "uint");
                Int64(h, unchecked((long)Convert.ToUInt64(v, System.Globalization.CultureInfo.InvariantCulture)));
                return;
            case Delegate del:
                Tag(h, "delegate");
                Tag(h, (del.Method.DeclaringType?.FullName ?? "") + "." + del.Method.Name);
                Write(h, del.Target, depth + 1);
                return;
            case ITuple tuple:
                Tag(h, "tuple");
                Int64(h, tuple.Length);
                for (int i = 0; i < tuple.Length; i++)
                {
                    Write(h, tuple[i], depth + 1);
                }
                return;
            case IEnumerable sequence:
                Tag(h, "seq");
                int count = 0;
                foreach (object? item in sequence)
                {
                    Write(h, item, depth + 1);
                    count++;
                }
                Int64(h, count);
                return;
        }
        Type type = v.GetType();
        Tag(h, type.FullName ?? type.Name);
        for (Type? t = type; t is not null && t != typeof(object) && t != typeof(ValueType); t = t.BaseType)
        {
            foreach (FieldInfo field in t.GetFields(BindingFlags.Instance | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.DeclaredOnly)
                .OrderBy(f => f.Name, StringComparer.Ordinal))
            {
                Tag(h, field.Name);
                Write(h, field.GetValue(v), depth + 1);
            }
        }
    }

    private static void Tag(IncrementalHash h, string name)
    {
        byte[] bytes = Encoding.UTF8.GetBytes(name);
        Int64(h, bytes.Length);
        h.AppendData(bytes);
    }

    private static void Int64(IncrementalHash h, long x)
    {
        Span<byte> b = stackalloc byte[8];
        BinaryPrimitives.WriteInt64LittleEndian(b, x);
        h.AppendData(b);
    }
}
