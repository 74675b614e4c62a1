using System.Globalization;

namespace LoadDiff.Core;

/// <summary>
/// An immutable vector of three finite doubles in global axes (x, y, z).
/// Units are those of the quantity it carries (a position in length units, a force in force units).
/// </summary>
public readonly struct Vector3 : IEquatable<Vector3>, IFormattable
{
    private readonly double _x;
    private readonly double _y;
    private readonly double _z;

    private Vector3(double x, double y, double z)
    {
        _x = x;
        _y = y;
        _z = z;
    }

    /// <summary>The zero vector.</summary>
    public static Vector3 Zero => default;

    /// <summary>Unit vector along +x.</summary>
    public static Vector3 UnitX => new(1, 0, 0);

    /// <summary>Unit vector along +y.</summary>
    public static Vector3 UnitY => new(0, 1, 0);

    /// <summary>Unit vector along +z.</summary>
    public static Vector3 UnitZ => new(0, 0, 1);

    /// <summary>The x component.</summary>
    public double X => _x;

    /// <summary>The y component.</summary>
    public double Y => _y;

    /// <summary>The z component.</summary>
    public double Z => _z;

    /// <summary>Creates a vector from finite components.</summary>
    /// <exception cref="ArgumentException">A component is NaN or infinite.</exception>
    public static Vector3 Create(double x, double y, double z)
    {
        Guard.Finite(x, y, z, "components");
        return new Vector3(x, y, z);
    }

    /// <summary>Creates a vector, returning false when a component is NaN or infinite.</summary>
    public static bool TryCreate(double x, double y, double z, out Vector3 vector)
    {
        bool ok = double.IsFinite(x) && double.IsFinite(y) && double.IsFinite(z);
        vector = ok ? new Vector3(x, y, z) : default;
        return ok;
    }

    /// <summary>Component by index 0, 1 or 2.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The index is not 0, 1 or 2.</exception>
    public double this[int index] => index switch
    {
        0 => _x,
        1 => _y,
        2 => _z,
        _ => throw new ArgumentOutOfRangeException(nameof(index), index, "Index must be 0, 1 or 2."),
    };

    /// <summary>Euclidean length, computed without overflow for large components.</summary>
    public double Length
    {
        get
        {
            // Plain sqrt when the sum of squares neither overflows nor loses digits to underflow.
            double sq = (_x * _x) + (_y * _y) + (_z * _z);
            if (sq is > 1e-290 and < 1e290)
            {
                return Math.Sqrt(sq);
            }
            double m = Math.Max(Math.Abs(_x), Math.Max(Math.Abs(_y), Math.Abs(_z)));
            if (m == 0)
            {
                return 0;
            }
            double a = _x / m, b = _y / m, c = _z / m;
            return m * Math.Sqrt((a * a) + (b * b) + (c * c));
        }
    }

    /// <summary>Squared Euclidean length.</summary>
    public double LengthSquared => (_x * _x) + (_y * _y) + (_z * _z);

    /// <summary>True when every component is exactly zero.</summary>
    public bool IsZero => _x == 0 && _y == 0 && _z == 0;

    /// <summary>Sum of two vectors.</summary>
    public static Vector3 Add(Vector3 a, Vector3 b) => Checked(a._x + b._x, a._y + b._y, a._z + b._z);

    /// <summary>Difference a − b.</summary>
    public static Vector3 Subtract(Vector3 a, Vector3 b) => Checked(a._x - b._x, a._y - b._y, a._z - b._z);

    /// <summary>Opposite vector.</summary>
    public static Vector3 Negate(Vector3 a) => new(-a._x, -a._y, -a._z);

    /// <summary>Vector scaled by a finite factor.</summary>
    public static Vector3 Multiply(Vector3 a, double s) => Checked(a._x * s, a._y * s, a._z * s);

    /// <summary>Vector divided by a finite non-zero divisor.</summary>
    public static Vector3 Divide(Vector3 a, double s) => Checked(a._x / s, a._y / s, a._z / s);

    /// <summary>Dot product, each product rounded once (fused multiply-add).</summary>
    public static double Dot(Vector3 a, Vector3 b) =>
        Math.FusedMultiplyAdd(a._x, b._x, Math.FusedMultiplyAdd(a._y, b._y, a._z * b._z));

    /// <summary>Cross product a × b, each component as a difference of products with one rounding of the first product (FMA).</summary>
    public static Vector3 Cross(Vector3 a, Vector3 b) => Checked(
        DiffOfProducts(a._y, b._z, a._z, b._y),
        DiffOfProducts(a._z, b._x, a._x, b._z),
        DiffOfProducts(a._x, b._y, a._y, b._x));

    /// <summary>This vector divided by its length.</summary>
    /// <exception cref="InvalidOperationException">The vector is zero.</exception>
    public Vector3 Normalize()
    {
        double l = Length;
        if (l == 0)
        {
            throw new InvalidOperationException("Cannot normalise the zero vector.");
        }
        return new Vector3(_x / l, _y / l, _z / l);
    }

    /// <summary>Component-wise minimum.</summary>
    public static Vector3 Min(Vector3 a, Vector3 b) => new(Math.Min(a._x, b._x), Math.Min(a._y, b._y), Math.Min(a._z, b._z));

    /// <summary>Component-wise maximum.</summary>
    public static Vector3 Max(Vector3 a, Vector3 b) => new(Math.Max(a._x, b._x), Math.Max(a._y, b._y), Math.Max(a._z, b._z));

    /// <summary>Sum of two vectors.</summary>
    public static Vector3 operator +(Vector3 a, Vector3 b) => Add(a, b);

    /// <summary>Difference a − b.</summary>
    public static Vector3 operator -(Vector3 a, Vector3 b) => Subtract(a, b);

    /// <summary>Opposite vector.</summary>
    public static Vector3 operator -(Vector3 a) => Negate(a);

    /// <summary>Vector scaled by a factor.</summary>
    public static Vector3 operator *(Vector3 a, double s) => Multiply(a, s);

    /// <summary>Vector scaled by a factor.</summary>
    public static Vector3 operator *(double s, Vector3 a) => Multiply(a, s);

    /// <summary>Vector divided by a divisor.</summary>
    public static Vector3 operator /(Vector3 a, double s) => Divide(a, s);

    /// <summary>Exact component equality.</summary>
    public static bool operator ==(Vector3 a, Vector3 b) => a.Equals(b);

    /// <summary>Exact component inequality.</summary>
    public static bool operator !=(Vector3 a, Vector3 b) => !a.Equals(b);

    /// <summary>Exact component equality (0.0 equals −0.0, as for doubles).</summary>
    public bool Equals(Vector3 other) => _x == other._x && _y == other._y && _z == other._z;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Vector3 v && Equals(v);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(_x == 0 ? 0 : _x, _y == 0 ? 0 : _y, _z == 0 ? 0 : _z);

    /// <summary>True when |a − b| ≤ absolute + relative·max(|a|, |b|).</summary>
    public static bool AreClose(Vector3 a, Vector3 b, double absolute, double relative)
    {
        double d = (a - b).Length;
        return d <= absolute + (relative * Math.Max(a.Length, b.Length));
    }

    /// <summary>Invariant, round-tripping text such as <c>(1, -2.5, 3E+20)</c>.</summary>
    public override string ToString() => ToString("R", CultureInfo.InvariantCulture);

    /// <inheritdoc/>
    public string ToString(string? format, IFormatProvider? formatProvider)
    {
        formatProvider ??= CultureInfo.InvariantCulture;
        format ??= "R";
        string sep = formatProvider is CultureInfo ci && ci.NumberFormat.NumberDecimalSeparator == "," ? "; " : ", ";
        return "(" + _x.ToString(format, formatProvider) + sep + _y.ToString(format, formatProvider) + sep
            + _z.ToString(format, formatProvider) + ")";
    }

    // a*b − c*d with the error of c*d recovered by FMA (Kahan's algorithm), so near-cancelling
    // moment terms keep their accuracy.
    private static double DiffOfProducts(double a, double b, double c, double d)
    {
        double cd = c * d;
        double err = Math.FusedMultiplyAdd(-c, d, cd);
        double dop = Math.FusedMultiplyAdd(a, b, -cd);
        return dop + err;
    }

    internal static Vector3 Checked(double x, double y, double z)
    {
        if (!double.IsFinite(x) || !double.IsFinite(y) || !double.IsFinite(z))
        {
            throw new OverflowException("A vector operation overflowed the range of double.");
        }
        return new Vector3(x, y, z);
    }
}
