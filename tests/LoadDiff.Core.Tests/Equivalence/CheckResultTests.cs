using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The overall verdict of <see cref="CheckResult"/> (SPEC §4, exit codes): equivalent only when every compared case and
/// combination is, and the section-cut gate passes when it was asked for. Inputs are invented; a case passes or fails here
/// by exact arithmetic (identical loads give a residual of exactly 0; a 10 kN load left out gives 10 kN).
/// </summary>
public class CheckResultTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Down(string id, double x, double fz) => new(id, V(x, 0, 0), V(0, 0, -fz));

    private static CheckSide Side(string name, params (string Case, LoadItem[] Items)[] cases)
    {
        var sink = new ReductionSink(topContributors: 16);
        foreach ((string caseName, LoadItem[] items) in cases)
        {
            sink.BeginCase(caseName, null);
            foreach (LoadItem item in items)
            {
                sink.Item(item);
            }
            sink.EndCase();
        }
        return new CheckSide(name, sink);
    }

    private static CheckResult Run(CheckSide a, CheckSide b, ToleranceSpec? tolerance = null) =>
        EquivalenceCheck.Run(a, b, UnitSystem.Si, Vector3.Zero, "origin", tolerance ?? ToleranceSpec.Default, []);

    private static readonly LoadItem[] Dead = [Down("g1", 0, 10), Down("g2", 4, 10)];

    private static CheckResult Passing() => Run(Side("a.loads.json", ("G", Dead)), Side("b.loads.json", ("G", Dead)));

    // The gate of one case: largest |ΔM| against rel × peak (SectionGateCase); 10 kN·m against 0.05 × 20 = 1 kN·m fails.
    private static SectionGateVerdict Gate(double deviation) =>
        new(SectionAxis.Create(Vector3.Zero, Vector3.UnitX), 0.05,
            [new SectionGateCase("G", EntryKind.Case, 0.05, 20, (0, 4), deviation, 2)]);

    [Fact]
    public void Every_case_equivalent_and_no_gate_is_equivalent()
    {
        CheckResult r = Passing();
        Assert.True(r.CasesEquivalent);
        Assert.True(r.Equivalent);
        Assert.Equal(0, r.FailureCount);
        Assert.Equal("check a.loads.json against b.loads.json: equivalent", r.ToString());
    }

    [Fact]
    public void A_failing_section_gate_makes_an_equivalent_set_of_cases_not_equivalent()
    {
        CheckResult r = Passing() with { SectionGate = Gate(10) };
        Assert.True(r.CasesEquivalent);
        Assert.False(r.Equivalent);
        Assert.Equal("check a.loads.json against b.loads.json: not equivalent", r.ToString());
        Assert.True((Passing() with { SectionGate = Gate(0.5) }).Equivalent); // 0.5 ≤ 1 kN·m
    }

    [Fact]
    public void A_passing_gate_does_not_rescue_a_failing_case()
    {
        // The substitute leaves out g2: ΔR = 10 kN ≫ 1e-3 × 20 kN.
        CheckResult r = Run(Side("a", ("G", Dead), ("Q", [Down("q", 2, 4)])), Side("b", ("G", [Down("g1", 0, 10)]), ("Q", [Down("q", 2, 4)])))
            with { SectionGate = Gate(0) };
        Assert.False(r.CasesEquivalent);
        Assert.False(r.Equivalent);
        Assert.Equal(1, r.FailureCount);
        Assert.Equal([false, true], r.Comparisons.Select(c => c.Equivalent));
    }

    [Fact]
    public void Failures_are_counted_over_cases_and_cases_in_one_file_only()
    {
        CheckResult r = Run(
            Side("a", ("G", Dead), ("S", [Down("s", 1, 3)]), ("Q", [Down("q", 2, 4)])),
            Side("b", ("G", [Down("g1", 0, 10)]), ("Q", [Down("q", 2, 4)]), ("W", [Down("w", 1, 1)])));
        // G fails (g2 left out), S and W are each in one file only; Q is identical.
        Assert.Equal(3, r.FailureCount);
        Assert.False(r.Equivalent);
    }

    [Fact]
    public void A_check_with_nothing_compared_is_not_equivalent()
    {
        // Nothing compared proves nothing: an empty pair of files must not pass.
        CheckResult r = Run(new CheckSide("a", new ReductionSink()), new CheckSide("b", new ReductionSink()));
        Assert.Empty(r.Comparisons);
        Assert.False(r.CasesEquivalent);
        Assert.False(r.Equivalent);
        Assert.Equal(0, r.FailureCount);
    }

    [Fact]
    public void The_default_relative_tolerance_is_recognised()
    {
        Assert.True(Passing().DefaultRelative);
        Assert.False(Run(Side("a", ("G", Dead)), Side("b", ("G", Dead)), new ToleranceSpec(1e-4, 0, 0)).DefaultRelative);
    }
}
