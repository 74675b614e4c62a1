using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Tests.Support;
using CollectingSink = LoadDiff.Formats.Tests.Support.CollectingSink;

namespace LoadDiff.Formats.Tests;

// Whether a document stated its units or had them defaulted (SPEC §3: "units ... all optional, SI by default";
// a CSV given directly carries no units of its own). Every JSON case is read by both paths: whole, and streamed.
public sealed partial class LoadFileReaderTests
{
    private static readonly ReadOptions StreamedPath = new() { StreamJsonAbove = 0 };

    private const string NoUnitsFile = """
        { "cases": { "dead": { "loads": [ { "id": "p", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -5] } ] } } }
        """;

    /// <summary>The header of a JSON file read whole and streamed; both must succeed and agree.</summary>
    private DocumentHeader HeaderByBothPaths(string json)
    {
        string path = _folder.Write("model.loads.json", json);
        ReadResult whole = LoadFileReader.Read(path, new CollectingSink());
        ReadResult streamed = LoadFileReader.Read(path, new CollectingSink(), StreamedPath);
        Assert.True(whole.Succeeded, string.Join("\n", whole.Diagnostics));
        Assert.True(streamed.Succeeded, string.Join("\n", streamed.Diagnostics));
        Assert.Equal(whole.Header, streamed.Header);
        return whole.Header!;
    }

    [Fact]
    public void Read_file_without_units_block_reports_no_unit_stated_on_both_paths()
    {
        DocumentHeader h = HeaderByBothPaths(NoUnitsFile);
        Assert.False(h.ForceUnitStated);
        Assert.False(h.LengthUnitStated);
        Assert.False(h.MassUnitStated);
        Assert.Equal(UnitSystem.Si, h.SourceUnits); // SPEC §3: SI by default
    }

    [Fact]
    public void Read_file_with_empty_units_block_reports_no_unit_stated_on_both_paths()
    {
        DocumentHeader h = HeaderByBothPaths("""{ "units": {}, "cases": { "dead": { "loads": [ { "id": "c", "kind": "couple", "value": [0, 0, 1] } ] } } }""");
        Assert.False(h.ForceUnitStated);
        Assert.False(h.LengthUnitStated);
        Assert.False(h.MassUnitStated);
    }

    [Fact]
    public void Read_file_with_force_and_length_units_reports_those_stated_and_mass_not_on_both_paths()
    {
        DocumentHeader h = HeaderByBothPaths("""
            { "units": { "force": "kN", "length": "mm" },
              "cases": { "dead": { "loads": [ { "id": "p", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -5] } ] } } }
            """);
        Assert.True(h.ForceUnitStated);
        Assert.True(h.LengthUnitStated);
        Assert.False(h.MassUnitStated);
    }

    [Fact]
    public void Read_file_with_units_after_the_cases_reports_them_stated_on_both_paths()
    {
        // The streamed path finds the units in its first pass even when they follow the loads.
        DocumentHeader h = HeaderByBothPaths("""
            { "cases": { "dead": { "loads": [ { "id": "m", "kind": "mass", "at": [0, 0, 0], "value": 2 } ] } },
              "units": { "mass": "t" } }
            """);
        Assert.False(h.ForceUnitStated);
        Assert.False(h.LengthUnitStated);
        Assert.True(h.MassUnitStated);
    }

    [Fact]
    public void ReadJson_from_memory_without_units_block_reports_no_unit_stated()
    {
        ReadResult r = LoadFileReader.ReadJson(System.Text.Encoding.UTF8.GetBytes(NoUnitsFile), "-", _folder.Path, new CollectingSink());
        Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
        Assert.False(r.Header!.ForceUnitStated || r.Header.LengthUnitStated || r.Header.MassUnitStated);
    }

    [Fact]
    public void Read_csv_given_directly_without_chosen_units_reports_no_unit_stated()
    {
        string path = _folder.Write("anchors.csv", "id,x,y,z,fx,fy,fz\nb1,1,0,0,0,0,-2\n");
        ReadResult r = LoadFileReader.Read(path, new CollectingSink(), new ReadOptions { TargetUnits = UnitSystem.Si });
        Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
        Assert.False(r.Header!.ForceUnitStated || r.Header.LengthUnitStated || r.Header.MassUnitStated);
    }

    [Fact]
    public void Read_csv_given_directly_with_chosen_units_reports_them_stated_even_when_they_are_SI()
    {
        string path = _folder.Write("anchors.csv", "id,x,y,z,fx,fy,fz\nb1,1,0,0,0,0,-2\n");
        foreach (UnitSystem chosen in new[] { UnitSystem.Si, new UnitSystem(UnitCatalog.Kip, UnitCatalog.Inch, UnitCatalog.Pound) })
        {
            ReadResult r = LoadFileReader.Read(path, new CollectingSink(), new ReadOptions { CsvUnits = chosen });
            Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
            Assert.True(r.Header!.ForceUnitStated && r.Header.LengthUnitStated && r.Header.MassUnitStated);
            Assert.Equal(chosen, r.Header.SourceUnits);
        }
    }

    [Fact]
    public void ReadOptions_copied_with_other_changes_keep_the_chosen_csv_units_as_given()
    {
        string path = _folder.Write("anchors.csv", "id,x,y,z,fx,fy,fz\nb1,1,0,0,0,0,-2\n");
        ReadOptions copied = new ReadOptions { CsvUnits = UnitSystem.Si } with { MaxItems = 10 };
        ReadResult r = LoadFileReader.Read(path, new CollectingSink(), copied);
        Assert.True(r.Header!.LengthUnitStated);
    }

    [Fact]
    public void NoUnits_hint_for_a_file_without_units_block_read_by_both_paths()
    {
        // SPEC §3: without a units block a file is read in SI (N, m, kg).
        UnitHint hint = UnitSlipHints.NoUnits("the substitute", HeaderByBothPaths(NoUnitsFile))!;
        Assert.Equal("no-units", hint.Code);
        Assert.Contains("read as N, m, kg", hint.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoUnits_no_hint_for_a_file_with_force_and_length_units_read_by_both_paths()
    {
        DocumentHeader h = HeaderByBothPaths("""
            { "units": { "force": "N", "length": "m" },
              "cases": { "dead": { "loads": [ { "id": "p", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -5] } ] } } }
            """);
        Assert.Null(UnitSlipHints.NoUnits("the substitute", h));
    }

    [Fact]
    public void NoUnits_hint_for_a_csv_given_directly_only_when_its_units_were_not_chosen()
    {
        string path = _folder.Write("anchors.csv", "id,x,y,z,fx,fy,fz\nb1,1,0,0,0,0,-2\n");
        ReadResult plain = LoadFileReader.Read(path, new CollectingSink());
        ReadResult chosen = LoadFileReader.Read(path, new CollectingSink(), new ReadOptions { CsvUnits = UnitSystem.Si });
        Assert.Equal("no-units", UnitSlipHints.NoUnits("anchors.csv", plain.Header!)!.Code);
        Assert.Null(UnitSlipHints.NoUnits("anchors.csv", chosen.Header!));
    }
}
