using PartForge.Geometry;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Bench;

/// <summary>
/// The reference rotor of the kernel benchmarks: a disc minus bore minus bolt holes, with blind round
/// pockets on a pitch circle (the reference rotors R1/R2, docs/physics.md §9), from profiles to solid.
/// </summary>
internal sealed record KernelRotor(double Od, double T, double Bore, int Pockets, double PocketD, double PocketDepth,
    double PitchR, int Bolts, double BoltD, double BoltCircleD, double E)
{
    public static readonly KernelRotor R1 = new(120, 8, 10, 16, 12.2, 5, 45, 6, 4.5, 30, 0.005);
    public static readonly KernelRotor R2 = new(400, 10, 25, 64, 15.2, 6, 180, 8, 6.6, 60, 0.0005);

    public Precision Precision => Precision.FromChordalTolerance(E);

    public (Profile Floor, Profile Top) Profiles()
    {
        var outer = Contour.FullCircle(new Vec2(0, 0), Od / 2);
        var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), Bore / 2) };
        for (int i = 0; i < Bolts; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / Bolts) * (BoltCircleD / 2), BoltD / 2));
        var all = new List<Contour>(holes);
        for (int i = 0; i < Pockets; i++) all.Add(Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / Pockets) * PitchR, PocketD / 2));
        return (Profile.Of(outer, holes.ToArray()), Profile.Of(outer, all.ToArray()));
    }

    public LayeredSolid Build()
    {
        var (floor, top) = Profiles();
        var prec = Precision;
        double zf = T - PocketDepth;
        return new LayeredSolid(new[]
        {
            new Layer(0, zf, Region.FromProfile(floor, prec)),
            new Layer(zf, T, Region.FromProfile(top, prec)),
        });
    }
}
