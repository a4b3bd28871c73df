using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Regions;

/// <summary>
/// Turns exact contours into polygon rings on the precision grid. Outers get their vertices on the true
/// circle/arc; holes get them outside it (tangent polygon, radius r / cos(pi/n) plus one grid step) so that
/// a hole is never undersize.
/// </summary>
internal static class ContourDiscretiser
{
    /// <summary>Hard guard on the vertices of one region, far above any printable part.</summary>
    public const long MaxVertices = 20_000_000;

    /// <summary>Vertices of the discretised contour (not closed), snapped to the grid, duplicates removed.</summary>
    public static List<Vec2> Discretise(Contour c, Precision prec, bool asHole, int symmetry)
    {
        var pts = new List<Vec2>();
        double e = prec.ChordalToleranceMm;
        double g = prec.GridMm;
        if (c.Circle is { } circle)
        {
            // Symmetry rounding only for circles about the origin; off-centre circles take their phase from
            // the centre's polar angle, so a pattern of them repeats exactly around the origin anyway.
            bool centred = circle.Center.X == 0 && circle.Center.Y == 0;
            int n = ArcSegmentation.FullCircle(circle.Radius, e, centred ? Math.Max(1, symmetry) : 1);
            double r = asHole ? ArcSegmentation.CircumscribedRadius(circle.Radius, n) + g : circle.Radius;
            // Phase from the centre's polar angle, so that a circle pattern repeats exactly around the origin.
            double phase = circle.Center.X == 0 && circle.Center.Y == 0 ? 0 : Math.Atan2(circle.Center.Y, circle.Center.X);
            for (int i = 0; i < n; i++)
            {
                double t = phase + 2 * Math.PI * i / n;
                pts.Add(new Vec2(circle.Center.X + r * Math.Cos(t), circle.Center.Y + r * Math.Sin(t)));
            }
        }
        else
        {
            // Orientation of the exact loop decides which arcs bulge away from the hole's inside.
            bool ccw = CoarseSignedArea(c) >= 0;
            foreach (var s in c.Segments)
            {
                switch (s)
                {
                    case LineSegment l:
                        pts.Add(l.From);
                        break;
                    case ArcSegment a:
                        AddArc(pts, a, e, g, asHole, ccw);
                        break;
                    default:
                        throw new InvalidOperationException("unknown segment type");
                }
            }
        }
        if (pts.Count > MaxVertices) throw new ArgumentOutOfRangeException(nameof(prec), $"a contour would need {pts.Count} vertices at chordal tolerance {e} mm");
        return SnapAndClean(pts, prec);
    }

    private static void AddArc(List<Vec2> pts, ArcSegment a, double e, double g, bool asHole, bool loopCcw)
    {
        int n = ArcSegmentation.Arc(a.Radius, a.SweepDeg, e);
        double t0 = a.StartDeg * Math.PI / 180.0, sweep = a.SweepDeg * Math.PI / 180.0;
        double d = sweep / n;
        // The hole's inside lies toward the arc centre when the arc turns the same way as the loop.
        bool bulgesOut = asHole && ((a.SweepDeg > 0) == loopCcw);
        pts.Add(a.Start);
        if (!bulgesOut)
        {
            for (int i = 1; i < n; i++)
            {
                double t = t0 + d * i;
                pts.Add(new Vec2(a.Center.X + a.Radius * Math.Cos(t), a.Center.Y + a.Radius * Math.Sin(t)));
            }
        }
        else
        {
            // Tangent polygon: the corners where the tangents at t0 + d*i meet lie at r / cos(d/2).
            double rr = a.Radius / Math.Cos(Math.Abs(d) / 2) + g;
            for (int i = 0; i < n; i++)
            {
                double t = t0 + d * (i + 0.5);
                pts.Add(new Vec2(a.Center.X + rr * Math.Cos(t), a.Center.Y + rr * Math.Sin(t)));
            }
        }
    }

    private static double CoarseSignedArea(Contour c)
    {
        var p = new List<Vec2>();
        foreach (var s in c.Segments)
        {
            p.Add(s.Start);
            if (s is ArcSegment a)
            {
                for (int i = 1; i < 8; i++)
                {
                    double t = (a.StartDeg + a.SweepDeg * i / 8) * Math.PI / 180.0;
                    p.Add(new Vec2(a.Center.X + a.Radius * Math.Cos(t), a.Center.Y + a.Radius * Math.Sin(t)));
                }
            }
        }
        double s2 = 0;
        for (int i = 0; i < p.Count; i++) s2 += p[i].Cross(p[(i + 1) % p.Count]);
        return s2 / 2;
    }

    private static List<Vec2> SnapAndClean(List<Vec2> pts, Precision prec)
    {
        var res = new List<Vec2>(pts.Count);
        foreach (var p in pts)
        {
            if (!double.IsFinite(p.X) || !double.IsFinite(p.Y)) throw new ArgumentException("non-finite contour coordinate");
            var q = new Vec2(Snap(p.X, prec.Scale), Snap(p.Y, prec.Scale));
            if (res.Count == 0 || res[^1] != q) res.Add(q);
        }
        while (res.Count > 1 && res[0] == res[^1]) res.RemoveAt(res.Count - 1);
        return res;
    }

    /// <summary>Same rounding as the fixed PrecisionModel of NetTopologySuite (round half up).</summary>
    public static double Snap(double v, double scale) => Math.Floor(v * scale + 0.5) / scale;
}
