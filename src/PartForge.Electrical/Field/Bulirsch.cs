namespace PartForge.Electrical.Field;

/// <summary>
/// Bulirsch's general complete elliptic integral (Numer. Math. 13, 1969), in the form used by Derby and
/// Olbert (Am. J. Phys. 78(3), 2010):
/// cel(kc, p, c, s) = integral_0^(pi/2) (c cos^2 + s sin^2) / ((cos^2 + p sin^2) sqrt(cos^2 + kc^2 sin^2)) dphi.
/// The iteration is an arithmetic-geometric mean: it converges quadratically.
/// </summary>
public static class Bulirsch
{
    /// <summary>cel(kc, p, c, s); kc must be non-zero (the integral diverges at kc = 0, returns +infinity there).</summary>
    public static double Cel(double kc, double p, double c, double s)
    {
        if (kc == 0) return double.PositiveInfinity;
        const double errtol = 1e-12;
        double k = Math.Abs(kc);
        double em = 1.0;
        double pp, cc = c, ss = s;
        if (p > 0)
        {
            pp = Math.Sqrt(p);
            ss = s / pp;
        }
        else
        {
            double f0 = kc * kc;
            double q0 = 1.0 - f0;
            double g0 = 1.0 - p;
            f0 -= p;
            q0 *= ss - c * p;
            pp = Math.Sqrt(f0 / g0);
            cc = (c - ss) / g0;
            ss = -q0 / (g0 * g0 * pp) + cc * pp;
        }
        double f = cc;
        cc += ss / pp;
        double g = k / pp;
        ss = 2 * (ss + f * g);
        pp = g + pp;
        g = em;
        em = k + em;
        double kk = k;
        for (int it = 0; it < 60 && Math.Abs(g - k) > g * errtol; it++)
        {
            k = 2 * Math.Sqrt(kk);
            kk = k * em;
            f = cc;
            cc += ss / pp;
            g = kk / pp;
            ss = 2 * (ss + f * g);
            pp = g + pp;
            g = em;
            em = k + em;
        }
        return Math.PI / 2 * (ss + cc * em) / (em * (em + pp));
    }
}
