using System.Globalization;
using CsCheck;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Tests.Source;

public class DocumentDifferTests
{
    private const string Base = """
        { "units": { "force": "kN", "length": "m" }, "cases": {
          "dead": { "loads": [
            { "id": "p1", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10] },
            { "id": "p2", "kind": "force", "at": [4, 0, 0], "value": [0, 0, -20] },
            { "id": "w",  "kind": "line", "from": [0, 0, 0], "to": [6, 0, 0], "start": [0, 0, -2], "end": [0, 0, -4] } ] } } }
        """;

    private static string N(double d) => d.ToString("R", CultureInfo.InvariantCulture);

    private static DocumentDiff Diff(string a, string b, Vector3? at = null)
    {
        SourceReadResult old = LoadDocumentReader.ReadText(a, "old");
        Assert.True(old.Succeeded, old.Error?.ToString());
        SourceReadResult @new = LoadDocumentReader.ReadText(b, "new", new ReadOptions { TargetUnits = old.Document!.Units });
        Assert.True(@new.Succeeded, @new.Error?.ToString());
        return DocumentDiffer.Compare("old", old, "new", @new, at ?? Vector3.Zero, "origin", []);
    }

    [Fact]
    public void Reordered_keys_and_items_reformatted_numbers_and_comments_are_no_difference()
    {
        DocumentDiff d = Diff(Base, """
            // reviewed
            { "cases": { "dead": { "loads": [
                { "kind": "line", "id": "w", "end": [0, 0, -4.0], "start": [0, 0, -2e0], "to": [6, 0, 0], "from": [0, 0, 0] },
                { "id": "p2", "kind": "force", "value": [0, 0, -2.0e1], "at": [4, 0, 0] },  /* moved up */
                { "id": "p1", "kind": "force", "at": [1.000, 0, 0], "value": [0, 0, -10] }, ] } },
              "units": { "length": "m", "force": "kN" } }
            """);
        Assert.False(d.HasDifferences);
        Assert.All(d.Resultants, r => Assert.True(r.Unchanged));
    }

    [Fact]
    public void A_changed_value_a_removed_and_an_added_item_are_each_named()
    {
        DocumentDiff d = Diff(Base, """
            { "units": { "force": "kN", "length": "m" }, "cases": {
              "dead": { "loads": [
                { "id": "p1", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -12] },
                { "id": "w",  "kind": "line", "from": [0, 0, 0], "to": [6, 0, 0], "start": [0, 0, -2], "end": [0, 0, -4] },
                { "id": "p3", "kind": "couple", "value": [0, 5, 0] } ] } } }
            """);
        Assert.True(d.HasDifferences);
        ItemChange changed = Assert.Single(d.Items, i => i.Change == ChangeKind.Changed);
        Assert.Equal("p1", changed.Id);
        FieldChange f = Assert.Single(changed.Fields);
        Assert.Equal(("value", "[0, 0, -10]", "[0, 0, -12]", "kN"), (f.Field, f.Old, f.New, f.Unit));
        // hand: ΔF = −2 kN at x = 1 m about the origin gives ΔM = r × ΔF = (1,0,0) × (0,0,−2) = (0, 2, 0)
        Assert.Equal(Vector3.Create(0, 0, -2), changed.DeltaForce);
        Assert.Equal(Vector3.Create(0, 2, 0), changed.DeltaMoment);
        ItemChange removed = Assert.Single(d.Items, i => i.Change == ChangeKind.Removed);
        Assert.Equal("p2", removed.Id);
        Assert.Equal(Vector3.Create(0, 0, 20), removed.DeltaForce);
        ItemChange added = Assert.Single(d.Items, i => i.Change == ChangeKind.Added);
        Assert.Equal("p3", added.Id);
        Assert.Equal(Vector3.Create(0, 5, 0), added.DeltaMoment);
    }

    [Fact]
    public void Id_less_items_at_one_place_are_numbered_in_file_order()
    {
        // Five id-less forces at one point are ~force@…, then #2 … #5 in file order (README, "ids"); changing the
        // fourth changes exactly the item numbered #4. The numbering stays in order when an explicit id sits
        // between them.
        static string Doc(string fourth) =>
            """{ "cases": { "d": { "loads": [ { "kind": "force", "at": [1, 2, 3], "value": [0, 0, -1] },"""
            + """{ "kind": "force", "at": [1, 2, 3], "value": [0, 0, -2] },"""
            + """{ "id": "named", "kind": "force", "at": [1, 2, 3], "value": [0, 0, -9] },"""
            + """{ "kind": "force", "at": [1, 2, 3], "value": [0, 0, -3] },"""
            + """{ "kind": "force", "at": [1, 2, 3], "value": [0, 0, """ + fourth + """] },"""
            + """{ "kind": "force", "at": [1, 2, 3], "value": [0, 0, -5] } ] } } }""";
        ItemChange c = Assert.Single(Diff(Doc("-4"), Doc("-40")).Items);
        Assert.True(c.DerivedId);
        Assert.StartsWith("~force@", c.Id, StringComparison.Ordinal);
        Assert.EndsWith("#4", c.Id, StringComparison.Ordinal);
    }

    [Fact]
    public void Items_without_id_are_matched_by_a_derived_key_and_marked()
    {
        const string a = """{ "cases": { "d": { "loads": [ { "kind": "force", "at": [1, 2, 3], "value": [0, 0, -1] } ] } } }""";
        const string b = """{ "cases": { "d": { "loads": [ { "kind": "force", "at": [1, 2, 3], "value": [0, 0, -3] } ] } } }""";
        ItemChange c = Assert.Single(Diff(a, b).Items);
        Assert.True(c.DerivedId);
        Assert.StartsWith("~force@", c.Id, StringComparison.Ordinal);
        Assert.Equal(ChangeKind.Changed, c.Change);
        Assert.Contains(Diff(a, b).Notes, n => n.Contains("derived", StringComparison.Ordinal));
    }

    [Fact]
    public void Different_units_are_compared_after_exact_conversion_and_said()
    {
        // 1 kN = 1000 N and 1 m = 1000 mm exactly (NIST SP 811, SI prefixes)
        const string a = """{ "units": { "force": "kN", "length": "m" }, "cases": { "d": { "loads": [ { "id": "p", "kind": "force", "at": [1.5, 0, 0], "value": [0, 0, -2] } ] } } }""";
        const string b = """{ "units": { "force": "N", "length": "mm" }, "cases": { "d": { "loads": [ { "id": "p", "kind": "force", "at": [1500, 0, 0], "value": [0, 0, -2000] } ] } } }""";
        DocumentDiff d = Diff(a, b);
        Assert.True(d.UnitsConverted);
        Assert.Empty(d.Items);
        SettingChange units = Assert.Single(d.Settings);
        Assert.Equal("units", units.What);
        Assert.Contains(d.Notes, n => n.Contains("NIST SP 811", StringComparison.Ordinal));
    }

    [Fact]
    public void A_moved_named_point_changes_the_items_that_refer_to_it()
    {
        const string a = """{ "points": { "A": [1, 0, 0] }, "cases": { "d": { "loads": [ { "id": "p", "kind": "force", "at": "A", "value": [0, 0, -1] } ] } } }""";
        const string b = """{ "points": { "A": [2, 0, 0] }, "cases": { "d": { "loads": [ { "id": "p", "kind": "force", "at": "A", "value": [0, 0, -1] } ] } } }""";
        DocumentDiff d = Diff(a, b);
        Assert.Contains(d.Settings, s => s.What == "point A");
        ItemChange c = Assert.Single(d.Items);
        Assert.Equal("\"A\" = [1, 0, 0]", c.Fields[0].Old);
        Assert.Equal(Vector3.Create(0, 1, 0), c.DeltaMoment); // (1,0,0) × (0,0,−1) = (0, 1, 0)
    }

    private static readonly Gen<string> Body = SourceSamples.ItemBody;

    [Fact]
    public void The_contribution_of_the_only_change_equals_the_change_of_the_case_resultant()
    {
        // ΔR_i from the item's own exact contribution must equal ΔR of the case (reduced separately, in double-double)
        Gen.Select(Body.Array[1, 6], Gen.Int[0, 5], Body, Gen.Select(SourceSamples.Moderate, SourceSamples.Moderate, SourceSamples.Moderate))
            .SampleSeeded((bodies, pick, replacement, p) =>
            {
                int k = pick % bodies.Length;
                string Doc(string[] items) => "{ \"units\": { \"force\": \"kN\", \"length\": \"m\" }, \"cases\": { \"d\": { \"loads\": ["
                    + string.Join(", ", items.Select((it, i) => $"{{ \"id\": \"i{i}\", {it} }}")) + "] } } }";
                string[] changed = [.. bodies];
                changed[k] = replacement;
                if (changed[k] == bodies[k])
                {
                    return;
                }
                Vector3 point = Vector3.Create(p.Item1, p.Item2, p.Item3);
                DocumentDiff d = Diff(Doc(bodies), Doc(changed), point);
                ItemChange c = Assert.Single(d.Items);
                Assert.Equal("i" + k.ToString(CultureInfo.InvariantCulture), c.Id);
                var r = Assert.Single(d.Resultants);
                // the scale of rounding is the gross magnitude of both versions (Σ|F|, and Σ|F|·size about the point),
                // not the resultant, which may be a small remainder of large cancelling loads
                var ga = LoadDocumentReader.ReadText(Doc(bodies)).Resultants!.Cases.Cases["d"].ResultAt(point);
                var gb = LoadDocumentReader.ReadText(Doc(changed)).Resultants!.Cases.Cases["d"].ResultAt(point);
                double scaleF = ga.GrossForce + gb.GrossForce;
                double scaleM = ga.MomentScale(point) + gb.MomentScale(point);
                // 1e-12 relative, plus 1e-300 absolute because products of subnormal inputs keep only a few
                // significant bits (IEEE 754 gradual underflow)
                Assert.True((c.DeltaForce - r.DeltaForce).Length <= (1e-12 * scaleF) + 1e-300, $"ΔR_i {c.DeltaForce} vs ΔR {r.DeltaForce}");
                Assert.True((c.DeltaMoment - r.DeltaMoment).Length <= (1e-12 * scaleM) + 1e-300, $"ΔM_i {c.DeltaMoment} vs ΔM {r.DeltaMoment}");
            }, iter: 300);
    }

    [Fact]
    public void Diff_of_a_document_with_itself_is_empty()
    {
        SourceSamples.Document.SampleSeeded(json =>
        {
            DocumentDiff d = Diff(json, json);
            Assert.False(d.HasDifferences);
            Assert.Equal(d.OldListing, d.NewListing);
        }, iter: 100);
    }
}
