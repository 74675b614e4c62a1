using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Reduction;

/// <summary>
/// <see cref="ResultantSums"/>: exact equality over every sum and the anchor, and the move of a hand-made system,
/// M_Q = M_P + (P − Q) × R (any statics text), on small integers where double arithmetic is exact.
/// </summary>
public class ResultantSumsEqualityTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static ResultantSums Sums(Vector3 force, Vector3 moment, Vector3 anchor) =>
        ResultantSums.From(new ForceCoupleSystem(force, moment, anchor));

    private static readonly ResultantSums Base = Sums(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9));

    public static TheoryData<string> Changes => ["fx", "fy", "fz", "mx", "my", "mz", "anchor"];

    private static ResultantSums Changed(string which) => which switch
    {
        "fx" => Sums(V(1.5, 2, 3), V(4, 5, 6), V(7, 8, 9)),
        "fy" => Sums(V(1, 2.5, 3), V(4, 5, 6), V(7, 8, 9)),
        "fz" => Sums(V(1, 2, 3.5), V(4, 5, 6), V(7, 8, 9)),
        "mx" => Sums(V(1, 2, 3), V(4.5, 5, 6), V(7, 8, 9)),
        "my" => Sums(V(1, 2, 3), V(4, 5.5, 6), V(7, 8, 9)),
        "mz" => Sums(V(1, 2, 3), V(4, 5, 6.5), V(7, 8, 9)),
        "anchor" => Sums(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9.5)),
        _ => throw new ArgumentOutOfRangeException(nameof(which)),
    };

    [Fact]
    public void Sums_of_the_same_system_are_equal()
    {
        ResultantSums again = Sums(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9));
        Assert.True(Base.Equals(again));
        Assert.True(Base.Equals((object)again));
        Assert.True(Base == again);
        Assert.False(Base != again);
    }

    [Theory]
    [MemberData(nameof(Changes))]
    public void Sums_differing_in_one_part_are_not_equal(string which)
    {
        ResultantSums other = Changed(which);
        Assert.False(Base.Equals(other));
        Assert.False(Base.Equals((object)other));
        Assert.False(Base == other);
        Assert.True(Base != other);
    }

    [Fact]
    public void Sums_are_not_equal_to_another_type()
    {
        Assert.False(Base.Equals(new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9))));
    }

    [Fact]
    public void The_system_moved_to_another_point_follows_the_transfer_formula()
    {
        // M_Q = M_P + (P − Q) × R with P = (7, 8, 9), Q = (7, 8, 8), R = (1, 2, 3): (0, 0, 1) × (1, 2, 3) = (−2, 1, 0),
        // so M_Q = (4, 5, 6) + (−2, 1, 0) = (2, 6, 6) (cross product by hand, exact in doubles).
        ForceCoupleSystem at = Base.At(V(7, 8, 8));
        Assert.Equal(V(1, 2, 3), at.Force);
        Assert.Equal(V(2, 6, 6), at.Moment);
        Assert.Equal(V(7, 8, 8), at.ReferencePoint);
        Assert.Equal(V(7, 8, 9), Base.Anchor);
    }

    [Fact]
    public void Text_names_the_anchor()
    {
        Assert.Equal("sums about " + V(7, 8, 9), Base.ToString());
    }
}
