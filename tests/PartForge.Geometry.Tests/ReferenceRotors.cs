using PartForge.Geometry;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests;

/// <summary>
/// The reference rotors R1 and R2 (docs/physics.md §9), built in the test itself as layered
/// solids: a disc minus bore minus bolt holes, with blind round pockets from the top.
/// </summary>
public static class ReferenceRotors
{
    public sealed record Spec(double Od, double T, double Bore, int Pockets, double PocketD, double PocketDepth, double PitchR, int Bolts, double BoltD, double BoltCircleD, double E);

    public static readonly Spec R1 = new(120, 8, 10, 16, 12.2, 5, 45, 6, 4.5, 30, 0.005);
    public static readonly Spec R2 = new(400, 10, 25, 64, 15.2, 6, 180, 8, 6.6, 60, 0.0005);

    public static LayeredSolid Build(Spec s)
    {
        var prec = Precision.FromChordalTolerance(s.E);
        var outer = Contour.FullCircle(new Vec2(0, 0), s.Od / 2);
        var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), s.Bore / 2) };
        for (int i = 0; i < s.Bolts; i++)
            holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / s.Bolts) * (s.BoltCircleD / 2), s.BoltD / 2));
        var pockets = new List<Contour>();
        for (int i = 0; i < s.Pockets; i++)
            pockets.Add(Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / s.Pockets) * s.PitchR, s.PocketD / 2));
        var floor = Region.FromProfile(Profile.Of(outer, holes.ToArray()), prec);
        var top = Region.FromProfile(Profile.Of(outer, holes.Concat(pockets).ToArray()), prec);
        double zf = s.T - s.PocketDepth;
        return new LayeredSolid(new[] { new Layer(0, zf, floor), new Layer(zf, s.T, top) });
    }

    /// <summary>
    /// Volume of the true-circle geometry: pi r^2 h for the disc, minus the through holes over the full
    /// thickness and the pockets over their depth. Source: volume of a right circular cylinder, V = pi r^2 h.
    /// </summary>
    public static double TrueVolume(Spec s)
    {
        static double Cyl(double d, double h) => Math.PI * d * d / 4 * h;
        return Cyl(s.Od, s.T) - Cyl(s.Bore, s.T) - s.Bolts * Cyl(s.BoltD, s.T) - s.Pockets * Cyl(s.PocketD, s.PocketDepth);
    }
}
