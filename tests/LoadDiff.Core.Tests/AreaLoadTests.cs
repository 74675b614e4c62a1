using System.Collections.Immutable;
using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public partial class AreaLoadTests
{
    private static AreaLoad Area(double pressure, Vector3 gradient, Vector3 origin, Vector3? direction, params Vector3[] polygon) =>
        new("a", [.. polygon], pressure, direction, gradient, origin);

    [Fact]
    public void ContributionAbout_hydrostaticVerticalWall_forceGammaBHSquaredOver2AtThirdHeight()
    {
        // Munson, Young, Okiishi & Huebsch, Fundamentals of Fluid Mechanics, 6th ed., hydrostatic force on a plane
        // surface (pressure prism): F = γ b h²/2 acting h/3 above the base. γ = 9.80 kN/m³ as that source uses.
        double gamma = 9800, b = 4, h = 3;
        // Wall in the x-z plane, base on z = 0, water surface at z = h; p = γ(h − z); the vertex order makes the
        // normal +y, the direction the water pushes.
        AreaLoad wall = Area(0, V(0, 0, -gamma), V(0, 0, h), null, V(0, 0, 0), V(0, 0, h), V(b, 0, h), V(b, 0, 0));
        LoadReduction red = Reduce.About(V(0, 0, 0), wall);
        double f = gamma * b * h * h / 2;
        Close.Relative(V(0, f, 0), red.Force, 1e-12);
        // About the origin: (b/2, 0, h/3) × (0, F, 0) = (−F·h/3, 0, F·b/2).
        Close.Relative(V(-f * h / 3, 0, f * b / 2), red.Moment, 1e-12);
        Close.Relative(h / 3, -red.Moment.X / red.Force.Y, 1e-12);
    }

    [Fact]
    public void ContributionAbout_inclinedSubmergedRectangle_centreOfPressureYcPlusIxcOverYcA()
    {
        // Munson, Young, Okiishi & Huebsch, 6th ed., inclined plane surface: F = γ h_c A, y_R = y_c + I_xc/(y_c A),
        // x_R = x_c (I_xyc = 0 for a rectangle), y measured along the plane from the free surface.
        double gamma = 9800, theta = Math.PI / 3, width = 3, length = 2, top = 10;
        double yc = top + (length / 2), area = width * length, ixc = width * length * length * length / 12;
        double yR = yc + (ixc / (yc * area));
        double force = gamma * yc * Math.Sin(theta) * area;

        Vector3 down = V(0, Math.Cos(theta), -Math.Sin(theta)); // along the plane, into the water
        Vector3 P(double x, double y) => V(x, 0, 0) + (down * y);
        AreaLoad gate = Area(0, V(0, 0, -gamma), V(0, 0, 0), null, P(0, top), P(width, top), P(width, top + length), P(0, top + length));
        LoadReduction red = Reduce.About(V(0, 0, 0), gate);

        Close.Relative(force, red.Force.Length, 1e-12);
        Assert.Equal(SystemKind.Force, red.Wrench().Kind);
        // The origin lies in the plane and the forces are normal to it, so the axis point nearest the origin is
        // where the resultant pierces the plate.
        Vector3 cp = red.Wrench().AxisPoint!.Value;
        Close.Relative(yR, Vector3.Dot(cp, down), 1e-12);
        Close.Relative(width / 2, cp.X, 1e-12);
    }

    [Fact]
    public void ContributionAbout_nonConvexLShapeWithLinearPressure_matchesRectangleIntegrals()
    {
        // L = [0,4]×[0,1] ∪ [0,1]×[1,3], p = 2 + x − y. The vertex order starts at (4,1) so that one fan triangle has
        // negative area. Hand values from integrating the polynomial over each rectangle.
        AreaLoad l = Area(2, V(1, -1, 0), V(0, 0, 0), null,
            V(4, 1, 0), V(1, 1, 0), V(1, 3, 0), V(0, 3, 0), V(0, 0, 0), V(4, 0, 0));
        (double f, double fx, double fy) = RectangleIntegrals(2, 1, -1, 0, 4, 0, 1);
        (double g, double gx, double gy) = RectangleIntegrals(2, 1, -1, 0, 1, 1, 3);
        double total = f + g, firstX = fx + gx, firstY = fy + gy;
        Contribution c = l.ContributionAbout(V(0, 0, 0));
        Close.Relative(V(0, 0, total), c.Force, 1e-14);
        // M = ∫ x × p ẑ dA = (∫p y, −∫p x, 0).
        Close.Relative(V(firstY, -firstX, 0), c.Moment, 1e-14);
    }

    [Fact]
    public void ContributionAbout_rectangleWithPressureMinusOneToOne_grossIsHalfTheArea()
    {
        // p = x − 1 on [0,2]×[0,1]: ∫|p| dA = 2·∫₀¹ (1 − x) dx = 1 = A/2, ∫p dA = 0, and |p| is symmetric about x = 1.
        AreaLoad r = Area(-1, V(1, 0, 0), V(0, 0, 0), null, V(0, 0, 0), V(2, 0, 0), V(2, 1, 0), V(0, 1, 0));
        LoadReduction red = Reduce.About(V(0, 0, 0), r);
        Close.Absolute(V(0, 0, 0), red.Force, 1e-15);
        Close.Relative(1, red.GrossForce, 1e-14);
        Close.Relative(V(1, 0.5, 0), red.Centroid!.Value, 1e-14);
    }

    [Theory]
    [InlineData(-1, 1.0 / 3)]   // p = x + y − 1: ∫|p| = 2·∫ over x + y < 1 of (1 − x − y) = 2·(1/6); zeros at two vertices
    [InlineData(-0.5, 13.0 / 24)] // p = x + y − ½: ∫p = ½, plus twice ∫ over x + y < ½ of (½ − x − y) = 2·(1/48)
    public void ContributionAbout_unitSquareWithSignChangeAcrossDiagonalLine_grossIsHandValue(double p0, double gross)
    {
        AreaLoad sq = Area(p0, V(1, 1, 0), V(0, 0, 0), null, V(0, 0, 0), V(1, 0, 0), V(1, 1, 0), V(0, 1, 0));
        Close.Relative(gross, sq.ContributionAbout(V(0, 0, 0)).GrossForce, 1e-14);
    }

    [Fact]
    public void ContributionAbout_givenDirection_forceAlongNormalisedDirection()
    {
        // Uniform 2 kN/m² on a 4 × 3 plate acting along (0, 0, −5) normalised: F = 24 downward at the plate centre.
        AreaLoad plate = Area(2, V(0, 0, 0), V(0, 0, 0), V(0, 0, -5), V(0, 0, 0), V(4, 0, 0), V(4, 3, 0), V(0, 3, 0));
        LoadReduction red = Reduce.About(V(0, 0, 0), plate);
        Close.Relative(V(0, 0, -24), red.Force, 1e-14);
        // (2, 1.5, 0) × (0, 0, −24) = (−36, 48, 0)
        Close.Relative(V(-36, 48, 0), red.Moment, 1e-14);
    }

    [Fact]
    public void ContributionAbout_starPolygonSplitInTwo_sameResultantMomentAndGross()
    {
        Gen<double> c = Gen.Double[-5, 5];
        Gen.Select(Gen.Double[0.5, 3].Array[8], Gen.Int[2, 6], Gen.Select(c, c, c, Vector3.Create), Gen.Select(c, c, c, Vector3.Create), c)
            .SampleSeeded((radii, k, gradient, point, p0) =>
        {
            // A polygon star-shaped about its centre, in a tilted plane; splitting it through the centre gives two
            // simple polygons with the same orientation.
            Vector3 centre = V(1, -2, 0.5), u = V(1, 0, 0.3), w = V(0, 1, -0.4);
            Vector3[] ring = new Vector3[radii.Length];
            for (int i = 0; i < radii.Length; i++)
            {
                double angle = 2 * Math.PI * i / radii.Length;
                ring[i] = centre + (u * (radii[i] * Math.Cos(angle))) + (w * (radii[i] * Math.Sin(angle)));
            }
            Vector3 origin = V(0.5, 0.5, 0.5);
            AreaLoad whole = Area(p0, gradient, origin, null, ring);
            AreaLoad first = Area(p0, gradient, origin, null, [centre, .. ring[..(k + 1)]]);
            AreaLoad second = Area(p0, gradient, origin, null, [centre, .. ring[k..], ring[0]]);
            Contribution a = whole.ContributionAbout(point), b1 = first.ContributionAbout(point), b2 = second.ContributionAbout(point);
            double scale = a.GrossForce, reach = 10;
            Close.Absolute(a.Force, b1.Force + b2.Force, 1e-12 * scale);
            Close.Absolute(a.Moment, b1.Moment + b2.Moment, 1e-12 * scale * reach);
            Close.Absolute(a.GrossForce, b1.GrossForce + b2.GrossForce, 1e-12 * scale);
        }, iter: 300);
    }

    [Fact]
    public void Equals_sameVerticesInDifferentArrays_equalWithSameHash()
    {
        AreaLoad a = Area(1, V(0, 0, 1), V(0, 0, 0), null, V(0, 0, 0), V(1, 0, 0), V(0, 1, 0));
        AreaLoad b = Area(1, V(0, 0, 1), V(0, 0, 0), null, V(0, 0, 0), V(1, 0, 0), V(0, 1, 0));
        AreaLoad c = Area(1, V(0, 0, 1), V(0, 0, 0), null, V(0, 0, 0), V(1, 0, 0), V(0, 2, 0));
        EqualityContract.Check<LoadItem>(a, b, c, (x, y) => x == y, (x, y) => x != y);
        EqualityContract.Check(a, b, a with { Pressure = 2 }, (x, y) => x == y, (x, y) => x != y);
    }

    // ∫p, ∫p x and ∫p y over [x0,x1]×[y0,y1] for p = c + gx·x + gy·y, by direct integration of the polynomial.
    private static (double Total, double FirstX, double FirstY) RectangleIntegrals(double c, double gx, double gy, double x0, double x1, double y0, double y1)
    {
        double dx = x1 - x0, dy = y1 - y0;
        double ix = ((x1 * x1) - (x0 * x0)) / 2 * dy, iy = ((y1 * y1) - (y0 * y0)) / 2 * dx;
        double ixx = ((x1 * x1 * x1) - (x0 * x0 * x0)) / 3 * dy, iyy = ((y1 * y1 * y1) - (y0 * y0 * y0)) / 3 * dx;
        double ixy = ((x1 * x1) - (x0 * x0)) / 2 * (((y1 * y1) - (y0 * y0)) / 2);
        return ((c * dx * dy) + (gx * ix) + (gy * iy), (c * ix) + (gx * ixx) + (gy * ixy), (c * iy) + (gx * ixy) + (gy * iyy));
    }
}
