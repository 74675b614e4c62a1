using LoadDiff.Cli.Tests.Support;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Referenced files that leave the load file's folder through a symbolic link, with real files and real links on disk
/// and real git for links committed to a revision: every command refuses them the same way (LD050 at the reference).
/// </summary>
public sealed class SymlinkEscapeTests : IDisposable
{
    // A point-load table: one force of -5000 N in z at (1, 0, 0) m.
    private const string Table = "id,x,y,z,fx,fy,fz\ns1,1,0,0,0,0,-5000\n";

    private readonly TempFolder _root = new();

    public SymlinkEscapeTests()
    {
        _root.Write(Path.Combine("outside", "secret.csv"), Table);
    }

    public void Dispose() => _root.Dispose();

    private string Model => Path.Combine(_root.Path, "model");

    // A load file whose one forces item references `file`; the string sits on line 5.
    private static string Document(string file) =>
        "{\n  \"cases\": {\n    \"dead\": {\n      \"loads\": [\n"
        + $"        {{ \"id\": \"w\", \"kind\": \"forces\", \"file\": \"{file}\" }}\n"
        + "      ]\n    }\n  }\n}\n";

    // The position of the file name's string on line 5, read off the text written above.
    private static string Position(string file) => "5:" + (Document(file).Split('\n')[4].IndexOf('"' + file + '"', StringComparison.Ordinal) + 1);

    private string WriteModel(string name, string file) => _root.Write(Path.Combine("model", name), Document(file));

    private static void AssertEscapeRefusal(CliRun run, string document, string file)
    {
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.DoesNotContain("   at ", run.Stderr);
        string line = Assert.Single(run.StderrLines);
        Assert.StartsWith($"{document}:{Position(file)}: error {Codes.OutsideFolder}: '{file}' escapes the folder of the load file through a symbolic link", line);
        Assert.EndsWith("(at $.cases.dead.loads[0].file)", line);
    }

    [Fact]
    public void A_linked_file_that_leads_out_is_refused_with_its_position()
    {
        WriteModel("m.loads.json", "link.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "link.csv"), Path.Combine("..", "outside", "secret.csv"));

        CliRun run = CliProcess.RunIn(Model, "reduce", "m.loads.json");

        AssertEscapeRefusal(run, "m.loads.json", "link.csv");
        Assert.Equal("", run.Stdout);
    }

    [Fact]
    public void A_link_with_an_absolute_target_outside_is_refused()
    {
        WriteModel("m.loads.json", "abs.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "abs.csv"), Path.Combine(_root.Path, "outside", "secret.csv"));

        AssertEscapeRefusal(CliProcess.RunIn(Model, "reduce", "m.loads.json"), "m.loads.json", "abs.csv");
    }

    [Fact]
    public void A_linked_folder_inside_that_points_out_is_refused()
    {
        WriteModel("m.loads.json", "tables/secret.csv");
        Directory.CreateSymbolicLink(Path.Combine(Model, "tables"), Path.Combine("..", "outside"));

        AssertEscapeRefusal(CliProcess.RunIn(Model, "reduce", "m.loads.json"), "m.loads.json", "tables/secret.csv");
    }

    [Fact]
    public void A_chain_of_links_that_ends_outside_is_refused_and_a_loop_is_refused()
    {
        // hop.csv → inner/next.csv (inside) → ../../outside/secret.csv: only the last step leaves
        WriteModel("chain.loads.json", "hop.csv");
        Directory.CreateDirectory(Path.Combine(Model, "inner"));
        File.CreateSymbolicLink(Path.Combine(Model, "inner", "next.csv"), Path.Combine("..", "..", "outside", "secret.csv"));
        File.CreateSymbolicLink(Path.Combine(Model, "hop.csv"), Path.Combine("inner", "next.csv"));
        AssertEscapeRefusal(CliProcess.RunIn(Model, "reduce", "chain.loads.json"), "chain.loads.json", "hop.csv");

        WriteModel("loop.loads.json", "a.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "a.csv"), "b.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "b.csv"), "a.csv");
        AssertEscapeRefusal(CliProcess.RunIn(Model, "reduce", "loop.loads.json"), "loop.loads.json", "a.csv");
    }

    [Fact]
    public void Links_that_stay_inside_the_folder_are_read()
    {
        _root.Write(Path.Combine("model", "data", "real.csv"), Table);
        WriteModel("m.loads.json", "inner.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "inner.csv"), Path.Combine("data", "real.csv"));
        WriteModel("d.loads.json", "alias/real.csv");
        Directory.CreateSymbolicLink(Path.Combine(Model, "alias"), "data");

        foreach (string doc in new[] { "m.loads.json", "d.loads.json" })
        {
            CliRun run = CliProcess.RunIn(Model, "reduce", doc);
            Assert.True(run.ExitCode == 0, run.ToString());
            // Hand statics: F = (0, 0, -5000) N at r = (1, 0, 0) m gives M_O = r × F = (0, 5000, 0) N·m.
            Assert.Contains("(0, 0, -5000) N", run.Stdout);
            Assert.Contains("(0, 5000, 0) N·m", run.Stdout);
        }
    }

    [Fact]
    public void Allow_outside_still_reads_a_file_through_a_link_that_leads_out()
    {
        WriteModel("m.loads.json", "link.csv");
        File.CreateSymbolicLink(Path.Combine(Model, "link.csv"), Path.Combine("..", "outside", "secret.csv"));
        WriteModel("d.loads.json", "tables/secret.csv");
        Directory.CreateSymbolicLink(Path.Combine(Model, "tables"), Path.Combine("..", "outside"));

        foreach (string doc in new[] { "m.loads.json", "d.loads.json" })
        {
            CliRun run = CliProcess.RunIn(Model, "reduce", doc, "--allow-outside");
            Assert.True(run.ExitCode == 0, run.ToString());
            // Hand statics, as above: the outside table's one force and its moment about the origin
            Assert.Contains("(0, 0, -5000) N", run.Stdout);
            Assert.Contains("(0, 5000, 0) N·m", run.Stdout);
        }
    }

    public static TheoryData<string> Commands() => new("reduce", "check-original", "check-substitute", "diff-old", "diff-new", "fmt-check", "sections", "distribute");

    [Theory]
    [MemberData(nameof(Commands))]
    public void Every_command_refuses_the_same_hostile_folder_with_the_same_code_and_position(string command)
    {
        WriteModel("m.loads.json", "tables/secret.csv");
        Directory.CreateSymbolicLink(Path.Combine(Model, "tables"), Path.Combine("..", "outside"));
        // a harmless document and support points, both plain files inside the folder
        _root.Write(Path.Combine("model", "good.loads.json"),
            "{ \"cases\": { \"dead\": { \"loads\": [ { \"id\": \"p\", \"kind\": \"force\", \"at\": [1, 0, 0], \"value\": [0, 0, -5000] } ] } } }\n");
        _root.Write(Path.Combine("model", "supports.csv"), "id,x,y,z\na,0,0,0\nb,2,0,0\n");
        string[] args = command switch
        {
            "reduce" => ["reduce", "m.loads.json"],
            "check-original" => ["check", "m.loads.json", "good.loads.json"],
            "check-substitute" => ["check", "good.loads.json", "m.loads.json"],
            "diff-old" => ["diff", "m.loads.json", "good.loads.json"],
            "diff-new" => ["diff", "good.loads.json", "m.loads.json"],
            "fmt-check" => ["fmt", "m.loads.json", "--check"],
            "sections" => ["sections", "m.loads.json", "good.loads.json", "--axis", "x"],
            _ => ["distribute", "m.loads.json", "--onto", "supports.csv"],
        };
        string before = File.ReadAllText(Path.Combine(Model, "m.loads.json"));

        CliRun run = CliProcess.RunIn(Model, args);

        AssertEscapeRefusal(run, "m.loads.json", "tables/secret.csv");
        Assert.Equal(before, File.ReadAllText(Path.Combine(Model, "m.loads.json")));
    }

    [Fact]
    public void A_link_committed_to_a_revision_is_refused_and_the_working_tree_is_never_read()
    {
        string repo = Path.Combine(_root.Path, "repo");
        Directory.CreateDirectory(repo);
        Git(repo, "init", "-q", "-b", "main");
        Git(repo, "config", "user.name", "Test Engineer");
        Git(repo, "config", "user.email", "engineer@example.invalid");
        Git(repo, "config", "core.symlinks", "true");
        _root.Write(Path.Combine("repo", "model", "m.loads.json"), Document("link.csv"));
        _root.Write(Path.Combine("repo", "model", "d.loads.json"), Document("tables/secret.csv"));
        _root.Write(Path.Combine("repo", "model", "good.loads.json"), Document("plain.csv"));
        _root.Write(Path.Combine("repo", "model", "plain.csv"), Table);
        File.CreateSymbolicLink(Path.Combine(repo, "model", "link.csv"), Path.Combine("..", "..", "outside", "secret.csv"));
        Directory.CreateSymbolicLink(Path.Combine(repo, "model", "tables"), Path.Combine("..", "..", "outside"));
        Git(repo, "add", ".");
        Git(repo, "commit", "-q", "-m", "Loads with linked tables");
        Assert.StartsWith("120000 ", Git(repo, "ls-tree", "HEAD", "--", "model/link.csv"));
        Assert.StartsWith("120000 ", Git(repo, "ls-tree", "HEAD", "--", "model/tables"));

        foreach ((string doc, string file) in new[] { ("m.loads.json", "link.csv"), ("d.loads.json", "tables/secret.csv") })
        {
            string operand = "HEAD:model/" + doc;
            foreach (string[] args in new[] { new[] { "diff", operand, "HEAD:model/good.loads.json" }, ["reduce", operand], ["check", "HEAD:model/good.loads.json", operand] })
            {
                // refused even with --allow-outside: what a link in a revision points at is no part of that revision
                // (diff has no --allow-outside: it never reads outside the folder)
                foreach (string[] withFlag in args[0] == "diff" ? new[] { args } : new[] { args, [.. args, "--allow-outside"] })
                {
                    CliRun run = CliProcess.RunIn(repo, withFlag);
                    Assert.True(run.ExitCode == 2, string.Join(' ', withFlag) + "\n" + run);
                    string line = Assert.Single(run.StderrLines);
                    Assert.StartsWith($"{operand}:{Position(file)}: error {Codes.OutsideFolder}: '{file}' escapes through a symbolic link", line);
                    Assert.Contains("stored in revision 'HEAD' as a symbolic link", line);
                    Assert.EndsWith("(at $.cases.dead.loads[0].file)", line);
                }
            }
        }

        // the same revision's plain table is read from the revision (hand statics as above)
        CliRun good = CliProcess.RunIn(repo, "reduce", "HEAD:model/good.loads.json");
        Assert.True(good.ExitCode == 0, good.ToString());
        Assert.Contains("(0, 0, -5000) N", good.Stdout);

        // a document that is itself a link in the revision is refused too
        File.CreateSymbolicLink(Path.Combine(repo, "model", "alias.loads.json"), "good.loads.json");
        Git(repo, "add", ".");
        Git(repo, "commit", "-q", "-m", "Alias");
        CliRun alias = CliProcess.RunIn(repo, "reduce", "HEAD:model/alias.loads.json");
        Assert.True(alias.ExitCode == 2, alias.ToString());
        Assert.StartsWith($"loaddiff: error {Codes.OutsideFolder}: 'HEAD:model/alias.loads.json': 'model/alias.loads.json' is stored in revision 'HEAD' as a symbolic link", Assert.Single(alias.StderrLines));
    }

    private static string Git(string repo, params string[] args) => GitProcess.Ok(repo, args);
}
