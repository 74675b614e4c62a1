using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using LoadDiff.Core.Model;
using LoadDiff.Formats;

namespace LoadDiff.Benchmarks;

/// <summary>Whole-reader throughput on a point-load CSV and a triangle-row CSV of about 20 MB each (MB/s = size / Mean).</summary>
public class CsvBenchmarks
{
    private string _points = "";
    private string _mesh = "";

    [Params(1, 2)]
    public int Threads { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(11);
        string F(double v) => v.ToString("F5", CultureInfo.InvariantCulture);
        var sb = new StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 0; i < 300_000; i++)
        {
            sb.Append('p').Append(i).Append(',').Append(F(512000 + (rnd.NextDouble() * 200))).Append(',').Append(F(6170000 + (rnd.NextDouble() * 50)))
              .Append(',').Append(F(40 + rnd.NextDouble())).Append(',').Append(F(rnd.NextDouble() - 0.5)).Append(',').Append(F(rnd.NextDouble() - 0.5))
              .Append(',').Append(F(-1 - (rnd.NextDouble() * 20))).Append('\n');
        }
        _points = Path.Combine(Path.GetTempPath(), "loaddiff-bench-points.csv");
        File.WriteAllText(_points, sb.ToString());
        sb.Clear().Append("x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n");
        for (int i = 0; i < 150_000; i++)
        {
            double x = i % 400 * 0.25, y = i / 400 * 0.25;
            sb.Append(CultureInfo.InvariantCulture, $"{F(x)},{F(y)},12,{F(x + 0.25)},{F(y)},12.1,{F(x + 0.25)},{F(y + 0.25)},12.1,{F(-0.8 + (0.01 * x))},{F(-0.79)},{F(-0.81)}\n");
        }
        _mesh = Path.Combine(Path.GetTempPath(), "loaddiff-bench-mesh.csv");
        File.WriteAllText(_mesh, sb.ToString());
    }

    [Benchmark]
    public long PointLoadCsv()
    {
        var sink = new ReductionSink();
        LoadFileReader.Read(_points, sink, new ReadOptions { Threads = Threads });
        return sink.Cases.Values.Single().Count;
    }

    [Benchmark]
    public long TriangleRowCsv()
    {
        var sink = new ReductionSink();
        LoadFileReader.Read(_mesh, sink, new ReadOptions { Threads = Threads });
        return sink.Cases.Values.Single().Count;
    }
}
