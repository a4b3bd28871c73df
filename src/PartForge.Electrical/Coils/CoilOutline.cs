using PartForge.Design.Machines;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Electrical.Coils;

/// <summary>
/// The plan outline of one coil, exact (lines and arcs), in the coil's local frame: the machine axis at the
/// origin and the coil centred on the +x axis at (PitchRadiusMm, 0). Coil k of the stator is this outline
/// rotated by k x 360/coils degrees. Both contours run counter-clockwise seen from +z.
///
/// Round coil: Window is the core circle (diameter `coils.core.diameter`), Outer the circle of diameter
/// core + 2 x RadialBuildMm.
///
/// Keystone coil: the Window (the core the wire is wound around) is an annular sector about the machine
/// axis, bounded by two radial lines at +-WindowHalfAngleDeg and two arcs at WindowMinRadiusMm and
/// WindowMaxRadiusMm. Its tangential width (chord) at the pitch radius is `coils.core.width`
/// (half-angle = asin(width / (2 pitch_radius))); its radial length equals the radial length of the magnets
/// (disc: diameter, block: length, arc: outer - inner radius), centred on the coil pitch radius, so the
/// radial legs of the winding lie across the magnets' whole radial extent. The Outer contour is the window
/// grown by the radial build (a Minkowski offset): the two sides become parallel lines at distance build,
/// the arcs become concentric arcs (inner radius - build, outer radius + build), and each of the four
/// corners becomes a 90-degree arc of radius build centred on the window corner.
/// </summary>
public sealed record CoilOutline
{
    public required CoilShape Shape { get; init; }

    /// <summary>Radius of the coil centre from the machine axis, mm.</summary>
    public required double PitchRadiusMm { get; init; }

    /// <summary>Axial height of the winding, mm (`coils.height`).</summary>
    public required double HeightMm { get; init; }

    /// <summary>Radial thickness of the winding around the window, mm.</summary>
    public required double RadialBuildMm { get; init; }

    /// <summary>Round coil: core (window) diameter, mm; null for keystones.</summary>
    public double? InnerDiameterMm { get; init; }

    /// <summary>Round coil: outer diameter of the winding, mm; null for keystones.</summary>
    public double? OuterDiameterMm { get; init; }

    /// <summary>The core / winding window, exact.</summary>
    public required Contour Window { get; init; }

    /// <summary>The outer boundary of the winding, exact.</summary>
    public required Contour Outer { get; init; }

    /// <summary>Keystone: half-angle of the window's radial sides about the machine axis, degrees. Round: the half-angle the core circle subtends from the axis.</summary>
    public required double WindowHalfAngleDeg { get; init; }

    /// <summary>Smallest distance of the window from the machine axis, mm.</summary>
    public required double WindowMinRadiusMm { get; init; }

    /// <summary>Largest distance of the window from the machine axis, mm.</summary>
    public required double WindowMaxRadiusMm { get; init; }

    /// <summary>Smallest distance of the outer boundary from the machine axis, mm.</summary>
    public double OuterMinRadiusMm => Shape == CoilShape.Round
        ? PitchRadiusMm - OuterDiameterMm!.Value / 2
        : WindowMinRadiusMm - RadialBuildMm;

    /// <summary>Largest distance of the outer boundary from the machine axis, mm.</summary>
    public double OuterMaxRadiusMm => Shape == CoilShape.Round
        ? PitchRadiusMm + OuterDiameterMm!.Value / 2
        : WindowMaxRadiusMm + RadialBuildMm;

    /// <summary>Perimeter of the window, mm.</summary>
    public double WindowPerimeterMm => Shape == CoilShape.Round
        ? Math.PI * InnerDiameterMm!.Value
        : 2 * HalfAngleRad * (WindowMinRadiusMm + WindowMaxRadiusMm) + 2 * (WindowMaxRadiusMm - WindowMinRadiusMm);

    /// <summary>
    /// Perimeter of the turn at distance <paramref name="offsetMm"/> outside the window (0..build), mm. For both
    /// shapes it is the window perimeter + 2 pi offset (the keystone's concave inner arc shortens by exactly
    /// what its convex outer arc gains).
    /// </summary>
    public double TurnPerimeterMm(double offsetMm) => WindowPerimeterMm + 2 * Math.PI * offsetMm;

    /// <summary>Area of the window, mm^2.</summary>
    public double WindowAreaMm2 => Shape == CoilShape.Round
        ? Math.PI * InnerDiameterMm!.Value * InnerDiameterMm.Value / 4
        : HalfAngleRad * (WindowMaxRadiusMm * WindowMaxRadiusMm - WindowMinRadiusMm * WindowMinRadiusMm);

    /// <summary>Winding cross-section in plan (outer area minus window area), mm^2: perimeter x build + pi build^2.</summary>
    public double WindingPlanAreaMm2 => WindowPerimeterMm * RadialBuildMm + Math.PI * RadialBuildMm * RadialBuildMm;

    private double HalfAngleRad => WindowHalfAngleDeg * Math.PI / 180;

    /// <summary>
    /// Distance from a point (coil-local frame, mm) to the window; 0 inside it. The turn at offset s encloses
    /// exactly the points with distance &lt;= s.
    /// </summary>
    public double DistanceToWindowMm(Vec2 p)
    {
        if (Shape == CoilShape.Round)
        {
            double dx = p.X - PitchRadiusMm, dy = p.Y;
            return Math.Max(0, Math.Sqrt(dx * dx + dy * dy) - InnerDiameterMm!.Value / 2);
        }
        double r = p.Length;
        double a = HalfAngleRad;
        double phi = Math.Atan2(Math.Abs(p.Y), p.X); // symmetric about the x axis
        double r0 = WindowMinRadiusMm, r1 = WindowMaxRadiusMm;
        if (phi <= a)
        {
            if (r >= r0 && r <= r1) return 0;
            return r < r0 ? r0 - r : r - r1;
        }
        // Outside the angular range: nearest point on the side segment at +a (by symmetry).
        var q = new Vec2(r * Math.Cos(phi), r * Math.Sin(phi));
        var u = new Vec2(Math.Cos(a), Math.Sin(a));
        double t = Math.Clamp(q.Dot(u), r0, r1);
        var f = u * t;
        double ds = (q - f).Length;
        return ds;
    }

    /// <summary>
    /// Angular half-extent of the outer boundary at <paramref name="radiusMm"/> from the machine axis, degrees:
    /// the outline covers angles -h..h there. Null when the circle of that radius misses the coil.
    /// </summary>
    public double? OuterHalfAngleDegAt(double radiusMm) => HalfAngleDegAt(radiusMm, RadialBuildMm);

    /// <summary>Angular half-extent, degrees, of the region within <paramref name="offsetMm"/> of the window at a radius; null if none.</summary>
    public double? HalfAngleDegAt(double radiusMm, double offsetMm)
    {
        if (!(radiusMm > 0)) return null;
        if (Shape == CoilShape.Round)
        {
            double rr = InnerDiameterMm!.Value / 2 + offsetMm;
            double c = (radiusMm * radiusMm + PitchRadiusMm * PitchRadiusMm - rr * rr) / (2 * radiusMm * PitchRadiusMm);
            if (c > 1) return null;
            return Math.Acos(Math.Max(-1, c)) * 180 / Math.PI;
        }
        if (DistanceToWindowMm(new Vec2(radiusMm, 0)) > offsetMm) return null;
        // Distance grows monotonically with the angle away from the window: bisection.
        double lo = 0, hi = Math.PI;
        if (DistanceToWindowMm(new Vec2(-radiusMm, 0)) <= offsetMm) return 180;
        for (int i = 0; i < 60; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (DistanceToWindowMm(new Vec2(radiusMm * Math.Cos(mid), radiusMm * Math.Sin(mid))) <= offsetMm) lo = mid; else hi = mid;
        }
        return lo * 180 / Math.PI;
    }

    /// <summary>Builds a round outline.</summary>
    public static CoilOutline Round(double pitchRadiusMm, double heightMm, double coreDiameterMm, double buildMm)
    {
        var c = new Vec2(pitchRadiusMm, 0);
        double ri = coreDiameterMm / 2;
        return new CoilOutline
        {
            Shape = CoilShape.Round,
            PitchRadiusMm = pitchRadiusMm,
            HeightMm = heightMm,
            RadialBuildMm = buildMm,
            InnerDiameterMm = coreDiameterMm,
            OuterDiameterMm = coreDiameterMm + 2 * buildMm,
            Window = Contour.FullCircle(c, ri),
            Outer = Contour.FullCircle(c, ri + buildMm),
            WindowHalfAngleDeg = ri < pitchRadiusMm ? Math.Asin(ri / pitchRadiusMm) * 180 / Math.PI : 180,
            WindowMinRadiusMm = Math.Max(0, pitchRadiusMm - ri),
            WindowMaxRadiusMm = pitchRadiusMm + ri,
        };
    }

    /// <summary>
    /// Builds a keystone outline: window half-angle from the core width at the pitch radius, window radii
    /// pitch_radius -+ radialLength/2, outer = window offset by the build. Requires
    /// coreWidth &lt; 2 pitchRadius, radialLength/2 &lt; pitchRadius and build &lt; window inner radius.
    /// </summary>
    public static CoilOutline Keystone(double pitchRadiusMm, double heightMm, double coreWidthMm, double radialLengthMm, double buildMm)
    {
        double a = Math.Asin(coreWidthMm / (2 * pitchRadiusMm)) * 180 / Math.PI;
        double r0 = pitchRadiusMm - radialLengthMm / 2, r1 = pitchRadiusMm + radialLengthMm / 2;
        var o = new Vec2(0, 0);
        Vec2 P(double r, double deg) => Vec2.FromAngleDeg(deg) * r;
        var window = Contour.FromSegments(new Segment[]
        {
            new LineSegment(P(r0, -a), P(r1, -a)),
            new ArcSegment(o, r1, -a, 2 * a),
            new LineSegment(P(r1, a), P(r0, a)),
            new ArcSegment(o, r0, a, -2 * a),
        });
        double b = buildMm;
        Contour outer;
        if (b > 0)
        {
            Vec2 nLow = Vec2.FromAngleDeg(-a - 90) * b, nHigh = Vec2.FromAngleDeg(a + 90) * b;
            outer = Contour.FromSegments(new Segment[]
            {
                new LineSegment(P(r0, -a) + nLow, P(r1, -a) + nLow),
                new ArcSegment(P(r1, -a), b, -a - 90, 90),
                new ArcSegment(o, r1 + b, -a, 2 * a),
                new ArcSegment(P(r1, a), b, a, 90),
                new LineSegment(P(r1, a) + nHigh, P(r0, a) + nHigh),
                new ArcSegment(P(r0, a), b, a + 90, 90),
                new ArcSegment(o, r0 - b, a, -2 * a),
                new ArcSegment(P(r0, -a), b, -a + 180, 90),
            });
        }
        else outer = window;
        return new CoilOutline
        {
            Shape = CoilShape.Keystone,
            PitchRadiusMm = pitchRadiusMm,
            HeightMm = heightMm,
            RadialBuildMm = b,
            Window = window,
            Outer = outer,
            WindowHalfAngleDeg = a,
            WindowMinRadiusMm = r0,
            WindowMaxRadiusMm = r1,
        };
    }
}
