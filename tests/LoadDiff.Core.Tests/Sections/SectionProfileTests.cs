using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

public partial class SectionProfileTests
{
    private static readonly SectionAxis AlongX = SectionAxis.Create(Vector3.Zero, Vector3.UnitX);

    private static IReadOnlyList<ForceCoupleSystem> Profile(SectionAxis axis, IReadOnlyList<double> stations, params LoadItem[] items) =>
        SectionProfile.Compute(axis, stations, [new WeightedItems(items, 1)], out _);

    [Fact]
    public void Compute_cantileverUnderUniformLoad_cutMomentWxSquaredOver2AndShearWx()
    {
        // AISC Steel Construction Manual, Beam Diagrams and Formulas, Case 19 (table number from memory):
        // cantilever, uniform load w; at distance x from the free end the shear is w·x and the moment w·x²/2.
        double w = 12.5, l = 4;
        var load = new LineLoad("w", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w), V(0, 0, -w));
        double[] stations = [0, 0.3, 1, 2.5, 3.7, 4];
        IReadOnlyList<ForceCoupleSystem> p = Profile(AlongX, stations, load);
        for (int i = 0; i < stations.Length; i++)
        {
            double x = stations[i];
            Assert.Equal(V(x, 0, 0), p[i].ReferencePoint);
            // Loads towards −z on the free-end side: V = (0, 0, −w x); about the cut point (ξ − x) x̂ × (−w ẑ) gives −w x²/2 about y.
            Close.Absolute(V(0, 0, -w * x), p[i].Force, 1e-12 * w * l);
            Close.Absolute(V(0, -w * x * x / 2, 0), p[i].Moment, 1e-12 * w * l * l);
        }
        // At the fixed end: V = wl, M = wl²/2 (same source).
        Close.Relative(w * l, p[^1].Force.Length, 1e-14);
        Close.Relative(w * l * l / 2, p[^1].Moment.Length, 1e-14);
    }

    [Fact]
    public void Compute_triangularLoadOnSimpleBeam_peakMoment2WlOver9Root3AtLOverRoot3WithZeroShear()
    {
        // AISC Manual, Beam Diagrams and Formulas, Case 2 (table number from memory): load increasing uniformly to one
        // end, total W; R1 = W/3, R2 = 2W/3, M_max = 2Wl/(9√3) at x = l/√3 from the light end, where the shear is zero.
        double wPeak = 9, l = 6, total = wPeak * l / 2;
        LoadItem[] beam =
        [
            new PointForce("R1", V(0, 0, 0), V(0, 0, total / 3)),
            new LineLoad("tri", V(0, 0, 0), V(l, 0, 0), V(0, 0, 0), V(0, 0, -wPeak)),
            new PointForce("R2", V(l, 0, 0), V(0, 0, 2 * total / 3)),
        ];
        double xMax = l / Math.Sqrt(3);
        double[] stations = [0, 1, xMax, 5, l];
        IReadOnlyList<ForceCoupleSystem> p = Profile(AlongX, stations, beam);
        Close.Relative(2 * total * l / (9 * Math.Sqrt(3)), p[2].Moment.Length, 1e-12);
        Close.Absolute(Vector3.Zero, p[2].Force, 1e-12 * total);
        // Elsewhere M(x) = R1·x − w x³/(6l) (integral of the triangle; same case of the same source); the upward R1 left
        // of the cut turns about +y.
        foreach (int i in new[] { 1, 3 })
        {
            double x = stations[i];
            Close.Relative((total / 3 * x) - (wPeak * x * x * x / (6 * l)), p[i].Moment.Y, 1e-12);
        }
        // Past the last support the beam is in equilibrium: nothing is left at the cut.
        Close.Absolute(Vector3.Zero, p[^1].Force, 1e-12 * total);
        Close.Absolute(Vector3.Zero, p[^1].Moment, 1e-12 * total * l);
    }

    [Fact]
    public void Compare_uniformLoadAgainstItsResultant_equalAtEndsLargestMomentDeviationWlSquaredOver8AtTheResultant()
    {
        // AISC Manual, Beam Diagrams and Formulas, Case 1: simple beam, uniform w over l, reactions wl/2, M_max = wl²/8 at
        // mid-span. The single resultant wl at mid-span gives the cut moment wl/2·l/2 = wl²/4 there, so the deviation
        // is wl²/4 − wl²/8 = wl²/8, and it is the largest along the span (the deviation is w·x²/2 left of mid-span).
        double w = 7, l = 10;
        LoadItem r1 = new PointForce("R1", V(0, 0, 0), V(0, 0, w * l / 2));
        LoadItem r2 = new PointForce("R2", V(l, 0, 0), V(0, 0, w * l / 2));
        LoadItem[] original = [r1, new LineLoad("udl", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w), V(0, 0, -w)), r2];
        LoadItem[] substitute = [r1, new PointForce("resultant", V(l / 2, 0, 0), V(0, 0, -w * l)), r2];

        // Seven even stations (0, 1.667, …) do not hit mid-span: the item boundaries add it.
        SectionComparison c = SectionComparison.Compare(AlongX, null, null, 7, [new WeightedItems(original, 1)], [new WeightedItems(substitute, 1)]);

        Assert.Contains(c.Stations, x => x.S == l / 2);
        Assert.Equal(0, c.Stations[0].S);
        Assert.Equal(l, c.Stations[^1].S);
        Close.Absolute(0, c.Stations[0].MomentDeviation, 1e-12 * w * l * l);
        Close.Absolute(0, c.Stations[^1].MomentDeviation, 1e-12 * w * l * l);
        Close.Absolute(0, c.Stations[^1].ForceDeviation, 1e-12 * w * l);
        Assert.Equal(l / 2, c.MaxMomentDeviationAt);
        Close.Relative(w * l * l / 8, c.MaxMomentDeviation, 1e-12);
        // The original's peak is the same wl²/8, so the relative deviation is 1.
        Close.Relative(w * l * l / 8, c.OriginalPeakMoment, 1e-12);
        Close.Relative(1, c.MaxMomentDeviationRelative!.Value, 1e-12);
    }

    [Fact]
    public void NegativeSide_hydrostaticWallCutAtMidDepth_forceOfThePressurePrismBelowTheCut()
    {
        // Munson, Young, Okiishi & Huebsch, Fundamentals of Fluid Mechanics, pressure prism: p = γ(h − z) on a wall of
        // width b; the force below z = a is γ b (h a − a²/2), acting at the prism's centroid.
        double gamma = 9.81, b = 6, h = 4, a = 1.5;
        var wall = new AreaLoad("wall", [V(0, 0, 0), V(0, b, 0), V(0, b, h), V(0, 0, h)], 0, V(1, 0, 0), V(0, 0, -gamma), V(0, 0, h));
        SectionAxis up = SectionAxis.Create(Vector3.Zero, Vector3.UnitZ);
        IReadOnlyList<LoadItem> below = HalfSpaceClip.NegativeSide(wall, up, a);
        LoadReduction r = Reduce.About(V(0, 0, 0), below);
        double force = gamma * b * ((h * a) - (a * a / 2));
        // ∫ z p dz = γ b (h a²/2 − a³/3): the moment about the origin of a force along +x at height z is +z·F about y.
        double first = gamma * b * ((h * a * a / 2) - (a * a * a / 3));
        Close.Relative(V(force, 0, 0), r.Force, 1e-14);
        Close.Relative(V(0, first, -force * b / 2), r.Moment, 1e-13);
    }

    [Fact]
    public void NegativeSide_meshTriangleWithVertexPressures_cutPartIntegratesTheLinearField()
    {
        // Triangle (0,0), (2,0), (0,2) with p = 1 + x at the vertices; x ≤ 1 keeps ∫₀¹ (1 + x)(2 − x) dx = 13/6
        // (direct integration of the polynomial), and ∫ x p dA = ∫₀¹ x(1 + x)(2 − x) dx = 1 + 1/3 − 1/4 = 13/12.
        var t = new MeshTriangle("t", V(0, 0, 0), V(2, 0, 0), V(0, 2, 0), 1, 3, 1, null);
        IReadOnlyList<LoadItem> parts = HalfSpaceClip.NegativeSide(t, AlongX, 1);
        Assert.Equal(2, parts.Count);
        LoadReduction r = Reduce.About(V(0, 0, 0), parts);
        Close.Relative(V(0, 0, 13.0 / 6), r.Force, 1e-14);
        Close.Relative(-13.0 / 12, r.Moment.Y, 1e-14);
    }

    [Fact]
    public void NegativeSide_pointForceExactlyOnTheCut_countsOnTheNegativeSide()
    {
        var f = new PointForce("p", V(2, 5, 1), V(0, 0, -3));
        Assert.Single(HalfSpaceClip.NegativeSide(f, AlongX, 2));
        Assert.Empty(HalfSpaceClip.NegativeSide(f, AlongX, Math.BitDecrement(2.0)));
    }

    [Fact]
    public void NegativeSide_lineLoadAlongADiagonalAxis_keepsTheNearPartWithInterpolatedIntensity()
    {
        // A 0 → 6 kN/m ramp over 6 m cut at its middle: the kept part is the 0 → 3 ramp over 3 m, 4.5 kN at 2 m.
        SectionAxis diagonal = SectionAxis.Create(V(1, 1, 0), V(1, 1, 0));
        var w = new LineLoad("w", V(1, 1, 0), V(1, 1, 0) + (V(1, 1, 0).Normalize() * 6), V(0, 0, 0), V(0, 0, -6));
        var part = Assert.IsType<LineLoad>(Assert.Single(HalfSpaceClip.NegativeSide(w, diagonal, 3)));
        Close.Relative(3, part.Length, 1e-15);
        Close.Relative(V(0, 0, -3), part.EndIntensity, 1e-15);
    }

    [Fact]
    public void Stations_includeItemBoundariesInsideTheRange()
    {
        var w = new LineLoad("w", V(0.7, 0, 0), V(2.2, 0, 0), V(0, 0, -1), V(0, 0, -1));
        IReadOnlyList<double> s = SectionProfile.Stations(AlongX, 0, 2, 3, [w], out bool all);
        Assert.True(all);
        Assert.Equal([0, 0.7, 1, 2], s);
    }

    [Fact]
    public void Stations_evenStationWithinRoundingOfABoundary_isReplacedByTheBoundary()
    {
        // 0.2 + 3.6·5/8 rounds to 2.0000000000000004; the point load at exactly 2 must not be split off a twin station.
        var f = new PointForce("p", V(2, 0, 0), V(0, 0, -1));
        IReadOnlyList<double> s = SectionProfile.Stations(AlongX, 0.2, 3.8, 9, [f], out _);
        Assert.Single(s, x => Math.Abs(x - 2) < 1e-6);
        Assert.Contains(2.0, s);
    }
}
