using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Export.Drawings;

/// <summary>SVG path data for exact contours: straight lines stay lines and arcs become true SVG arcs.</summary>
public static class ContourPath
{
    public static string Of(SvgCanvas c, Contour contour)
    {
        if (contour.Circle is { } circ)
        {
            // A full circle as two half arcs (an SVG arc cannot start and end at the same point).
            var (ctr, r) = circ;
            var a = new Vec2(ctr.X + r, ctr.Y);
            var b = new Vec2(ctr.X - r, ctr.Y);
            string rs = SvgCanvas.Num(r);
            return $"M{c.P(a.X, a.Y)} A{rs},{rs} 0 1 0 {c.P(b.X, b.Y)} A{rs},{rs} 0 1 0 {c.P(a.X, a.Y)} Z";
        }
        var sb = new System.Text.StringBuilder();
        var start = contour.Segments[0].Start;
        sb.Append('M').Append(c.P(start.X, start.Y));
        foreach (var s in contour.Segments)
        {
            switch (s)
            {
                case LineSegment l:
                    sb.Append(" L").Append(c.P(l.To.X, l.To.Y));
                    break;
                case ArcSegment arc:
                    // Split arcs of more than 180 degrees so the large-arc flag is never ambiguous.
                    int pieces = Math.Abs(arc.SweepDeg) > 179 ? (int)Math.Ceiling(Math.Abs(arc.SweepDeg) / 179) : 1;
                    for (int i = 1; i <= pieces; i++)
                    {
                        var e = arc.Center + Vec2.FromAngleDeg(arc.StartDeg + arc.SweepDeg * i / pieces) * arc.Radius;
                        string rs = SvgCanvas.Num(arc.Radius);
                        // y is flipped on the page, so a counter-clockwise arc in the design is clockwise there (sweep 0).
                        sb.Append(" A").Append(rs).Append(',').Append(rs).Append(" 0 0 ").Append(arc.SweepDeg > 0 ? '0' : '1')
                          .Append(' ').Append(c.P(e.X, e.Y));
                    }
                    break;
            }
        }
        sb.Append(" Z");
        return sb.ToString();
    }

    /// <summary>One path for a whole profile (outers and holes), to be filled with the even-odd rule.</summary>
    public static string Of(SvgCanvas c, Profile profile) =>
        string.Join(" ", profile.Outers.Concat(profile.Holes).Select(k => Of(c, k)));
}
