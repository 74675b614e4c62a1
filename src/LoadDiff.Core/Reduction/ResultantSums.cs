namespace LoadDiff.Core.Reduction;

/// <summary>
/// A reduction's resultant force and its moment about the accumulator's anchor (a point near the loads), kept in
/// double-double as they were accumulated. Moments about any other point, and differences of two systems, are formed
/// from these sums with one rounding at the end, so no digits are lost by moving a system far away and back.
/// </summary>
public readonly struct ResultantSums : IEquatable<ResultantSums>
{
    private readonly DoubleDouble _fx, _fy, _fz, _mx, _my, _mz;
    private readonly Vector3 _anchor;

    internal ResultantSums(DoubleDouble fx, DoubleDouble fy, DoubleDouble fz, DoubleDouble mx, DoubleDouble my, DoubleDouble mz, Vector3 anchor)
    {
        _fx = fx;
        _fy = fy;
        _fz = fz;
        _mx = mx;
        _my = my;
        _mz = mz;
        _anchor = anchor;
    }

    /// <summary>Sums taken from a system as it is (no more accurate than its doubles): for reductions made by hand.</summary>
    public static ResultantSums From(ForceCoupleSystem system) => new(
        DoubleDouble.FromDouble(system.Force.X), DoubleDouble.FromDouble(system.Force.Y), DoubleDouble.FromDouble(system.Force.Z),
        DoubleDouble.FromDouble(system.Moment.X), DoubleDouble.FromDouble(system.Moment.Y), DoubleDouble.FromDouble(system.Moment.Z),
        system.ReferencePoint);

    /// <summary>The point the moment sums are about (length units).</summary>
    public Vector3 Anchor => _anchor;

    /// <summary>The system about <paramref name="point"/>, rounded once.</summary>
    public ForceCoupleSystem At(Vector3 point) => Difference(default, this, point);

    /// <summary>
    /// <paramref name="b"/> − <paramref name="a"/> about <paramref name="point"/>: ΔR and ΔM_Q = M_b(Q) − M_a(Q), each
    /// moment moved from its own anchor in double-double and rounded once after the subtraction.
    /// </summary>
    public static ForceCoupleSystem Difference(ResultantSums a, ResultantSums b, Vector3 point)
    {
        (DoubleDouble ax, DoubleDouble ay, DoubleDouble az) = a.MomentAt(point);
        (DoubleDouble bx, DoubleDouble by, DoubleDouble bz) = b.MomentAt(point);
        Vector3 force = Vector3.Create((b._fx - a._fx).Value, (b._fy - a._fy).Value, (b._fz - a._fz).Value);
        Vector3 moment = Vector3.Create((bx - ax).Value, (by - ay).Value, (bz - az).Value);
        return new ForceCoupleSystem(force, moment, point);
    }

    // M_Q = M_anchor + (anchor − Q) × R, with anchor − Q exact as a double-double.
    private (DoubleDouble X, DoubleDouble Y, DoubleDouble Z) MomentAt(Vector3 q)
    {
        DoubleDouble dx = DoubleDouble.Difference(_anchor.X, q.X);
        DoubleDouble dy = DoubleDouble.Difference(_anchor.Y, q.Y);
        DoubleDouble dz = DoubleDouble.Difference(_anchor.Z, q.Z);
        return (_mx + (dy * _fz) - (dz * _fy), _my + (dz * _fx) - (dx * _fz), _mz + (dx * _fy) - (dy * _fx));
    }

    /// <inheritdoc/>
    public bool Equals(ResultantSums other) =>
        _fx == other._fx && _fy == other._fy && _fz == other._fz && _mx == other._mx && _my == other._my && _mz == other._mz
        && _anchor == other._anchor;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is ResultantSums s && Equals(s);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(_fx, _fy, _fz, _mx, _my, _mz, _anchor);

    /// <summary>Exact equality.</summary>
    public static bool operator ==(ResultantSums a, ResultantSums b) => a.Equals(b);

    /// <summary>Exact inequality.</summary>
    public static bool operator !=(ResultantSums a, ResultantSums b) => !a.Equals(b);

    /// <inheritdoc/>
    public override string ToString() => $"sums about {_anchor}";
}
