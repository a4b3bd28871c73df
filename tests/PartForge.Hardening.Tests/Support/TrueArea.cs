using NetTopologySuite.Geometries;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts;
using LineSegment = PartForge.Geometry.Profiles.LineSegment;

namespace PartForge.Hardening.Tests.Support;

/// <summary>
/// The true-circle area of an exact layer (union of its outer contours minus the union of its cuts), computed
/// apart from the project's kernel: every arc is flattened with vertices on the true circle so finely
/// (sagitta at most 1e-5 mm) that the polygon area is the analytic area to within 1e-5 mm x perimeter, and the
/// set operations are done by NetTopologySuite in floating precision. Also the total perimeter of the
/// contours, which bounds the area error of any chordal discretisation: |dA| <= perimeter x tolerance.
/// </summary>
public static class TrueArea
{
    private const double Sagitta = 1e-5;
    private static readonly GeometryFactory Factory = new();

    public static (double Area, double Perimeter) Of(ExactLayer layer)
    {
        var outers = Union(layer.Outers);
        var cuts = Union(layer.Cuts);
        var material = cuts.IsEmpty ? outers : outers.Difference(cuts);
        double perimeter = layer.Outers.Concat(layer.Cuts).Sum(Length);
        return (material.Area, perimeter);
    }

    private static NtsGeometry Union(IReadOnlyList<Contour> contours)
    {
        if (contours.Count == 0) return Factory.CreatePolygon();
        var polys = contours.Select(c => (NtsGeometry)Factory.CreatePolygon(Ring(c))).Select(g => g.IsValid ? g : g.Buffer(0)).ToArray();
        return Factory.BuildGeometry(polys).Union();
    }

    public static double Length(Contour c)
    {
        if (c.Circle is { } circle) return 2 * Math.PI * circle.Radius;
        return c.Segments.Sum(s => s switch
        {
            LineSegment l => (l.To - l.From).Length,
            ArcSegment a => Math.Abs(a.SweepDeg) * Math.PI / 180 * a.Radius,
            _ => 0,
        });
    }

    private static Coordinate[] Ring(Contour c)
    {
        var pts = new List<Coordinate>();
        void Arc(double cx, double cy, double r, double startDeg, double sweepDeg)
        {
            double step = 2 * Math.Acos(Math.Max(-1, 1 - Sagitta / r)); // radians per segment for the sagitta
            int m = Math.Max(1, (int)Math.Ceiling(Math.Abs(sweepDeg) * Math.PI / 180 / step));
            for (int i = 0; i < m; i++)
            {
                double a = (startDeg + sweepDeg * i / m) * Math.PI / 180;
                pts.Add(new Coordinate(cx + r * Math.Cos(a), cy + r * Math.Sin(a)));
            }
        }
        if (c.Circle is { } circle) Arc(circle.Center.X, circle.Center.Y, circle.Radius, 0, 360);
        else
            foreach (var s in c.Segments)
            {
                if (s is LineSegment l) pts.Add(new Coordinate(l.From.X, l.From.Y));
                else if (s is ArcSegment a) Arc(a.Center.X, a.Center.Y, a.Radius, a.StartDeg, a.SweepDeg);
            }
        pts.Add(pts[0].Copy());
        return pts.ToArray();
    }
}
