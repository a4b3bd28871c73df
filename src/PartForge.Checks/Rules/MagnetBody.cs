using PartForge.Checks.Clearance;
using PartForge.Checks.Materials;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Checks.Rules;

/// <summary>The magnet as a solid the checks can reason about: plan shape, mass, centroid radius.</summary>
internal sealed record MagnetBody(string Shape, double DiameterMm, double LengthMm, double WidthMm,
    double InnerRadiusMm, double OuterRadiusMm, double SpanDeg, double ThicknessMm, double PitchRadiusMm)
{
    public static MagnetBody From(Design.Model.Magnets m)
    {
        double pitch = m.PitchRadius ?? (m.InnerRadius is { } ri && m.OuterRadius is { } ro ? (ri + ro) / 2 : 0);
        return new MagnetBody(m.Shape, m.Diameter ?? 0, m.Length ?? 0, m.Width ?? 0, m.InnerRadius ?? 0, m.OuterRadius ?? 0,
            m.Span ?? 0, m.Thickness, pitch);
    }

    public double FaceAreaMm2 => Shape switch
    {
        "disc" => Math.PI * DiameterMm * DiameterMm / 4,
        "block" => LengthMm * WidthMm,
        _ => SpanDeg / 360 * Math.PI * (OuterRadiusMm * OuterRadiusMm - InnerRadiusMm * InnerRadiusMm),
    };

    public double PerimeterMm => Shape switch
    {
        "disc" => Math.PI * DiameterMm,
        "block" => 2 * (LengthMm + WidthMm),
        _ => SpanDeg * Math.PI / 180 * (OuterRadiusMm + InnerRadiusMm) + 2 * (OuterRadiusMm - InnerRadiusMm),
    };

    /// <summary>Mass, kg, at the NdFeB density of <see cref="MaterialTable.NdFeBDensityKgM3"/>.</summary>
    public double MassKg => FaceAreaMm2 * ThicknessMm * 1e-9 * MaterialTable.NdFeBDensityKgM3;

    /// <summary>
    /// Radius of the centroid, mm: the pitch radius for discs and blocks; for an annular sector
    /// (2/3)(ro^3 - ri^3)/(ro^2 - ri^2) sin(s/2)/(s/2) (the centroid of a sector of an annulus, a geometry fact).
    /// </summary>
    public double CentroidRadiusMm
    {
        get
        {
            if (Shape != "arc") return PitchRadiusMm;
            double h = SpanDeg * Math.PI / 360;
            double ri = InnerRadiusMm, ro = OuterRadiusMm;
            return 2.0 / 3 * (ro * ro * ro - ri * ri * ri) / (ro * ro - ri * ri) * (h > 0 ? Math.Sin(h) / h : 1);
        }
    }

    /// <summary>The magnet's plan outline centred at a pocket's angle (machine frame, unrotated rotor).</summary>
    public Contour OutlineAt(double angleDeg, double radiusMm)
    {
        switch (Shape)
        {
            case "disc":
                return Contour.FullCircle(Vec2.FromAngleDeg(angleDeg) * radiusMm, DiameterMm / 2);
            case "block":
                return Contour.Rectangle(Vec2.FromAngleDeg(angleDeg) * radiusMm, LengthMm, WidthMm, angleDeg);
            default:
                return Contour.AnnularSector(InnerRadiusMm, OuterRadiusMm, angleDeg - SpanDeg / 2, SpanDeg);
        }
    }

    public Shape2D ShapeAt(double angleDeg, double radiusMm) => new(OutlineAt(angleDeg, radiusMm));
}
