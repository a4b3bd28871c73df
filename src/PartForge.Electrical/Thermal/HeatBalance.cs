namespace PartForge.Electrical.Thermal;

/// <summary>
/// The steady temperature of a body that sheds its heat through a thermal resistance to air at a fixed temperature while
/// its heat depends on its temperature (a winding whose resistance rises with it): the root of
/// g(T) = T - T_air - R_th P(T) at or above T_air. g(T_air) = -R_th P(T_air) is at most 0, and every loss this project
/// feeds in is bounded, so a root lies in a bracket found by doubling; it is found by false position with the Illinois
/// modification (a bracketing method: it cannot run away), to 1e-6 K.
/// </summary>
public static class HeatBalance
{
    /// <summary>Temperature tolerance of the solution, K.</summary>
    public const double ToleranceK = 1e-6;

    /// <summary>Solves for the steady temperature; returns it, the heat at it, and how many times the heat was evaluated.</summary>
    public static (double TemperatureC, double HeatW, int Evaluations) Solve(double airC, double resistanceKPerW, Func<double, double> heatAtW)
    {
        ArgumentNullException.ThrowIfNull(heatAtW);
        int n = 0;
        double G(double t) { n++; return t - airC - resistanceKPerW * Math.Max(0, heatAtW(t)); }
        double lo = airC, glo = G(lo);
        if (!(glo < 0) || !(resistanceKPerW > 0)) return (airC, Math.Max(0, heatAtW(airC)), n);
        double span = Math.Max(1, -2 * glo), hi = airC + span, ghi = G(hi);
        while (ghi < 0 && span < 1e7) { lo = hi; glo = ghi; span *= 2; hi = airC + span; ghi = G(hi); }
        if (ghi < 0) return (hi, Math.Max(0, heatAtW(hi)), n); // not reached for a bounded heat; kept finite
        int side = 0;
        for (int it = 0; it < 200 && hi - lo > ToleranceK; it++)
        {
            double t = (lo * ghi - hi * glo) / (ghi - glo);
            if (!(t > lo && t < hi)) t = 0.5 * (lo + hi);
            double gt = G(t);
            if (gt == 0) { lo = hi = t; break; }
            if (gt < 0)
            {
                lo = t; glo = gt;
                if (side == -1) ghi /= 2;
                side = -1;
            }
            else
            {
                hi = t; ghi = gt;
                if (side == 1) glo /= 2;
                side = 1;
            }
        }
        double temp = 0.5 * (lo + hi);
        return (temp, Math.Max(0, heatAtW(temp)), n);
    }
}
