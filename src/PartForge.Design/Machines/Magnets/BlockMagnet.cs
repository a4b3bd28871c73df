using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Design.Machines.Magnets;

/// <summary>A cuboid magnet: <see cref="LengthMm"/> radial by <see cref="WidthMm"/> tangential, centred on its pitch radius.</summary>
public sealed record BlockMagnet : MagnetShape
{
    public BlockMagnet(double lengthMm, double widthMm, double thicknessMm, double pitchRadiusMm) : base(thicknessMm, pitchRadiusMm)
    {
        LengthMm = lengthMm;
        WidthMm = widthMm;
    }

    /// <summary>Radial length, mm.</summary>
    public double LengthMm { get; }

    /// <summary>Tangential width, mm.</summary>
    public double WidthMm { get; }

    public static readonly MagnetShapeKind Registration = new("block", ["length", "width", "pitch_radius"], "width", "pitch_radius", "pitch_radius",
        _ => [], m => new BlockMagnet(m.Length!.Value, m.Width!.Value, m.Thickness, m.PitchRadius!.Value));

    public override MagnetShapeKind Kind => Registration;

    public override Contour Outline(double clearanceMm) =>
        Contour.Rectangle(new Vec2(PitchRadiusMm, 0), LengthMm + clearanceMm, WidthMm + clearanceMm, 0);

    public override double FaceAreaMm2 => LengthMm * WidthMm;
    public override double PerimeterMm => 2 * (LengthMm + WidthMm);
    public override double RadialLengthMm => LengthMm;
    public override double TangentialWidthMm => WidthMm;

    /// <summary>Nearest point: the middle of the inner edge; farthest: the outer corners.</summary>
    public override (double Min, double Max) RadialRangeMm(double clearanceMm)
    {
        double l = LengthMm + clearanceMm, w = WidthMm + clearanceMm;
        return (PitchRadiusMm - l / 2, Math.Sqrt((PitchRadiusMm + l / 2) * (PitchRadiusMm + l / 2) + w * w / 4));
    }

    /// <summary>The inner corner (r_in, w/2), r_in = R - l/2, comes nearest to the bisector: web = 2 (r_in sin(pi/n) - w/2 cos(pi/n)).</summary>
    public override double WebMm(int poles, double clearanceMm)
    {
        double l = LengthMm + clearanceMm, w = WidthMm + clearanceMm;
        double half = Math.PI / poles;
        double rin = PitchRadiusMm - l / 2;
        return 2 * (rin * Math.Sin(half) - w / 2 * Math.Cos(half));
    }

    public override string Describe() => $"block {F(LengthMm)} x {F(WidthMm)} x {F(ThicknessMm)} mm (radial x tangential x axial)";
    public override string PocketText(double c) => $"{F(LengthMm + c)} x {F(WidthMm + c)}";
    public override IReadOnlyList<(string Id, double Mm)> PocketSizes(double c) => [("pocket_length", LengthMm + c), ("pocket_width", WidthMm + c)];
}
