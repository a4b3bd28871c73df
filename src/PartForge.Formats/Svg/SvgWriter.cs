using System.Text;
using PartForge.Formats.Cutting;
using PartForge.Formats.Io;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Svg;

/// <summary>
/// Writes a cut sheet as SVG 1.1 for cutters that take SVG: width and height in millimetres, a viewBox in
/// millimetres (one user unit = 1 mm) with y flipped so the drawing reads like the DXF (y up), hairline
/// strokes and no fill, one group per layer (<c>id="mark"</c> first, then <c>id="cut"</c>), the same kerf
/// compensation and order as the DXF (marks, holes, outlines). Full circles are <c>&lt;circle&gt;</c>,
/// other contours one closed <c>&lt;path&gt;</c> with true arcs (<c>A</c>) and lines (<c>L</c>).
/// </summary>
/// <remarks>
/// Coordinates are written with y negated (no transform attribute, which some cutter software ignores).
/// UTF-8 without byte-order mark, LF line ends, invariant shortest round-trip numbers; byte-identical on
/// rewrite.
/// </remarks>
public static class SvgWriter
{
    /// <summary>Stroke width (mm): a hairline, as cutter software expects for vector cuts.</summary>
    public const double StrokeWidthMm = 0.01;

    /// <summary>Empty border around the paths (mm), so strokes on the bounding box are not clipped.</summary>
    public const double MarginMm = 1.0;

    public const string CutColor = "#ff0000";
    public const string MarkColor = "#0000ff";

    /// <summary>Compensates the sheet for its kerf (<see cref="KerfCompensation.Apply"/>) and writes it.</summary>
    public static void Write(Stream stream, CutSheet sheet) => Write(stream, KerfCompensation.Apply(sheet));

    /// <summary>Compensates and writes the sheet to a file atomically (temporary file, then rename).</summary>
    public static void WriteFile(string path, CutSheet sheet)
    {
        var plan = KerfCompensation.Apply(sheet);
        AtomicFile.Write(path, s => Write(s, plan));
    }

    /// <summary>Writes an already compensated plan.</summary>
    public static void Write(Stream stream, CutPlan plan)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(plan);
        var b = new StringBuilder(1024 + plan.Paths.Count * 256);
        // A nest's page is its sheet (lower-left corner at the origin); one part's page is its paths plus a margin.
        double x0 = plan.MinMm.X - MarginMm, y0 = -(plan.MaxMm.Y + MarginMm);
        double w = plan.WidthMm + 2 * MarginMm, h = plan.HeightMm + 2 * MarginMm;
        if (plan.Frame is { } f) (x0, y0, w, h) = (0, -f.HeightMm, f.WidthMm, f.HeightMm);

        b.Append("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"no\"?>\n");
        b.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").Append(N(w)).Append("mm\" height=\"").Append(N(h))
            .Append("mm\" viewBox=\"").Append(N(x0)).Append(' ').Append(N(y0)).Append(' ').Append(N(w)).Append(' ').Append(N(h)).Append("\">\n");
        b.Append("  <title>").Append(Escape(plan.PartName)).Append("</title>\n");
        b.Append("  <desc>").Append(Escape(KerfNote(plan))).Append(" Units millimetre; written by PartForge.</desc>\n");
        Group(b, "mark", MarkColor, plan.Paths.Where(p => p.Kind == CutPathKind.Mark));
        Group(b, "cut", CutColor, plan.Paths.Where(p => p.Kind != CutPathKind.Mark));
        b.Append("</svg>\n");

        var bytes = new UTF8Encoding(false).GetBytes(b.ToString());
        stream.Write(bytes, 0, bytes.Length);
    }

    /// <summary>The sentence stating the kerf, written in the description.</summary>
    public static string KerfNote(CutPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        string k = N(plan.KerfMm), hk = N(plan.HalfKerfMm);
        return plan.KerfMm == 0
            ? "Kerf 0 mm: paths are the design contours (no compensation)."
            : $"Kerf {k} mm compensated: outlines +{hk} mm, holes -{hk} mm (cutter centre line).";
    }

    private static void Group(StringBuilder b, string id, string color, IEnumerable<CutPath> paths)
    {
        b.Append("  <g id=\"").Append(id).Append("\" fill=\"none\" stroke=\"").Append(color).Append("\" stroke-width=\"")
            .Append(N(StrokeWidthMm)).Append("\">\n");
        foreach (var p in paths)
        {
            if (p.Contour.Circle is { } c)
            {
                b.Append("    <circle cx=\"").Append(N(c.Center.X)).Append("\" cy=\"").Append(N(-c.Center.Y)).Append("\" r=\"").Append(N(c.Radius)).Append("\"/>\n");
                continue;
            }
            b.Append("    <path d=\"");
            var segs = ArcPieces.Of(p.Contour).ToList();
            Vec2 first = segs[0].Start;
            b.Append('M').Append(N(first.X)).Append(' ').Append(N(-first.Y));
            for (int i = 0; i < segs.Count; i++)
            {
                bool last = i == segs.Count - 1;
                // Each piece ends where the next starts; the last closes the loop at the first point.
                Vec2 end = last ? first : segs[i + 1].Start;
                if (segs[i] is ArcSegment a)
                {
                    // y is negated, so a counter-clockwise arc in the design runs in SVG's negative-angle
                    // direction: sweep-flag 0. Pieces are at most 180 degrees: large-arc-flag 0.
                    b.Append(" A").Append(N(a.Radius)).Append(' ').Append(N(a.Radius)).Append(" 0 0 ").Append(a.SweepDeg > 0 ? '0' : '1')
                        .Append(' ').Append(N(end.X)).Append(' ').Append(N(-end.Y));
                }
                else if (!last)
                {
                    b.Append(" L").Append(N(end.X)).Append(' ').Append(N(-end.Y));
                }
            }
            b.Append(" Z\"/>\n");
        }
        b.Append("  </g>\n");
    }

    private static string N(double v) => InvariantNumber.Format(v);

    private static string Escape(string s)
    {
        var b = new StringBuilder(s.Length);
        foreach (char ch in s)
        {
            switch (ch)
            {
                case '<': b.Append("&lt;"); break;
                case '>': b.Append("&gt;"); break;
                case '&': b.Append("&amp;"); break;
                case '"': b.Append("&quot;"); break;
                default:
                    // XML 1.0 forbids most control characters; unpaired surrogates cannot be encoded.
                    if ((ch < 0x20 && ch != '\t' && ch != '\n' && ch != '\r') || ch == '\uFFFE' || ch == '\uFFFF') b.Append(' ');
                    else b.Append(ch);
                    break;
            }
        }
        return b.ToString();
    }
}
