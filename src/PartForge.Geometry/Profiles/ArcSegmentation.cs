namespace PartForge.Geometry.Profiles;

/// <summary>How many straight segments replace an arc so that the chordal error stays within tolerance.</summary>
public static class ArcSegmentation
{
    /// <summary>Upper bound on segments for one full circle, a guard against absurd tolerances.</summary>
    public const int MaxSegmentsPerCircle = 1 << 20;

    /// <summary>
    /// Segments for a full circle: n = ceil(pi / acos(1 - e / r)), at least 3. With a pattern symmetry
    /// <paramref name="multipleOf"/>, n is rounded up to a multiple of the largest divisor of it that costs at
    /// most <paramref name="extraAllowed"/> more segments (default none: the symmetry is taken where it is free,
    /// e.g. 1,408 segments in a 64-fold pattern stay 1,408 and the mesh repeats exactly with the pattern, but
    /// 1,405 stay 1,405 rather than growing by 3).
    /// </summary>
    public static int FullCircle(double radius, double chordalTolerance, int multipleOf = 1, int extraAllowed = 0)
    {
        if (!(radius > 0) || !(chordalTolerance > 0)) throw new ArgumentOutOfRangeException(nameof(radius));
        int n;
        if (chordalTolerance >= radius) n = 3;
        else
        {
            double x = Math.Ceiling(Math.PI / Math.Acos(1 - chordalTolerance / radius));
            n = x > MaxSegmentsPerCircle ? MaxSegmentsPerCircle : Math.Max(3, (int)x);
        }
        if (multipleOf > 1)
        {
            for (int d = multipleOf; d > 1; d--)
            {
                if (multipleOf % d != 0) continue;
                int m = (n + d - 1) / d * d;
                if (m - n <= extraAllowed) return m;
            }
        }
        return n;
    }

    /// <summary>Segments for an arc of the given sweep (degrees), at least 1.</summary>
    public static int Arc(double radius, double sweepDeg, double chordalTolerance)
    {
        int full = FullCircle(radius, chordalTolerance);
        return Math.Max(1, (int)Math.Ceiling(full * Math.Abs(sweepDeg) / 360.0 - 1e-9));
    }

    /// <summary>
    /// Radius at which to place the vertices of an n-gon so the polygon contains the true circle
    /// (r / cos(pi / n)): holes and pockets are then never undersize.
    /// </summary>
    public static double CircumscribedRadius(double radius, int segmentsPerFullCircle) =>
        radius / Math.Cos(Math.PI / segmentsPerFullCircle);
}
