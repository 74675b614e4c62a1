using System.Globalization;
using System.Text;

namespace LoadDiff.Reports.Html;

/// <summary>Writes SVG elements with invariant, rounded coordinates (0.1 px) and escaped text.</summary>
internal sealed class SvgBuilder
{
    private readonly StringBuilder _s = new();

    public int ElementCount { get; private set; }

    public static string N(double v)
    {
        double r = Math.Round(v, 1);
        return (r == 0 ? 0 : r).ToString("0.#", CultureInfo.InvariantCulture);
    }

    public void Raw(string text) => _s.Append(text);

    public void Open(string tag, string attributes)
    {
        _s.Append('<').Append(tag).Append(' ').Append(attributes).Append(">\n");
        ElementCount++;
    }

    public void Close(string tag) => _s.Append("</").Append(tag).Append(">\n");

    public void Line(double x1, double y1, double x2, double y2, string cls, string? item = null) =>
        Element($"<line class=\"{cls}\"{Item(item)} x1=\"{N(x1)}\" y1=\"{N(y1)}\" x2=\"{N(x2)}\" y2=\"{N(y2)}\"/>");

    public void Polygon(IEnumerable<(double X, double Y)> points, string cls, string? fill = null, string? item = null) =>
        Element($"<polygon class=\"{cls}\"{Item(item)}{(fill is null ? "" : $" fill=\"{fill}\"")} points=\"{Points(points)}\"/>");

    public void Polyline(IEnumerable<(double X, double Y)> points, string cls) =>
        Element($"<polyline class=\"{cls}\" points=\"{Points(points)}\"/>");

    public void Path(string d, string cls, string? item = null) => Element($"<path class=\"{cls}\"{Item(item)} d=\"{d}\"/>");

    public void Circle(double x, double y, double r, string cls, string? item = null) =>
        Element($"<circle class=\"{cls}\"{Item(item)} cx=\"{N(x)}\" cy=\"{N(y)}\" r=\"{N(r)}\"/>");

    public void Rect(double x, double y, double w, double h, string cls, string? fill = null) =>
        Element($"<rect class=\"{cls}\"{(fill is null ? "" : $" fill=\"{fill}\"")} x=\"{N(x)}\" y=\"{N(y)}\" width=\"{N(w)}\" height=\"{N(h)}\"/>");

    public void Text(double x, double y, string text, string cls, string anchor = "start", string? item = null) =>
        Element($"<text class=\"{cls}\"{Item(item)} x=\"{N(x)}\" y=\"{N(y)}\" text-anchor=\"{anchor}\">{HtmlText.Escape(text)}</text>");

    public override string ToString() => _s.ToString();

    private void Element(string text)
    {
        _s.Append(text).Append('\n');
        ElementCount++;
    }

    /// <summary>The id of the load item an element draws, so that readers of the drawing can find it.</summary>
    private static string Item(string? id) => id is null ? "" : $" data-item=\"{HtmlText.Escape(id)}\"";

    private static string Points(IEnumerable<(double X, double Y)> points) =>
        string.Join(" ", points.Select(p => N(p.X) + "," + N(p.Y)));
}
