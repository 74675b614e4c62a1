using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

public partial class SectionProfileTests
{
    [Fact]
    public void Compute_cantileverCombination135DeadUdlPlus15LiveTipLoad_matchesTheClosedForm()
    {
        // Standard closed form (statics of a cantilever; CHECK-VALUES: AISC beam diagrams Case 19 and the tip-load case;
        // factors EN 1990 (6.10), Table A1.2(B)): free end at x = 0, axis +x towards the support. Loads act towards −z,
        // so the cut-side (x' ≤ x) force is V_z = −(1.35·w·x + 1.5·P) and the moment about the cut point, (x' − x) x̂ × (−F ẑ),
        // is about −y: M_y = −(1.35·w·x²/2 + 1.5·P·x).
        double w = 12.5, p = 20, l = 4;
        LoadItem[] dead = [new LineLoad("udl", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w), V(0, 0, -w))];
        LoadItem[] live = [new PointForce("tip", V(0, 0, 0), V(0, 0, -p))];
        double[] stations = [0, 0.5, 1, 2.5, 4];
        IReadOnlyList<ForceCoupleSystem> c = SectionProfile.Compute(AlongX, stations, [new(dead, 1.35), new(live, 1.5)], out _);
        for (int i = 0; i < stations.Length; i++)
        {
            double x = stations[i];
            double vz = -((1.35 * w * x) + (1.5 * p)), my = -((1.35 * w * x * x / 2) + (1.5 * p * x));
            Close.Absolute(V(0, 0, vz), c[i].Force, 1e-12 * 100);
            Close.Absolute(V(0, my, 0), c[i].Moment, 1e-12 * 500);
        }
        // At the support, x = 4: V = 1.35·50 + 30 = 97.5, M = 1.35·100 + 1.5·80 = 255 (same closed form, by hand).
        Close.Relative(-97.5, c[^1].Force.Z, 1e-14);
        Close.Relative(-255, c[^1].Moment.Y, 1e-14);
    }

    [Fact]
    public void NegativeSide_unitSquareLinearFieldCutObliquely_exactIntegralsOverTheTriangle()
    {
        // Unit square, p = x, force towards −z; the cut keeps x + y ≤ 1 (axis (1,1,0)/√2 at station 1/√2), the triangle
        // T = {x, y ≥ 0, x + y ≤ 1}. By integration over T (y from 0 to 1 − x):
        //   ∫p dA   = ∫₀¹ x(1 − x) dx        = 1/2 − 1/3       = 1/6,
        //   ∫p·x dA = ∫₀¹ x²(1 − x) dx       = 1/3 − 1/4       = 1/12,
        //   ∫p·y dA = ∫₀¹ x(1 − x)²/2 dx     = (1/2 − 2/3 + 1/4)/2 = 1/24.
        // F = −(1/6) ẑ; about the origin M = ∫ (x, y, 0) × (0, 0, −p) dA = (−∫p·y, ∫p·x, 0) = (−1/24, 1/12, 0).
        var square = new AreaLoad("sq", [V(0, 0, 0), V(1, 0, 0), V(1, 1, 0), V(0, 1, 0)], 0, V(0, 0, -1), V(1, 0, 0), Vector3.Zero);
        var axis = SectionAxis.Create(Vector3.Zero, V(1, 1, 0));
        double s = 1 / Math.Sqrt(2);
        LoadReduction r = Reduce.About(Vector3.Zero, HalfSpaceClip.NegativeSide(square, axis, s));
        Close.Absolute(V(0, 0, -1.0 / 6), r.Force, 1e-15);
        Close.Absolute(V(-1.0 / 24, 1.0 / 12, 0), r.Moment, 1e-15);
        // Through the profile, about the cut point c = (1/2, 1/2, 0): M_c = M_O − c × F = (−1/24 + 1/12, 1/12 − 1/12, 0) = (1/24, 0, 0).
        ForceCoupleSystem cut = Profile(axis, [s], square)[0];
        Close.Absolute(V(0.5, 0.5, 0), cut.ReferencePoint, 1e-15);
        Close.Absolute(V(0, 0, -1.0 / 6), cut.Force, 1e-15);
        Close.Absolute(V(1.0 / 24, 0, 0), cut.Moment, 1e-15);
    }

    [Fact]
    public void NegativeSide_triangularLineLoadCutObliquely_keepsTheExactPart()
    {
        // Line (0,0,0)–(2,0,0), intensity −3x ẑ (0 to −6). The cut x + y ≤ 1 meets it at x = 1. By integration:
        // F = −∫₀¹ 3x dx ẑ = −(3/2) ẑ; M_O = ∫₀¹ x x̂ × (−3x ẑ) dx = ∫₀¹ 3x² dx ŷ = (0, 1, 0).
        var line = new LineLoad("w", V(0, 0, 0), V(2, 0, 0), V(0, 0, 0), V(0, 0, -6));
        var axis = SectionAxis.Create(Vector3.Zero, V(1, 1, 0));
        LoadReduction r = Reduce.About(Vector3.Zero, HalfSpaceClip.NegativeSide(line, axis, 1 / Math.Sqrt(2)));
        Close.Absolute(V(0, 0, -1.5), r.Force, 1e-14);
        Close.Absolute(V(0, 1, 0), r.Moment, 1e-14);
    }

    [Fact]
    public void NegativeSide_meshTriangleCutThroughAVertex_exactIntegralsOverTheKeptTriangle()
    {
        // Triangle (0,0), (2,0), (0,2) with p = x (vertex pressures 0, 2, 0), force towards −z. The plane x = y through
        // the vertex (0,0) keeps y ≥ x (axis (1,−1,0)/√2, station 0): the triangle (0,0), (1,1), (0,2), area 1, p = 1 at
        // (1,1). Linear-field triangle integrals (area A, vertex values): ∫f dA = A·Σf_i/3; ∫f·g dA = A/12·(Σf_i g_i + Σf_i Σg_i).
        //   ∫p dA = 1/3;  ∫p·x dA = (1 + 1)/12 = 1/6;  ∫p·y dA = (1 + 1·3)/12 = 1/3  (x_i = 0, 1, 0; y_i = 0, 1, 2).
        // F = −(1/3) ẑ, M_O = (−∫p·y, ∫p·x, 0) = (−1/3, 1/6, 0).
        var t = new MeshTriangle("t", V(0, 0, 0), V(2, 0, 0), V(0, 2, 0), 0, 2, 0, V(0, 0, -1));
        var axis = SectionAxis.Create(Vector3.Zero, V(1, -1, 0));
        LoadReduction r = Reduce.About(Vector3.Zero, HalfSpaceClip.NegativeSide(t, axis, 0));
        Close.Absolute(V(0, 0, -1.0 / 3), r.Force, 1e-14);
        Close.Absolute(V(-1.0 / 3, 1.0 / 6, 0), r.Moment, 1e-14);
    }

    [Fact]
    public void Compute_pointForcesAtEveryStation_equalTheExactRationalCutSideSums()
    {
        // Independent oracle: exact dyadic-rational Σ (r_i − c) × F_i over the forces with station ≤ s (SPEC §2), with
        // the side rule of the cut (a force on the plane is on the negative side). Fixed seed for reproducible cases.
        var random = new Random(20261202);
        double Coord() => Math.Round((random.NextDouble() * 8) - 4, 3);
        var forces = Enumerable.Range(0, 40)
            .Select(i => new PointForce($"f{i}", V(Coord(), Coord(), Coord()), V(Coord(), Coord(), Coord()))).ToArray();
        double[] stations = [-5, -2.5, forces[3].At.X, 0, 1.25, forces[17].At.X, 3, 5];
        Array.Sort(stations);
        IReadOnlyList<ForceCoupleSystem> p = Profile(AlongX, stations, forces);
        for (int i = 0; i < stations.Length; i++)
        {
            var side = forces.Where(f => f.At.X <= stations[i]).Select(f => (f.At, f.Value)).ToArray();
            ExactVector force = ExactVector.Resultant(side), moment = ExactVector.MomentAbout(V(stations[i], 0, 0), side);
            Close.Absolute(V(force.X.ToDouble(), force.Y.ToDouble(), force.Z.ToDouble()), p[i].Force, 1e-13);
            Close.Absolute(V(moment.X.ToDouble(), moment.Y.ToDouble(), moment.Z.ToDouble()), p[i].Moment, 1e-12);
        }
    }
}
