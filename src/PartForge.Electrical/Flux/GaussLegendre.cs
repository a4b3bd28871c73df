using System.Collections.Concurrent;

namespace PartForge.Electrical.Flux;

/// <summary>Gauss-Legendre nodes and weights on [-1, 1] (Newton iteration on P_n), cached per order.</summary>
public static class GaussLegendre
{
    private static readonly ConcurrentDictionary<int, (double[] X, double[] W)> Cache = new();

    /// <summary>Nodes and weights of order n (n &gt;= 1) on [-1, 1], nodes ascending.</summary>
    public static (double[] X, double[] W) Rule(int n) => Cache.GetOrAdd(n, Compute);

    private static (double[] X, double[] W) Compute(int n)
    {
        if (n < 1) throw new ArgumentOutOfRangeException(nameof(n));
        var x = new double[n];
        var w = new double[n];
        for (int i = 0; i < (n + 1) / 2; i++)
        {
            double z = Math.Cos(Math.PI * (i + 0.75) / (n + 0.5));
            double pp = 0;
            for (int it = 0; it < 100; it++)
            {
                double p1 = 1, p2 = 0;
                for (int j = 1; j <= n; j++)
                {
                    double p3 = p2;
                    p2 = p1;
                    p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
                }
                pp = n * (z * p1 - p2) / (z * z - 1);
                double z1 = z;
                z = z1 - p1 / pp;
                if (Math.Abs(z - z1) < 1e-15) break;
            }
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = w[n - 1 - i] = 2 / ((1 - z * z) * pp * pp);
        }
        if (n % 2 == 1) x[n / 2] = 0;
        return (x, w);
    }

    /// <summary>Integral of f over [a, b] with order n.</summary>
    public static double Integrate(Func<double, double> f, double a, double b, int n)
    {
        var (x, w) = Rule(n);
        double h = (b - a) / 2, m = (a + b) / 2, s = 0;
        for (int i = 0; i < n; i++) s += w[i] * f(m + h * x[i]);
        return s * h;
    }

    /// <summary>
    /// Nodes and weights for [a, b] split at the given breakpoints, each piece mapped through the smoothstep
    /// r = a + (b - a)(3t^2 - 2t^3), which clusters nodes at both ends of every piece and turns square-root
    /// end behaviour (a circle's width near its tangent) into a smooth integrand.
    /// </summary>
    public static (double[] X, double[] W) Composite(IReadOnlyList<double> breakpoints, int order, bool cluster)
    {
        var (gx, gw) = Rule(order);
        var xs = new List<double>();
        var ws = new List<double>();
        for (int p = 0; p + 1 < breakpoints.Count; p++)
        {
            double a = breakpoints[p], b = breakpoints[p + 1];
            if (!(b > a)) continue;
            for (int i = 0; i < order; i++)
            {
                double t = 0.5 * (gx[i] + 1), wt = 0.5 * gw[i];
                if (cluster)
                {
                    xs.Add(a + (b - a) * (3 * t * t - 2 * t * t * t));
                    ws.Add(wt * (b - a) * 6 * t * (1 - t));
                }
                else
                {
                    xs.Add(a + (b - a) * t);
                    ws.Add(wt * (b - a));
                }
            }
        }
        return (xs.ToArray(), ws.ToArray());
    }
}
