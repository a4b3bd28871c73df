namespace PartForge.Electrical.Field;

/// <summary>
/// Field of a uniformly magnetised cuboid (magnetised along +z, remanence Br, mu_r = 1) anywhere outside it,
/// closed form from the surface-charge model (Akoun and Yonnet, IEEE Trans. Magn. 20(5), 1984; Furlani,
/// Permanent Magnet and Electromechanical Devices, 2001, ch. 4). With r the distance to corner (xn, ym, zk):
/// Bz = Br/(4 pi) Sum (-1)^(k+n+m) atan[(x-xn)(y-ym) / ((z-zk) r)],
/// Bx = -Br/(4 pi) Sum (-1)^(k+n+m) ln[(y-ym) + r], By = -Br/(4 pi) Sum (-1)^(k+n+m) ln[(x-xn) + r].
/// </summary>
public static class CuboidField
{
    /// <summary>Bz, tesla, at (x, y, z) mm of the cuboid [x1,x2] x [y1,y2] x [z1,z2].</summary>
    public static double Bz(double brTesla, double x1, double x2, double y1, double y2, double z1, double z2, double x, double y, double z)
    {
        double dx1 = x - x1, dx2 = x - x2, dy1 = y - y1, dy2 = y - y2;
        // Per face k: -atan(t11) + atan(t21) + atan(t12) - atan(t22) (signs (-1)^(n+m+1)), times (-1)^k.
        // Pairs are combined exactly: atan(a) - atan(b) = atan2(a - b, 1 + ab) for a, b in (-pi/2, pi/2).
        double top = Face(dx1, dx2, dy1, dy2, z - z2);
        double bottom = Face(dx1, dx2, dy1, dy2, z - z1);
        return brTesla / (4 * Math.PI) * (top - bottom);
    }

    /// <summary>Sum over the face's corners of (-1)^(n+m) atan[(x-xn)(y-ym) / (dz r)], with the corner (1,1) positive.</summary>
    private static double Face(double dx1, double dx2, double dy1, double dy2, double dz)
    {
        double a11 = Ratio(dx1, dy1, dz), a22 = Ratio(dx2, dy2, dz), a21 = Ratio(dx2, dy1, dz), a12 = Ratio(dx1, dy2, dz);
        return Diff(a11, a21) + Diff(a22, a12);
    }

    /// <summary>atan(a) - atan(b), exact; infinite arguments stand for +-pi/2.</summary>
    private static double Diff(double a, double b)
    {
        if (double.IsInfinity(a) || double.IsInfinity(b)) return Atan(a) - Atan(b);
        return Math.Atan2(a - b, 1 + a * b);
    }

    private static double Atan(double a) => double.IsPositiveInfinity(a) ? Math.PI / 2 : double.IsNegativeInfinity(a) ? -Math.PI / 2 : Math.Atan(a);

    private static double Ratio(double dx, double dy, double dz)
    {
        double num = dx * dy;
        if (num == 0) return 0;
        double den = dz * Math.Sqrt(dx * dx + dy * dy + dz * dz);
        return den == 0 ? (num > 0 ? double.PositiveInfinity : double.NegativeInfinity) : num / den;
    }

    /// <summary>(Bx, By, Bz), tesla, at (x, y, z) mm of the cuboid [x1,x2] x [y1,y2] x [z1,z2].</summary>
    public static (double Bx, double By, double Bz) B(double brTesla, double x1, double x2, double y1, double y2, double z1, double z2, double x, double y, double z)
    {
        double bx = 0, by = 0;
        double[] xs = { x1, x2 }, ys = { y1, y2 }, zs = { z1, z2 };
        for (int k = 0; k < 2; k++)
        for (int n = 0; n < 2; n++)
        for (int m = 0; m < 2; m++)
        {
            double dx = x - xs[n], dy = y - ys[m], dz = z - zs[k];
            double r = Math.Sqrt(dx * dx + dy * dy + dz * dz);
            int sign = ((k + n + m + 3) & 1) == 0 ? 1 : -1;
            bx += sign * SafeLog(dy + r);
            by += sign * SafeLog(dx + r);
        }
        double c = -brTesla / (4 * Math.PI);
        return (c * bx, c * by, Bz(brTesla, x1, x2, y1, y2, z1, z2, x, y, z));
    }

    private static double SafeLog(double v) => Math.Log(Math.Max(v, 1e-300));
}
