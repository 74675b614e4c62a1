using System.Globalization;
using CsCheck;

namespace LoadDiff.Tests.Support;

/// <summary>
/// The contract of <see cref="SeededProperty"/> (compiled into each test project that has properties): a run is a
/// function of the master seed and the test's name alone, and a failure's seeds replay it. The reference is the
/// runner's own definition: the same inputs must give the same bits.
/// </summary>
public class SeededPropertyTests
{
    // every bit pattern, NaNs and infinities included: the comparison is of bits, not of values
    private static readonly Gen<(long, double, string)> Mixed =
        Gen.Select(Gen.Long, Gen.Long.Select(BitConverter.Int64BitsToDouble), Gen.Char.Array[0, 8].Select(c => new string(c)));

    private static List<(long, double, string)> Cases(ulong master, string test, int iter = 300)
    {
        var seen = new List<(long, double, string)>();
        SeededProperty.Run(Mixed, seen.Add, iter, test, master);
        return seen;
    }

    private static long[] Bits(List<(long L, double D, string S)> cases) =>
        [.. cases.SelectMany(c => new[] { c.L, BitConverter.DoubleToInt64Bits(c.D), c.S.Length }.Concat(c.S.Select(ch => (long)ch)))];

    [Fact]
    public void Run_sameMasterSeedAndTest_generatesTheSameCasesBitForBit_onAnyThread()
    {
        ulong master = SeededProperty.MasterSeed;
        long[] first = Bits(Cases(master, "SeededPropertyTests.same"));
        // two more runs at the same time on other threads, beside the rest of the test run
        long[][] others = new long[2][];
        Parallel.For(0, 2, k => others[k] = Bits(Cases(master, "SeededPropertyTests.same")));
        Assert.Equal(first, others[0]);
        Assert.Equal(first, others[1]);
        Assert.True(first.Distinct().Count() > 500, "the cases must differ from one another");
    }

    [Fact]
    public void Run_otherMasterSeedOrOtherTest_generatesOtherCases()
    {
        ulong master = SeededProperty.MasterSeed;
        List<(long, double, string)> baseline = Cases(master, "SeededPropertyTests.same");
        List<(long, double, string)> otherSeed = Cases(unchecked(master + 1), "SeededPropertyTests.same");
        List<(long, double, string)> otherTest = Cases(master, "SeededPropertyTests.other");
        // CsCheck draws edge values (0, ±1, extremes) often, so a few cases may coincide; most must not
        Assert.True(SameCases(baseline, otherSeed) < 30, $"{SameCases(baseline, otherSeed)} of 300 cases the same for the next master seed");
        Assert.True(SameCases(baseline, otherTest) < 30, $"{SameCases(baseline, otherTest)} of 300 cases the same for another test");
    }

    private static int SameCases(List<(long, double, string)> a, List<(long, double, string)> b) =>
        a.Zip(b).Count(p => Bits([p.First]).SequenceEqual(Bits([p.Second])));

    [Fact]
    public void CaseGenerator_ofAnIndex_givesThatCaseOfTheRun_withoutTheCasesBeforeIt()
    {
        ulong master = SeededProperty.MasterSeed;
        List<(long, double, string)> run = Cases(master, "SeededPropertyTests.same");
        foreach (int i in new[] { 0, 1, 77, 299 })
        {
            var alone = Mixed.Generate(SeededProperty.CaseGenerator(master, "SeededPropertyTests.same", i), null, out _);
            Assert.Equal(Bits([run[i]]), Bits([alone]));
        }
    }

    [Fact]
    public void Run_failingProperty_namesBothSeeds_andEachReplaysTheSameFailure()
    {
        // about one case in a hundred fails; 2000 cases pass together with probability 0.99²⁰⁰⁰ ≈ 2e-9
        ulong master = SeededProperty.MasterSeed;
        Gen<int> gen = Gen.Int[0, 999];
        var failed = new List<int>();
        void Assertion(int x)
        {
            if (x >= 990)
            {
                failed.Add(x);
                Assert.Fail($"{x} is 990 or more");
            }
        }
        var e = Assert.Throws<PropertyFailedException>(() => SeededProperty.Run(gen, Assertion, 2000, "SeededPropertyTests.failing", master));
        Assert.Equal(master, e.MasterSeed);
        Assert.Equal("SeededPropertyTests.failing", e.Test);
        Assert.NotNull(e.CaseIndex);
        Assert.Contains("Property SeededPropertyTests.failing failed at case " + (e.CaseIndex + 1).Value.ToString(CultureInfo.InvariantCulture) + " of 2000", e.Message);
        Assert.Contains($"master seed {master}", e.Message);
        Assert.Contains($"case seed {e.CaseSeed}", e.Message);
        Assert.Contains($"LOADDIFF_TEST_SEED={master} dotnet test tests/", e.Message);
        Assert.Contains($"LOADDIFF_TEST_CASE={e.CaseSeed} dotnet test tests/", e.Message);
        Assert.Contains("--filter \"FullyQualifiedName~failing\"", e.Message);
        Assert.Contains($"input {failed[0]}", e.Message);

        // the master seed replays the run to the same case; the case seed replays that case alone
        var again = Assert.Throws<PropertyFailedException>(() => SeededProperty.Run(gen, Assertion, 2000, "SeededPropertyTests.failing", master));
        Assert.Equal(e.CaseIndex, again.CaseIndex);
        Assert.Equal(e.CaseSeed, again.CaseSeed);
        var alone = Assert.Throws<PropertyFailedException>(() => SeededProperty.Run(gen, Assertion, 2000, "SeededPropertyTests.failing", master, e.CaseSeed));
        Assert.Null(alone.CaseIndex);
        Assert.Equal(e.CaseSeed, alone.CaseSeed);
        Assert.Equal([failed[0], failed[0], failed[0]], failed);
    }

    [Theory]
    [InlineData(null, SeededProperty.DefaultMasterSeed)]
    [InlineData("  ", SeededProperty.DefaultMasterSeed)]
    [InlineData("42", 42UL)]
    [InlineData(" 0x2A ", 42UL)]
    [InlineData("18446744073709551615", ulong.MaxValue)]
    public void ParseSeed_decimalOrHexadecimal(string? text, ulong expected) => Assert.Equal(expected, SeededProperty.ParseSeed(text));

    [Theory]
    [InlineData("-1")]
    [InlineData("1e3")]
    [InlineData("18446744073709551616")]
    [InlineData("0xG")]
    public void ParseSeed_notA64BitUnsignedNumber_namesTheVariable(string text) =>
        Assert.Contains("LOADDIFF_TEST_SEED", Assert.Throws<InvalidOperationException>(() => SeededProperty.ParseSeed(text)).Message);

    [Fact]
    public void TestName_isTheFileNameAndMethod_onEveryMachine()
    {
        Assert.Equal("DoubleDoubleTests.Operations.Add", SeededProperty.TestName("/srv/checkout/tests/DoubleDoubleTests.Operations.cs", "Add"));
        Assert.Equal("DoubleDoubleTests.Operations.Add", SeededProperty.TestName(@"C:\src\tests\DoubleDoubleTests.Operations.cs", "Add"));
        Assert.Equal("MutationTests.Json[a.json]", SeededProperty.TestName("tests/MutationTests.cs", "Json", "a.json"));
    }

    [Fact]
    public void ValueDigest_tellsApartEveryBitAndTheOrder_andNothingElse()
    {
        Assert.Equal(ValueDigest.Of((1.5, new[] { 1, 2 }, "ab")), ValueDigest.Of((1.5, new[] { 1, 2 }, "ab")));
        Assert.NotEqual(ValueDigest.Of(0.0), ValueDigest.Of(-0.0));
        Assert.NotEqual(ValueDigest.Of(new[] { 1, 2 }), ValueDigest.Of(new[] { 2, 1 }));
        Assert.NotEqual(ValueDigest.Of(("a", "bc")), ValueDigest.Of(("ab", "c")));
        // an object by its fields, private ones included
        Assert.Equal(ValueDigest.Of(new Exact(1, 2)), ValueDigest.Of(new Exact(1, 2)));
        Assert.NotEqual(ValueDigest.Of(new Exact(1, 2)), ValueDigest.Of(new Exact(1, 3)));
    }

    private sealed class Exact(double a, double b)
    {
        public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{a} {b}");
    }
}
