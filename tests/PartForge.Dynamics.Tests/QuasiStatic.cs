namespace PartForge.Dynamics.Tests;

/// <summary>
/// An independent quasi-static (L -> 0) model of the drives, written here from circuit theory and not from the
/// engine: at each angle the current is the one Ohm's law and the diode/switch conduction conditions allow, the
/// torque i d lambda/d theta uses a numerical derivative of lambda, and the revolution mean comes from a
/// composite Simpson rule with the window edges as breakpoints.
/// </summary>
internal static class QuasiStatic
{
    /// <summary>Central-difference d lambda / d theta (independent of the series' own slope).</summary>
    public static double Slope(FluxSeries f, double theta)
    {
        const double d = 1e-5;
        return (f.LinkageWb(theta + d) - f.LinkageWb(theta - d)) / (2 * d);
    }

    /// <summary>Unipolar circuit: switch closed (V - Vsw across coil and on-resistance) or flyback diode (-Vd).</summary>
    public static double Unipolar(int cmd, double e, double v, double vsw, double ron, double r, double? vd)
    {
        if (cmd == 1) return Math.Max(0, (v - vsw - e) / (r + ron));
        return vd is double d ? Math.Max(0, (-d - e) / r) : 0;
    }

    /// <summary>
    /// H-bridge: +V through two switches (or, for reverse current, back through two diodes to +V), -V likewise,
    /// off: the four diodes rectify into the supply. Dead bands where no path conducts give zero current.
    /// </summary>
    public static double Bipolar(int cmd, double e, double v, double vsw, double ron, double r, double? vd)
    {
        double swPos = (v - 2 * vsw - e) / (r + 2 * ron), swNeg = (-v + 2 * vsw - e) / (r + 2 * ron);
        if (cmd == 1 && swPos > 0) return swPos;
        if (cmd == -1 && swNeg < 0) return swNeg;
        if (vd is not double d) return 0;
        // Diode paths: positive current returns through the bridge against -V, negative against +V.
        double dPos = (-v - 2 * d - e) / r, dNeg = (v + 2 * d - e) / r;
        if (cmd != 1 && dPos > 0) return dPos;
        if (cmd != -1 && dNeg < 0) return dNeg;
        return 0;
    }

    /// <summary>Command of a window list at angle theta (rad), by its definition [on, off) in degrees.</summary>
    public static int Command(IReadOnlyList<ConductionWindow> windows, double theta)
    {
        double deg = (theta * 180 / Math.PI) % 360;
        if (deg < 0) deg += 360;
        foreach (var w in windows)
        {
            bool inside = w.OnDeg < w.OffDeg ? deg >= w.OnDeg && deg < w.OffDeg : deg >= w.OnDeg || deg < w.OffDeg;
            if (inside) return w.Sign;
        }
        return 0;
    }

    /// <summary>Mean of f over one revolution: Simpson on each piece between the breakpoints (degrees).</summary>
    public static double RevolutionMean(Func<double, double> f, IEnumerable<double> breakDeg, int perPiece = 400)
    {
        var b = breakDeg.Select(x => x * Math.PI / 180).Append(0).Append(2 * Math.PI).Distinct().Order().ToArray();
        double sum = 0;
        for (int p = 0; p + 1 < b.Length; p++)
        {
            double a = b[p], c = b[p + 1], h = (c - a) / perPiece;
            // Evaluate just inside the piece so that [on, off) edges are taken from the right side.
            double eps = 1e-12;
            double s = f(a + eps) + f(c - eps);
            for (int i = 1; i < perPiece; i++) s += (i % 2 == 1 ? 4 : 2) * f(a + i * h);
            sum += s * h / 3;
        }
        return sum / (2 * Math.PI);
    }

    /// <summary>A root of g in [lo, hi] by bisection (g(lo) and g(hi) of opposite sign).</summary>
    public static double Root(Func<double, double> g, double lo, double hi)
    {
        double glo = g(lo);
        Assert.True(glo * g(hi) < 0, "no sign change");
        for (int i = 0; i < 60 && hi - lo > 1e-13 * hi; i++)
        {
            double mid = 0.5 * (lo + hi), gm = g(mid);
            if (gm * glo > 0) { lo = mid; glo = gm; } else hi = mid;
        }
        return 0.5 * (lo + hi);
    }
}
