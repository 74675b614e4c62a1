using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public class WrenchAnalysisTests
{
    [Fact]
    public void Analyse_workedExample_pitchMinimumCoupleAndCentralAxis()
    {
        // Murray, Li & Sastry, A Mathematical Introduction to Robotic Manipulation (1994), ch. 2, wrenches;
        // Meriam & Kraige, Engineering Mechanics: Statics, resultants (section from memory).
        // R = (0, −4, 3), M_O = (5, 0, −5): pitch −0.6, minimum couple −3 signed along R, axis through (0.8, 0.6, 0.8),
        // crossing z = 0 at (0.8, 5/3, 0).
        var system = new ForceCoupleSystem(V(0, -4, 3), V(5, 0, -5), V(0, 0, 0));
        WrenchAnalysis w = WrenchAnalysis.Analyse(system, 5, 10, parallel: false);

        Assert.Equal(SystemKind.Wrench, w.Kind);
        Close.Relative(-0.6, w.Pitch!.Value, 1e-15);
        Vector3 dir = w.AxisDirection!.Value;
        Close.Relative(V(0, -0.8, 0.6), dir, 1e-15);
        Close.Relative(-3, Vector3.Dot(w.MinimumCouple, dir), 1e-15);
        Close.Relative(V(0, 2.4, -1.8), w.MinimumCouple, 1e-15);
        Close.Relative(V(0.8, 0.6, 0.8), w.AxisPoint!.Value, 1e-15);
        Vector3 p = w.AxisPoint.Value;
        Vector3 crossing = p + (dir * (-p.Z / dir.Z));
        Close.Relative(V(0.8, 5.0 / 3, 0), crossing, 1e-15);
        Assert.Empty(w.Crossings); // a wrench has no single line of action
    }

    [Fact]
    public void Wrench_workedExampleThroughAccumulator_samePitchAndAxis()
    {
        // Same example (Murray, Li & Sastry 1994; Meriam & Kraige), built from a force at the origin plus a free couple.
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(0, 0, 0), V(0, -4, 3));
        acc.AddCouple(V(5, 0, -5));
        WrenchAnalysis w = acc.ResultAt(V(0, 0, 0)).Wrench();
        Assert.Equal(SystemKind.Wrench, w.Kind);
        Close.Relative(-0.6, w.Pitch!.Value, 1e-15);
        Close.Relative(V(0.8, 0.6, 0.8), w.AxisPoint!.Value, 1e-15);
    }

    [Fact]
    public void Analyse_singleForce_crossingsLieOnItsLineOfAction()
    {
        // A single force (0, −4, 3) through (1, 2, 3), reduced to the origin: R·M = 0, so it is a single force whose
        // line meets z = 0 where 3 + 0.6λ = 0, i.e. λ = −5: (1, 2 + 4, 0) = (1, 6, 0); and y = 0 at λ = 2.5: (1, 0, 4.5).
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(1, 2, 3), V(0, -4, 3));
        WrenchAnalysis w = acc.ResultAt(V(0, 0, 0)).Wrench();
        Assert.Equal(SystemKind.Force, w.Kind);
        Assert.True(w.IsSingleForce);
        Close.Relative(V(1, 6, 0), Assert.Single(w.Crossings, c => c.Axis == 2).Point, 1e-15);
        Close.Relative(V(1, 0, 4.5), Assert.Single(w.Crossings, c => c.Axis == 1).Point, 1e-15);
        Assert.DoesNotContain(w.Crossings, c => c.Axis == 0); // the force is parallel to the plane x = 0
    }

    [Fact]
    public void Analyse_parallelForces_centreOfParallelForces()
    {
        // Centre of parallel forces x̄ = ΣF x/ΣF, ȳ = ΣF y/ΣF (Meriam & Kraige, resultants — section from memory):
        // 10 at (0,0), 20 at (4,0), 30 at (0,6) give (80/60, 180/60) = (4/3, 3).
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(0, 0, 0), V(0, 0, -10));
        acc.AddPointForce(V(4, 0, 0), V(0, 0, -20));
        acc.AddPointForce(V(0, 6, 0), V(0, 0, -30));
        WrenchAnalysis w = acc.ResultAt(V(0, 0, 0)).Wrench();
        Assert.Equal(SystemKind.Force, w.Kind);
        PlaneCrossing centre = Assert.IsType<PlaneCrossing>(w.CentreOfParallelForces);
        Assert.Equal("z", centre.AxisName);
        Close.Relative(V(4.0 / 3, 3, 0), centre.Point, 1e-15);
    }

    [Fact]
    public void Analyse_zeroForce_coupleOrNull()
    {
        // Poinsot: R = 0 and M = 0 is a null system; R = 0, M ≠ 0 a pure couple (CHECK-VALUES, wrench facts).
        WrenchAnalysis none = WrenchAnalysis.Analyse(new ForceCoupleSystem(Vector3.Zero, Vector3.Zero, V(1, 2, 3)), 1, 1, true);
        Assert.Equal(SystemKind.Null, none.Kind);
        Assert.Null(none.Pitch);
        WrenchAnalysis couple = WrenchAnalysis.Analyse(new ForceCoupleSystem(Vector3.Zero, V(0, 0, 7), V(1, 2, 3)), 1, 1, true);
        Assert.Equal(SystemKind.Couple, couple.Kind);
        Assert.Equal(V(0, 0, 7), couple.MinimumCouple);
        Assert.Null(couple.AxisPoint);
    }

    [Fact]
    public void Wrench_equalAndOppositeForcesOnDifferentLines_pureCouple()
    {
        // Two equal and opposite forces 2 apart form a couple of moment 2·5 = 10 (any statics text; common practice, no source).
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(1e6, 0, 0), V(0, 5, 0));
        acc.AddPointForce(V(1e6 + 2, 0, 0), V(0, -5, 0));
        LoadReduction red = acc.ResultAt(V(0, 0, 0));
        Assert.Equal(SystemKind.Couple, red.Wrench().Kind);
        Assert.Equal(V(0, 0, -10), red.Moment);
    }
}
