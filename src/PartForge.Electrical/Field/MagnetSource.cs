using PartForge.Geometry.Profiles;

namespace PartForge.Electrical.Field;

/// <summary>
/// One axially magnetised magnet placed in the rotor frame (machine axis = z, magnet centred at angle
/// CentreDeg on PitchRadiusMm), between ZMinMm and ZMaxMm, with signed remanence (positive: magnetised +z).
/// Its Bz comes from the closed forms (block: <see cref="CuboidField"/>, disc: <see cref="CylinderField"/>,
/// arc: <see cref="PolygonFaceField"/> on faces whose arcs are split finely enough that the polygon's chordal
/// error is at most ArcChordalToleranceMm). Far away (distance from the centre above FarFactor x the
/// magnet's largest dimension) it is replaced by its dipole field, whose relative error there is below
/// about (1 / (2 FarFactor))^2 of that magnet's small contribution; FarFactor 0 disables the dipole.
/// </summary>
public sealed class MagnetSource
{
    public MagnetGeometry Geometry { get; }
    public double CentreDeg { get; }
    public double ZMinMm { get; }
    public double ZMaxMm { get; }
    public double SignedBrTesla { get; }

    private readonly double _c, _s, _cx, _cy, _cz, _far2, _dipole;
    private readonly double[] _px = Array.Empty<double>(), _py = Array.Empty<double>();

    /// <summary>Chordal tolerance of the polygons that stand for an arc magnet's faces, mm.</summary>
    public const double ArcChordalToleranceMm = 0.002;

    public MagnetSource(MagnetGeometry g, double centreDeg, double zMinMm, double zMaxMm, double signedBrTesla, double farFactor)
    {
        Geometry = g;
        CentreDeg = centreDeg;
        ZMinMm = zMinMm;
        ZMaxMm = zMaxMm;
        SignedBrTesla = signedBrTesla;
        _c = Math.Cos(centreDeg * Math.PI / 180);
        _s = Math.Sin(centreDeg * Math.PI / 180);
        _cx = g.PitchRadiusMm * _c;
        _cy = g.PitchRadiusMm * _s;
        _cz = (zMinMm + zMaxMm) / 2;
        double size = g.Shape switch
        {
            MagnetShape.Disc => Math.Max(g.DiameterMm, g.ThicknessMm),
            MagnetShape.Block => Math.Max(Math.Max(g.LengthMm, g.WidthMm), g.ThicknessMm),
            _ => Math.Max(Math.Max(g.OuterRadiusMm - g.InnerRadiusMm, 2 * g.OuterRadiusMm * Math.Sin(Math.Min(g.SpanDeg, 180) * Math.PI / 360)), g.ThicknessMm),
        };
        _far2 = farFactor > 0 ? Math.Pow(farFactor * size, 2) : double.PositiveInfinity;
        _dipole = signedBrTesla * g.VolumeMm3 / (4 * Math.PI);
        if (g.Shape == MagnetShape.Arc)
        {
            int nOut = ArcSegmentation.Arc(g.OuterRadiusMm, g.SpanDeg, ArcChordalToleranceMm);
            int nIn = g.InnerRadiusMm > 0 ? ArcSegmentation.Arc(g.InnerRadiusMm, g.SpanDeg, ArcChordalToleranceMm) : 0;
            var xs = new List<double>();
            var ys = new List<double>();
            double h = g.SpanDeg / 2;
            for (int i = 0; i <= nOut; i++)
            {
                double a = (-h + g.SpanDeg * i / nOut) * Math.PI / 180;
                xs.Add(g.OuterRadiusMm * Math.Cos(a)); ys.Add(g.OuterRadiusMm * Math.Sin(a));
            }
            if (nIn > 0)
                for (int i = 0; i <= nIn; i++)
                {
                    double a = (h - g.SpanDeg * i / nIn) * Math.PI / 180;
                    xs.Add(g.InnerRadiusMm * Math.Cos(a)); ys.Add(g.InnerRadiusMm * Math.Sin(a));
                }
            else { xs.Add(0); ys.Add(0); }
            _px = xs.ToArray();
            _py = ys.ToArray();
        }
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
        var g = Geometry;
        switch (g.Shape)
        {
            case MagnetShape.Block:
            {
                double u = x * _c + y * _s, v = -x * _s + y * _c;
                return CuboidField.Bz(SignedBrTesla, g.PitchRadiusMm - g.LengthMm / 2, g.PitchRadiusMm + g.LengthMm / 2,
                    -g.WidthMm / 2, g.WidthMm / 2, ZMinMm, ZMaxMm, u, v, z);
            }
            case MagnetShape.Disc:
            {
                double dx = x - _cx, dy = y - _cy;
                double rho = Math.Sqrt(dx * dx + dy * dy);
                return CylinderField.Bz(SignedBrTesla, g.DiameterMm / 2, (ZMaxMm - ZMinMm) / 2, rho, z - _cz);
            }
            default:
            {
                double u = x * _c + y * _s, v = -x * _s + y * _c;
                double top = PolygonFaceField.SolidAngle(_px, _py, ZMaxMm, u, v, z);
                double bottom = PolygonFaceField.SolidAngle(_px, _py, ZMinMm, u, v, z);
                return SignedBrTesla / (4 * Math.PI) * (top - bottom);
            }
        }
    }

    /// <summary>A copy mirrored in the plane z = planeMm with the same magnetisation (the image in ideal iron).</summary>
    public MagnetSource ImageIn(double planeMm, double farFactor) =>
        new(Geometry, CentreDeg, 2 * planeMm - ZMaxMm, 2 * planeMm - ZMinMm, SignedBrTesla, farFactor);
}
