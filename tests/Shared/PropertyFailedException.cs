using System.Globalization;

namespace LoadDiff.Tests.Support;

/// <summary>A property failed; the message names the test, the master seed and the case seed, and how to replay it.</summary>
public sealed class PropertyFailedException : Exception
{
    public PropertyFailedException(string test, ulong master, int? index, int iter, string caseSeed, string input, Exception inner)
        : base(Describe(test, master, index, iter, caseSeed, input, inner), inner)
    {
        Test = test;
        MasterSeed = master;
        CaseIndex = index;
        CaseSeed = caseSeed;
    }

    /// <summary>The test's name (<see cref="SeededProperty.TestName"/>).</summary>
    public string Test { get; }

    /// <summary>The master seed of the run.</summary>
    public ulong MasterSeed { get; }

    /// <summary>The failing case's index from 0, or null when the case came from <see cref="SeededProperty.CaseVariable"/>.</summary>
    public int? CaseIndex { get; }

    /// <summary>The failing case's seed, as <see cref="SeededProperty.CaseVariable"/> takes it.</summary>
    public string CaseSeed { get; }

    private static string Describe(string test, ulong master, int? index, int iter, string caseSeed, string input, Exception inner)
    {
        string project = typeof(SeededProperty).Assembly.GetName().Name ?? "the test project";
        string method = test.Split('[')[0];
        method = method[(method.LastIndexOf('.') + 1)..];
        string command = $"dotnet test tests/{project} --filter \"FullyQualifiedName~{method}\"";
        string which = index is { } i ? $"case {i + 1} of {iter}" : $"the case given by {SeededProperty.CaseVariable}";
        return string.Create(CultureInfo.InvariantCulture, $"""
            Property {test} failed at {which}: {inner.Message}
              master seed {master}{(master == SeededProperty.DefaultMasterSeed ? " (the default)" : "")}, case seed {caseSeed}
              input {input}
              replay the run:  {SeededProperty.SeedVariable}={master} {command}
              replay the case: {SeededProperty.CaseVariable}={caseSeed} {command}
            """);
    }
}
