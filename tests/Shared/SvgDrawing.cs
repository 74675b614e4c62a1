using System.Globalization;
using System.Xml.Linq;

namespace LoadDiff.Tests.Support;

/// <summary>A straight arrow read from a drawing: its tail, its tip (the first point of its head) and what it draws.</summary>
public sealed record DrawnArrow(double X1, double Y1, double TipX, double TipY, string Class, string? Item)
{
    public double Length => Math.Sqrt(((TipX - X1) * (TipX - X1)) + ((TipY - Y1) * (TipY - Y1)));
}

/// <summary>
/// Reads one SVG view of a report as geometry: arrows (a line followed by its head polygon), the length scale bar
/// (its pixel length and the length it states), the reference arrows (their pixel length and the value they state)
/// and the reference point's mark. Only what the drawing shows is used, never the renderer's constants.
/// </summary>
public sealed class SvgDrawing
{
    private readonly List<XElement> _elements;

    public SvgDrawing(XElement svg)
    {
        ArgumentNullException.ThrowIfNull(svg);
        _elements = svg.Descendants().ToList();
        var arrows = new List<DrawnArrow>();
        for (int i = 0; i + 1 < _elements.Count; i++)
        {
            XElement line = _elements[i], head = _elements[i + 1];
            if (line.Name.LocalName == "line" && head.Name.LocalName == "polygon" && Class(head).StartsWith("head ", StringComparison.Ordinal))
            {
                (double tx, double ty) = Points(head)[0];
                arrows.Add(new DrawnArrow(Num(line, "x1"), Num(line, "y1"), tx, ty, Class(line), (string?)line.Attribute("data-item")));
            }
        }
        Arrows = arrows;
    }

    public static SvgDrawing Parse(string svg) => new(XElement.Parse(svg));

    public IReadOnlyList<DrawnArrow> Arrows { get; }

    public IEnumerable<XElement> Elements(string name) => _elements.Where(e => e.Name.LocalName == name);

    public IEnumerable<XElement> ForItem(string id) => _elements.Where(e => (string?)e.Attribute("data-item") == id);

    /// <summary>Pixels per length unit, from the length scale bar: its bar's pixel length over the length its label states.</summary>
    public double PixelsPerLength(string lengthSymbol)
    {
        XElement label = Elements("text").Single(t => Class(t) == "sc" && (string?)t.Attribute("text-anchor") == "middle"
            && t.Value.EndsWith(" " + lengthSymbol, StringComparison.Ordinal));
        double stated = double.Parse(label.Value.Split(' ')[0], CultureInfo.InvariantCulture);
        double end = Num(label, "x");
        XElement bar = Elements("line").Single(l => Class(l) == "bar" && Num(l, "y1") == Num(l, "y2") && Math.Abs(Num(l, "x2") - end) < 0.05);
        Assert.Equal("0", Elements("text").Single(t => Class(t) == "sc" && Math.Abs(Num(t, "x") - Num(bar, "x1")) < 0.05).Value);
        return (Num(bar, "x2") - Num(bar, "x1")) / stated;
    }

    /// <summary>Pixels per unit of a reference arrow "= VALUE UNIT": the arrow's tail-to-tip length over the stated value.</summary>
    public double PixelsPerUnit(string unit)
    {
        for (int i = 0; i + 2 < _elements.Count; i++)
        {
            XElement text = _elements[i + 2];
            if (Class(_elements[i]) == "bar" && Class(_elements[i + 1]) == "head bar" && text.Name.LocalName == "text"
                && text.Value.StartsWith("= ", StringComparison.Ordinal) && text.Value.EndsWith(" " + unit, StringComparison.Ordinal))
            {
                double stated = double.Parse(text.Value[2..^(unit.Length + 1)], CultureInfo.InvariantCulture);
                DrawnArrow a = Arrows.Single(r => r.Class == "bar" && r.X1 == Num(_elements[i], "x1") && r.Y1 == Num(_elements[i], "y1"));
                return a.Length / stated;
            }
        }
        throw new InvalidOperationException("no reference arrow for " + unit);
    }

    /// <summary>The centre of the reference point's mark (the circle of class <c>ref</c>).</summary>
    public (double X, double Y) ReferenceMark()
    {
        XElement c = Elements("circle").Single(e => Class(e) == "ref");
        return (Num(c, "cx"), Num(c, "cy"));
    }

    public static string Class(XElement e) => (string?)e.Attribute("class") ?? "";

    public static double Num(XElement e, string attribute) =>
        double.Parse((string?)e.Attribute(attribute) ?? throw new InvalidOperationException(attribute + " missing"), CultureInfo.InvariantCulture);

    public static List<(double X, double Y)> Points(XElement polygon) =>
        ((string)polygon.Attribute("points")!).Split(' ').Select(p => p.Split(','))
            .Select(p => (double.Parse(p[0], CultureInfo.InvariantCulture), double.Parse(p[1], CultureInfo.InvariantCulture))).ToList();
}
