using LoadDiff.Core.Loads;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public class MeshTriangleTests
{
    [Fact]
    public void ContributionAbout_integerTriangleLinearPressure_matchesHandIntegrals()
    {
        // Triangle (0,0), (4,0), (0,3), pressures 1, 2, 6, i.e. p = 1 + x/4 + 5y/3; A = 6.
        // ∫p = A·p(centroid) = 6·p(4/3, 1) = 18.
        // ∫p x = ∫x + ∫x²/4 + (5/3)∫xy = 8 + 16/4 + (5/3)·6 = 22; ∫p y = ∫y + ∫xy/4 + (5/3)∫y² = 6 + 1.5 + 15 = 22.5,
        // using the triangle moments ∫x = A x̄, ∫x² = (A/12)(Σx_i² + (Σx_i)²) and ∫xy = (A/12)(Σx_i·y_i + (Σx_i)(Σy_i))
        // (here Σx_i·y_i = 0: every vertex lies on an axis; the next test needs that term).
        var t = new MeshTriangle("m", V(0, 0, 0), V(4, 0, 0), V(0, 3, 0), 1, 2, 6, null);
        Contribution c = t.ContributionAbout(V(0, 0, 0));
        Close.Relative(V(0, 0, 18), c.Force, 1e-15);
        // M = (∫p x) × ẑ = (22.5, −22, 0)
        Close.Relative(V(22.5, -22, 0), c.Moment, 1e-15);
        Close.Relative(18, c.GrossForce, 1e-15);
        Close.Relative(V(22, 22.5, 0), c.GrossFirstMoment, 1e-15);
    }

    [Fact]
    public void ContributionAbout_triangleOffTheAxes_productMomentNeedsTheSumOfVertexProducts()
    {
        // Triangle (1,1), (3,1), (1,4), A = 3, with p = 2 + x + y (vertex values 4, 6, 7). Closed-form moments of a
        // triangle (exact for polynomials of degree two; checked against ∫λ1^a λ2^b λ3^c dA = 2A·a!b!c!/(a+b+c+2)!):
        // ∫x = A x̄ = 5, ∫y = 6, ∫x² = (A/12)(Σx_i² + (Σx_i)²) = 9, ∫y² = (A/12)(Σy_i² + (Σy_i)²) = 13.5,
        // ∫xy = (A/12)(Σx_i·y_i + (Σx_i)(Σy_i)) = (3/12)(8 + 30) = 9.5 (without Σx_i·y_i it would be 7.5).
        // ∫p = A·p(centroid) = 3·(2 + 5/3 + 2) = 17; ∫p x = 2·5 + 9 + 9.5 = 28.5; ∫p y = 2·6 + 9.5 + 13.5 = 35.
        double[] xs = [1, 3, 1], ys = [1, 1, 4];
        double area = 3;
        double ixy = area / 12 * ((xs[0] * ys[0]) + (xs[1] * ys[1]) + (xs[2] * ys[2]) + (xs.Sum() * ys.Sum()));
        Assert.Equal(9.5, ixy);
        Assert.NotEqual(9.5, area / 12 * xs.Sum() * ys.Sum()); // the formula without the vertex products is off here
        var t = new MeshTriangle("m", V(1, 1, 0), V(3, 1, 0), V(1, 4, 0), 4, 6, 7, null);
        var a = new AreaLoad("a", [V(1, 1, 0), V(3, 1, 0), V(1, 4, 0)], 2, null, V(1, 1, 0), V(0, 0, 0));
        foreach (Contribution c in new[] { t.ContributionAbout(V(0, 0, 0)), a.ContributionAbout(V(0, 0, 0)) })
        {
            Close.Relative(V(0, 0, 17), c.Force, 1e-15);
            // M = ∫ (x, y, 0) × p ẑ dA = (∫p y, −∫p x, 0); p > 0, so the gross first moment is (∫p x, ∫p y, 0).
            Close.Relative(V(35, -28.5, 0), c.Moment, 1e-15);
            Close.Relative(17, c.GrossForce, 1e-15);
            Close.Relative(V(28.5, 35, 0), c.GrossFirstMoment, 1e-15);
        }
    }

    [Fact]
    public void ContributionAbout_pressureChangesSign_grossIsHandValue()
    {
        // Triangle (0,0), (1,0), (0,1) with p = −1 + 2x + 2y (vertex values −1, 1, 1): the zero line x + y = ½ cuts off a
        // corner of area 1/8 where ∫|p| = (1/8)(1 + 0 + 0)/3 = 1/24; ∫p over the whole triangle is ½·(1/3) = 1/6, so
        // ∫p over the rest is 1/6 + 1/24 = 5/24 and ∫|p| = 1/24 + 5/24 = 1/4.
        var t = new MeshTriangle("m", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), -1, 1, 1, null);
        Contribution c = t.ContributionAbout(V(0, 0, 0));
        Close.Relative(V(0, 0, 1.0 / 6), c.Force, 1e-15);
        Close.Relative(0.25, c.GrossForce, 1e-14);
    }

    [Fact]
    public void ContributionAbout_reversedVertexOrder_forceReversesAlongNormal()
    {
        // The right-hand rule of the vertex order sets the normal: reversing it reverses the force of a positive pressure.
        var t = new MeshTriangle("m", V(0, 0, 0), V(0, 3, 0), V(4, 0, 0), 1, 6, 2, null);
        Close.Relative(V(0, 0, -18), t.ContributionAbout(V(0, 0, 0)).Force, 1e-15);
    }

    [Fact]
    public void ContributionAbout_sameAsAreaLoadOnSameTriangle_equal()
    {
        // Two routes to one integral: a mesh triangle with vertex pressures, and an area load whose linear field takes
        // the same values at the vertices (p = 1 + x/4 + 5y/3 on the triangle above, lifted to z = 2).
        var t = new MeshTriangle("m", V(0, 0, 2), V(4, 0, 2), V(0, 3, 2), 1, 2, 6, null);
        var a = new AreaLoad("a", [V(0, 0, 2), V(4, 0, 2), V(0, 3, 2)], 1, null, V(0.25, 5.0 / 3, 0), V(0, 0, 2));
        Contribution ct = t.ContributionAbout(V(1, 1, 1)), ca = a.ContributionAbout(V(1, 1, 1));
        Close.Relative(ct.Force, ca.Force, 1e-14);
        Close.Relative(ct.Moment, ca.Moment, 1e-14);
    }
}
