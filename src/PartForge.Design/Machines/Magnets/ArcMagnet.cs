using PartForge.Geometry.Profiles;

namespace PartForge.Design.Machines.Magnets;

/// <summary>A segment of an annulus: <see cref="InnerRadiusMm"/> to <see cref="OuterRadiusMm"/>, <see cref="SpanDeg"/> wide, centred on +x.</summary>
public sealed record ArcMagnet : MagnetShape
{
    public ArcMagnet(double innerRadiusMm, double outerRadiusMm, double spanDeg, double thicknessMm)
        : base(thicknessMm, (innerRadiusMm + outerRadiusMm) / 2)
    {
        InnerRadiusMm = innerRadiusMm;
        OuterRadiusMm = outerRadiusMm;
        SpanDeg = spanDeg;
    }

    public double InnerRadiusMm { get; }
    public double OuterRadiusMm { get; }
    public double SpanDeg { get; }

    public static readonly MagnetShapeKind Registration = new("arc", ["inner_radius", "outer_radius", "span"], "span", "inner_radius", "outer_radius",
        m => m.InnerRadius is { } ri && m.OuterRadius is { } ro && ri >= ro
            ? [new ShapeProblem("inner_radius", $"is not less than magnets.outer_radius ({F(Math.Round(ro, 3))})", F(Math.Round(ri, 3)), "less than magnets.outer_radius")]
            : [],
        m => new ArcMagnet(m.InnerRadius!.Value, m.OuterRadius!.Value, m.Span!.Value, m.Thickness));

    public override MagnetShapeKind Kind => Registration;

    /// <summary>Radii inner - c/2 .. outer + c/2; the span widened so the arc length at the pitch radius grows by c
    /// (span + c / r_pitch radians). The radial sides stay radial.</summary>
    public override Contour Outline(double clearanceMm)
    {
        double ri = InnerRadiusMm - clearanceMm / 2;
        double ro = OuterRadiusMm + clearanceMm / 2;
        double span = SpanDeg + clearanceMm / PitchRadiusMm * 180.0 / Math.PI;
        if (!(ri >= 0) || !(ro > ri)) throw new ArgumentException("arc pocket radii are invalid (inner_radius - clearance/2 < 0 or outer <= inner)");
        return Contour.AnnularSector(ri, ro, -span / 2, span);
    }

    public override double FaceAreaMm2 => SpanDeg / 360.0 * Math.PI * (OuterRadiusMm * OuterRadiusMm - InnerRadiusMm * InnerRadiusMm);
    public override double PerimeterMm => SpanDeg * Math.PI / 180 * (OuterRadiusMm + InnerRadiusMm) + 2 * (OuterRadiusMm - InnerRadiusMm);
    public override double RadialLengthMm => OuterRadiusMm - InnerRadiusMm;
    public override double TangentialWidthMm => 2 * PitchRadiusMm * Math.Sin(SpanDeg * Math.PI / 360);

    /// <summary>Centroid of a sector of an annulus: (2/3)(ro^3 - ri^3)/(ro^2 - ri^2) sin(s/2)/(s/2) (a geometry fact).</summary>
    public override double CentroidRadiusMm
    {
        get
        {
            double h = SpanDeg * Math.PI / 360;
            double ri = InnerRadiusMm, ro = OuterRadiusMm;
            return 2.0 / 3 * (ro * ro * ro - ri * ri * ri) / (ro * ro - ri * ri) * (h > 0 ? Math.Sin(h) / h : 1);
        }
    }

    public override (double Min, double Max) RadialRangeMm(double clearanceMm) => (InnerRadiusMm - clearanceMm / 2, OuterRadiusMm + clearanceMm / 2);

    /// <summary>Radial side edges an angle g apart: the nearest points are the inner corners, 2 ri sin(g/2) apart, less the clearance.</summary>
    public override double WebMm(int poles, double clearanceMm)
    {
        double gap = 2 * Math.PI / poles - SpanDeg * Math.PI / 180;
        return gap <= 0 ? gap * InnerRadiusMm - clearanceMm : 2 * InnerRadiusMm * Math.Sin(gap / 2) - clearanceMm;
    }

    public override string Describe() => $"arc segment R{F(InnerRadiusMm)}-{F(OuterRadiusMm)} mm x {F(SpanDeg)} deg x {F(ThicknessMm)} mm";
    public override string PocketText(double c) => $"R{F(InnerRadiusMm - c / 2)}-{F(OuterRadiusMm + c / 2)} arc";
    public override IReadOnlyList<(string Id, double Mm)> PocketSizes(double c) =>
        [("pocket_inner_radius", InnerRadiusMm - c / 2), ("pocket_outer_radius", OuterRadiusMm + c / 2)];
}
