using LoadDiff.Core;
using LoadDiff.Core.Distribution;
using LoadDiff.Core.Text;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// Reads the points a load is distributed onto: a CSV with the columns <c>id,x,y,z</c> and an optional
/// <c>weight</c> (relative stiffness, &gt; 0, default 1), coordinates in the load file's length units.
/// </summary>
public static class SupportPointReader
{
    /// <summary>The columns, for messages and help.</summary>
    public const string Layout = "id, x, y, z and optionally weight";

    /// <summary>Reads the points; on failure the list is null and the diagnostic says why and where.</summary>
    public static (IReadOnlyList<SupportPoint>? Points, Diagnostic? Error) Read(string path, ReadOptions? options = null) =>
        Read(path, path, options);

    /// <summary>
    /// Reads the points from <paramref name="path"/>, naming <paramref name="displayName"/> in every diagnostic (the operand
    /// as the user wrote it, when the file is a copy taken from a revision); on failure the list is null.
    /// </summary>
    public static (IReadOnlyList<SupportPoint>? Points, Diagnostic? Error) Read(string path, string displayName, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(displayName);
        options ??= new ReadOptions();
        try
        {
            if (!File.Exists(path))
            {
                throw new InputError(new Diagnostic(Codes.FileUnreadable, Severity.Error, "file not found", new SourceLocation(displayName)));
            }
            using CsvRowReader csv = CsvLoadReader.Open(path, displayName, options);
            csv.ReadHeader();
            int id = csv.RequiredColumn("id", Layout), x = csv.RequiredColumn("x", Layout), y = csv.RequiredColumn("y", Layout), z = csv.RequiredColumn("z", Layout);
            int weight = csv.Column("weight");
            var points = new List<SupportPoint>();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            while (csv.ReadRow())
            {
                string name = csv.Text(id);
                // The id becomes the id of the force placed there, so it obeys the rule of ids in a load description.
                if (ItemIds.Problem(name, "a support point id") is { } problem)
                {
                    throw csv.Fail(Codes.InvalidId, problem, id);
                }
                if (!seen.Add(name))
                {
                    throw csv.Fail(Codes.DuplicateId, $"support point id '{name}' appears twice", id);
                }
                Vector3 at = Vector3.Create(csv.Number(x), csv.Number(y), csv.Number(z));
                double w = weight >= 0 ? csv.Number(weight) : 1;
                if (!(w > 0))
                {
                    throw csv.Fail(Codes.OutOfRange, $"weight {w.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} of point '{name}' must be greater than 0", weight);
                }
                points.Add(new SupportPoint(name, at, w));
            }
            if (points.Count == 0)
            {
                throw csv.Fail(Codes.NoSupportPoints, "the file lists no support points (a header row and at least one row are needed)", 0);
            }
            return (points, null);
        }
        catch (InputError e)
        {
            return (null, e.Diagnostic);
        }
    }
}
