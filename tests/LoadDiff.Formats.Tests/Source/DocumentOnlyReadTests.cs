using System.Text;
using LoadDiff.Core;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Source;
using LoadDiff.Tests.Support;

namespace LoadDiff.Formats.Tests.Source;

/// <summary>
/// Reading a document without the files it references (git's external diff and textconv, a report's notes): no table
/// is opened even where one of that name exists, the items that need one carry no load, and the names are still checked.
/// </summary>
public class DocumentOnlyReadTests
{
    private static byte[] Document(string file) => Encoding.UTF8.GetBytes($$"""
        { "units": { "length": "m", "force": "kN" },
          "cases": { "cranes": { "loads": [
            { "id": "p", "kind": "force", "at": [2, 0, 0], "value": [0, 0, -10] },
            { "id": "wheels", "kind": "forces", "file": "{{file}}" } ] } } }
        """);

    [Fact]
    public void A_table_is_never_opened_and_its_item_carries_nothing()
    {
        // A table of that name beside the document as it would be read normally, and in the folder the document-only
        // read resolves names against: neither may be read.
        using var dir = new TempFolder();
        const string table = "id,x,y,z,fx,fy,fz\nw1,0,0,0,0,0,-500\n";
        File.WriteAllText(Path.Combine(dir.Path, "wheels.csv"), table);
        byte[] doc = Document("wheels.csv");

        SourceReadResult normal = LoadDocumentReader.ReadBytes(doc, "d.loads.json", dir.Path);
        Assert.True(normal.Succeeded, normal.Error?.ToString());
        // 10 kN + 500 kN: the table is read when it may be
        Assert.Equal(-510, normal.Resultants!.Cases.Cases["cranes"].ResultAt(Vector3.Zero).Force.Z);

        string shared = Path.Combine(Path.GetTempPath(), "loaddiff-document-only");
        Directory.CreateDirectory(shared);
        string stray = Path.Combine(shared, "wheels.csv");
        File.WriteAllText(stray, table);
        var missing = new List<string>();
        SourceReadResult only;
        try
        {
            only = LoadDocumentReader.ReadDocumentOnly(doc, "d.loads.json", new ReadOptions { MissingReferencedFile = missing.Add });
        }
        finally
        {
            File.Delete(stray);
        }
        Assert.True(only.Succeeded, only.Error?.ToString());
        Assert.Equal(["wheels.csv"], missing);
        LoadReduction r = only.Resultants!.Cases.Cases["cranes"].ResultAt(Vector3.Zero);
        // the force item alone: R = −10 kN at x = 2 m, M_y about the origin = −(2 × −10) = 20 kN·m
        Assert.Equal(-10, r.Force.Z);
        Assert.Equal(20, r.Moment.Y);
        Assert.Equal(2, only.Document!.Cases[0].Items.Length);
    }

    [Fact]
    public void Without_a_listener_the_names_are_still_skipped_quietly()
    {
        SourceReadResult only = LoadDocumentReader.ReadDocumentOnly(Document("wheels.csv"), "d.loads.json");
        Assert.True(only.Succeeded, only.Error?.ToString());
        Assert.Equal(-10, only.Resultants!.Cases.Cases["cranes"].ResultAt(Vector3.Zero).Force.Z);
    }

    [Theory]
    [InlineData("../wheels.csv")]
    [InlineData("/var/data/wheels.csv")]
    public void A_name_outside_the_document_folder_is_still_an_error(string name)
    {
        SourceReadResult only = LoadDocumentReader.ReadDocumentOnly(Document(name), "d.loads.json", new ReadOptions { MissingReferencedFile = _ => { } });
        Assert.False(only.Succeeded);
        Assert.Equal(Codes.OutsideFolder, only.Error!.Code);
    }
}
