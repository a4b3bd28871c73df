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
        double dx1 = x - x1, dx2 = x - x2, dy1 = y - y1, dy2 = y - y2, dz1 = z - z1, dz2 = z - z2;
        double s = 0;
        // (-1)^(k+n+m) with n,m,k in {1,2}: sign + when an even number of indices equal 2... (1+1+1 odd -> -).
        s += Term(dx1, dy1, dz1, -1);
        s += Term(dx2, dy1, dz1, +1);
        s += Term(dx1, dy2, dz1, +1);
        s += Term(dx2, dy2, dz1, -1);
        s += Term(dx1, dy1, dz2, +1);
        s += Term(dx2, dy1, dz2, -1);
        s += Term(dx1, dy2, dz2, -1);
        s += Term(dx2, dy2, dz2, +1);
        return brTesla / (4 * Math.PI) * s;
    }

    private static double Term(double dx, double dy, double dz, int sign)
    {
        double num = dx * dy;
        if (num == 0) return 0;
        double r = Math.Sqrt(dx * dx + dy * dy + dz * dz);
        double den = dz * r;
        double a = den == 0 ? Math.Sign(num) * Math.PI / 2 : Math.Atan(num / den);
        return sign * a;
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
