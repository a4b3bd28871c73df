using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Design.Machines.Magnets;

/// <summary>
/// A sector (trapezoidal) block magnet: <see cref="LengthMm"/> radial, <see cref="InnerWidthMm"/> wide at its
/// inner edge and <see cref="OuterWidthMm"/> at its outer edge, both edges square to its radial centre line,
/// whose midpoint sits on the pitch radius. Equal widths give the block of that size.
/// </summary>
public sealed record SectorMagnet : MagnetShape
{
    public SectorMagnet(double innerWidthMm, double outerWidthMm, double lengthMm, double thicknessMm, double pitchRadiusMm)
        : base(thicknessMm, pitchRadiusMm)
    {
        InnerWidthMm = innerWidthMm;
        OuterWidthMm = outerWidthMm;
        LengthMm = lengthMm;
    }

    public double InnerWidthMm { get; }
    public double OuterWidthMm { get; }

    /// <summary>Radial length, mm.</summary>
    public double LengthMm { get; }

    public static readonly MagnetShapeKind Registration = new("sector", ["inner_width", "outer_width", "length", "pitch_radius"], "outer_width", "pitch_radius", "pitch_radius",
        _ => [], m => new SectorMagnet(m.InnerWidth!.Value, m.OuterWidth!.Value, m.Length!.Value, m.Thickness, m.PitchRadius!.Value));

    public override MagnetShapeKind Kind => Registration;

    /// <summary>The corners of magnet 0 grown by c/2 beyond every side (mitred), counter-clockwise from the inner edge's -y end.</summary>
    public IReadOnlyList<Vec2> Corners(double clearanceMm)
    {
        double xi = PitchRadiusMm - LengthMm / 2, xo = PitchRadiusMm + LengthMm / 2, h = clearanceMm / 2;
        double yi = InnerWidthMm / 2, yo = OuterWidthMm / 2;
        // The slanted side y = yi + (x - xi) k moved outward by h along its normal: y = yi + (x - xi) k + h sqrt(1 + k^2).
        double k = (yo - yi) / LengthMm, lift = h * Math.Sqrt(1 + k * k);
        double xi2 = xi - h, xo2 = xo + h;
        double Y(double x) => yi + (x - xi) * k + lift;
        return [new Vec2(xi2, -Y(xi2)), new Vec2(xo2, -Y(xo2)), new Vec2(xo2, Y(xo2)), new Vec2(xi2, Y(xi2))];
    }

    public override Contour Outline(double clearanceMm) => Contour.Polygon(Corners(clearanceMm));

    public override double FaceAreaMm2 => LengthMm * (InnerWidthMm + OuterWidthMm) / 2;

    public override double PerimeterMm =>
        InnerWidthMm + OuterWidthMm + 2 * Math.Sqrt(LengthMm * LengthMm + Math.Pow((OuterWidthMm - InnerWidthMm) / 2, 2));

    public override double RadialLengthMm => LengthMm;
    public override double TangentialWidthMm => (InnerWidthMm + OuterWidthMm) / 2;

    /// <summary>Centroid of a trapezoid, from its inner edge: L (a + 2b) / (3 (a + b)), a and b the inner and outer widths (geometry).</summary>
    public override double CentroidRadiusMm =>
        PitchRadiusMm - LengthMm / 2 + LengthMm * (InnerWidthMm + 2 * OuterWidthMm) / (3 * (InnerWidthMm + OuterWidthMm));

    /// <summary>Exact on the (convex) outline: nearest point of its edges to the axis, farthest corner.</summary>
    public override (double Min, double Max) RadialRangeMm(double clearanceMm) => Exact2D.RadialExtent(Outline(clearanceMm));

    /// <summary>Twice the smallest distance of a corner from the bisector at pi/n (the corners are the extreme points of a convex outline).</summary>
    public override double WebMm(int poles, double clearanceMm)
    {
        double a = Math.PI / poles, s = Math.Sin(a), c = Math.Cos(a);
        return 2 * Corners(clearanceMm).Min(p => p.X * s - p.Y * c);
    }

    public override string Describe() =>
        $"sector block {F(LengthMm)} radial x {F(InnerWidthMm)}-{F(OuterWidthMm)} wide x {F(ThicknessMm)} mm (inner-outer width)";

    public override string PocketText(double c)
    {
        var k = Corners(c);
        return $"{F(LengthMm + c)} x {F(k[3].Y - k[0].Y)}-{F(k[2].Y - k[1].Y)} sector";
    }

    public override IReadOnlyList<(string Id, double Mm)> PocketSizes(double c)
    {
        var k = Corners(c);
        return [("pocket_length", LengthMm + c), ("pocket_outer_width", k[2].Y - k[1].Y), ("pocket_inner_width", k[3].Y - k[0].Y)];
    }
}
