using PartForge.Electrical.Flux;

namespace PartForge.Electrical.Field;

/// <summary>
/// Solid angle of a uniformly charged annular-sector face (radii r1..r2, angles -a..a about +x, in the plane
/// z = zf) for points not close to it: the radial integral is done in closed form,
/// Int_r1^r2 h r' dr' / (r'^2 - 2 r r' c + r^2 + h^2)^(3/2) = h [-1/sqrt(u^2+A) + r c u / (A sqrt(u^2+A))]_(u1)^(u2)
/// with c = cos(phi - phi'), u = r' - r c, A = r^2 (1 - c^2) + h^2; the angular one by Gauss-Legendre. Used
/// for the arc magnets' faces away from the point where the integrand is smooth (the polygon model takes over
/// near the magnet).
/// </summary>
public static class SectorFaceField
{
    /// <summary>Signed solid angle (positive above the face) seen from (x, y, z), with an n-point angular rule.</summary>
    public static double SolidAngle(double r1, double r2, double halfAngleRad, double zf, double x, double y, double z, int n)
    {
        var (gx, gw) = GaussLegendre.Rule(n);
        double h = z - zf;
        double r = Math.Sqrt(x * x + y * y), phi = Math.Atan2(y, x);
        double sum = 0;
        for (int i = 0; i < n; i++)
        {
            double ph = halfAngleRad * gx[i];
            double c = Math.Cos(phi - ph);
            double a = r * r * (1 - c * c) + h * h;
            if (a < 1e-18) continue;
            double rc = r * c;
            double u1 = r1 - rc, u2 = r2 - rc;
            double s1 = Math.Sqrt(u1 * u1 + a), s2 = Math.Sqrt(u2 * u2 + a);
            double f2 = -1 / s2 + rc * u2 / (a * s2);
            double f1 = -1 / s1 + rc * u1 / (a * s1);
            sum += gw[i] * (f2 - f1);
        }
        return h * sum * halfAngleRad;
    }

    /// <summary>
    /// Signed solid angle for points at any distance: the angular rule is split at the point's own angle
    /// (clamped to the span) and graded geometrically towards it down to pieces of about |h| / r radians, where
    /// the integrand peaks; Gauss-Legendre of <paramref name="order"/> points on each piece.
    /// </summary>
    public static double SolidAngleGraded(double r1, double r2, double halfAngleRad, double zf, double x, double y, double z, int order = 6)
    {
        double h = z - zf;
        if (h == 0) return 0; // in the face plane: 0 outside the face, the principal value on it
        double r = Math.Sqrt(x * x + y * y), phi = Math.Atan2(y, x);
        double pc = Math.Clamp(phi, -halfAngleRad, halfAngleRad);
        // Distance from the point's foot to the face, used for the finest piece.
        double near = Math.Max(Math.Abs(h), r1 > 0 && r < r1 ? r1 - r : r > r2 ? r - r2 : 0);
        double finest = Math.Max(near / Math.Max(r, 1e-9), 1e-6) / 2;
        var (gx, gw) = GaussLegendre.Rule(order);
        double total = 0;
        void Piece(double a, double b)
        {
            if (!(b > a)) return;
            double hw = (b - a) / 2, mid = (a + b) / 2, s = 0;
            for (int i = 0; i < order; i++)
            {
                double ph = mid + hw * gx[i];
                double c = Math.Cos(phi - ph);
                double aa = r * r * (1 - c * c) + h * h;
                double rc = r * c;
                double u1 = r1 - rc, u2 = r2 - rc;
                double s1 = Math.Sqrt(u1 * u1 + aa), s2 = Math.Sqrt(u2 * u2 + aa);
                s += gw[i] * ((-1 / s2 + rc * u2 / (aa * s2)) - (-1 / s1 + rc * u1 / (aa * s1)));
            }
            total += s * hw;
        }
        void Side(double from, double to)
        {
            // from = the peak end; pieces double in length away from it.
            double len = Math.Abs(to - from), dir = Math.Sign(to - from);
            double t = 0, step = finest;
            while (t < len)
            {
                double t1 = Math.Min(len, t + step);
                if (len - t1 < step) t1 = len;
                double a = from + dir * t, b = from + dir * t1;
                Piece(Math.Min(a, b), Math.Max(a, b));
                t = t1;
                step *= 2;
            }
        }
        Side(pc, halfAngleRad);
        Side(pc, -halfAngleRad);
        return h * total;
    }
}
