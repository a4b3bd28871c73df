using System.Diagnostics.Contracts;

namespace PartForge.Checks.Mechanics;

/// <summary>
/// Stresses in a thin annular disc spinning about its axis (plane stress), in MPa.
/// Source: Timoshenko &amp; Goodier, Theory of Elasticity, rotating disc of uniform thickness with a central
/// hole: hoop stress at the bore sigma = (3 + nu)/4 rho omega^2 [ b^2 + (1 - nu)/(3 + nu) a^2 ]
/// (a bore radius, b outer radius); the same book's Lame solution for a ring under internal/external
/// pressure gives the rim-load term.
/// </summary>
public static class RotatingDisc
{
    /// <summary>Angular speed, rad/s, of a speed in rpm.</summary>
    [Pure] public static double Omega(double rpm) => rpm * 2 * Math.PI / 60;

    /// <summary>
    /// Hoop stress at the bore from the disc's own mass, MPa. Radii in mm, density kg/m^3.
    /// </summary>
    [Pure]
    public static double BoreHoopStress(double densityKgM3, double poisson, double boreRadiusMm, double outerRadiusMm, double rpm)
    {
        double w = Omega(rpm);
        double a = boreRadiusMm * 1e-3, b = outerRadiusMm * 1e-3;
        double pa = (3 + poisson) / 4 * densityKgM3 * w * w * (b * b + (1 - poisson) / (3 + poisson) * a * a);
        return pa * 1e-6;
    }

    /// <summary>
    /// Hoop stress at the bore caused by a radial outward traction p acting on a circle of radius r (Lame,
    /// annulus a..r loaded on its outer edge): sigma = 2 p r^2 / (r^2 - a^2), MPa. A solid disc (a = 0)
    /// gives p.
    /// </summary>
    [Pure]
    public static double BoreHoopStressFromRimTraction(double tractionMpa, double boreRadiusMm, double loadRadiusMm)
    {
        double r2 = loadRadiusMm * loadRadiusMm, a2 = boreRadiusMm * boreRadiusMm;
        if (a2 <= 0) return tractionMpa;
        return 2 * tractionMpa * r2 / (r2 - a2);
    }

    /// <summary>
    /// The centrifugal load of N bodies of mass m (kg) at radius r (mm), spread as a radial traction on the
    /// cylinder of radius r and height t (mm): p = N m r omega^2 / (2 pi r t), MPa.
    /// </summary>
    [Pure]
    public static double RingTractionOfMasses(int count, double massKg, double radiusMm, double heightMm, double rpm)
    {
        double w = Omega(rpm);
        double forceN = count * massKg * radiusMm * 1e-3 * w * w;
        return forceN / (2 * Math.PI * radiusMm * heightMm);
    }

    /// <summary>Centrifugal force m r omega^2 on a mass (kg) at radius r (mm), N.</summary>
    [Pure]
    public static double CentrifugalForce(double massKg, double radiusMm, double rpm)
    {
        double w = Omega(rpm);
        return massKg * radiusMm * 1e-3 * w * w;
    }
}
