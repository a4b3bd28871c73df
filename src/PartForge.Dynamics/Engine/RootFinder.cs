namespace PartForge.Dynamics.Engine;

/// <summary>
/// Locates where a continuous function of the step fraction s crosses to its "past" side (value below zero, or
/// at or below zero when inclusive) between a point before (a) and a point past (b): the Illinois variant of
/// false position (Dowell and Jarratt 1971), always bracketing. Returns a point on the past side within
/// <see cref="Tolerance"/> of the crossing.
/// </summary>
internal static class RootFinder
{
    /// <summary>Bracket width, in step fractions, at which the search stops.</summary>
    public const double Tolerance = 1e-13;

    public static double Locate(Func<double, double> f, bool inclusive, double a, double fa, double b, double fb)
    {
        int side = 0;
        for (int it = 0; it < 200 && b - a > Tolerance; it++)
        {
            double s = fa != fb ? b - fb * (b - a) / (fb - fa) : 0.5 * (a + b);
            // Keep the trial strictly inside and away from the ends (bisection guard).
            double lo = a + 0.01 * (b - a), hi = b - 0.01 * (b - a);
            if (!(s > lo && s < hi)) s = 0.5 * (a + b);
            double fs = f(s);
            bool past = inclusive ? fs <= 0 : fs < 0;
            if (past)
            {
                b = s; fb = fs;
                if (side == -1) fa *= 0.5;
                side = -1;
            }
            else
            {
                a = s; fa = fs;
                if (side == 1) fb *= 0.5;
                side = 1;
            }
        }
        return b;
    }
}
