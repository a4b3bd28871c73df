namespace PartForge.Electrical.Tests.Field;

/// <summary>
/// Independent reference for the tests: the field of a uniformly charged plane face by brute-force midpoint
/// integration of Coulomb's law (surface-charge model of a magnet, sigma = Br/mu0): B = Br/(4 pi) Int R/|R|^3 dA.
/// Deliberately simple and slow; shares no code with the implementation.
/// </summary>
public static class SurfaceCharge
{
    /// <summary>B (x, y, z components) of a rectangle face [x1,x2] x [y1,y2] at height zf with unit-Br charge (+1), n x n midpoints.</summary>
    public static (double X, double Y, double Z) Rectangle(double x1, double x2, double y1, double y2, double zf, double x, double y, double z, int n)
    {
        double hx = (x2 - x1) / n, hy = (y2 - y1) / n, bx = 0, by = 0, bz = 0;
        for (int i = 0; i < n; i++)
        {
            double u = x1 + (i + 0.5) * hx;
            for (int j = 0; j < n; j++)
            {
                double v = y1 + (j + 0.5) * hy;
                double rx = x - u, ry = y - v, rz = z - zf;
                double r2 = rx * rx + ry * ry + rz * rz;
                double inv = 1 / (r2 * Math.Sqrt(r2));
                bx += rx * inv; by += ry * inv; bz += rz * inv;
            }
        }
        double k = hx * hy / (4 * Math.PI);
        return (bx * k, by * k, bz * k);
    }

    /// <summary>B of an annular-sector face (radii r1..r2, angles a1..a2 radians, centred on the origin) at height zf, unit Br, polar midpoints.</summary>
    public static (double X, double Y, double Z) Sector(double r1, double r2, double a1, double a2, double zf, double x, double y, double z, int nr, int na)
    {
        double hr = (r2 - r1) / nr, ha = (a2 - a1) / na, bx = 0, by = 0, bz = 0;
        for (int i = 0; i < nr; i++)
        {
            double r = r1 + (i + 0.5) * hr;
            for (int j = 0; j < na; j++)
            {
                double a = a1 + (j + 0.5) * ha;
                double rx = x - r * Math.Cos(a), ry = y - r * Math.Sin(a), rz = z - zf;
                double r2s = rx * rx + ry * ry + rz * rz;
                double inv = r / (r2s * Math.Sqrt(r2s));
                bx += rx * inv; by += ry * inv; bz += rz * inv;
            }
        }
        double k = hr * ha / (4 * Math.PI);
        return (bx * k, by * k, bz * k);
    }
}
