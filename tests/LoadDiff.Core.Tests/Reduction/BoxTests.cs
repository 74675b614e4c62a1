using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Reduction;

/// <summary>Box arithmetic, by hand (small integers: every value is exact).</summary>
public class BoxTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static readonly Box Unit = new(V(0, 0, 0), V(1, 2, 3));

    [Fact]
    public void Union_eitherNull_isTheOther_bothNull_isNull()
    {
        Assert.Same(Unit, Box.Union(Unit, null));
        Assert.Same(Unit, Box.Union(null, Unit));
        Assert.Null(Box.Union(null, null));
    }

    [Fact]
    public void Union_disjointBoxes_spansBoth()
    {
        var far = new Box(V(5, -4, 10), V(6, -3, 11));
        Box expected = new(V(0, -4, 0), V(6, 2, 11));
        Assert.Equal(expected, Box.Union(Unit, far));
        Assert.Equal(expected, Box.Union(far, Unit));
    }

    [Fact]
    public void Union_nestedBoxes_isTheOuter()
    {
        var inner = new Box(V(0.25, 0.5, 1), V(0.75, 1.5, 2));
        Assert.Equal(Unit, Box.Union(Unit, inner));
        Assert.Equal(Unit, Box.Union(inner, Unit));
        // overlapping, neither inside the other: each axis takes its own extremes
        Assert.Equal(new Box(V(-1, 0, 0), V(1, 5, 3)), Box.Union(Unit, new Box(V(-1, 1, 1), V(0.5, 5, 2))));
    }

    [Fact]
    public void Corners_solidBox_eightDistinct_theAllMinMaxCombinations()
    {
        IReadOnlyList<Vector3> corners = Unit.Corners;
        Assert.Equal(8, corners.Count);
        Assert.Equal(8, corners.Distinct().Count());
        HashSet<Vector3> expected = [];
        foreach (double x in new[] { 0.0, 1 })
        {
            foreach (double y in new[] { 0.0, 2 })
            {
                foreach (double z in new[] { 0.0, 3 })
                {
                    expected.Add(V(x, y, z));
                }
            }
        }
        Assert.True(expected.SetEquals(corners)); // order irrelevant
    }

    [Fact]
    public void Corners_flatBox_four_line_two_point_one()
    {
        Assert.True(new HashSet<Vector3> { V(0, 0, 5), V(2, 0, 5), V(0, 3, 5), V(2, 3, 5) }.SetEquals(new Box(V(0, 0, 5), V(2, 3, 5)).Corners));
        Assert.Equal(4, new Box(V(0, 0, 5), V(2, 3, 5)).Corners.Count);
        Assert.Equal(4, new Box(V(1, -1, 0), V(1, 1, 7)).Corners.Count); // flat in x
        Assert.True(new HashSet<Vector3> { V(0, 0, 0), V(0, 4, 0) }.SetEquals(new Box(V(0, 0, 0), V(0, 4, 0)).Corners));
        Assert.Equal(2, new Box(V(0, 0, 0), V(0, 4, 0)).Corners.Count);
        Assert.Equal([V(3, 3, 3)], new Box(V(3, 3, 3), V(3, 3, 3)).Corners);
    }

    [Fact]
    public void Including_pointInside_outside_andOnOneAxis()
    {
        Assert.Equal(Unit, Unit.Including(V(0.5, 1, 1.5)));
        Assert.Equal(new Box(V(-1, 0, 0), V(1, 5, 3)), Unit.Including(V(-1, 5, 2)));
        Assert.Equal(new Box(V(0, 0, -2), V(1, 2, 3)), Unit.Including(V(1, 2, -2)));
    }

    [Fact]
    public void Centre_isTheMidpoint()
    {
        Assert.Equal(V(0.5, 1, 1.5), Unit.Centre);
        Assert.Equal(V(2, -1, 7), new Box(V(1, -3, 4), V(3, 1, 10)).Centre);
        Assert.Equal(V(3, 3, 3), new Box(V(3, 3, 3), V(3, 3, 3)).Centre);
    }

    [Fact]
    public void Diagonal_threeFourTwelve_isThirteen()
    {
        // 3² + 4² + 12² = 169 = 13² (Pythagorean quadruple)
        Assert.Equal(13, new Box(V(1, 1, 1), V(4, 5, 13)).Diagonal);
        Assert.Equal(13, new Box(V(-3, -4, -12), V(0, 0, 0)).Diagonal);
        Assert.Equal(0, new Box(V(3, 3, 3), V(3, 3, 3)).Diagonal);
    }
}
