using CsCheck;
using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Tests.Support;

/// <summary>Random load systems of every item kind, and exact rigid motions and scalings of them.</summary>
public static class Systems
{
    // Positions are multiples of 2⁻²⁴ (and the fixed offsets below are dyadic), so shifting a system by
    // whole metres up to 10⁶ is exact: the shifted and unshifted systems are the same geometry.
    public static readonly Gen<Vector3> Position = Vec(-10, 10).Select(v =>
        Vector3.Create(Dyadic(v.X), Dyadic(v.Y), Dyadic(v.Z)));

    private static double Dyadic(double x) => Math.Round(x * (1 << 24)) / (1 << 24);

    public static readonly Gen<Vector3> Load = Vec(-100, 100);

    public static Gen<Vector3> Vec(double min, double max) =>
        Gen.Select(Gen.Double[min, max], Gen.Double[min, max], Gen.Double[min, max], Vector3.Create);

    private static readonly Gen<LoadItem> Item = Gen.Int[0, 5].SelectMany(kind => kind switch
    {
        0 => Gen.Select(Position, Load, (at, f) => (LoadItem)new PointForce("f", at, f)),
        1 => Load.Select(c => (LoadItem)new FreeCouple("c", c)),
        2 => Gen.Select(Position, Vec(1, 3), Load, Load, (a, d, w1, w2) => (LoadItem)new LineLoad("w", a, a + Vector3.Create(Dyadic(d.X), Dyadic(d.Y), Dyadic(d.Z)), w1, w2)),
        3 => Gen.Select(Position, Gen.Double[-50, 50], Vec(-5, 5), Gen.Bool, (o, p, g, normal) =>
            (LoadItem)new AreaLoad("a", [o, o + Vector3.Create(2, 0, 0.5), o + Vector3.Create(2.5, 3, 1), o + Vector3.Create(-0.5, 2, 0.5)],
                p, normal ? null : Vector3.Create(0.3, -0.2, 1), g, o + Vector3.Create(1, 1, 0))),
        4 => Gen.Select(Position, Gen.Double[-50, 50], Gen.Double[-50, 50], Gen.Double[-50, 50], (o, pa, pb, pc) =>
            (LoadItem)new MeshTriangle("t", o, o + Vector3.Create(1.5, 0.25, 0), o + Vector3.Create(0.125, 2, 0.75), pa, pb, pc, null)),
        _ => Gen.Select(Position, Gen.Double[0.1, 10], (at, m) => (LoadItem)new PointMass("m", at, m, Vector3.Create(0, 0, -9.80665))),
    });

    /// <summary>One to twelve items of mixed kinds.</summary>
    public static readonly Gen<LoadItem[]> System = Item.Array[1, 12];

    /// <summary>Applies x ↦ rotate(x) + shift to positions and rotate to vectors, and scales every force by k.</summary>
    public static LoadItem Map(LoadItem item, Func<Vector3, Vector3> rotate, Vector3 shift, double k = 1)
    {
        Vector3 T(Vector3 x) => rotate(x) + shift;
        Vector3 R(Vector3 v) => rotate(v) * k;
        return item switch
        {
            PointForce f => new PointForce(f.Id, T(f.At), R(f.Value)),
            FreeCouple c => new FreeCouple(c.Id, R(c.Value)),
            LineLoad w => new LineLoad(w.Id, T(w.From), T(w.To), R(w.StartIntensity), R(w.EndIntensity)),
            AreaLoad a => new AreaLoad(a.Id, [.. a.Polygon.Select(T)], a.Pressure * k,
                a.Direction is { } d ? rotate(d) : null, R(a.Gradient), T(a.Origin)),
            MeshTriangle t => new MeshTriangle(t.Id, T(t.A), T(t.B), T(t.C), t.PressureA * k, t.PressureB * k, t.PressureC * k,
                t.Direction is { } d ? rotate(d) : null),
            PointMass m => new PointMass(m.Id, T(m.At), m.Mass * k, rotate(m.Gravity)),
            _ => throw new ArgumentException("unknown item", nameof(item)),
        };
    }

    /// <summary>A uniformly random proper rotation, from a normalised quaternion.</summary>
    public static readonly Gen<Func<Vector3, Vector3>> Rotation =
        Gen.Select(Gen.Double[-1, 1], Gen.Double[-1, 1], Gen.Double[-1, 1], Gen.Double[-1, 1])
            .Where((w, x, y, z) => (w * w) + (x * x) + (y * y) + (z * z) is > 0.01 and <= 1)
            .Select((w, x, y, z) =>
            {
                double n = Math.Sqrt((w * w) + (x * x) + (y * y) + (z * z));
                w /= n;
                x /= n;
                y /= n;
                z /= n;
                double[,] m =
                {
                    { 1 - (2 * ((y * y) + (z * z))), 2 * ((x * y) - (z * w)), 2 * ((x * z) + (y * w)) },
                    { 2 * ((x * y) + (z * w)), 1 - (2 * ((x * x) + (z * z))), 2 * ((y * z) - (x * w)) },
                    { 2 * ((x * z) - (y * w)), 2 * ((y * z) + (x * w)), 1 - (2 * ((x * x) + (y * y))) },
                };
                return (Func<Vector3, Vector3>)(v => Vector3.Create(
                    (m[0, 0] * v.X) + (m[0, 1] * v.Y) + (m[0, 2] * v.Z),
                    (m[1, 0] * v.X) + (m[1, 1] * v.Y) + (m[1, 2] * v.Z),
                    (m[2, 0] * v.X) + (m[2, 1] * v.Y) + (m[2, 2] * v.Z)));
            });
}
