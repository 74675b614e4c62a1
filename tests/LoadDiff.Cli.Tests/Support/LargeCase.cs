using System.Globalization;
using System.Text;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>
/// A generated pair too large to draw item by item: thousands of nodal forces (a CSV) and a pressure mesh of
/// thousands of triangles on a roof at z = 5 m, against a one-force substitute. Invented data, for drawing only.
/// </summary>
public static class LargeCase
{
    public const int Forces = 6000;
    public const int MeshColumns = 60, MeshRows = 50;
    public const int Triangles = 2 * MeshColumns * MeshRows;

    public static (string Original, string Substitute) Write(TempFolder t)
    {
        var inv = CultureInfo.InvariantCulture;
        var rng = new Random(20240611);
        var nodal = new StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 0; i < Forces; i++)
        {
            nodal.Append(inv, $"n{i},{rng.NextDouble() * 40:0.###},{rng.NextDouble() * 20:0.###},0,0,0,{-0.5 - (rng.NextDouble() * 2.5):0.###}\n");
        }
        t.Write("nodal.csv", nodal.ToString());
        var mesh = new StringBuilder("x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n");
        static double P(double x, double y) => (0.8 * Math.Sin(x / 40 * Math.PI)) - (0.3 * y / 20);
        for (int i = 0; i < MeshColumns; i++)
        {
            for (int j = 0; j < MeshRows; j++)
            {
                double x0 = i * 40.0 / MeshColumns, x1 = (i + 1) * 40.0 / MeshColumns, y0 = j * 20.0 / MeshRows, y1 = (j + 1) * 20.0 / MeshRows;
                mesh.Append(inv, $"{x0},{y0},5,{x1},{y0},5,{x1},{y1},5,{P(x0, y0):0.####},{P(x1, y0):0.####},{P(x1, y1):0.####}\n");
                mesh.Append(inv, $"{x0},{y0},5,{x1},{y1},5,{x0},{y1},5,{P(x0, y0):0.####},{P(x1, y1):0.####},{P(x0, y1):0.####}\n");
            }
        }
        t.Write("roof.csv", mesh.ToString());
        string original = t.Write("roof.loads.json", """
            { "units": { "force": "kN", "length": "m" },
              "cases": { "roof": { "loads": [
                { "id": "nodes", "kind": "forces", "file": "nodal.csv" },
                { "id": "wind", "kind": "mesh", "file": "roof.csv" } ] } } }
            """);
        string substitute = t.Write("lumped.loads.json", """
            { "units": { "force": "kN", "length": "m" },
              "cases": { "roof": { "loads": [ { "id": "lumped", "kind": "force", "at": [20, 10, 0], "value": [0, 0, -10000] } ] } } }
            """);
        return (original, substitute);
    }
}
