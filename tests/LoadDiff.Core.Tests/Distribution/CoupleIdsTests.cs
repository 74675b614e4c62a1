using LoadDiff.Core.Distribution;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Distribution;

public class CoupleIdsTests
{
    private static SupportPoint[] Points(params string[] ids) => [.. ids.Select((id, i) => new SupportPoint(id, V(i, 0, 0), 1))];

    [Fact]
    public void For_distinct_points_each_couple_is_named_id_couple()
    {
        Assert.Equal(["A-couple", "B-couple"], CoupleIds.For(Points("A", "B")));
    }

    [Fact]
    public void For_a_point_named_like_another_points_couple_the_first_free_number_is_appended()
    {
        Assert.Equal(["S1-couple-2", "S1-couple-couple"], CoupleIds.For(Points("S1", "S1-couple")));
        Assert.Equal(["S1-couple-3", "S1-couple-couple", "S1-couple-2-couple"], CoupleIds.For(Points("S1", "S1-couple", "S1-couple-2")));
    }

    [Fact]
    public void For_any_ids_every_id_of_a_distributed_case_is_distinct()
    {
        string[] ids = ["a", "a-couple", "a-couple-2", "a-couple-couple", "b", "b-couple-2"];
        IReadOnlyList<string> couples = CoupleIds.For(Points(ids));
        string[] all = [.. ids, .. couples];
        Assert.Equal(all.Length, all.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void For_points_sharing_an_id_throws()
    {
        Assert.Throws<ArgumentException>(() => CoupleIds.For(Points("A", "A")));
    }
}
