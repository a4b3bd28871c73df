namespace PartForge.Electrical.Field;

/// <summary>
/// Field of a uniformly magnetised cylinder (axially, +z, remanence Br, mu_r = 1) anywhere outside it: the
/// finite solenoid of Derby and Olbert (Am. J. Phys. 78(3) 229, 2010) with surface current Br/mu0, written
/// with Bulirsch's cel. Radius a, half-length b, origin at the centre, B0 = Br/pi, z+- = z +- b,
/// D+- = sqrt(z+-^2 + (rho+a)^2), alpha+- = a/D+-, beta+- = z+-/D+-, gamma = (a-rho)/(a+rho),
/// k+- = sqrt((z+-^2+(a-rho)^2)/(z+-^2+(a+rho)^2)):
/// B_rho = B0 [alpha+ C(k+,1,1,-1) - alpha- C(k-,1,1,-1)],
/// B_z = B0 a/(a+rho) [beta+ C(k+,gamma^2,1,gamma) - beta- C(k-,gamma^2,1,gamma)].
/// (In the paper z+ is measured from the end at -b, i.e. z+ = z + b.)
/// </summary>
public static class CylinderField
{
    /// <summary>(B_rho, B_z), tesla, at radial distance rho and axial position z (mm, from the centre).</summary>
    public static (double BRho, double Bz) B(double brTesla, double radiusMm, double halfLengthMm, double rho, double z)
    {
        double a = radiusMm, b0 = brTesla / Math.PI;
        double zp = z + halfLengthMm, zm = z - halfLengthMm;
        double apr = a + rho, amr = a - rho;
        double dp = Math.Sqrt(zp * zp + apr * apr), dm = Math.Sqrt(zm * zm + apr * apr);
        double kp = Math.Sqrt((zp * zp + amr * amr) / (zp * zp + apr * apr));
        double km = Math.Sqrt((zm * zm + amr * amr) / (zm * zm + apr * apr));
        double gamma = amr / apr;
        double g2 = gamma * gamma;
        double brho = b0 * (a / dp * Bulirsch.Cel(kp, 1, 1, -1) - a / dm * Bulirsch.Cel(km, 1, 1, -1));
        double bz = b0 * a / apr * (zp / dp * Bulirsch.Cel(kp, g2, 1, gamma) - zm / dm * Bulirsch.Cel(km, g2, 1, gamma));
        return (brho, bz);
    }

    /// <summary>B_z only, tesla.</summary>
    public static double Bz(double brTesla, double radiusMm, double halfLengthMm, double rho, double z)
    {
        double a = radiusMm;
        double zp = z + halfLengthMm, zm = z - halfLengthMm;
        double apr = a + rho, amr = a - rho;
        double apr2 = apr * apr, amr2 = amr * amr;
        double dp2 = zp * zp + apr2, dm2 = zm * zm + apr2;
        double dp = Math.Sqrt(dp2), dm = Math.Sqrt(dm2);
        double kp = Math.Sqrt((zp * zp + amr2) / dp2);
        double km = Math.Sqrt((zm * zm + amr2) / dm2);
        double gamma = amr / apr;
        double g2 = gamma * gamma;
        return brTesla / Math.PI * a / apr * (zp / dp * Bulirsch.Cel(kp, g2, 1, gamma) - zm / dm * Bulirsch.Cel(km, g2, 1, gamma));
    }
}
