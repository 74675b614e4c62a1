using System.Text;
using DiffPlex.DiffBuilder;
using DiffPlex.DiffBuilder.Model;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>
/// Golden files: output is compared with a committed <c>Golden/NAME.verified.EXT</c>; a difference fails with a
/// line diff and leaves <c>NAME.received.EXT</c> beside it. <c>LOADDIFF_ACCEPT=1</c> rewrites the verified file
/// instead (review the change in version control before committing it).
/// </summary>
public static class Golden
{
    public static string Folder => Path.Combine(CliProcess.RepoRoot, "tests", "LoadDiff.Cli.Tests", "Golden");

    public static void Verify(string name, string extension, string actual)
    {
        actual = actual.Replace("\r\n", "\n", StringComparison.Ordinal);
        string verified = Path.Combine(Folder, $"{name}.verified.{extension}");
        string received = Path.Combine(Folder, $"{name}.received.{extension}");
        string? expected = File.Exists(verified) ? File.ReadAllText(verified).Replace("\r\n", "\n", StringComparison.Ordinal) : null;
        if (expected == actual)
        {
            File.Delete(received);
            return;
        }
        Directory.CreateDirectory(Folder);
        if (Environment.GetEnvironmentVariable("LOADDIFF_ACCEPT") == "1")
        {
            File.WriteAllText(verified, actual);
            File.Delete(received);
            return;
        }
        File.WriteAllText(received, actual);
        string diff = expected is null ? "(there is no verified file yet)" : Diff(expected, actual);
        Assert.Fail($"{name}.{extension} differs from {verified}:\n{diff}\nReview {received}; run with LOADDIFF_ACCEPT=1 to accept it.");
    }

    /// <summary>The changed lines with two lines of context, at most 80 lines.</summary>
    public static string Diff(string expected, string actual)
    {
        // Whitespace matters in golden files (DiffPlex ignores leading and trailing whitespace by default).
        DiffPaneModel model = InlineDiffBuilder.Diff(expected, actual, ignoreWhiteSpace: false);
        var lines = model.Lines;
        var keep = new bool[lines.Count];
        for (int i = 0; i < lines.Count; i++)
        {
            if (lines[i].Type != ChangeType.Unchanged)
            {
                for (int k = Math.Max(0, i - 2); k <= Math.Min(lines.Count - 1, i + 2); k++)
                {
                    keep[k] = true;
                }
            }
        }
        var b = new StringBuilder();
        int shown = 0;
        for (int i = 0; i < lines.Count && shown < 80; i++)
        {
            if (!keep[i])
            {
                continue;
            }
            string tag = lines[i].Type switch { ChangeType.Inserted => "+", ChangeType.Deleted => "-", _ => " " };
            b.Append(tag).Append(' ').AppendLine(lines[i].Text);
            shown++;
        }
        return b.ToString();
    }
}
