using PartForge.Checks.Mechanics;

namespace PartForge.Checks.Tests.Mechanics;

public class AnnularPlateTests
{
    // Source: Roark's Formulas for Stress and Strain, 7th ed., Table 11.2, case 1j (annular plate, inner edge
    // fixed, outer edge free, ring load); worked check in docs/physics.md §7 [calc]: PLA E 3.5 GPa,
    // nu 0.35, t 3, a 50, b 10, 20 N at the rim -> y_a = -0.1745 mm, M_rb = -5.748 N m/m, sigma 3.83 MPa.
    [Fact]
    public void Roark_case_1j_worked_check_is_reproduced()
    {
        double y = AnnularPlate.RimDeflectionRingLoad(20, 50, 50, 10, 3500, 0.35, 3);
        Assert.Equal(-0.1745, y, 4);
        double m = AnnularPlate.RootMomentRingLoad(20, 50, 50, 10, 0.35);
        Assert.Equal(-5.748, m, 3);
        Assert.Equal(3.83, AnnularPlate.BendingStress(m, 3), 2);
    }

    // Independent check of the plate constants: solve the axisymmetric plate equation
    // D (1/r d/dr)(r d/dr)(1/r d/dr)(r dy/dr) = 0 between b and a with y(b) = y'(b) = 0, M_r(a) = 0 and the
    // shear Q(a) = w (ring load at the rim), by the textbook general solution
    // y = A + B r^2 + C ln r + E r^2 ln r, with the four constants from a 4x4 linear solve in the test.
    [Theory]
    [InlineData(50, 10, 0.35)]
    [InlineData(60, 12, 0.3)]
    [InlineData(80, 30, 0.4)]
    public void Rim_deflection_matches_a_direct_solution_of_the_plate_equation(double a, double b, double nu)
    {
        double e = 3500, t = 3, force = 20;
        double d = e * t * t * t / (12 * (1 - nu * nu));
        double w = force / (2 * Math.PI * a);
        // Unknowns x = [A, B, C, E]. y = A + B r^2 + C ln r + E r^2 ln r.
        // y' = 2 B r + C / r + E (2 r ln r + r)
        // y'' = 2 B - C / r^2 + E (2 ln r + 3)
        // M_r = -D (y'' + nu y' / r); Q_r = -D d/dr(y'' + y'/r) = -D (4 E / r)   (the C and B terms cancel)
        var m = new double[4, 5];
        void Row(int i, double c0, double c1, double c2, double c3, double rhs) { m[i, 0] = c0; m[i, 1] = c1; m[i, 2] = c2; m[i, 3] = c3; m[i, 4] = rhs; }
        Row(0, 1, b * b, Math.Log(b), b * b * Math.Log(b), 0);
        Row(1, 0, 2 * b, 1 / b, 2 * b * Math.Log(b) + b, 0);
        Row(2, 0, 2 + 2 * nu, -1 / (a * a) + nu / (a * a), (2 * Math.Log(a) + 3) + nu * (2 * Math.Log(a) + 1), 0);
        // Shear at the free edge balances the ring load: total force on the plate at radius a equals w per unit length.
        Row(3, 0, 0, 0, -4 * d / a, -w);
        var x = Solve(m);
        double ya = x[0] + x[1] * a * a + x[2] * Math.Log(a) + x[3] * a * a * Math.Log(a);
        double roark = AnnularPlate.RimDeflectionRingLoad(force, a, a, b, e, nu, t);
        Assert.Equal(Math.Abs(ya), Math.Abs(roark), 6);
    }

    // Ring load inside the rim: the loading terms L3 and L9 (Roark Table 11.2, case 1j). A load moved inward
    // deflects the rim less, and a load at the clamped edge does not deflect it at all.
    [Fact]
    public void Ring_load_inside_the_rim_deflects_less_than_at_the_rim_and_more_than_zero()
    {
        double atRim = AnnularPlate.RimDeflectionRingLoad(20, 50, 50, 10, 3500, 0.35, 3);
        double inside = AnnularPlate.RimDeflectionRingLoad(20, 40, 50, 10, 3500, 0.35, 3);
        Assert.True(inside < 0 && inside > atRim);
        Assert.Equal(0, AnnularPlate.RimDeflectionRingLoad(20, 10 + 1e-9, 50, 10, 3500, 0.35, 3), 6);
    }

    private static double[] Solve(double[,] m)
    {
        int n = 4;
        for (int c = 0; c < n; c++)
        {
            int p = c;
            for (int r = c + 1; r < n; r++) if (Math.Abs(m[r, c]) > Math.Abs(m[p, c])) p = r;
            for (int k = 0; k <= n; k++) (m[c, k], m[p, k]) = (m[p, k], m[c, k]);
            for (int r = 0; r < n; r++)
            {
                if (r == c) continue;
                double f = m[r, c] / m[c, c];
                for (int k = 0; k <= n; k++) m[r, k] -= f * m[c, k];
            }
        }
        var x = new double[n];
        for (int i = 0; i < n; i++) x[i] = m[i, n] / m[i, i];
        return x;
    }
}
