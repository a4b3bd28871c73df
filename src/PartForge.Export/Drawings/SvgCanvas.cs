using System.Globalization;
using System.Text;

namespace PartForge.Export.Drawings;

/// <summary>
/// Writes an inline SVG element piece by piece: invariant numbers rounded to 4 decimals, escaped text,
/// attributes in the order given. Drawing coordinates are y-up (as in the design); the canvas flips y when
/// it writes, so callers never think about SVG's y-down convention.
/// </summary>
public sealed class SvgCanvas
{
    private readonly StringBuilder _body = new();
    private int _depth;

    /// <summary>Left, bottom, width and height of the drawing area in drawing units (y-up).</summary>
    public double MinX { get; }
    public double MinY { get; }
    public double Width { get; }
    public double Height { get; }

    public SvgCanvas(double minX, double minY, double width, double height)
    {
        MinX = minX; MinY = minY; Width = width; Height = height;
    }

    /// <summary>A number as SVG and data attributes carry it: invariant, at most 4 decimals, no exponent.</summary>
    public static string Num(double v)
    {
        double r = Math.Round(v, 4);
        if (r == 0) r = 0; // no "-0"
        return r.ToString("0.####", CultureInfo.InvariantCulture);
    }

    public static string Escape(string s) => s.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");

    /// <summary>SVG y of a drawing y.</summary>
    public double Y(double y) => -y;

    public string P(double x, double y) => Num(x) + "," + Num(-y);

    private void Open(string tag, (string Name, string Value)[] attrs, bool selfClose)
    {
        _body.Append(' ', _depth * 2).Append('<').Append(tag);
        foreach (var (n, v) in attrs) _body.Append(' ').Append(n).Append("=\"").Append(Escape(v)).Append('"');
        _body.Append(selfClose ? "/>\n" : ">\n");
    }

    public SvgCanvas BeginGroup(params (string Name, string Value)[] attrs)
    {
        Open("g", attrs, false);
        _depth++;
        return this;
    }

    public SvgCanvas EndGroup()
    {
        _depth--;
        _body.Append(' ', _depth * 2).Append("</g>\n");
        return this;
    }

    public SvgCanvas Element(string tag, params (string Name, string Value)[] attrs)
    {
        Open(tag, attrs, true);
        return this;
    }

    public SvgCanvas Line(double x1, double y1, double x2, double y2, string cls) =>
        Element("line", ("x1", Num(x1)), ("y1", Num(-y1)), ("x2", Num(x2)), ("y2", Num(-y2)), ("class", cls));

    public SvgCanvas Circle(double cx, double cy, double r, string cls) =>
        Element("circle", ("cx", Num(cx)), ("cy", Num(-cy)), ("r", Num(r)), ("class", cls));

    /// <summary>A rectangle from its lower-left corner (y-up) and size.</summary>
    public SvgCanvas Rect(double x, double y, double w, double h, string cls, params (string Name, string Value)[] extra) =>
        Element("rect", [("x", Num(x)), ("y", Num(-(y + h))), ("width", Num(w)), ("height", Num(h)), ("class", cls), .. extra]);

    public SvgCanvas Path(string d, string cls, params (string Name, string Value)[] extra) =>
        Element("path", [("d", d), ("class", cls), .. extra]);

    /// <summary>Text whose anchor point is (x, y) in drawing coordinates; size in drawing units.</summary>
    public SvgCanvas Text(double x, double y, string text, double size, string cls, string anchor = "start", double rotateDeg = 0)
    {
        var attrs = new List<(string, string)>
        {
            ("x", Num(x)), ("y", Num(-y)), ("font-size", Num(size)), ("class", cls), ("text-anchor", anchor),
        };
        if (rotateDeg != 0) attrs.Add(("transform", $"rotate({Num(-rotateDeg)} {Num(x)} {Num(-y)})"));
        _body.Append(' ', _depth * 2).Append("<text");
        foreach (var (n, v) in attrs) _body.Append(' ').Append(n).Append("=\"").Append(Escape(v)).Append('"');
        _body.Append('>').Append(Escape(text)).Append("</text>\n");
        return this;
    }

    /// <summary>A filled arrow head with its tip at (x, y) pointing along (dx, dy).</summary>
    public SvgCanvas Arrow(double x, double y, double dx, double dy, double size, string cls)
    {
        double len = Math.Sqrt(dx * dx + dy * dy);
        if (!(len > 0)) return this;
        dx /= len; dy /= len;
        double bx = x - dx * size, by = y - dy * size;
        double nx = -dy * size * 0.32, ny = dx * size * 0.32;
        return Path($"M{P(x, y)} L{P(bx + nx, by + ny)} L{P(bx - nx, by - ny)} Z", cls);
    }

    /// <summary>The finished &lt;svg&gt; element, sized to the given CSS width (height follows the aspect ratio).</summary>
    public string ToSvg(string cssClass, string title, double displayWidthPx, params (string Name, string Value)[] extra)
    {
        var sb = new StringBuilder();
        double hPx = displayWidthPx * Height / Width;
        sb.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"").Append(Escape(cssClass)).Append('"')
          .Append(" viewBox=\"").Append(Num(MinX)).Append(' ').Append(Num(-(MinY + Height))).Append(' ')
          .Append(Num(Width)).Append(' ').Append(Num(Height)).Append('"')
          .Append(" width=\"").Append(Num(displayWidthPx)).Append("\" height=\"").Append(Num(hPx)).Append('"')
          .Append(" role=\"img\"");
        foreach (var (n, v) in extra) sb.Append(' ').Append(n).Append("=\"").Append(Escape(v)).Append('"');
        sb.Append(">\n<title>").Append(Escape(title)).Append("</title>\n").Append(_body).Append("</svg>\n");
        return sb.ToString();
    }
}
