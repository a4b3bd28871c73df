using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Design.Machines.Magnets;

/// <summary>A cylindrical magnet of <see cref="DiameterMm"/>, centred on its pitch radius.</summary>
public sealed record DiscMagnet : MagnetShape
{
    public DiscMagnet(double diameterMm, double thicknessMm, double pitchRadiusMm) : base(thicknessMm, pitchRadiusMm) =>
        DiameterMm = diameterMm;

    public double DiameterMm { get; }

    public static readonly MagnetShapeKind Registration = new("disc", ["diameter", "pitch_radius"], "diameter", "pitch_radius", "pitch_radius",
        _ => [], m => new DiscMagnet(m.Diameter!.Value, m.Thickness, m.PitchRadius!.Value));

    public override MagnetShapeKind Kind => Registration;

    public override Contour Outline(double clearanceMm) => Contour.FullCircle(new Vec2(PitchRadiusMm, 0), (DiameterMm + clearanceMm) / 2);

    public override double FaceAreaMm2 => Math.PI * DiameterMm * DiameterMm / 4;
    public override double PerimeterMm => Math.PI * DiameterMm;
    public override double RadialLengthMm => DiameterMm;
    public override double TangentialWidthMm => DiameterMm;

    public override (double Min, double Max) RadialRangeMm(double clearanceMm)
    {
        double rp = (DiameterMm + clearanceMm) / 2;
        return (PitchRadiusMm - rp, PitchRadiusMm + rp);
    }

    /// <summary>Centres 2 R sin(pi/n) apart; each pocket reaches (D + c)/2 towards the other.</summary>
    public override double WebMm(int poles, double clearanceMm) =>
        2 * PitchRadiusMm * Math.Sin(Math.PI / poles) - (DiameterMm + clearanceMm);

    public override string Describe() => $"disc D{F(DiameterMm)} x {F(ThicknessMm)} mm";
    public override string PocketText(double c) => $"D{F(DiameterMm + c)}";
    public override IReadOnlyList<(string Id, double Mm)> PocketSizes(double c) => [("pocket_diameter", DiameterMm + c)];
}
