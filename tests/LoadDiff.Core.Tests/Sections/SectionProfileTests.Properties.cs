using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

public partial class SectionProfileTests
{
    private static readonly Gen<SectionAxis> AnyAxis =
        Gen.Select(Systems.Vec(-3, 3), Systems.Vec(-1, 1).Where(d => d.Length > 0.1), SectionAxis.Create);

    // The shared generator's quadrilaterals are not planar (the reader would reject them); sections cut real,
    // planar polygons, so the third vertex is moved into the plane of the other three.
    private static readonly Gen<LoadItem[]> PlanarSystem = Systems.System.Select(items => items.Select(Planar).ToArray());

    private static LoadItem Planar(LoadItem item) => item is AreaLoad a
        ? a with { Polygon = [a.Polygon[0], a.Polygon[1], a.Polygon[1] + a.Polygon[3] - a.Polygon[0], a.Polygon[3]] }
        : item;

    [Fact]
    public void Compute_itemsSplitIntoPieces_sameProfileAtEveryStation()
    {
        Gen.Select(PlanarSystem, AnyAxis, Gen.Double[0.1, 0.9], Gen.Double[-4, 4].Array[1, 12]).SampleSeeded((items, axis, t, raw) =>
        {
            double[] stations = [.. raw.Order()];
            LoadItem[] split = [.. items.SelectMany(i => Split(i, t))];
            IReadOnlyList<ForceCoupleSystem> a = Profile(axis, stations, items), b = Profile(axis, stations, split);
            LoadReduction whole = Reduce.About(axis.Origin, items);
            double fs = whole.GrossForce + 1e-300, ms = whole.MomentScale(axis.Origin) + (whole.GrossForce * 8) + 1e-300;
            for (int i = 0; i < stations.Length; i++)
            {
                Close.Absolute(a[i].Force, b[i].Force, 1e-11 * fs);
                Close.Absolute(a[i].Moment, b[i].Moment, 1e-11 * ms);
            }
        }, iter: 300);
    }

    // Splits an item into pieces that together are the same load: a line at parameter t, a polygon into a fan of
    // triangles, a triangle at a point of one edge, a force or mass into two parts at the same point.
    private static IEnumerable<LoadItem> Split(LoadItem item, double t)
    {
        switch (item)
        {
            case LineLoad w:
                Vector3 m = w.From + ((w.To - w.From) * t), wm = w.StartIntensity + ((w.EndIntensity - w.StartIntensity) * t);
                return [w with { To = m, EndIntensity = wm }, w with { From = m, StartIntensity = wm }];
            case AreaLoad a:
                return Enumerable.Range(1, a.Polygon.Length - 2)
                    .Select(i => (LoadItem)(a with { Polygon = [a.Polygon[0], a.Polygon[i], a.Polygon[i + 1]], Direction = a.ForceUnit }));
            case MeshTriangle tr:
                Vector3 e = tr.B + ((tr.C - tr.B) * t);
                double pe = tr.PressureB + ((tr.PressureC - tr.PressureB) * t);
                Vector3 n = tr.Direction ?? Vector3.Cross(tr.B - tr.A, tr.C - tr.A).Normalize();
                return [new MeshTriangle(tr.Id, tr.A, tr.B, e, tr.PressureA, tr.PressureB, pe, n), new MeshTriangle(tr.Id, tr.A, e, tr.C, tr.PressureA, pe, tr.PressureC, n)];
            case PointForce f:
                return [f with { Value = f.Value * t }, f with { Value = f.Value * (1 - t) }];
            case PointMass pm:
                return [pm with { Mass = pm.Mass * t }, pm with { Mass = pm.Mass * (1 - t) }];
            default:
                return [item];
        }
    }
}
