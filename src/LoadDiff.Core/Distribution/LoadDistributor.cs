using LoadDiff.Core.Reduction;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace LoadDiff.Core.Distribution;

/// <summary>
/// Replaces a force-couple system by forces at given points (and, optionally, couples), statically equivalent by
/// construction and of minimum weighted norm: minimise Σ|F_i|²/w_i (+ Σ|C_i|²/(w_i ℓ²)) subject to ΣF_i = R and
/// Σ(r_i − c) × F_i + ΣC_i = M_c. For equal in-plane points under in-plane load this is the elastic method of bolt
/// groups (direct share plus torsion M·r/J about the centroid).
/// </summary>
/// <remarks>
/// The six equilibrium equations are written about the centroid c of the points, with the moment rows divided by
/// ℓ, the RMS distance of the points from c, so that force and moment rows are of one size. The minimum-norm
/// solution is the truncated-SVD pseudo-inverse: singular values below <see cref="RankTolerance"/>·σ_max count as zero,
/// which is how collinear or coincident points show up (rank below 6). The thin SVD of the 6 × m matrix A is taken
/// from a thin QR factorisation Aᵀ = QR and the SVD of the 6 × 6 factor R, so no m × m matrix is ever formed.
/// </remarks>
public sealed class LoadDistributor
{
    /// <summary>Singular values below this fraction of the largest count as zero.</summary>
    public const double RankTolerance = 1e-10;

    /// <summary>A residual of the equilibrium equations below this fraction of the load's scale is rounding.</summary>
    public const double FeasibilityTolerance = 1e-9;

    /// <summary>
    /// The largest <see cref="ConditionNumber"/> a distribution is trusted with: the forces can be this many times the
    /// load, and as many of the 16 digits of a double are lost in forming them; beyond 1e8 fewer than half remain, and
    /// the points are, for this load, practically coincident or on one line (common practice, no source).
    /// </summary>
    public const double ConditionLimit = 1e8;

    private readonly SupportPoint[] _points;
    private readonly bool _couples;
    private readonly Matrix<double> _right;    // m × 6: columns of V (right singular vectors of A) for the kept values
    private readonly Vector<double> _inverse;  // 1/σ for kept values, 0 otherwise
    private readonly Matrix<double> _left;     // 6 × 6: U (left singular vectors of A)
    private readonly Vector<double> _sigma;    // singular values of A
    private readonly double[] _scale;          // x = scale ⊙ y: the weighting

    /// <summary>Prepares the distribution onto <paramref name="points"/> (the factorisation is done once for all cases).</summary>
    /// <exception cref="ArgumentException">No points, or a weight that is not a positive finite number.</exception>
    public LoadDistributor(IReadOnlyList<SupportPoint> points, bool allowCouples)
    {
        Guard.NotNull(points);
        Guard.That(points.Count > 0, "At least one support point is needed.", nameof(points));
        foreach (SupportPoint p in points)
        {
            Guard.Positive(p.Weight, nameof(points));
        }
        _points = [.. points];
        _couples = allowCouples;
        Vector3 sum = Vector3.Zero;
        foreach (SupportPoint p in _points)
        {
            sum += p.At;
        }
        Centroid = sum / _points.Length;
        double r2 = 0;
        foreach (SupportPoint p in _points)
        {
            r2 += (p.At - Centroid).LengthSquared;
        }
        LengthScale = r2 > 0 ? Math.Sqrt(r2 / _points.Length) : 1;

        int n = _points.Length, m = (allowCouples ? 6 : 3) * n;
        _scale = new double[m];
        Matrix<double> a = Matrix<double>.Build.Dense(6, m);
        for (int i = 0; i < n; i++)
        {
            double w = Math.Sqrt(_points[i].Weight);
            Vector3 d = (_points[i].At - Centroid) / LengthScale;
            for (int k = 0; k < 3; k++)
            {
                _scale[(3 * i) + k] = w;
                a[k, (3 * i) + k] = w;
            }
            // Moment rows: (d × F)/ℓ with d in units of ℓ, i.e. the skew matrix of d.
            a[3, (3 * i) + 1] = -d.Z * w;
            a[3, (3 * i) + 2] = d.Y * w;
            a[4, (3 * i) + 0] = d.Z * w;
            a[4, (3 * i) + 2] = -d.X * w;
            a[5, (3 * i) + 0] = -d.Y * w;
            a[5, (3 * i) + 1] = d.X * w;
            if (allowCouples)
            {
                // Couple unknowns are C/(ℓ·√w), so that Σ|C|²/(w ℓ²) is the norm they add.
                for (int k = 0; k < 3; k++)
                {
                    _scale[(3 * n) + (3 * i) + k] = w * LengthScale;
                    a[3 + k, (3 * n) + (3 * i) + k] = w;
                }
            }
        }
        (_left, _sigma, _inverse, _right, Rank) = ThinPseudoInverse(a);
    }

    /// <summary>The centroid of the points, about which the equations are set up (length units).</summary>
    public Vector3 Centroid { get; }

    /// <summary>ℓ, the RMS distance of the points from their centroid (1 when they coincide).</summary>
    public double LengthScale { get; }

    /// <summary>Rank of the equilibrium equations: 6 when the points can carry any load.</summary>
    public int Rank { get; }

    /// <summary>The points, in order.</summary>
    public IReadOnlyList<SupportPoint> Points => _points;

    /// <summary>
    /// σ_max/σ_min (over the singular values kept, see <see cref="Rank"/>) of the equilibrium equations with the moment
    /// rows divided by L = max(ℓ, ρ), ρ the distance from the centroid to the farthest corner of <paramref name="loaded"/>
    /// (the box of a case's loaded geometry; null for a case of free couples only). The equations are solved with the
    /// moments over ℓ, which keeps them well scaled whatever the points' spread, but a load at lever arm ρ makes forces
    /// up to ρ/ℓ times itself: this number is that amplification, dimensionless and the same in any units.
    /// </summary>
    public double ConditionNumber(Box? loaded)
    {
        double reach = 0;
        if (loaded is not null)
        {
            foreach (Vector3 corner in loaded.Corners)
            {
                reach = Math.Max(reach, (corner - Centroid).Length);
            }
        }
        double shrink = LengthScale / Math.Max(LengthScale, reach);
        // A ≈ U_r S_r W_rᵀ with W_r orthonormal, so D·A (D scaling the moment rows) has the singular values of D·U_r·S_r.
        var kept = Enumerable.Range(0, _sigma.Count).Where(i => _inverse[i] != 0).ToArray();
        Matrix<double> scaled = Matrix<double>.Build.Dense(6, kept.Length, (row, j) =>
            _left[row, kept[j]] * _sigma[kept[j]] * (row >= 3 ? shrink : 1));
        Vector<double> s = scaled.Svd(computeVectors: false).S;
        return s.Maximum() / s.Minimum();
    }

    /// <summary>
    /// Distributes <paramref name="system"/>; <paramref name="forceScale"/> and <paramref name="momentScale"/> (the
    /// load's gross magnitudes) decide what residual is rounding and what the points cannot carry.
    /// </summary>
    public Distribution Distribute(ForceCoupleSystem system, double forceScale, double momentScale)
    {
        ForceCoupleSystem s = system.MoveTo(Centroid);
        Vector<double> b = Vector<double>.Build.DenseOfArray(
        [
            s.Force.X, s.Force.Y, s.Force.Z,
            s.Moment.X / LengthScale, s.Moment.Y / LengthScale, s.Moment.Z / LengthScale,
        ]);
        // y = V Σ⁺ Uᵀ b, then x = scale ⊙ y.
        Vector<double> utb = _left.TransposeThisAndMultiply(b);
        Vector<double> y = _right * utb.PointwiseMultiply(_inverse);
        int n = _points.Length;
        var forces = new Vector3[n];
        var couples = new Vector3[n];
        for (int i = 0; i < n; i++)
        {
            forces[i] = Vector3.Create(y[3 * i] * _scale[3 * i], y[(3 * i) + 1] * _scale[(3 * i) + 1], y[(3 * i) + 2] * _scale[(3 * i) + 2]);
            if (_couples)
            {
                int o = 3 * n;
                couples[i] = Vector3.Create(y[o + (3 * i)] * _scale[o + (3 * i)], y[o + (3 * i) + 1] * _scale[o + (3 * i) + 1], y[o + (3 * i) + 2] * _scale[o + (3 * i) + 2]);
            }
        }
        CleanNoise(forces);
        CleanNoise(couples);

        // The residual of the equations, from the forces themselves in double-double.
        var acc = new ReductionAccumulator(Centroid);
        for (int i = 0; i < n; i++)
        {
            acc.AddPointForce(_points[i].At, forces[i]);
            acc.AddCouple(couples[i]);
        }
        ForceCoupleSystem got = acc.ResultAt(Centroid).System;
        Vector3 dF = s.Force - got.Force, dM = s.Moment - got.Moment;
        // A pure couple has no force scale of its own: its forces are of size M/ℓ, and so is their rounding.
        double ms = Math.Max(momentScale, s.Moment.Length);
        double fs = Math.Max(Math.Max(forceScale, s.Force.Length), ms / LengthScale);
        bool feasible = dF.Length <= FeasibilityTolerance * fs && dM.Length <= FeasibilityTolerance * Math.Max(ms, fs * LengthScale);
        return new Distribution(forces, couples, Rank, feasible ? Vector3.Zero : dF, feasible ? Vector3.Zero : dM, feasible);
    }

    // Components below 1e-14 of the largest are rounding noise of the SVD; dropping them changes the resultant by less
    // than the rounding of the solution itself.
    private static void CleanNoise(Vector3[] values)
    {
        double max = 0;
        foreach (Vector3 v in values)
        {
            max = Math.Max(max, Math.Max(Math.Abs(v.X), Math.Max(Math.Abs(v.Y), Math.Abs(v.Z))));
        }
        double zero = 1e-14 * max;
        for (int i = 0; i < values.Length; i++)
        {
            Vector3 v = values[i];
            values[i] = Vector3.Create(Math.Abs(v.X) <= zero ? 0 : v.X, Math.Abs(v.Y) <= zero ? 0 : v.Y, Math.Abs(v.Z) <= zero ? 0 : v.Z);
        }
    }

    private static (Matrix<double> Left, Vector<double> Sigma, Vector<double> Inverse, Matrix<double> Right, int Rank) ThinPseudoInverse(Matrix<double> a)
    {
        Matrix<double> left, right;
        Vector<double> sigma;
        if (a.ColumnCount < a.RowCount)
        {
            // Fewer unknowns than equations (a single point without couples): the SVD of A itself is small.
            Svd<double> svd = a.Svd(computeVectors: true);
            left = svd.U.SubMatrix(0, a.RowCount, 0, svd.S.Count);
            right = svd.VT.Transpose();
            sigma = svd.S;
        }
        else
        {
            // Aᵀ = Q R (thin), R = U_r S V_rᵀ, so A = V_r S (Q U_r)ᵀ: left vectors V_r, right vectors Q U_r.
            QR<double> qr = a.Transpose().QR(QRMethod.Thin);
            Svd<double> svd = qr.R.Svd(computeVectors: true);
            left = svd.VT.Transpose();
            right = qr.Q * svd.U;
            sigma = svd.S;
        }
        double max = sigma.Count > 0 ? sigma.Maximum() : 0;
        var inverse = Vector<double>.Build.Dense(sigma.Count);
        int rank = 0;
        for (int i = 0; i < sigma.Count; i++)
        {
            if (sigma[i] > RankTolerance * max)
            {
                inverse[i] = 1 / sigma[i];
                rank++;
            }
        }
        return (left, sigma, inverse, right, rank);
    }
}
