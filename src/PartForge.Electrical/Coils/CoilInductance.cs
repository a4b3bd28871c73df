using PartForge.Geometry.Primitives;

namespace PartForge.Electrical.Coils;

/// <summary>Self-inductance of an air-core coil.</summary>
public static class CoilInductance
{
    /// <summary>
    /// Wheeler's multilayer formula (Proc. IRE 16(10), 1928): L[uH] = 0.031496 a^2 N^2 / (6a + 9b + 10c), with
    /// a the mean radius, b the axial length and c the radial depth, all in mm. About 1 % for circular coils
    /// whose three terms are of similar size.
    /// </summary>
    public static double WheelerMicrohenry(double meanRadiusMm, double axialLengthMm, double radialDepthMm, double turns) =>
        0.031496 * meanRadiusMm * meanRadiusMm * turns * turns / (6 * meanRadiusMm + 9 * axialLengthMm + 10 * radialDepthMm);

    /// <summary>Segments of the mean-turn loop in <see cref="KeystoneMicrohenry"/>.</summary>
    public const int LoopSegments = 192;

    /// <summary>
    /// Self-inductance of a coil of any plan shape (used for keystones), uH, by Maxwell's geometric-mean-distance
    /// method: L = N^2 M, with M the mutual inductance (Neumann's integral, midpoint rule over
    /// <see cref="LoopSegments"/> straight segments) between the mean turn and a copy of it displaced axially by the
    /// geometric mean distance of the winding's rectangular cross-section from itself, GMD = 0.2235 (build + height)
    /// (Maxwell; Grover, Inductance Calculations, 1946; from memory). Air core, no neighbouring coils.
    /// </summary>
    public static double KeystoneMicrohenry(CoilOutline outline, double heightMm, double buildMm, double turns)
    {
        var loop = TurnLoop(outline, buildMm / 2, LoopSegments);
        double gmd = 0.2235 * (buildMm + heightMm);
        return turns * turns * NeumannMicrohenry(loop, loop, gmd);
    }

    /// <summary>
    /// The turn at <paramref name="offsetMm"/> from the coil's window as a closed polygon of <paramref name="n"/>
    /// points (coil frame, mm): on rays from the window's centre, the point at that distance from the window
    /// (<see cref="CoilOutline.DistanceToWindowMm"/>), found by bisection.
    /// </summary>
    public static Vec2[] TurnLoop(CoilOutline outline, double offsetMm, int n)
    {
        var c = outline.Shape == Design.Machines.CoilShape.Round
            ? new Vec2(outline.PitchRadiusMm, 0)
            : new Vec2((outline.WindowMinRadiusMm + outline.WindowMaxRadiusMm) / 2, 0);
        double reach = outline.WindowMaxRadiusMm + offsetMm + outline.PitchRadiusMm + 10;
        var pts = new Vec2[n];
        for (int k = 0; k < n; k++)
        {
            double a = 2 * Math.PI * k / n;
            var u = new Vec2(Math.Cos(a), Math.Sin(a));
            double lo = 0, hi = reach;
            for (int it = 0; it < 60; it++)
            {
                double mid = (lo + hi) / 2;
                if (outline.DistanceToWindowMm(c + u * mid) <= offsetMm) lo = mid; else hi = mid;
            }
            pts[k] = c + u * ((lo + hi) / 2);
        }
        return pts;
    }

    /// <summary>Mutual inductance of two closed polygons <paramref name="dzMm"/> apart along z, uH (Neumann: mu0/4pi
    /// sum dl_i . dl_j / R_ij over segment midpoints).</summary>
    public static double NeumannMicrohenry(IReadOnlyList<Vec2> a, IReadOnlyList<Vec2> b, double dzMm)
    {
        double sum = 0, dz2 = dzMm * dzMm;
        int na = a.Count, nb = b.Count;
        var mb = new (double X, double Y, double Dx, double Dy)[nb];
        for (int j = 0; j < nb; j++)
        {
            var p = b[j];
            var q = b[(j + 1) % nb];
            mb[j] = ((p.X + q.X) / 2, (p.Y + q.Y) / 2, q.X - p.X, q.Y - p.Y);
        }
        for (int i = 0; i < na; i++)
        {
            var p = a[i];
            var q = a[(i + 1) % na];
            double mx = (p.X + q.X) / 2, my = (p.Y + q.Y) / 2, dx = q.X - p.X, dy = q.Y - p.Y;
            for (int j = 0; j < nb; j++)
            {
                var s = mb[j];
                double rx = mx - s.X, ry = my - s.Y;
                sum += (dx * s.Dx + dy * s.Dy) / Math.Sqrt(rx * rx + ry * ry + dz2);
            }
        }
        return 1e-7 * sum * 1e-3 * 1e6; // mu0/4pi = 1e-7 H/m; lengths in mm: dl dl / R -> mm; to uH
    }
}
