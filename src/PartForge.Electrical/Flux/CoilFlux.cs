using PartForge.Electrical.Coils;
using PartForge.Electrical.Field;
using PartForge.Geometry.Primitives;

namespace PartForge.Electrical.Flux;

/// <summary>
/// Flux linkage of one coil from the rotor field.
///
/// Method. With a uniform distribution of the turns over the winding's cross-section, the turn at distance s
/// (0..build) outside the window and at height z links the flux of Bz(z) through the window grown by s. So
/// lambda / N = (1/h) Int dz Int w(x) Bz(x, z) dA, with the weight w = 1 inside the window and
/// w = 1 - t/build at distance t outside it (the fraction of turns that enclose the point).
/// In polar coordinates (r, phi) about the machine axis the rotor field is expanded in its odd electrical
/// harmonics, Bz(r, phi - theta, z) = Sum a_n(r, z) cos(n p (phi - theta)), with a_n from 72 (by default)
/// samples per electrical period folded by the even and half-wave symmetries; then
/// lambda(theta) = Sum_n C_n cos(n p theta), C_n = (N/h) Int dz Int r dr a_n(r, z) W_n(r), and
/// W_n(r) = Int w(r, phi) cos(n p phi) dphi is pure coil geometry (exact sin term over the window, Gauss over
/// the build). Radially: composite Gauss-Legendre between the coil's, window's and magnets' edges, with
/// end-clustered nodes; axially: Gauss-Legendre over the copper. For a dual-rotor machine the symmetric
/// half of the sources is integrated over the symmetric copper and doubled.
/// </summary>
public static class CoilFlux
{
    /// <summary>Smallest axial distance between the copper slab and any source, mm.</summary>
    private static double NearestSourceDistance(RotorField field)
    {
        double best = double.MaxValue;
        foreach (var s in field.Sources)
        {
            double d = s.ZMinMm >= field.CopperZMaxMm ? s.ZMinMm - field.CopperZMaxMm
                : s.ZMaxMm <= field.CopperZMinMm ? field.CopperZMinMm - s.ZMaxMm : 0;
            best = Math.Min(best, d);
        }
        return best == double.MaxValue ? 1 : best;
    }

    /// <summary>The flux linkage series of coil 0 with <paramref name="turns"/> turns.</summary>
    public static FluxLinkageSeries Compute(RotorField field, CoilOutline outline, int turns, FluxQuadrature q)
    {
        int p = field.FieldPeriods;
        int m = q.SamplesPerPeriod;
        int quarter = m / 4;
        bool halfWave = field.HalfWaveSymmetric;
        // Alternating magnets: odd orders, samples over a quarter period (even and half-wave symmetry). Same-pole
        // magnets: orders 0 (the steady part) .. quarter - 1, samples over half a period (even symmetry only).
        var orders = halfWave ? Enumerable.Range(0, quarter).Select(i => 2 * i + 1).ToArray() : Enumerable.Range(0, quarter).ToArray();
        int nSamples = halfWave ? quarter : m / 2 + 1;

        // Radial pieces.
        double rMin = Math.Max(1e-9, outline.OuterMinRadiusMm), rMax = outline.OuterMaxRadiusMm;
        var breaks = new List<double> { rMin, rMax, outline.WindowMinRadiusMm, outline.WindowMaxRadiusMm };
        if (field.Sources.Count > 0)
        {
            var g = field.Sources[0].Shape;
            // The magnet's radial edges along its centre line (a block's corner radius is not an edge of the field).
            breaks.Add(g.PitchRadiusMm - g.RadialLengthMm / 2);
            breaks.Add(g.PitchRadiusMm + g.RadialLengthMm / 2);
        }
        var bp = breaks.Where(b => b >= rMin && b <= rMax).OrderBy(b => b).ToList();
        var merged = new List<double>();
        foreach (var b in bp) if (merged.Count == 0 || b - merged[^1] > 1e-6 * (rMax - rMin + 1)) merged.Add(b);
        if (merged[^1] < rMax) merged[^1] = rMax;
        // Pieces no longer than MaxPieceGaps x the axial distance from the magnets to the copper's near face:
        // the field varies over about that length near the magnets' edges.
        double nearGap = Math.Max(0.5, NearestSourceDistance(field));
        double maxPiece = q.MaxPieceGaps * nearGap;
        var refined = new List<double> { merged[0] };
        for (int i = 1; i < merged.Count; i++)
        {
            double a = merged[i - 1], b = merged[i];
            int parts = Math.Max(1, (int)Math.Ceiling((b - a) / maxPiece - 1e-9));
            for (int j = 1; j <= parts; j++) refined.Add(a + (b - a) * j / parts);
        }
        merged = refined;
        var (rs, rw) = GaussLegendre.Composite(merged, q.RadialOrder, cluster: true);

        // Axial nodes.
        var sources = field.HalfSources ?? field.Sources;
        double factor = field.HalfSources is null ? 1 : 2;
        double z0 = field.CopperZMinMm, z1 = field.CopperZMaxMm, h = z1 - z0;
        var (gz, gzw) = GaussLegendre.Rule(q.AxialOrder);

        // Geometry weights W_n(r).
        int nh = orders.Length;
        double build = outline.RadialBuildMm;
        var (ga, gaw) = GaussLegendre.Rule(q.AngularOrder);
        var wn = new double[rs.Length, nh];
        for (int j = 0; j < rs.Length; j++)
        {
            double r = rs[j];
            double? endDeg = outline.HalfAngleDegAt(r, build);
            if (endDeg is null) continue;
            double? winDeg = outline.HalfAngleDegAt(r, 0);
            double a0 = (winDeg ?? 0) * Math.PI / 180, a1 = endDeg.Value * Math.PI / 180;
            for (int k = 0; k < nh; k++)
            {
                double kk = orders[k] * p;
                double s = winDeg is null ? 0 : kk == 0 ? a0 : Math.Sin(kk * a0) / kk;
                wn[j, k] = 2 * s;
            }
            if (a1 > a0 && build > 0)
            {
                double half = (a1 - a0) / 2, mid = (a1 + a0) / 2;
                for (int i = 0; i < ga.Length; i++)
                {
                    double phi = mid + half * ga[i];
                    double t = outline.DistanceToWindowMm(new Vec2(r * Math.Cos(phi), r * Math.Sin(phi)));
                    double w = Math.Max(0, 1 - t / build) * gaw[i] * half * 2;
                    if (w == 0) continue;
                    for (int k = 0; k < nh; k++) wn[j, k] += w * Math.Cos(orders[k] * p * phi);
                }
            }
        }

        // Field harmonics along each circle.
        // Fold weights: a_n = (4/M) Sum_{s<M/4} w_s f_s cos(...) (half-wave), a_n = (2/M) Sum_{s<=M/2} w_s f_s cos(...)
        // (even only), w_s = 1 at the ends of the folded range and 2 inside; the steady part a_0 takes 1/M.
        var cosTab = new double[nh, nSamples];
        for (int k = 0; k < nh; k++)
            for (int s = 0; s < nSamples; s++)
            {
                double ws = s == 0 || (!halfWave && s == m / 2) ? 1 : 2;
                cosTab[k, s] = Math.Cos(2 * Math.PI * orders[k] * s / m) * ws;
            }
        var norm = orders.Select(n => halfWave ? 4.0 / m : n == 0 ? 1.0 / m : 2.0 / m).ToArray();
        var cs = new double[nSamples];
        var sn = new double[nSamples];
        for (int s = 0; s < nSamples; s++)
        {
            double phi = 2 * Math.PI * s / m / p;
            cs[s] = Math.Cos(phi);
            sn[s] = Math.Sin(phi);
        }
        var coef = new double[nh];
        var f = new double[nSamples];
        for (int l = 0; l < gz.Length; l++)
        {
            double z = 0.5 * (z0 + z1) + 0.5 * h * gz[l];
            double wz = 0.5 * h * gzw[l];
            for (int j = 0; j < rs.Length; j++)
            {
                double r = rs[j];
                bool any = false;
                for (int k = 0; k < nh; k++) if (wn[j, k] != 0) { any = true; break; }
                if (!any) continue;
                for (int s = 0; s < nSamples; s++)
                {
                    double x = r * cs[s], y = r * sn[s], b = 0;
                    for (int i = 0; i < sources.Count; i++) b += sources[i].Bz(x, y, z);
                    f[s] = b;
                }
                double wgt = wz * rw[j] * r;
                for (int k = 0; k < nh; k++)
                {
                    double a = 0;
                    for (int s = 0; s < nSamples; s++) a += cosTab[k, s] * f[s];
                    a *= norm[k];
                    coef[k] += wgt * a * wn[j, k];
                }
            }
        }
        double scale = factor * turns / h * 1e-6; // T mm^2 -> Wb
        if (halfWave)
            return new FluxLinkageSeries { PolePairs = p, Orders = orders, CoefficientsWb = coef.Select(c => c * scale).ToArray() };
        return new FluxLinkageSeries
        {
            PolePairs = p,
            Orders = orders.Skip(1).ToArray(),
            CoefficientsWb = coef.Skip(1).Select(c => c * scale).ToArray(),
            OffsetWb = coef[0] * scale,
        };
    }
}
