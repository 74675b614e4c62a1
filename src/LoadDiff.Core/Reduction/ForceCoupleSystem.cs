namespace LoadDiff.Core.Reduction;

/// <summary>A resultant force and the resultant moment about a stated reference point (global axes).</summary>
public readonly struct ForceCoupleSystem : IEquatable<ForceCoupleSystem>
{
    private readonly Vector3 _force;
    private readonly Vector3 _moment;
    private readonly Vector3 _point;

    /// <summary>Creates a force-couple system.</summary>
    /// <param name="force">Resultant force R (force units).</param>
    /// <param name="moment">Resultant moment M_P about <paramref name="referencePoint"/> (force × length).</param>
    /// <param name="referencePoint">The point P (length units).</param>
    public ForceCoupleSystem(Vector3 force, Vector3 moment, Vector3 referencePoint)
    {
        _force = force;
        _moment = moment;
        _point = referencePoint;
    }

    /// <summary>Resultant force R.</summary>
    public Vector3 Force => _force;

    /// <summary>Resultant moment about <see cref="ReferencePoint"/>.</summary>
    public Vector3 Moment => _moment;

    /// <summary>The point the moment is taken about.</summary>
    public Vector3 ReferencePoint => _point;

    /// <summary>The same system about Q: M_Q = M_P + (P − Q) × R.</summary>
    public ForceCoupleSystem MoveTo(Vector3 q) =>
        q == _point ? this : new ForceCoupleSystem(_force, _moment + Vector3.Cross(_point - q, _force), q);

    /// <summary>Sum of two systems, taken about this system's reference point.</summary>
    public ForceCoupleSystem Add(ForceCoupleSystem other)
    {
        ForceCoupleSystem o = other.MoveTo(_point);
        return new ForceCoupleSystem(_force + o._force, _moment + o._moment, _point);
    }

    /// <summary>This system minus another (the residual when this is the substitute), about this system's point.</summary>
    public ForceCoupleSystem Subtract(ForceCoupleSystem other) => Add(other.Negate());

    /// <summary>The opposite system.</summary>
    public ForceCoupleSystem Negate() => new(-_force, -_moment, _point);

    /// <summary>The system scaled by a load factor.</summary>
    public ForceCoupleSystem Multiply(double factor) => new(_force * factor, _moment * factor, _point);

    /// <summary>Sum operator, about the left operand's point.</summary>
    public static ForceCoupleSystem operator +(ForceCoupleSystem a, ForceCoupleSystem b) => a.Add(b);

    /// <summary>Difference operator, about the left operand's point.</summary>
    public static ForceCoupleSystem operator -(ForceCoupleSystem a, ForceCoupleSystem b) => a.Subtract(b);

    /// <summary>Scaling operator.</summary>
    public static ForceCoupleSystem operator *(ForceCoupleSystem a, double factor) => a.Multiply(factor);

    /// <summary>Exact equality.</summary>
    public static bool operator ==(ForceCoupleSystem a, ForceCoupleSystem b) => a.Equals(b);

    /// <summary>Exact inequality.</summary>
    public static bool operator !=(ForceCoupleSystem a, ForceCoupleSystem b) => !a.Equals(b);

    /// <inheritdoc/>
    public bool Equals(ForceCoupleSystem other) => _force == other._force && _moment == other._moment && _point == other._point;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is ForceCoupleSystem s && Equals(s);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(_force, _moment, _point);

    /// <inheritdoc/>
    public override string ToString() => $"R = {_force}, M = {_moment} about {_point}";
}
