using System.Collections.Concurrent;
using System.Numerics;

namespace PartForge.Electrical.Flux;

/// <summary>
/// Evaluates Re[Sum_i K_i exp(i n_i theta_e)] on equally spaced electrical angles with cached cosine and
/// sine tables (the hot path of the EMF, peak and drive calculations).
/// </summary>
public static class HarmonicSynth
{
    private static readonly ConcurrentDictionary<(int, string), (double[] Cos, double[] Sin)> Tables = new();

    /// <summary>The waveform at <paramref name="samples"/> angles 360 i / samples, i = 0..samples-1.</summary>
    public static double[] Sample(IReadOnlyList<Complex> k, IReadOnlyList<int> orders, int samples)
    {
        var (c, s) = Table(orders, samples);
        int nh = orders.Count;
        var r = new double[samples];
        for (int i = 0; i < samples; i++)
        {
            double v = 0;
            int b = i * nh;
            for (int h = 0; h < nh; h++) v += k[h].Real * c[b + h] - k[h].Imaginary * s[b + h];
            r[i] = v;
        }
        return r;
    }

    /// <summary>Largest |value| of the waveform: sampled at 720 points, then refined by golden-section search around the best sample.</summary>
    public static double Peak(IReadOnlyList<Complex> k, IReadOnlyList<int> orders)
    {
        const int n = 720;
        var w = Sample(k, orders, n);
        int best = 0;
        for (int i = 1; i < n; i++) if (Math.Abs(w[i]) > Math.Abs(w[best])) best = i;
        double At(double deg)
        {
            double t = deg * Math.PI / 180, v = 0;
            for (int h = 0; h < orders.Count; h++) v += k[h].Real * Math.Cos(orders[h] * t) - k[h].Imaginary * Math.Sin(orders[h] * t);
            return Math.Abs(v);
        }
        double step = 360.0 / n, a = (best - 1) * step, b = (best + 1) * step;
        double g = (Math.Sqrt(5) - 1) / 2;
        double x1 = b - g * (b - a), x2 = a + g * (b - a), f1 = At(x1), f2 = At(x2);
        for (int it = 0; it < 30; it++)
        {
            if (f1 > f2) { b = x2; x2 = x1; f2 = f1; x1 = b - g * (b - a); f1 = At(x1); }
            else { a = x1; x1 = x2; f1 = f2; x2 = a + g * (b - a); f2 = At(x2); }
        }
        return Math.Max(Math.Abs(w[best]), Math.Max(f1, f2));
    }

    private static (double[] Cos, double[] Sin) Table(IReadOnlyList<int> orders, int samples)
    {
        string key = string.Join(",", orders);
        return Tables.GetOrAdd((samples, key), _ =>
        {
            int nh = orders.Count;
            var c = new double[samples * nh];
            var s = new double[samples * nh];
            for (int i = 0; i < samples; i++)
                for (int h = 0; h < nh; h++)
                {
                    double a = 2 * Math.PI * orders[h] * (double)i / samples;
                    c[i * nh + h] = Math.Cos(a);
                    s[i * nh + h] = Math.Sin(a);
                }
            return (c, s);
        });
    }
}
