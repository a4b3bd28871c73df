using NetTopologySuite.Geometries;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using LineSegment = PartForge.Geometry.Profiles.LineSegment;

namespace PartForge.Geometry.Tests.Layout;

/// <summary>
/// Test-side geometry written independently of the kernel's discretiser and of the layout engine: exact
/// profiles turned into NetTopologySuite polygons with vertices on the true arcs (so every polygon edge is
/// within <see cref="ChordMm"/> of the exact outline), exact bounds, and the part shapes the tests use with
/// their analytic areas.
/// </summary>
internal static class TestShapes
{
    /// <summary>Chordal error of the test's own polygons, mm.</summary>
    public const double ChordMm = 1e-3;

    private static readonly GeometryFactory F = new();

    public static Polygon OuterPolygon(Contour c) => F.CreatePolygon(Ring(c));

    /// <summary>The profile's first outer with all its holes (the test shapes have one outer each).</summary>
    public static Polygon PartPolygon(Profile p) =>
        F.CreatePolygon(Ring(p.Outers[0]), p.Holes.Select(Ring).ToArray());

    public static LinearRing Ring(Contour c)
    {
        var pts = new List<Coordinate>();
        if (c.Circle is { } k)
        {
            int n = Pieces(k.Radius, 2 * Math.PI);
            for (int i = 0; i < n; i++)
            {
                double a = 2 * Math.PI * i / n;
                pts.Add(new Coordinate(k.Center.X + k.Radius * Math.Cos(a), k.Center.Y + k.Radius * Math.Sin(a)));
            }
        }
        else
        {
            foreach (var s in c.Segments)
            {
                if (s is ArcSegment a)
                {
                    double a0 = a.StartDeg * Math.PI / 180, sw = a.SweepDeg * Math.PI / 180;
                    int n = Pieces(a.Radius, Math.Abs(sw));
                    for (int i = 0; i < n; i++)
                    {
                        double t = a0 + sw * i / n;
                        pts.Add(new Coordinate(a.Center.X + a.Radius * Math.Cos(t), a.Center.Y + a.Radius * Math.Sin(t)));
                    }
                }
                else pts.Add(new Coordinate(s.Start.X, s.Start.Y));
            }
        }
        pts.Add(pts[0].Copy());
        return F.CreateLinearRing(pts.ToArray());
    }

    // Chord sagitta r (1 - cos(phi/2)) <= ChordMm.
    private static int Pieces(double r, double sweep) =>
        Math.Max(4, (int)Math.Ceiling(sweep / (2 * Math.Acos(Math.Max(-1, 1 - ChordMm / r)))));

    /// <summary>Exact bounds of contours, written here again (arcs: end points and the axis directions they pass).</summary>
    public static (double X0, double Y0, double X1, double Y1) Bounds(IEnumerable<Contour> contours)
    {
        double x0 = double.PositiveInfinity, y0 = x0, x1 = double.NegativeInfinity, y1 = x1;
        void Add(double x, double y) { x0 = Math.Min(x0, x); y0 = Math.Min(y0, y); x1 = Math.Max(x1, x); y1 = Math.Max(y1, y); }
        foreach (var c in contours)
        {
            if (c.Circle is { } k) { Add(k.Center.X - k.Radius, k.Center.Y - k.Radius); Add(k.Center.X + k.Radius, k.Center.Y + k.Radius); continue; }
            foreach (var s in c.Segments)
            {
                Add(s.Start.X, s.Start.Y);
                if (s is ArcSegment a)
                {
                    Add(a.End.X, a.End.Y);
                    for (int q = -8; q <= 8; q++)
                    {
                        double deg = q * 90.0;
                        double lo = Math.Min(a.StartDeg, a.StartDeg + a.SweepDeg), hi = Math.Max(a.StartDeg, a.StartDeg + a.SweepDeg);
                        if (deg >= lo && deg <= hi) Add(a.Center.X + a.Radius * Math.Cos(deg * Math.PI / 180), a.Center.Y + a.Radius * Math.Sin(deg * Math.PI / 180));
                    }
                }
            }
        }
        return (x0, y0, x1, y1);
    }

    // ---- the part shapes, each with its analytic area ----

    /// <summary>A disc of radius r with a centre bore and four bolt holes on a circle of 0.6 r.</summary>
    public static (Profile P, double Area) DiscWithHoles(double r, double bore, double bolt)
    {
        var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), bore) };
        for (int k = 0; k < 4; k++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(45 + 90 * k) * (0.6 * r), bolt));
        // Source: area of a circle, pi r^2.
        double area = Math.PI * (r * r - bore * bore - 4 * bolt * bolt);
        return (new Profile(new[] { Contour.FullCircle(new Vec2(0, 0), r) }, holes), area);
    }

    /// <summary>A regular n-gon of circumradius r (n straight segments) with a round centre hole.</summary>
    public static (Profile P, double Area) PolygonDisc(double r, int n, double hole)
    {
        var pts = Enumerable.Range(0, n).Select(i => new Vec2(r * Math.Cos(2 * Math.PI * i / n), r * Math.Sin(2 * Math.PI * i / n))).ToArray();
        // Source: area of a regular n-gon, (n / 2) r^2 sin(2 pi / n).
        double area = n / 2.0 * r * r * Math.Sin(2 * Math.PI / n) - Math.PI * hole * hole;
        return (Profile.Of(Contour.Polygon(pts), Contour.FullCircle(new Vec2(0, 0), hole)), area);
    }

    public static (Profile P, double Area) Ring(double rOut, double rIn) =>
        (Profile.Of(Contour.FullCircle(new Vec2(0, 0), rOut), Contour.FullCircle(new Vec2(0, 0), rIn)), Math.PI * (rOut * rOut - rIn * rIn));

    public static (Profile P, double Area) Rectangle(double w, double h) =>
        (Profile.Of(Contour.Rectangle(new Vec2(0, 0), w, h, 0)), w * h);

    /// <summary>
    /// A fork: a w x h block with a slot of width s from the top edge, depth d to the centre of its round
    /// end (a half circle bulging into the part): area w h - (s d + pi s^2 / 8).
    /// </summary>
    public static (Profile P, double Area) Fork(double w, double h, double s, double d)
    {
        double cx = w / 2, half = s / 2;
        var arc = new ArcSegment(new Vec2(cx, h - d), half, 0, -180);
        var segs = new Segment[]
        {
            new LineSegment(new Vec2(0, 0), new Vec2(w, 0)),
            new LineSegment(new Vec2(w, 0), new Vec2(w, h)),
            new LineSegment(new Vec2(w, h), new Vec2(cx + half, h)),
            new LineSegment(new Vec2(cx + half, h), arc.Start),
            arc,
            new LineSegment(arc.End, new Vec2(cx - half, h)),
            new LineSegment(new Vec2(cx - half, h), new Vec2(0, h)),
            new LineSegment(new Vec2(0, h), new Vec2(0, 0)),
        };
        return (Profile.Of(Contour.FromSegments(segs)), w * h - (s * d + Math.PI * s * s / 8));
    }
}
