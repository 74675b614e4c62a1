using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace LoadDiff.Core.Reduction;

public sealed partial class ReductionAccumulator
{
    /// <summary>
    /// Adds concentrated forces given as columns (the fast path of large point-load files): the same terms as
    /// <see cref="AddPointForce"/>, four rows at a time, each sum kept as a running sum and a running sum of
    /// rounding errors (the compensated summation and dot product "Sum2"/"Dot2" of Ogita, Rump and Oishi,
    /// SIAM J. Sci. Comput. 26 (2005) 1955–1988: as accurate as if computed in twice the working precision).
    /// The lanes are merged into the double-double sums at the end, in a fixed order.
    /// </summary>
    /// <param name="x">Positions, x.</param>
    /// <param name="y">Positions, y.</param>
    /// <param name="z">Positions, z.</param>
    /// <param name="fx">Forces, x.</param>
    /// <param name="fy">Forces, y.</param>
    /// <param name="fz">Forces, z.</param>
    /// <param name="magnitudes">Receives |F| of each row, as <see cref="Vector3.Length"/> gives it.</param>
    /// <returns>False, with nothing added, when a term is not finite (the caller then adds the rows one at a time to find it).</returns>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]
    public bool AddPointForces(
        ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> z,
        ReadOnlySpan<double> fx, ReadOnlySpan<double> fy, ReadOnlySpan<double> fz, Span<double> magnitudes)
    {
        int n = x.Length;
        if (y.Length != n || z.Length != n || fx.Length != n || fy.Length != n || fz.Length != n || magnitudes.Length < n)
        {
            throw new ArgumentException("The columns must have the same length.", nameof(x));
        }
        if (n == 0)
        {
            return true;
        }
        // The anchor and the direction come from the first loaded row: a zero force is no loaded geometry.
        int firstLoaded = -1;
        for (int i = 0; i < n; i++)
        {
            if (fx[i] != 0 || fy[i] != 0 || fz[i] != 0)
            {
                firstLoaded = i;
                break;
            }
        }
        int a0 = Math.Max(firstLoaded, 0);
        Vector3 anchor = Anchor ?? Vector3.Create(x[a0], y[a0], z[a0]);
        Vector3 direction = _direction;
        bool parallel = _parallel;
        if (parallel && direction.IsZero && firstLoaded >= 0)
        {
            direction = Vector3.Create(fx[firstLoaded], fy[firstLoaded], fz[firstLoaded]).Normalize();
        }

        var lanes = new Lanes(anchor, direction);
        int whole = n & ~3;
        for (int i = 0; i < whole; i += 4)
        {
            lanes.Add(x, y, z, fx, fy, fz, magnitudes, i);
        }
        if (whole < n)
        {
            // The last rows, padded with zero forces at the first row's point: they add exactly nothing.
            Span<double> pad = stackalloc double[7 * 4];
            pad.Clear();
            for (int k = 0; k < 4; k++)
            {
                int i = whole + k < n ? whole + k : 0;
                bool real = whole + k < n;
                pad[k] = x[i];
                pad[4 + k] = y[i];
                pad[8 + k] = z[i];
                pad[12 + k] = real ? fx[i] : 0;
                pad[16 + k] = real ? fy[i] : 0;
                pad[20 + k] = real ? fz[i] : 0;
            }
            lanes.Add(pad[..4], pad[4..8], pad[8..12], pad[12..16], pad[16..20], pad[20..24], pad[24..28], 0);
            pad[24..(24 + n - whole)].CopyTo(magnitudes[whole..n]);
        }
        if (!lanes.AllFinite())
        {
            return false;
        }

        if (firstLoaded >= 0)
        {
            Anchor = anchor;
        }
        _force.Add(lanes.Fx.Total(), lanes.Fy.Total(), lanes.Fz.Total());
        _moment.Add(lanes.Mx.Total(), lanes.My.Total(), lanes.Mz.Total());
        _gross += lanes.Gross.Total();
        _grossFirst.Add(lanes.Gx.Total(), lanes.Gy.Total(), lanes.Gz.Total());
        for (int k = 0; k < Vector256<double>.Count; k++)
        {
            // a lane that saw no loaded row still holds +∞ … −∞
            if (lanes.MinX[k] <= lanes.MaxX[k])
            {
                Extend(Vector3.Create(lanes.MinX[k], lanes.MinY[k], lanes.MinZ[k]));
                Extend(Vector3.Create(lanes.MaxX[k], lanes.MaxY[k], lanes.MaxZ[k]));
            }
        }
        if (parallel)
        {
            _direction = direction;
            _parallel = lanes.Parallel;
        }
        Count += n;
        return true;
    }

    /// <summary>A running sum and the running sum of its rounding errors, per lane.</summary>
    private struct CompensatedLanes
    {
        public Vector256<double> Sum;
        public Vector256<double> Error;

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        public void Add(Vector256<double> a)
        {
            // two-sum: s + err = Sum + a exactly
            Vector256<double> s = Sum + a;
            Vector256<double> bb = s - Sum;
            Error += (Sum - (s - bb)) + (a - bb);
            Sum = s;
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        public void AddProduct(Vector256<double> a, Vector256<double> b)
        {
            // two-product: p + e = a·b exactly
            Vector256<double> p = a * b;
            Error += Vector256.FusedMultiplyAdd(a, b, -p);
            Add(p);
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        public void SubtractProduct(Vector256<double> a, Vector256<double> b)
        {
            Vector256<double> p = a * b;
            Error -= Vector256.FusedMultiplyAdd(a, b, -p);
            Add(-p);
        }

        public readonly bool Finite => Vector256.EqualsAll(Sum - Sum, Vector256<double>.Zero) && Vector256.EqualsAll(Error - Error, Vector256<double>.Zero);

        public readonly DoubleDouble Total()
        {
            DoubleDouble t = DoubleDouble.Zero;
            for (int k = 0; k < Vector256<double>.Count; k++)
            {
                t += DoubleDouble.TwoSum(Sum[k], Error[k]);
            }
            return t;
        }
    }

    private struct Lanes
    {
        public CompensatedLanes Fx, Fy, Fz, Mx, My, Mz, Gross, Gx, Gy, Gz;
        public Vector256<double> MinX, MinY, MinZ, MaxX, MaxY, MaxZ;
        private readonly Vector256<double> _ax, _ay, _az, _ux, _uy, _uz;
        private Vector256<double> _notParallel;

        public Lanes(Vector3 anchor, Vector3 direction)
        {
            _ax = Vector256.Create(anchor.X);
            _ay = Vector256.Create(anchor.Y);
            _az = Vector256.Create(anchor.Z);
            _ux = Vector256.Create(direction.X);
            _uy = Vector256.Create(direction.Y);
            _uz = Vector256.Create(direction.Z);
            MinX = MinY = MinZ = Vector256.Create(double.PositiveInfinity);
            MaxX = MaxY = MaxZ = Vector256.Create(double.NegativeInfinity);
        }

        public readonly bool Parallel => _notParallel == Vector256<double>.Zero;

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        public void Add(
            ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> z,
            ReadOnlySpan<double> fx, ReadOnlySpan<double> fy, ReadOnlySpan<double> fz, Span<double> magnitudes, int i)
        {
            Vector256<double> px = Load(x, i), py = Load(y, i), pz = Load(z, i);
            Vector256<double> gx = Load(fx, i), gy = Load(fy, i), gz = Load(fz, i);
            Vector256<double> dx = px - _ax, dy = py - _ay, dz = pz - _az;
            Fx.Add(gx);
            Fy.Add(gy);
            Fz.Add(gz);
            Mx.AddProduct(dy, gz);
            Mx.SubtractProduct(dz, gy);
            My.AddProduct(dz, gx);
            My.SubtractProduct(dx, gz);
            Mz.AddProduct(dx, gy);
            Mz.SubtractProduct(dy, gx);
            Vector256<double> sq = (gx * gx) + (gy * gy) + (gz * gz);
            Vector256<double> g = Vector256.Sqrt(sq);
            if (!Vector256.GreaterThanAll(sq, Vector256.Create(1e-290)) || !Vector256.LessThanAll(sq, Vector256.Create(1e290)))
            {
                g = ScaledLengths(gx, gy, gz, g, sq);
            }
            g.StoreUnsafe(ref MemoryMarshal.GetReference(magnitudes), (nuint)i);
            Gross.Add(g);
            Gx.Add(dx * g);
            Gy.Add(dy * g);
            Gz.Add(dz * g);
            // only loaded rows widen the box (|F| > 0; the padding rows and zero nodal forces are not loaded)
            Vector256<double> loaded = Vector256.GreaterThan(g, Vector256<double>.Zero);
            Vector256<double> up = Vector256.Create(double.PositiveInfinity), down = Vector256.Create(double.NegativeInfinity);
            MinX = Vector256.Min(MinX, Vector256.ConditionalSelect(loaded, px, up));
            MinY = Vector256.Min(MinY, Vector256.ConditionalSelect(loaded, py, up));
            MinZ = Vector256.Min(MinZ, Vector256.ConditionalSelect(loaded, pz, up));
            MaxX = Vector256.Max(MaxX, Vector256.ConditionalSelect(loaded, px, down));
            MaxY = Vector256.Max(MaxY, Vector256.ConditionalSelect(loaded, py, down));
            MaxZ = Vector256.Max(MaxZ, Vector256.ConditionalSelect(loaded, pz, down));
            // |F × u|² ≤ tol²|F|² for every force (zero forces pass), as LoadItem.Parallel tests it; once one force
            // is not parallel the answer is known and the test is skipped
            if (_notParallel == Vector256<double>.Zero)
            {
                Vector256<double> cx = (gy * _uz) - (gz * _uy), cy = (gz * _ux) - (gx * _uz), cz = (gx * _uy) - (gy * _ux);
                Vector256<double> cross = (cx * cx) + (cy * cy) + (cz * cz);
                _notParallel |= Vector256.GreaterThan(cross, Vector256.Create(ParallelTolerance * ParallelTolerance) * sq);
            }
        }

        public readonly bool AllFinite() =>
            Fx.Finite && Fy.Finite && Fz.Finite && Mx.Finite && My.Finite && Mz.Finite
            && Gross.Finite && Gx.Finite && Gy.Finite && Gz.Finite;

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static Vector256<double> Load(ReadOnlySpan<double> s, int i) =>
            Vector256.LoadUnsafe(ref MemoryMarshal.GetReference(s), (nuint)i);

        // Lanes whose sum of squares would lose digits (or overflow) take the scaled length of Vector3.
        private static Vector256<double> ScaledLengths(Vector256<double> x, Vector256<double> y, Vector256<double> z, Vector256<double> g, Vector256<double> sq)
        {
            Span<double> lengths = stackalloc double[Vector256<double>.Count];
            for (int k = 0; k < lengths.Length; k++)
            {
                lengths[k] = sq[k] is > 1e-290 and < 1e290 ? g[k] : Vector3.Create(x[k], y[k], z[k]).Length;
            }
            return Vector256.Create(lengths);
        }
    }
}
