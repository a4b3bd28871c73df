using PartForge.Design.Machines.Magnets;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Electrical.Field;

/// <summary>
/// One axially magnetised magnet placed in the rotor frame (machine axis = z, magnet centred at angle
/// CentreDeg on PitchRadiusMm), between ZMinMm and ZMaxMm, with signed remanence (positive: magnetised +z).
/// Its Bz comes from the closed forms (block: <see cref="CuboidField"/>, disc: <see cref="CylinderField"/>,
/// arc: <see cref="SectorFaceField"/>, checked against <see cref="PolygonFaceField"/> on faces whose arcs are split
/// finely enough that the polygon's chordal error is at most ArcChordalToleranceMm; any other shape: its outline
/// as a polygon face, exact for straight-sided shapes such as the sector block, arcs split as for the arc). Far away (distance from the centre above FarFactor x the
/// magnet's largest dimension) it is replaced by its dipole field, whose relative error there is below
/// about (1 / (2 FarFactor))^2 of that magnet's small contribution; FarFactor 0 disables the dipole.
/// </summary>
public sealed class MagnetSource
{
    public MagnetShape Shape { get; }
    public double CentreDeg { get; }
    public double ZMinMm { get; }
    public double ZMaxMm { get; }
    public double SignedBrTesla { get; }

    private readonly double _c, _s, _cx, _cy, _cz, _far2, _dipole, _bound;
    // Arc faces: the sector's radial integral in closed form and an angular Gauss rule — within LodNearMm of the
    // magnet graded towards the point's angle (SectorFaceField.SolidAngleGraded), farther away a plain 16-point
    // (8 beyond LodFarMm) rule, where the integrand is smooth. The polygon of exact triangle solid angles
    // (PolygonFaceField) is kept as the reference (BzFinest).
    private readonly double[][] _px = Array.Empty<double[]>(), _py = Array.Empty<double[]>();

    /// <summary>Distance from the magnet below which an arc magnet's graded angular rule is used, mm.</summary>
    public const double LodNearMm = 5;

    /// <summary>Distance beyond which the angular rule drops from 16 to 8 points, mm.</summary>
    public const double LodFarMm = 50;

    /// <summary>Default chordal tolerance of the polygons that stand for an arc magnet's faces, mm (converged: see the tests).</summary>
    public const double ArcChordalToleranceMm = 0.002;

    /// <summary>Chordal tolerance used for this source's arc polygons, mm.</summary>
    public double ArcToleranceMm { get; }

    public MagnetSource(MagnetShape g, double centreDeg, double zMinMm, double zMaxMm, double signedBrTesla, double farFactor,
        double arcToleranceMm = ArcChordalToleranceMm)
    {
        ArcToleranceMm = arcToleranceMm;
        Shape = g;
        CentreDeg = centreDeg;
        ZMinMm = zMinMm;
        ZMaxMm = zMaxMm;
        SignedBrTesla = signedBrTesla;
        _c = Math.Cos(centreDeg * Math.PI / 180);
        _s = Math.Sin(centreDeg * Math.PI / 180);
        _cx = g.PitchRadiusMm * _c;
        _cy = g.PitchRadiusMm * _s;
        _cz = (zMinMm + zMaxMm) / 2;
        double size = g switch
        {
            DiscMagnet disc => Math.Max(disc.DiameterMm, g.ThicknessMm),
            BlockMagnet block => Math.Max(Math.Max(block.LengthMm, block.WidthMm), g.ThicknessMm),
            ArcMagnet arc => Math.Max(Math.Max(arc.OuterRadiusMm - arc.InnerRadiusMm, 2 * arc.OuterRadiusMm * Math.Sin(Math.Min(arc.SpanDeg, 180) * Math.PI / 360)), g.ThicknessMm),
            _ => Math.Max(g.PlanSizeMm, g.ThicknessMm),
        };
        _far2 = farFactor > 0 ? Math.Pow(farFactor * size, 2) : double.PositiveInfinity;
        _dipole = signedBrTesla * g.VolumeMm3 / (4 * Math.PI);
        switch (g)
        {
            case DiscMagnet disc:
                _bound = disc.DiameterMm / 2;
                break;
            case BlockMagnet block:
                _bound = Math.Sqrt(block.LengthMm * block.LengthMm + block.WidthMm * block.WidthMm) / 2;
                break;
            case ArcMagnet arc:
            {
                _bound = Math.Max(arc.OuterRadiusMm - arc.PitchRadiusMm, 2 * arc.OuterRadiusMm * Math.Sin(Math.Min(arc.SpanDeg, 180) * Math.PI / 360) / 2) + (arc.OuterRadiusMm - arc.InnerRadiusMm);
                var (xs, ys) = ArcPolygon(arc, arcToleranceMm);
                _px = new[] { xs };
                _py = new[] { ys };
                break;
            }
            default:
            {
                // Any other shape: its outline as a polygon (exact for straight sides), bounded about its centre.
                var (xs, ys) = OutlinePolygon(g.Outline(0), arcToleranceMm);
                _px = new[] { xs };
                _py = new[] { ys };
                double b = 0;
                for (int i = 0; i < xs.Length; i++) b = Math.Max(b, Math.Sqrt((xs[i] - g.PitchRadiusMm) * (xs[i] - g.PitchRadiusMm) + ys[i] * ys[i]));
                _bound = b;
                break;
            }
        }
    }

    /// <summary>A contour as a counter-clockwise polygon, arcs split to the chordal tolerance (vertices on the arcs).</summary>
    private static (double[] X, double[] Y) OutlinePolygon(Contour c, double tol)
    {
        var xs = new List<double>();
        var ys = new List<double>();
        foreach (var seg in PartForge.Geometry.Exact.Exact2D.SegmentsOf(c))
        {
            switch (seg)
            {
                case LineSegment l:
                    xs.Add(l.From.X); ys.Add(l.From.Y);
                    break;
                case ArcSegment a:
                {
                    int n = ArcSegmentation.Arc(a.Radius, Math.Abs(a.SweepDeg), tol);
                    for (int i = 0; i < n; i++)
                    {
                        var q = a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / n) * a.Radius;
                        xs.Add(q.X); ys.Add(q.Y);
                    }
                    break;
                }
            }
        }
        double area = 0;
        for (int i = 0, j = xs.Count - 1; i < xs.Count; j = i++) area += xs[j] * ys[i] - xs[i] * ys[j];
        if (area < 0) { xs.Reverse(); ys.Reverse(); }
        return (xs.ToArray(), ys.ToArray());
    }

    /// <summary>The annular sector's polygon (counter-clockwise, centred on +x) for a chordal tolerance.</summary>
    private static (double[] X, double[] Y) ArcPolygon(ArcMagnet g, double tol)
    {
        int nOut = ArcSegmentation.Arc(g.OuterRadiusMm, g.SpanDeg, tol);
        int nIn = g.InnerRadiusMm > 0 ? ArcSegmentation.Arc(g.InnerRadiusMm, g.SpanDeg, tol) : 0;
        var xs = new List<double>();
        var ys = new List<double>();
        double h = g.SpanDeg / 2;
        // Interior vertices sit on the radius whose chords enclose the arc's own area (r sqrt(d / sin d),
        // d the step), so the polygon straddles the arc instead of lying inside it; the end vertices stay on
        // the true corners.
        double Rv(double r, int n) { double dd = g.SpanDeg / n * Math.PI / 180; return r * Math.Sqrt(dd / Math.Sin(dd)); }
        double ro = Rv(g.OuterRadiusMm, nOut);
        for (int i = 0; i <= nOut; i++)
        {
            double a = (-h + g.SpanDeg * i / nOut) * Math.PI / 180;
            double rr = i == 0 || i == nOut ? g.OuterRadiusMm : ro;
            xs.Add(rr * Math.Cos(a)); ys.Add(rr * Math.Sin(a));
        }
        if (nIn > 0)
        {
            double ri = Rv(g.InnerRadiusMm, nIn);
            for (int i = 0; i <= nIn; i++)
            {
                double a = (h - g.SpanDeg * i / nIn) * Math.PI / 180;
                double rr = i == 0 || i == nIn ? g.InnerRadiusMm : ri;
                xs.Add(rr * Math.Cos(a)); ys.Add(rr * Math.Sin(a));
            }
        }
        else { xs.Add(0); ys.Add(0); }
        return (xs.ToArray(), ys.ToArray());
    }

    /// <summary>Bz, tesla, at (x, y, z) in the rotor frame, mm (outside the magnet).</summary>
    public double Bz(double x, double y, double z)
    {
        double dx = x - _cx, dy = y - _cy, dz = z - _cz;
        double d2 = dx * dx + dy * dy + dz * dz;
        if (d2 > _far2)
        {
            double d = Math.Sqrt(d2);
            return _dipole * (3 * dz * dz - d2) / (d2 * d2 * d);
        }
        return BzExact(x, y, z);
    }

    /// <summary>Bz from the closed form only (never the dipole), tesla.</summary>
    public double BzExact(double x, double y, double z)
    {
        switch (Shape)
        {
            case BlockMagnet g:
            {
                double u = x * _c + y * _s, v = -x * _s + y * _c;
                return CuboidField.Bz(SignedBrTesla, g.PitchRadiusMm - g.LengthMm / 2, g.PitchRadiusMm + g.LengthMm / 2,
                    -g.WidthMm / 2, g.WidthMm / 2, ZMinMm, ZMaxMm, u, v, z);
            }
            case DiscMagnet g:
            {
                double dx = x - _cx, dy = y - _cy;
                double rho = Math.Sqrt(dx * dx + dy * dy);
                return CylinderField.Bz(SignedBrTesla, g.DiameterMm / 2, (ZMaxMm - ZMinMm) / 2, rho, z - _cz);
            }
            case ArcMagnet g:
            {
                double u = x * _c + y * _s, v = -x * _s + y * _c;
                int level = ArcLevel(x, y, z);
                double top, bottom;
                if (level == 0)
                {
                    double a0 = g.SpanDeg * Math.PI / 360;
                    top = SectorFaceField.SolidAngleGraded(g.InnerRadiusMm, g.OuterRadiusMm, a0, ZMaxMm, u, v, z);
                    bottom = SectorFaceField.SolidAngleGraded(g.InnerRadiusMm, g.OuterRadiusMm, a0, ZMinMm, u, v, z);
                }
                else
                {
                    int n = level == 1 ? 16 : 8;
                    double a = g.SpanDeg * Math.PI / 360;
                    top = SectorFaceField.SolidAngle(g.InnerRadiusMm, g.OuterRadiusMm, a, ZMaxMm, u, v, z, n);
                    bottom = SectorFaceField.SolidAngle(g.InnerRadiusMm, g.OuterRadiusMm, a, ZMinMm, u, v, z, n);
                }
                return SignedBrTesla / (4 * Math.PI) * (top - bottom);
            }
            default:
                return BzFinest(x, y, z);
        }
    }

    /// <summary>Bz of an arc magnet from its polygon at any distance (the reference for the far-field rule), tesla.</summary>
    public double BzFinest(double x, double y, double z)
    {
        if (_px.Length == 0) return BzExact(x, y, z);
        double u = x * _c + y * _s, v = -x * _s + y * _c;
        return SignedBrTesla / (4 * Math.PI) * (PolygonFaceField.SolidAngle(_px[0], _py[0], ZMaxMm, u, v, z) - PolygonFaceField.SolidAngle(_px[0], _py[0], ZMinMm, u, v, z));
    }

    /// <summary>Which arc polygon to use at a point: by a lower bound of the distance to the magnet.</summary>
    private int ArcLevel(double x, double y, double z)
    {
        double dx = x - _cx, dy = y - _cy;
        double lateral = Math.Max(0, Math.Sqrt(dx * dx + dy * dy) - _bound);
        double axial = z > ZMaxMm ? z - ZMaxMm : z < ZMinMm ? ZMinMm - z : 0;
        double d2 = lateral * lateral + axial * axial;
        return d2 < LodNearMm * LodNearMm ? 0 : d2 < LodFarMm * LodFarMm ? 1 : 2;
    }

    /// <summary>A copy mirrored in the plane z = planeMm with the same magnetisation (the image in ideal iron), its
    /// remanence scaled by <paramref name="strength"/> (1: ideal iron; below 1: saturated, see BackIronFlux).</summary>
    public MagnetSource ImageIn(double planeMm, double farFactor, double strength = 1) =>
        new(Shape, CentreDeg, 2 * planeMm - ZMaxMm, 2 * planeMm - ZMinMm, SignedBrTesla * strength, farFactor, ArcToleranceMm);
}
