using PartForge.Checks.Mechanics;

namespace PartForge.Checks.Tests.Mechanics;

public class RotatingDiscTests
{
    // Source: Timoshenko & Goodier, Theory of Elasticity (rotating disc with a central hole); worked check in
    // docs/physics.md §7 [calc]: PLA rho 1240, nu 0.35, b 50 mm, a 4 mm: 3000 rpm -> 0.2566 MPa;
    // 10000 rpm -> 2.851 MPa.
    [Theory]
    [InlineData(3000, 0.2566)]
    [InlineData(10000, 2.851)]
    public void Timoshenko_bore_hoop_stress_worked_values(double rpm, double expectedMpa)
    {
        Assert.Equal(expectedMpa, RotatingDisc.BoreHoopStress(1240, 0.35, 4, 50, rpm), 3);
    }

    // Source: the thin rotating ring, sigma = rho v^2 (a textbook limit): a disc whose bore approaches its
    // outer radius tends to (3 + nu)/4 (1 + (1 - nu)/(3 + nu)) = 1 times rho omega^2 b^2.
    [Fact]
    public void Thin_ring_limit_is_rho_v_squared()
    {
        double rpm = 6000, b = 50;
        double v = RotatingDisc.Omega(rpm) * b * 1e-3;
        Assert.Equal(1240 * v * v * 1e-6, RotatingDisc.BoreHoopStress(1240, 0.35, b, b, rpm), 9);
    }

    // Source: Lame's solution (Timoshenko & Goodier): an annulus a..r under external traction p has hoop
    // stress 2 p r^2 / (r^2 - a^2) at the bore; a solid disc has a uniform p.
    [Fact]
    public void Lame_rim_traction()
    {
        Assert.Equal(2 * 1.0 * 2500 / (2500 - 100), RotatingDisc.BoreHoopStressFromRimTraction(1.0, 10, 50), 12);
        Assert.Equal(1.0, RotatingDisc.BoreHoopStressFromRimTraction(1.0, 0, 50), 12);
    }

    [Fact]
    public void Centrifugal_force_is_m_r_omega_squared()
    {
        // 10 g at 40 mm and 3000 rpm: omega = 314.159 rad/s -> 0.01 * 0.04 * 98696 = 39.478 N.
        Assert.Equal(39.478, RotatingDisc.CentrifugalForce(0.01, 40, 3000), 3);
    }
}
