using System.Globalization;
using System.Text;
using CsCheck;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Tests.Support;
using CollectingSink = LoadDiff.Formats.Tests.Support.CollectingSink;

namespace LoadDiff.Formats.Tests;

public partial class BlockCsvReducerTests
{
    private static string F(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    // Several 4 MiB blocks' worth of rows, so the block cut and the merge are exercised.
    private static string PointCsv(int rows, int seed)
    {
        var rnd = new Random(seed);
        var sb = new StringBuilder("id,x,y,z,fx,fy,fz,mx,my,mz\n");
        for (int i = 0; i < rows; i++)
        {
            sb.Append(CultureInfo.InvariantCulture,
                $"n{i},{F(512000 + (rnd.NextDouble() * 200))},{F(6170000 + (rnd.NextDouble() * 50))},{F(rnd.NextDouble())},"
                + $"{F(rnd.NextDouble() - 0.5)},{F(rnd.NextDouble() - 0.5)},{F(-1 - (rnd.NextDouble() * 20))},{(i % 7 == 0 ? "0.5" : "0")},0,0\n");
        }
        return sb.ToString();
    }

    [Fact]
    public void Block_path_agrees_with_item_by_item_reduction()
    {
        using var t = new TempFolder();
        string path = t.Write("deck.csv", PointCsv(120_000, 3));
        var bulk = new ReductionSink(topContributors: 3);
        Assert.True(LoadFileReader.Read(path, bulk).Succeeded);
        var items = new CollectingSink();
        Assert.True(LoadFileReader.Read(path, items).Succeeded);

        // Reference: the same items one at a time into one accumulator (the item path of the reader).
        var one = new ReductionAccumulator();
        foreach (LoadItem i in items.Case("deck").Items)
        {
            one.Add(i);
        }
        Vector3 p = Vector3.Create(512100, 6170025, 0);
        LoadReduction expected = one.ResultAt(p), actual = bulk.Cases["deck"].ResultAt(p);
        Assert.Equal(expected.ItemCount, actual.ItemCount);
        Assert.True((expected.Force - actual.Force).Length <= 1e-13 * expected.GrossForce);
        Assert.True((expected.Moment - actual.Moment).Length <= 1e-13 * expected.MomentScale(p));
        Assert.Equal(expected.GrossForce, actual.GrossForce, 1e-9 * expected.GrossForce);
        // The largest items found block by block are the largest of the whole file.
        string[] top = items.Case("deck").Items.OfType<PointForce>().OrderByDescending(f => f.Value.Length).Take(3).Select(f => f.Id).ToArray();
        Assert.Equal(top, bulk.Contributors("deck")!.Forces.Select(c => c.Id).ToArray());
    }

    [Fact]
    public void Rows_the_one_pass_scanner_declines_are_read_the_general_way()
    {
        // Spaces around numbers, 16 significant digits, exponents and a trailing id column:
        // each row's force is known exactly here, so the sums are exact arithmetic.
        using var t = new TempFolder();
        string path = t.Write("mixed.csv",
            "x,y,z,fx,fy,fz,id\n"
            + "0,0,0,0,0,-1,a\n"
            + " 1 , 0 ,0, 0,0, -2 ,b\n"
            + "2,0,0,0,0,-1.000000000000000,c\n"
            + "3,0,0,0,0,-4e0,d\n"
            + "4,0,0,0,0,-5e-1,e\n"
            + "5,0,0,0,0,-1E+00,f\n");
        var sink = new ReductionSink();
        ReadResult r = LoadFileReader.Read(path, sink);
        Assert.True(r.Succeeded, r.Error?.ToString());
        LoadReduction red = sink.Cases["mixed"].ResultAt(Vector3.Zero);
        Assert.Equal(6, red.ItemCount);
        Assert.Equal(-(1 + 2 + 1 + 4 + 0.5 + 1), red.Force.Z);
        // M_y = −Σ x F_z = −(0·(−1) + 1·(−2) + 2·(−1) + 3·(−4) + 4·(−0.5) + 5·(−1)) = 23
        Assert.Equal(23, red.Moment.Y);
    }

    [Fact]
    public void Result_is_bit_identical_for_one_and_for_several_threads()
    {
        using var t = new TempFolder();
        string path = t.Write("deck.csv", PointCsv(120_000, 5));
        LoadReduction Run(int threads)
        {
            var sink = new ReductionSink();
            Assert.True(LoadFileReader.Read(path, sink, new ReadOptions { Threads = threads }).Succeeded);
            return sink.Cases["deck"].ResultAt(Vector3.Zero);
        }
        LoadReduction a = Run(1), b = Run(2), c = Run(4);
        Assert.Equal(a, b);
        Assert.Equal(a, c);
    }

    [Fact]
    public void An_error_in_a_later_block_names_its_line()
    {
        using var t = new TempFolder();
        string text = PointCsv(100_000, 9);
        int target = 87_654; // a data row far past the first block
        string[] lines = text.Split('\n');
        lines[target] = lines[target].Replace(",0,0", ",0,0,7", StringComparison.Ordinal);
        string path = t.Write("deck.csv", string.Join('\n', lines));
        ReadResult r = LoadFileReader.Read(path, new ReductionSink());
        Assert.False(r.Succeeded);
        Assert.Equal("LD061", r.Error!.Code);
        Assert.Equal(target + 1, r.Error.Location.Line);
    }

    [Fact]
    public void Decimal_fast_path_matches_the_runtime_parser_bit_for_bit()
    {
        // Reference: the .NET runtime's correctly rounded double.Parse (general-purpose library).
        Gen.Select(Gen.Long[-999_999_999_999_999, 999_999_999_999_999], Gen.Int[-30, 30], Gen.Bool).SampleSeeded((mantissa, exponent, useE) =>
        {
            string text = useE
                ? mantissa.ToString(CultureInfo.InvariantCulture) + "e" + exponent.ToString(CultureInfo.InvariantCulture)
                : Decimalise(mantissa, Math.Clamp(exponent, -20, 0));
            bool fast = DecimalFastPath.TryParse(Encoding.ASCII.GetBytes(text), out double v);
            if (fast)
            {
                double reference = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
                Assert.Equal(BitConverter.DoubleToInt64Bits(reference), BitConverter.DoubleToInt64Bits(v));
            }
        }, iter: 20_000);
    }

    [Theory]
    [InlineData("1,5")]
    [InlineData("1.5x")]
    [InlineData("--1")]
    [InlineData(".")]
    [InlineData("1e")]
    [InlineData("1234567890123456")] // 16 significant digits: left to the general parser
    [InlineData("1e23")]
    public void Decimal_fast_path_declines_what_it_cannot_do_exactly(string text) =>
        Assert.False(DecimalFastPath.TryParse(Encoding.ASCII.GetBytes(text), out _));

    private static string Decimalise(long mantissa, int exponent)
    {
        string digits = Math.Abs(mantissa).ToString(CultureInfo.InvariantCulture).PadLeft(1 - exponent, '0');
        string s = exponent == 0 ? digits : digits[..^(-exponent)] + "." + digits[^(-exponent)..];
        return (mantissa < 0 ? "-" : "") + s;
    }
}
