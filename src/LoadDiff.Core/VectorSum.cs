namespace LoadDiff.Core;

/// <summary>A double-double accumulator of 3-vectors. Mutable on purpose: it lives inside one reduction.</summary>
internal sealed class VectorSum
{
    private DoubleDouble _x;
    private DoubleDouble _y;
    private DoubleDouble _z;

    public void Add(Vector3 v)
    {
        _x += v.X;
        _y += v.Y;
        _z += v.Z;
    }

    public void Add(DoubleDouble x, DoubleDouble y, DoubleDouble z)
    {
        _x += x;
        _y += y;
        _z += z;
    }

    /// <summary>Adds d × f with every product formed exactly (FMA two-product).</summary>
    public void AddCross(Vector3 d, Vector3 f)
    {
        _x = _x + DoubleDouble.TwoProduct(d.Y, f.Z) + DoubleDouble.TwoProduct(-d.Z, f.Y);
        _y = _y + DoubleDouble.TwoProduct(d.Z, f.X) + DoubleDouble.TwoProduct(-d.X, f.Z);
        _z = _z + DoubleDouble.TwoProduct(d.X, f.Y) + DoubleDouble.TwoProduct(-d.Y, f.X);
    }

    /// <summary>Adds d × (the vector held by <paramref name="f"/>), using both parts of its components.</summary>
    public void AddCross(Vector3 d, VectorSum f)
    {
        _x = _x + (f._z * d.Y) + (f._y * -d.Z);
        _y = _y + (f._x * d.Z) + (f._z * -d.X);
        _z = _z + (f._y * d.X) + (f._x * -d.Y);
    }

    public void AddScaled(VectorSum other, double factor)
    {
        _x += other._x * factor;
        _y += other._y * factor;
        _z += other._z * factor;
    }

    public VectorSum Clone()
    {
        var c = new VectorSum();
        c._x = _x;
        c._y = _y;
        c._z = _z;
        return c;
    }

    public DoubleDouble X => _x;

    public DoubleDouble Y => _y;

    public DoubleDouble Z => _z;

    /// <summary>Adds d × (the vector held by <paramref name="f"/>), d given exactly as double-double components.</summary>
    public void AddCross(DoubleDouble dx, DoubleDouble dy, DoubleDouble dz, VectorSum f)
    {
        _x = _x + (dy * f._z) - (dz * f._y);
        _y = _y + (dz * f._x) - (dx * f._z);
        _z = _z + (dx * f._y) - (dy * f._x);
    }

    // Every term is finite (inputs are checked), so a sum that is not has overflowed.
    public Vector3 Value => Vector3.Checked(_x.Value, _y.Value, _z.Value);
}
