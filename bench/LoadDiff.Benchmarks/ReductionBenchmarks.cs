using BenchmarkDotNet.Attributes;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Benchmarks;

/// <summary>The reduction kernels, per item kind (nanoseconds per item = Mean / N).</summary>
[MemoryDiagnoser]
public class ReductionBenchmarks
{
    private const int N = 100_000;
    private Vector3[] _at = [];
    private Vector3[] _force = [];
    private LineLoad[] _lines = [];
    private AreaLoad[] _areas = [];
    private double[] _x = [], _y = [], _z = [], _fx = [], _fy = [], _fz = [];
    private readonly double[] _magnitude = new double[512];

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(7);
        Vector3 R(double scale, double offset) => Vector3.Create(offset + (rnd.NextDouble() * scale), offset + (rnd.NextDouble() * scale), rnd.NextDouble() * scale);
        _at = Enumerable.Range(0, N).Select(_ => R(100, 5e5)).ToArray();
        _force = Enumerable.Range(0, N).Select(_ => R(10, -5)).ToArray();
        (_x, _y, _z) = (_at.Select(a => a.X).ToArray(), _at.Select(a => a.Y).ToArray(), _at.Select(a => a.Z).ToArray());
        (_fx, _fy, _fz) = (_force.Select(f => f.X).ToArray(), _force.Select(f => f.Y).ToArray(), _force.Select(f => f.Z).ToArray());
        _lines = Enumerable.Range(0, N / 10).Select(i => new LineLoad("l", _at[i], _at[i] + Vector3.Create(3, 0, 0), _force[i], _force[i + 1])).ToArray();
        _areas = Enumerable.Range(0, N / 10).Select(i => new AreaLoad("a",
            [_at[i], _at[i] + Vector3.Create(2, 0, 0), _at[i] + Vector3.Create(2, 1, 0), _at[i] + Vector3.Create(0, 1, 0)],
            1.5, null, Vector3.Create(0, 0, -9.81), _at[i])).ToArray();
    }

    [Benchmark(OperationsPerInvoke = N)]
    public Vector3 PointForce()
    {
        var acc = new ReductionAccumulator();
        for (int i = 0; i < N; i++)
        {
            acc.AddPointForce(_at[i], _force[i]);
        }
        return acc.ResultAt(_at[0]).Moment;
    }

    /// <summary>The same forces as columns in batches of 512, as the large-file reader hands them over.</summary>
    [Benchmark(OperationsPerInvoke = N)]
    public Vector3 PointForceColumns()
    {
        var acc = new ReductionAccumulator();
        const int batch = 512;
        for (int start = 0; start < N; start += batch)
        {
            int n = Math.Min(batch, N - start);
            acc.AddPointForces(_x.AsSpan(start, n), _y.AsSpan(start, n), _z.AsSpan(start, n),
                _fx.AsSpan(start, n), _fy.AsSpan(start, n), _fz.AsSpan(start, n), _magnitude);
        }
        return acc.ResultAt(_at[0]).Moment;
    }

    [Benchmark(OperationsPerInvoke = N)]
    public Vector3 MeshTriangle()
    {
        var acc = new ReductionAccumulator();
        for (int i = 0; i + 2 < N; i += 1)
        {
            acc.AddTriangle(_at[i], _at[i + 1], _at[i + 2], 1, 2, 3, null);
        }
        return acc.ResultAt(_at[0]).Moment;
    }

    [Benchmark(OperationsPerInvoke = N / 10)]
    public Vector3 LineLoad()
    {
        var acc = new ReductionAccumulator();
        foreach (LineLoad l in _lines)
        {
            acc.Add(l);
        }
        return acc.ResultAt(_at[0]).Moment;
    }

    [Benchmark(OperationsPerInvoke = N / 10)]
    public Vector3 AreaLoad()
    {
        var acc = new ReductionAccumulator();
        foreach (AreaLoad a in _areas)
        {
            acc.Add(a);
        }
        return acc.ResultAt(_at[0]).Moment;
    }
}
