using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

/// <summary>Items of zero magnitude (a zero nodal force, a line of zero intensity) are no loaded geometry (SPEC §4).</summary>
public partial class SectionProfileTests
{
    private static readonly LoadItem[] TwoTipLoads =
    [
        new PointForce("P1", V(0, 0, 0), V(0, 0, -10)),
        new PointForce("P2", V(2, 0, 0), V(0, 0, -10)),
    ];

    private static readonly LoadItem FarZeroLine = new LineLoad("zero", V(998, 0, 0), V(1000, 0, 0), Vector3.Zero, Vector3.Zero);

    [Fact]
    public void Extent_zeroLineLoadFarAway_extendsNothing()
    {
        Assert.Equal((0.0, 2.0), SectionProfile.Extent(AlongX, [.. TwoTipLoads, FarZeroLine]));
        Assert.Equal((0.0, 2.0), SectionProfile.Extent(AlongX, [new WeightedItems([.. TwoTipLoads, FarZeroLine], 1)]));
        Assert.Null(SectionProfile.Extent(AlongX, [FarZeroLine, new PointForce("z", V(5, 0, 0), Vector3.Zero)]));
    }

    [Fact]
    public void Extent_lineLoadOfZeroIntensityAtOneEnd_isLoadedOverItsWholeLength()
    {
        // A 0 → 3 kN/m ramp is a load (∫|w| = 3 kN over 2 m, trapezoid formula): its whole length counts.
        var ramp = new LineLoad("ramp", V(998, 0, 0), V(1000, 0, 0), Vector3.Zero, V(0, 0, -3));
        Assert.Equal((0.0, 1000.0), SectionProfile.Extent(AlongX, [.. TwoTipLoads, ramp]));
    }

    [Fact]
    public void Stations_zeroItemInsideTheRange_addsNoBoundary()
    {
        var zero = new PointForce("z", V(0.7, 0, 0), Vector3.Zero);
        var zeroLine = new LineLoad("zl", V(1.3, 0, 0), V(1.9, 0, 0), Vector3.Zero, Vector3.Zero);
        IReadOnlyList<double> s = SectionProfile.Stations(AlongX, 0, 2, 3, [.. TwoTipLoads, zero, zeroLine], out bool all);
        Assert.True(all);
        Assert.Equal([0, 1, 2], s);
    }

    [Fact]
    public void Compare_zeroLineLoadFarAwayInEitherSet_rangeEndsAtTheLastLoadAndTheProfileIsUnchanged()
    {
        var substitute = new LoadItem[] { new PointForce("P", V(1, 0, 0), V(0, 0, -20)) };
        SectionComparison plain = SectionComparison.Compare(AlongX, null, null, 5, [new WeightedItems(TwoTipLoads, 1)], [new WeightedItems(substitute, 1)]);
        SectionComparison zeroed = SectionComparison.Compare(AlongX, null, null, 5,
            [new WeightedItems([.. TwoTipLoads, FarZeroLine], 1)], [new WeightedItems([.. substitute, FarZeroLine], 1)]);
        Assert.Equal(2, zeroed.Stations[^1].S);
        Assert.Equal(plain.Stations.Select(x => x.S), zeroed.Stations.Select(x => x.S));
        for (int i = 0; i < plain.Stations.Count; i++)
        {
            // Cantilever tip loads, M = P·x (AISC Manual, Beam Diagrams and Formulas; case number from memory): the
            // original's |M(s)| = 10·s up to s = 2, whatever lies beyond.
            double x = zeroed.Stations[i].S;
            Close.Absolute(V(0, -10 * x, 0), zeroed.Stations[i].Original.Moment, 1e-12 * 20);
            Assert.Equal(plain.Stations[i].Substitute.Moment, zeroed.Stations[i].Substitute.Moment);
        }
        Assert.Equal((0.0, 2.0), zeroed.OriginalExtent);
    }

    [Fact]
    public void Compute_zeroItemsOnly_giveAZeroProfile()
    {
        IReadOnlyList<ForceCoupleSystem> p = Profile(AlongX, [0, 999, 1000], FarZeroLine, new PointForce("z", V(999, 0, 0), Vector3.Zero));
        Assert.All(p, x => Assert.True(x.Force.IsZero && x.Moment.IsZero, x.ToString()));
    }
}
