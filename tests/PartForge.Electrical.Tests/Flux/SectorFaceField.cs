namespace PartForge.Electrical.Tests.Flux;

/// <summary>
/// The independent field integration the sector-magnet flux tests share: Bz of one trapezoidal pole face by the
/// surface-charge model (Coulomb's law over the face) on composite Gauss-Legendre rules.
/// </summary>
internal static class SectorFaceField
{
    // Source: Gauss-Legendre 4-point nodes and weights on [-1, 1] (Abramowitz and Stegun, Handbook of
    // Mathematical Functions, table 25.4).
    public static readonly double[] X4 = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
    public static readonly double[] W4 = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];

    /// <summary>Composite 4-point Gauss nodes and weights on [a, b] in n equal cells.</summary>
    public static (double X, double W)[] Rule(double a, double b, int n)
    {
        var r = new List<(double, double)>();
        double h = (b - a) / n;
        for (int c = 0; c < n; c++)
            for (int i = 0; i < 4; i++) r.Add((a + h * (c + 0.5 + X4[i] / 2), W4[i] * h / 2));
        return r.ToArray();
    }

    /// <summary>Bz at (x, y, z) of a trapezoid face (magnet 0's frame: inner edge at xi, widths wi..wo, length l) at height zf,
    /// unit charge: Br/(4 pi) Int (z - zf)/|R|^3 dA over the face, mapped from the unit square.</summary>
    public static double FaceBz(double xi, double wi, double wo, double l, double zf, double x, double y, double z, (double X, double W)[] s, (double X, double W)[] t)
    {
        double sum = 0, dz = z - zf;
        foreach (var (u, wu) in s)
        {
            double w = wi + (wo - wi) * u, px = xi + l * u;
            foreach (var (v, wv) in t)
            {
                double py = (v - 0.5) * w;
                double rx = x - px, ry = y - py;
                double r2 = rx * rx + ry * ry + dz * dz;
                sum += wu * wv * l * w * dz / (r2 * Math.Sqrt(r2));
            }
        }
        return sum / (4 * Math.PI);
    }
}
