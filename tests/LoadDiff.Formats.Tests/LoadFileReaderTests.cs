using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Tests.Support;

namespace LoadDiff.Formats.Tests;

/// <summary>The reader through its public API: <see cref="LoadFileReader.Read"/> and <see cref="LoadFileReader.ReadJson"/>.</summary>
public sealed partial class LoadFileReaderTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    /// <summary>Writes <paramref name="json"/> as a load file, reads it and requires success without warnings.</summary>
    private CollectingSink Read(string json, ReadOptions? options = null, string name = "model.loads.json")
    {
        string path = _folder.Write(name, json);
        var sink = new CollectingSink();
        ReadResult result = LoadFileReader.Read(path, sink, options);
        Assert.True(result.Succeeded, string.Join("\n", result.Diagnostics));
        Assert.Empty(result.Diagnostics);
        Assert.NotNull(result.Header);
        Assert.Equal(result.Header, sink.DocumentHeader);
        return sink;
    }

    /// <summary>Reads a file that must fail; returns its one error.</summary>
    private Diagnostic ReadError(string json, ReadOptions? options = null, string name = "model.loads.json")
    {
        string path = _folder.Write(name, json);
        return ReadErrorAt(path, options);
    }

    private static Diagnostic ReadErrorAt(string path, ReadOptions? options = null)
    {
        ReadResult result = LoadFileReader.Read(path, new CollectingSink(), options);
        Assert.False(result.Succeeded);
        Assert.Null(result.Header);
        Diagnostic error = Assert.Single(result.Diagnostics);
        Assert.Equal(Severity.Error, error.Severity);
        Assert.Same(error, result.Error);
        return error;
    }

    /// <summary>Relative comparison, for values that went through one or two roundings.</summary>
    private static void AssertRelative(double expected, double actual, double relative = 1e-12)
    {
        double scale = Math.Max(Math.Abs(expected), Math.Abs(actual));
        Assert.True(Math.Abs(expected - actual) <= relative * scale, $"expected {expected:R}, got {actual:R} (relative tolerance {relative:R})");
    }

    private static void AssertRelative(LoadDiff.Core.Vector3 expected, LoadDiff.Core.Vector3 actual, double relative = 1e-12)
    {
        for (int i = 0; i < 3; i++)
        {
            AssertRelative(expected[i], actual[i], relative);
        }
    }

    private static LoadDiff.Core.Vector3 V(double x, double y, double z) => LoadDiff.Core.Vector3.Create(x, y, z);
}
