using CsCheck;
using LoadDiff.Core.Model;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Tests.Support;
using CollectingSink = LoadDiff.Formats.Tests.Support.CollectingSink;

namespace LoadDiff.Formats.Tests;

/// <summary>No mutation of a valid file makes a reader throw: it either reads or returns one located error.</summary>
public class MutationTests
{
    private static readonly byte[] Interesting = "{}[],:\"\\-+.eE0123456789 \n\t\0NaInfty/*ñ"u8.ToArray();

    private static string Repo()
    {
        string? dir = AppContext.BaseDirectory;
        while (dir is not null && !File.Exists(Path.Combine(dir, "LoadDiff.sln")))
        {
            dir = Path.GetDirectoryName(dir);
        }
        return dir ?? throw new InvalidOperationException("repository root not found");
    }

    public static TheoryData<string> ValidFiles() =>
    [
        Path.Combine("fixtures", "footbridge", "detailed.loads.json"),
        Path.Combine("fixtures", "footbridge", "simplified.loads.json"),
        Path.Combine("fixtures", "tank-wall", "detailed.loads.json"),
    ];

    private static Gen<byte[]> Mutations(byte[] original) =>
        Gen.OneOf(
            // flip one byte to another value
            Gen.Select(Gen.Int[0, original.Length - 1], Gen.Byte).Select((i, b) =>
            {
                byte[] m = (byte[])original.Clone();
                m[i] = b;
                return m;
            }),
            // truncate
            Gen.Int[0, original.Length - 1].Select(n => original[..n]),
            // insert a few structural or numeric bytes
            Gen.Select(Gen.Int[0, original.Length], Gen.Int[0, Interesting.Length - 1].Array[1, 6]).Select((i, picks) =>
                original[..i].Concat(picks.Select(p => Interesting[p])).Concat(original[i..]).ToArray()),
            // delete a span
            Gen.Select(Gen.Int[0, original.Length - 1], Gen.Int[1, 40]).Select((i, n) =>
                original[..i].Concat(original[Math.Min(original.Length, i + n)..]).ToArray()));

    [Theory]
    [MemberData(nameof(ValidFiles))]
    public void Mutated_json_is_read_or_rejected_with_one_located_error(string relative)
    {
        string path = Path.Combine(Repo(), relative);
        byte[] original = File.ReadAllBytes(path);
        string dir = Path.GetDirectoryName(path)!;
        Mutations(original).SampleSeeded(bytes =>
        {
            ReadResult r = LoadFileReader.ReadJson(bytes, "mutated.loads.json", dir, new ReductionSink());
            if (!r.Succeeded)
            {
                Diagnostic e = r.Error!;
                Assert.Matches("^LD[0-9]{3}$", e.Code);
                Assert.Equal("mutated.loads.json", e.Location.File);
                Assert.DoesNotContain('\n', e.ToString());
                Assert.Single(r.Diagnostics, d => d.Severity == Severity.Error);
            }
        }, iter: 400, variant: Path.GetFileName(Path.GetDirectoryName(relative)) + "/" + Path.GetFileName(relative));
    }

    [Fact]
    public void Mutated_csv_is_read_or_rejected_with_one_located_error()
    {
        byte[] original = "id,x,y,z,fx,fy,fz\np1,1,2,3,0,0,-10\np2,4.5,-1,0,1e3,0,-2.25\n\"p,3\",0,0,0,0,0,1\n"u8.ToArray();
        Mutations(original).SampleSeeded(bytes =>
        {
            // each case in a folder of its own: nothing is shared between cases
            using var t = new TempFolder();
            string path = t.WriteBytes("m.csv", bytes);
            foreach (ILoadSink sink in new ILoadSink[] { new ReductionSink(), new CollectingSink() })
            {
                ReadResult r = LoadFileReader.Read(path, sink);
                if (!r.Succeeded)
                {
                    Assert.Matches("^LD[0-9]{3}$", r.Error!.Code);
                    Assert.Equal(path, r.Error.Location.File);
                }
            }
        }, iter: 300);
    }

    [Fact]
    public void A_key_with_a_line_break_is_quoted_on_one_line()
    {
        // found by the mutation property above: a quoted key carried its line break into the message
        byte[] json = "{ \"cases\": { \"c\": { \"loads\": [] } }, \"ti\\ntle\": 1 }"u8.ToArray();
        ReadResult r = LoadFileReader.ReadJson(json, "k.loads.json", Path.GetTempPath(), new ReductionSink());
        Diagnostic w = Assert.Single(r.Diagnostics);
        Assert.Equal(Codes.UnknownField, w.Code);
        Assert.DoesNotContain('\n', w.ToString());
        Assert.Contains("ti\\ntle", w.ToString());
    }
}
