using PartForge.Geometry;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Formats.Tests.Stl;

/// <summary>Solids for the writer tests, built here from profiles (reference rotor R1, docs/physics.md §9, and random plates).</summary>
public static class TestSolids
{
    public static readonly Precision R1Precision = Precision.FromChordalTolerance(0.005);

    /// <summary>R1: OD 120, t 8, bore 10, 16 pockets D12.2 x 5 deep on r 45, 6 holes D4.5 on a 30 circle.</summary>
    public static LayeredSolid R1()
    {
        var prec = R1Precision;
        var outer = Contour.FullCircle(new Vec2(0, 0), 60);
        var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), 5) };
        for (int i = 0; i < 6; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(60.0 * i) * 15, 2.25));
        var pockets = Enumerable.Range(0, 16).Select(i => Contour.FullCircle(Vec2.FromAngleDeg(22.5 * i) * 45, 6.1));
        return new LayeredSolid(new[]
        {
            new Layer(0, 3, Region.FromProfile(Profile.Of(outer, holes.ToArray()), prec)),
            new Layer(3, 8, Region.FromProfile(Profile.Of(outer, holes.Concat(pockets).ToArray()), prec)),
        });
    }

    /// <summary>True-circle volume of R1, pi r^2 h per cylinder (Source: volume of a right circular cylinder).</summary>
    public static double R1TrueVolume =>
        Math.PI * (60 * 60 * 8 - 5 * 5 * 8 - 6 * 2.25 * 2.25 * 8 - 16 * 6.1 * 6.1 * 5);

    /// <summary>A plate with random round and rectangular holes and a random pocketed top layer.</summary>
    public static LayeredSolid RandomPlate(int seed, Precision prec)
    {
        var rnd = new Random(seed);
        var plate = Region.FromContour(Contour.Rectangle(new Vec2(0, 0), 60 + rnd.NextDouble() * 40, 40 + rnd.NextDouble() * 30, rnd.NextDouble() * 30), prec);
        var holes = new List<Contour>();
        for (int i = 0; i < 4; i++)
            holes.Add(rnd.Next(2) == 0
                ? Contour.FullCircle(new Vec2(-18 + 12 * i, -6), 1 + rnd.NextDouble() * 3)
                : Contour.Rectangle(new Vec2(-18 + 12 * i, -6), 2 + rnd.NextDouble() * 5, 2 + rnd.NextDouble() * 5, rnd.NextDouble() * 90));
        var lower = holes.Aggregate(plate, (r, h) => r.Difference(Region.FromContour(h, prec, asHole: true)));
        var upper = Enumerable.Range(0, 3).Aggregate(lower, (r, i) => r.Difference(Region.FromContour(Contour.FullCircle(new Vec2(-12 + 12 * i, 10), 2 + rnd.NextDouble() * 2), prec, asHole: true)));
        return new LayeredSolid(new[] { new Layer(0, 2, lower), new Layer(2, 2 + 1 + rnd.NextDouble() * 3, upper) });
    }
}
