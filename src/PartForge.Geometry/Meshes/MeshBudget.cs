using System.Diagnostics.Contracts;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// Triangle count of a part estimated from its profiles BEFORE anything is discretised, so that an absurd
/// chordal tolerance is refused instantly instead of after minutes or an out-of-memory death.
/// The estimate is an upper bound for the mesher's output on a stack of layers: every ring vertex gives two
/// wall triangles per layer and about one face triangle on each of the two levels the layer touches
/// (a face of n vertices and h holes has n + 2h - 2 triangles).
/// </summary>
public static class MeshBudget
{
    /// <summary>The documented limit per part: 5,000,000 triangles (250 MB of binary STL).</summary>
    public const long DefaultTrianglesPerPart = 5_000_000;

    /// <summary>Segments of one contour at a chordal tolerance (not capped, as a double so nothing overflows).</summary>
    [Pure]
    public static double Segments(Contour c, double chordalToleranceMm)
    {
        ArgumentNullException.ThrowIfNull(c);
        if (c.Circle is { } ci) return CircleSegments(ci.Radius, chordalToleranceMm);
        double n = 0;
        foreach (var s in c.Segments)
            n += s is ArcSegment a ? Math.Max(1, Math.Ceiling(CircleSegments(a.Radius, chordalToleranceMm) * Math.Abs(a.SweepDeg) / 360.0)) : 1;
        return n;
    }

    /// <summary>Segments of all contours of a profile.</summary>
    [Pure]
    public static double Segments(Profile p, double chordalToleranceMm) =>
        p.Outers.Sum(c => Segments(c, chordalToleranceMm)) + p.Holes.Sum(c => Segments(c, chordalToleranceMm));

    /// <summary>
    /// Estimated triangles for a stack of layers, one profile per layer (bottom to top):
    /// sum over layers of 4 x segments + 2 x contours (an upper bound on what the mesher emits).
    /// </summary>
    [Pure]
    public static double EstimateTriangles(IEnumerable<Profile> layerProfiles, double chordalToleranceMm)
    {
        ArgumentNullException.ThrowIfNull(layerProfiles);
        if (!(chordalToleranceMm > 0)) return double.PositiveInfinity;
        double t = 0;
        foreach (var p in layerProfiles) t += 4 * Segments(p, chordalToleranceMm) + 2 * (p.Outers.Count + p.Holes.Count);
        return t;
    }

    /// <summary>
    /// The smallest chordal tolerance (mm) at which the estimate fits the budget, found by bisection on a log
    /// scale (the estimate falls as the tolerance grows); +infinity if no tolerance fits.
    /// </summary>
    [Pure]
    public static double SmallestTolerance(IReadOnlyList<Profile> layerProfiles, double budgetTriangles)
    {
        double lo = 1e-12, hi = 1e6;
        if (EstimateTriangles(layerProfiles, hi) > budgetTriangles) return double.PositiveInfinity;
        if (EstimateTriangles(layerProfiles, lo) <= budgetTriangles) return lo;
        for (int i = 0; i < 200 && hi / lo > 1 + 1e-9; i++)
        {
            double mid = Math.Sqrt(lo * hi);
            if (EstimateTriangles(layerProfiles, mid) <= budgetTriangles) hi = mid; else lo = mid;
        }
        return hi;
    }

    /// <summary>n = ceil(pi / acos(1 - e / r)), at least 3; the same rule as <see cref="ArcSegmentation"/> but uncapped.</summary>
    [Pure]
    public static double CircleSegments(double radius, double e)
    {
        if (!(radius > 0) || !(e > 0)) return 3;
        if (e >= radius) return 3;
        double x = 1 - e / radius;
        // acos(1 - d) ~ sqrt(2 d) for tiny d, where 1 - d rounds to 1 in double
        double ang = x < 1 ? Math.Acos(x) : Math.Sqrt(2 * e / radius);
        return Math.Max(3, Math.Ceiling(Math.PI / ang));
    }
}
