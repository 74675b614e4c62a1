namespace LoadDiff.Core.Tests.Support;

/// <summary>A vector of exact fractions.</summary>
public readonly record struct FractionVector(Fraction X, Fraction Y, Fraction Z)
{
    public static FractionVector Zero => new(Fraction.Zero, Fraction.Zero, Fraction.Zero);

    public static FractionVector From(Vector3 v) => new(Fraction.FromDouble(v.X), Fraction.FromDouble(v.Y), Fraction.FromDouble(v.Z));

    public static FractionVector operator +(FractionVector a, FractionVector b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    public static FractionVector operator -(FractionVector a, FractionVector b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    public static FractionVector operator *(FractionVector a, Fraction s) => new(a.X * s, a.Y * s, a.Z * s);

    public static FractionVector Cross(FractionVector a, FractionVector b) =>
        new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    public static Fraction Dot(FractionVector a, FractionVector b) => (a.X * b.X) + (a.Y * b.Y) + (a.Z * b.Z);

    public Vector3 ToVector3() => Vector3.Create(X.ToDouble(), Y.ToDouble(), Z.ToDouble());
}

/// <summary>
/// The weighted minimum-norm distribution solved independently of the code under test, in exact fractions.
/// Minimising Σ|F_i|²/w_i + Σ|C_i|²/(w_i ℓ²) subject to ΣF_i = R and Σ d_i × F_i + ΣC_i = M_c (d_i = r_i − c, c the plain
/// centroid of the points, ℓ² = Σ|d_i|²/n) with multipliers λ (force rows) and μ (moment rows): the gradient of
/// μ·(d_i × F_i) with respect to F_i is μ × d_i, so the optimum is F_i = w_i (λ + μ × d_i) and C_i = w_i ℓ² μ
/// (Lagrange multipliers; any textbook on constrained least squares). The six unknowns λ, μ are fitted to the six
/// equilibrium equations by Gaussian elimination on fractions. F is unique even where the 6 × 6 system is singular
/// (collinear points): the objective is strictly convex in F, so any solution of a consistent system gives it; a
/// free unknown is set to 0.
/// </summary>
public static class MinimumNormReference
{
    public sealed record Solution(FractionVector[] Forces, FractionVector[] Couples, int Rank, bool Consistent,
        FractionVector Centroid, Fraction LengthSquared);

    /// <summary>Points (position, weight); the load as its force and its moment about the origin.</summary>
    public static Solution Solve(IReadOnlyList<(Vector3 At, double Weight)> points, bool couples, Vector3 force, Vector3 momentAboutOrigin)
    {
        int n = points.Count;
        FractionVector[] r = [.. points.Select(p => FractionVector.From(p.At))];
        Fraction[] w = [.. points.Select(p => Fraction.FromDouble(p.Weight))];
        FractionVector c = r.Aggregate(FractionVector.Zero, (s, v) => s + v) * Fraction.Of(1, n);
        FractionVector[] d = [.. r.Select(v => v - c)];
        Fraction l2 = d.Aggregate(Fraction.Zero, (s, v) => s + FractionVector.Dot(v, v)) * Fraction.Of(1, n);
        FractionVector rf = FractionVector.From(force);
        // M_c = M_O + (O − c) × R
        FractionVector mc = FractionVector.From(momentAboutOrigin) - FractionVector.Cross(c, rf);

        (FractionVector[] F, FractionVector[] C) Forces(Fraction[] u)
        {
            var lambda = new FractionVector(u[0], u[1], u[2]);
            var mu = new FractionVector(u[3], u[4], u[5]);
            FractionVector[] f = [.. d.Select((di, i) => (lambda + FractionVector.Cross(mu, di)) * w[i])];
            FractionVector[] cc = [.. w.Select(wi => couples ? mu * (wi * l2) : FractionVector.Zero)];
            return (f, cc);
        }

        (FractionVector Force, FractionVector Moment) Equilibrium(FractionVector[] f, FractionVector[] cc)
        {
            FractionVector sf = FractionVector.Zero, sm = FractionVector.Zero;
            for (int i = 0; i < n; i++)
            {
                sf += f[i];
                sm += FractionVector.Cross(d[i], f[i]) + cc[i];
            }
            return (sf, sm);
        }

        // The 6 × 6 matrix of the map (λ, μ) → (ΣF, ΣM_c), column by column.
        var k = new Fraction[6, 7];
        for (int col = 0; col < 6; col++)
        {
            var e = new Fraction[6];
            for (int j = 0; j < 6; j++)
            {
                e[j] = j == col ? Fraction.One : Fraction.Zero;
            }
            (FractionVector[] f, FractionVector[] cc) = Forces(e);
            (FractionVector sf, FractionVector sm) = Equilibrium(f, cc);
            Fraction[] column = [sf.X, sf.Y, sf.Z, sm.X, sm.Y, sm.Z];
            for (int row = 0; row < 6; row++)
            {
                k[row, col] = column[row];
            }
        }
        Fraction[] b = [rf.X, rf.Y, rf.Z, mc.X, mc.Y, mc.Z];
        for (int row = 0; row < 6; row++)
        {
            k[row, 6] = b[row];
        }

        // Gauss–Jordan elimination; exact, so any non-zero pivot will do.
        int rank = 0;
        var pivotColumn = new int[6];
        for (int col = 0; col < 6 && rank < 6; col++)
        {
            int p = Enumerable.Range(rank, 6 - rank).FirstOrDefault(i => !k[i, col].IsZero, -1);
            if (p < 0)
            {
                continue;
            }
            for (int j = 0; j < 7; j++)
            {
                (k[rank, j], k[p, j]) = (k[p, j], k[rank, j]);
            }
            Fraction pivot = k[rank, col];
            for (int j = 0; j < 7; j++)
            {
                k[rank, j] /= pivot;
            }
            for (int i = 0; i < 6; i++)
            {
                if (i != rank && !k[i, col].IsZero)
                {
                    Fraction factor = k[i, col];
                    for (int j = 0; j < 7; j++)
                    {
                        k[i, j] -= factor * k[rank, j];
                    }
                }
            }
            pivotColumn[rank++] = col;
        }
        bool consistent = Enumerable.Range(rank, 6 - rank).All(i => k[i, 6].IsZero);
        var u = new Fraction[6];
        for (int j = 0; j < 6; j++)
        {
            u[j] = Fraction.Zero;
        }
        for (int i = 0; i < rank; i++)
        {
            u[pivotColumn[i]] = k[i, 6];
        }
        (FractionVector[] forces, FractionVector[] couplesOut) = Forces(u);
        return new Solution(forces, couplesOut, rank, consistent, c, l2);
    }
}
