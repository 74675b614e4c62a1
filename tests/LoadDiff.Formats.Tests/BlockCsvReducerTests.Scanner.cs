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
    // The line in a buffer laid out as the block reader lays it out: a line feed after the data, then padding.
    private static (byte[] Buffer, int[] ValueOfField) Line(string line, int fields, params int[] numberFields)
    {
        byte[] text = Encoding.UTF8.GetBytes(line + "\n");
        byte[] buffer = new byte[text.Length + PlainRowScanner.Padding];
        text.CopyTo(buffer, 0);
        buffer.AsSpan(text.Length).Fill((byte)'7'); // digits after the line must not be taken for part of it
        int[] valueOfField = Enumerable.Repeat(-1, fields).ToArray();
        for (int k = 0; k < numberFields.Length; k++)
        {
            valueOfField[numberFields[k]] = k;
        }
        return (buffer, valueOfField);
    }

    private static double[]? Scan(string line, int fields, params int[] numberFields) => Scan(false, line, fields, numberFields);

    private static double[]? Scan(bool portable, string line, int fields, params int[] numberFields)
    {
        (byte[] buffer, int[] valueOfField) = Line(line, fields, numberFields);
        double[] digits = new double[numberFields.Length], scales = new double[numberFields.Length];
        int end = PlainRowScanner.TryScan(buffer, 0, valueOfField, digits, scales, 1, 0, portable);
        if (end < 0)
        {
            return null;
        }
        Assert.Equal(line.TrimEnd('\r').Length, end);
        return digits.Zip(scales, (d, s) => d / s).ToArray();
    }

    // Decimal texts of every shape the scanner meets: signs, leading zeros, long digit runs, exponents, stray characters.
    private static readonly Gen<string> NumberText =
        Gen.Select(Gen.Int[0, 15], Gen.Char["0123456789"].Array[0, 18], Gen.Int[0, 3], Gen.Char["0123456789"].Array[0, 18], Gen.Int[0, 19])
        .Select((sign, whole, point, fraction, tail) =>
            (sign switch { < 9 => "", < 13 => "-", 13 => "+", 14 => "--", _ => " " })
            + new string(whole) + (point > 0 ? "." + new string(fraction) : "")
            + (tail switch { < 14 => "", 14 => "e3", 15 => "E-2", 16 => ".", 17 => "x", 18 => "-", _ => " " }));

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Scanner_acceptsOnlyWhatTheRuntimeParserReadsTheSame_bitForBit(bool portable)
    {
        // Reference: the .NET runtime's correctly rounded double.Parse (a general-purpose library). Whatever the
        // scanner accepts must parse there to the same bits; what it declines goes to the general path. Both code
        // paths (the portable one is chosen by an argument, so tests beside this one are not affected) see the same cases.
        int accepted = 0;
        Gen.Select(NumberText, NumberText, NumberText).SampleSeeded((a, b, c) =>
        {
            double[]? v = Scan(portable, $"id7,{a},{b},{c}", 4, 1, 2, 3);
            if (v is null)
            {
                return;
            }
            accepted++; // the cases run one after another
            string[] texts = [a, b, c];
            for (int k = 0; k < 3; k++)
            {
                Assert.True(double.TryParse(texts[k], NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out double reference), texts[k]);
                Assert.Equal(BitConverter.DoubleToInt64Bits(reference), BitConverter.DoubleToInt64Bits(v[k]));
            }
        }, iter: 50_000);
        Assert.True(accepted > 1000, $"only {accepted} lines accepted");
    }

    [Theory]
    [InlineData("p1,512070.321337,6170010.797162,40.9745")]
    [InlineData("p1,-0.5,+2,.25")]
    [InlineData("p1,1.,0,-0")]
    [InlineData("p1,123456789012345,0.00000000000001,9007199254740992")] // 2⁵³ is still exact
    [InlineData("p1,1,2,3\r")]
    [InlineData("a longer id with spaces,1,2,3")]
    public void Scanner_readsPlainDecimals(string line)
    {
        double[]? v = Scan(line, 4, 1, 2, 3);
        Assert.NotNull(v);
        string[] texts = line.TrimEnd('\r').Split(',');
        for (int k = 0; k < 3; k++)
        {
            Assert.Equal(double.Parse(texts[k + 1], CultureInfo.InvariantCulture), v[k]);
        }
    }

    [Theory]
    [InlineData("p1,1,2")] // a field short
    [InlineData("p1,1,2,3,4")] // a field more
    [InlineData("\"p,1\",1,2")] // quoted field with a comma
    [InlineData("p1,1, 2,3")] // space
    [InlineData("p1,1,2e0,3")] // exponent: the general path reads it
    [InlineData("p1,1,2.5.1,3")]
    [InlineData("p1,1,-,3")]
    [InlineData("p1,1,.,3")]
    [InlineData("p1,1,9007199254740993,3")] // 2⁵³ + 1 is not exact in double
    [InlineData("p1,1,12345678901234567,3")] // seventeen characters
    [InlineData("p1,1,2,3\r\r")]
    public void Scanner_declinesWhatItCannotReadExactly(string line) => Assert.Null(Scan(line, 4, 1, 2, 3));

    [Fact]
    public void Scanner_readsLongLinesWithFieldsInEveryMask()
    {
        // 15 numbers of 15 characters: 239 bytes, so the commas fall in all four 64-byte masks
        string[] texts = Enumerable.Range(0, 15).Select(i => (i % 2 == 0 ? "-" : "") + (1234567 + i).ToString(CultureInfo.InvariantCulture) + ".89123" + (i % 10).ToString(CultureInfo.InvariantCulture)).ToArray();
        string line = string.Join(",", texts);
        Assert.InRange(line.Length, 193, PlainRowScanner.LongestLine - 1);
        double[]? v = Scan(line, 15, Enumerable.Range(0, 15).ToArray());
        Assert.NotNull(v);
        for (int k = 0; k < 15; k++)
        {
            Assert.Equal(double.Parse(texts[k], CultureInfo.InvariantCulture), v[k]);
        }
    }

    [Fact]
    public void Scanner_declinesLinesLongerThanItReads()
    {
        string id = new('n', PlainRowScanner.LongestLine);
        Assert.Null(Scan(id + ",1,2,3", 4, 1, 2, 3));
    }

    // Plain rows, rows the scanner declines (spaces, exponents, quoted ids, CRLF) and blank lines, for the block cuts.
    private static string MixedCsv(int rows, int seed)
    {
        var rnd = new Random(seed);
        var sb = new StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 0; i < rows; i++)
        {
            string x = F(Math.Round(rnd.NextDouble() * 100, 3)), y = F(Math.Round(rnd.NextDouble() * 10, 2)), fz = F(-Math.Round(rnd.NextDouble() * 50, 4));
            sb.Append((i % 11) switch
            {
                3 => $"\"n,{i}\",{x},{y},0,0,0,{fz}\n",
                5 => $"n{i}, {x} ,{y},0,0,0,{fz}\n",
                7 => $"n{i},{x},{y},0,1e-1,0,{fz}\r\n",
                9 => $"\nn{i},{x},{y},0,0,0,{fz}\n",
                _ => $"n{i},{x},{y},0,0.5,-0.25,{fz}\n",
            });
        }
        return sb.ToString();
    }

    [Fact]
    public void Every_block_size_gives_the_items_of_the_item_path_and_the_same_bits_on_one_and_two_threads()
    {
        using var t = new TempFolder();
        string csv = MixedCsv(400, 17);
        string path = t.Write("deck.csv", csv);
        var items = new CollectingSink();
        Assert.True(LoadFileReader.Read(path, items).Succeeded);
        var one = new ReductionAccumulator();
        foreach (LoadItem i in items.Case("deck").Items)
        {
            one.Add(i);
        }
        Vector3 p = Vector3.Create(50, 5, 0);
        LoadReduction expected = one.ResultAt(p);
        (decimal[] exactForce, decimal[] exactMoment) = DecimalReduction(csv, 50, 5, 0);
        string[] top = items.Case("deck").Items.OfType<PointForce>().OrderByDescending(f => f.Value.Length).Take(3).Select(f => f.Id).ToArray();

        // Block sizes from a few bytes (most blocks then hold no line start at all) to more than the file.
        foreach (int blockSize in new[] { 1, 2, 3, 7, 31, 64, 65, 127, 500, 1021, 4096, 1 << 20 })
        {
            LoadReduction Run(int threads, out string[] largest)
            {
                var sink = new ReductionSink(topContributors: 3);
                ReadResult r = LoadFileReader.Read(path, sink, new ReadOptions { Threads = threads, CsvBlockSize = blockSize });
                Assert.True(r.Succeeded, $"block size {blockSize}: {r.Error}");
                largest = sink.Contributors("deck")!.Forces.Select(c => c.Id).ToArray();
                return sink.Cases["deck"].ResultAt(p);
            }
            LoadReduction a = Run(1, out string[] topA), b = Run(2, out string[] topB);
            Assert.Equal(a, b);
            Assert.Equal(expected.ItemCount, a.ItemCount);
            Assert.Equal(expected.Bounds, a.Bounds);
            Assert.True((expected.Force - a.Force).Length <= 1e-13 * expected.GrossForce, $"block size {blockSize}");
            Assert.True((expected.Moment - a.Moment).Length <= 1e-13 * expected.MomentScale(p), $"block size {blockSize}");
            // and against exact decimal arithmetic on the numbers as written (the doubles read differ from them by
            // half an ulp at most, hence a tolerance far below any engineering one)
            for (int k = 0; k < 3; k++)
            {
                Assert.True(Math.Abs(a.Force[k] - (double)exactForce[k]) <= 1e-13 * a.GrossForce, $"block size {blockSize}, R[{k}]");
                Assert.True(Math.Abs(a.Moment[k] - (double)exactMoment[k]) <= 1e-13 * a.MomentScale(p), $"block size {blockSize}, M[{k}]");
            }
            Assert.Equal(top, topA);
            Assert.Equal(top, topB);
        }
    }

    // R = ΣF and M = Σ (r − P) × F of a point-load CSV in System.Decimal, exact for these short decimal numbers;
    // the rows are split here independently of the reader (a quoted id is the only quoted field).
    private static (decimal[] Force, decimal[] Moment) DecimalReduction(string csv, decimal px, decimal py, decimal pz)
    {
        decimal[] f = new decimal[3], m = new decimal[3];
        foreach (string raw in csv.Split('\n').Skip(1))
        {
            string line = raw.TrimEnd('\r');
            if (line.Trim().Length == 0)
            {
                continue;
            }
            string rest = line.StartsWith('"') ? line[(line.IndexOf('"', 1) + 2)..] : line[(line.IndexOf(',') + 1)..];
            decimal[] v = rest.Split(',').Select(x => decimal.Parse(x.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            decimal dx = v[0] - px, dy = v[1] - py, dz = v[2] - pz;
            f[0] += v[3];
            f[1] += v[4];
            f[2] += v[5];
            m[0] += (dy * v[5]) - (dz * v[4]);
            m[1] += (dz * v[3]) - (dx * v[5]);
            m[2] += (dx * v[4]) - (dy * v[3]);
        }
        return (f, m);
    }

    [Fact]
    public void An_error_is_named_at_its_line_and_column_whatever_the_block_size()
    {
        using var t = new TempFolder();
        string[] lines = MixedCsv(120, 23).Split('\n');
        int target = 77; // index in lines = line number − 1
        lines[target] = "n77,1.5,2,0,0,0,12,5x";
        string path = t.Write("deck.csv", string.Join('\n', lines));
        foreach (int blockSize in new[] { 1, 5, 64, 333, 1 << 16 })
        {
            foreach (int threads in new[] { 1, 2 })
            {
                ReadResult r = LoadFileReader.Read(path, new ReductionSink(), new ReadOptions { Threads = threads, CsvBlockSize = blockSize });
                Assert.False(r.Succeeded);
                Assert.Equal("LD061", r.Error!.Code);
                Assert.Equal(target + 1, r.Error.Location.Line);
            }
        }
        lines[target] = "n77,1.5,2,0,0,0,1two";
        path = t.Write("deck.csv", string.Join('\n', lines));
        foreach (int blockSize in new[] { 1, 64, 1 << 16 })
        {
            ReadResult r = LoadFileReader.Read(path, new ReductionSink(), new ReadOptions { Threads = 2, CsvBlockSize = blockSize });
            Assert.Equal("LD062", r.Error!.Code);
            Assert.Equal(target + 1, r.Error.Location.Line);
            Assert.Equal("n77,1.5,2,0,0,0,".Length + 1, r.Error.Location.Column);
        }
    }

    [Fact]
    public void A_line_longer_than_the_limit_is_named_when_it_crosses_blocks()
    {
        using var t = new TempFolder();
        string[] lines = MixedCsv(60, 29).Split('\n');
        lines[40] = "n40," + new string('1', 300) + ",0,0,0,0,1";
        string path = t.Write("deck.csv", string.Join('\n', lines));
        foreach (int blockSize in new[] { 16, 100, 1 << 16 })
        {
            ReadResult r = LoadFileReader.Read(path, new ReductionSink(), new ReadOptions { Threads = 2, CsvBlockSize = blockSize, MaxLineLength = 200 });
            Assert.False(r.Succeeded);
            Assert.Equal("LD072", r.Error!.Code);
            Assert.Equal(41, r.Error.Location.Line);
        }
    }

    [Fact]
    public void The_first_error_in_file_order_is_named_even_when_a_later_line_is_not_utf8()
    {
        // Line 2 has a field too many; line 3 holds a byte that is not UTF-8. Whatever the cut, line 2 is reported.
        using var t = new TempFolder();
        byte[] head = Encoding.UTF8.GetBytes("id,x,y,z,fx,fy,fz\na,0,0,0,0,0,-1,9\nb,0,0,0,0,0,-");
        byte[] tail = Encoding.UTF8.GetBytes("1\nc,0,0,0,0,0,-1\n");
        string path = Path.Combine(t.Path, "deck.csv");
        File.WriteAllBytes(path, [.. head, 0xFF, .. tail]);
        foreach (int? blockSize in new int?[] { null, 16, 3 })
        {
            ReadResult r = LoadFileReader.Read(path, new ReductionSink(), new ReadOptions { Threads = 2, CsvBlockSize = blockSize });
            Assert.Equal("LD061", r.Error!.Code);
            Assert.Equal(2, r.Error.Location.Line);
        }
        // with line 2 mended, the invalid byte is named at its line and column
        File.WriteAllBytes(path, [.. Encoding.UTF8.GetBytes("id,x,y,z,fx,fy,fz\na,0,0,0,0,0,-1\nb,0,0,0,0,0,-"), 0xFF, .. tail]);
        ReadResult bad = LoadFileReader.Read(path, new ReductionSink());
        Assert.Equal("LD003", bad.Error!.Code);
        Assert.Equal(3, bad.Error.Location.Line);
        Assert.Equal("b,0,0,0,0,0,-".Length + 1, bad.Error.Location.Column);
    }

    [Fact]
    public void Item_path_reads_every_number_as_the_runtime_parser_does()
    {
        // The item reader (used when items are needed, for example by a report's sketch) takes a fast path for plain
        // decimals; whatever the text, it must agree with double.TryParse under the same rules (a general-purpose
        // reference): same bits when accepted, an error when the runtime parser refuses the text.
        using var t = new TempFolder();
        string path = Path.Combine(t.Path, "one.csv");
        Gen.Select(NumberText, Gen.Int[0, 5]).SampleSeeded((text, column) =>
        {
            string[] row = ["0", "0", "0", "0", "0", "1"];
            row[column] = text;
            // the cases run one after another, so one file serves them all
            File.WriteAllText(path, "x,y,z,fx,fy,fz\n" + string.Join(",", row) + "\n");
            var sink = new CollectingSink();
            ReadResult r = LoadFileReader.Read(path, sink);
            bool parses = double.TryParse(text.Trim(), NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out double reference) && Math.Abs(reference) <= 1e100;
            Assert.Equal(parses, r.Succeeded);
            if (parses)
            {
                var force = Assert.IsType<PointForce>(Assert.Single(sink.Case("one").Items));
                double read = column < 3 ? force.At[column] : force.Value[column - 3];
                Assert.Equal(BitConverter.DoubleToInt64Bits(reference), BitConverter.DoubleToInt64Bits(read));
            }
        }, iter: 3000);
    }
}
