using PartForge.Electrical.Coils;
using PartForge.Geometry.Primitives;

namespace PartForge.Electrical.Tests.Coils;

/// <summary>
/// Keystone coil inductance against the filament method written here: the winding's cross-section split into
/// 6 x 6 filaments (each a closed turn at its own offset from the window and its own height, traced here), and
/// L = (N / 36)^2 sum over all filament pairs of Neumann's mutual-inductance integral mu0/4pi oint oint dl.dl'/R;
/// a filament's own term uses the geometric mean distance of its small cell, 0.2235 (w + h).
/// Source: Neumann's formula (e.g. Grover, Inductance Calculations, 1946; Jackson 3rd ed. problem 5.32);
/// Maxwell's GMD of a rectangle (Grover, from memory).
/// </summary>
public class KeystoneInductanceTests
{
    private static Vec2[] Loop(CoilOutline o, double offset, int n)
    {
        // Rays from the window's middle; the distance-to-window level set at the offset, by bisection.
        double cx = (o.WindowMinRadiusMm + o.WindowMaxRadiusMm) / 2;
        var pts = new Vec2[n];
        for (int k = 0; k < n; k++)
        {
            double a = 2 * Math.PI * (k + 0.25) / n, lo = 0, hi = 500;
            while (hi - lo > 1e-9)
            {
                double m = (lo + hi) / 2;
                if (o.DistanceToWindowMm(new Vec2(cx + m * Math.Cos(a), m * Math.Sin(a))) <= offset) lo = m; else hi = m;
            }
            pts[k] = new Vec2(cx + lo * Math.Cos(a), lo * Math.Sin(a));
        }
        return pts;
    }

    private static double Neumann(Vec2[] a, Vec2[] b, double dz)
    {
        double s = 0;
        for (int i = 0; i < a.Length; i++)
        {
            Vec2 p0 = a[i], p1 = a[(i + 1) % a.Length], pm = (p0 + p1) * 0.5, dl = p1 - p0;
            for (int j = 0; j < b.Length; j++)
            {
                Vec2 q0 = b[j], q1 = b[(j + 1) % b.Length], qm = (q0 + q1) * 0.5, dm = q1 - q0;
                double r = Math.Sqrt((pm - qm).Dot(pm - qm) + dz * dz);
                s += dl.Dot(dm) / r;
            }
        }
        return 1e-7 * s * 1e-3; // H
    }

    [Theory]
    [InlineData(60, 6, 6, 20, 4.0, 60)]   // wind-duo-like: pitch radius 60, height 6, core 6, radial 20
    [InlineData(40, 5, 8, 12, 3.0, 120)]
    [InlineData(110, 8, 10, 30, 6.0, 60)]
    public void WithinThreePercentOfTheFilamentIntegral(double pitch, double height, double core, double radial, double build, int turns)
    {
        var o = CoilOutline.Keystone(pitch, height, core, radial, build);
        int nf = 6, seg = 160;
        var loops = Enumerable.Range(0, nf).Select(i => Loop(o, (i + 0.5) * build / nf, seg)).ToArray();
        double cellGmd = 0.2235 * (build / nf + height / nf);
        double sum = 0;
        for (int i = 0; i < nf; i++)
            for (int k = 0; k < nf; k++)
            {
                // Height pairs: the mutual inductance depends only on |z_j - z_l|.
                double[] byDz = new double[nf];
                for (int d = 0; d < nf; d++)
                    byDz[d] = Neumann(loops[i], loops[k], d == 0 && i == k ? cellGmd : d * height / nf);
                for (int j = 0; j < nf; j++)
                    for (int l = 0; l < nf; l++) sum += byDz[Math.Abs(j - l)];
            }
        double exactUh = sum * Math.Pow((double)turns / (nf * nf), 2) * 1e6;
        double model = CoilInductance.KeystoneMicrohenry(o, height, build, turns);
        Assert.InRange(model, 0.97 * exactUh, 1.03 * exactUh);
        // The old estimate (Wheeler with the circle of the mean turn's perimeter) was well above it.
        double wheeler = CoilInductance.WheelerMicrohenry(o.TurnPerimeterMm(build / 2) / (2 * Math.PI), height, build, turns);
        Assert.True(wheeler > 1.05 * exactUh, $"Wheeler {wheeler} vs {exactUh}");
    }
}
