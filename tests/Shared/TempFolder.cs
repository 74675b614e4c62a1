using System.Text;

namespace LoadDiff.Tests.Support;

/// <summary>A fresh folder on disk for test files, removed when disposed (compiled into each test project that needs one).</summary>
public sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "loaddiff-test-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    /// <summary>Writes UTF-8 text without a byte-order mark.</summary>
    public string Write(string name, string content) => WriteBytes(name, new UTF8Encoding(false).GetBytes(content));

    public string WriteBytes(string name, byte[] content)
    {
        string full = System.IO.Path.Combine(Path, name);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(full)!);
        File.WriteAllBytes(full, content);
        return full;
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
