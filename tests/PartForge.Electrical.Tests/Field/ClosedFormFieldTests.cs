using PartForge.Design.Machines.Magnets;
using PartForge.Electrical.Field;
using PartForge.Electrical.Flux;

namespace PartForge.Electrical.Tests.Field;

public class ClosedFormFieldTests
{
    // Source: on-axis closed forms (Furlani, Permanent Magnet and Electromechanical Devices, 2001, from memory), values computed from them (docs/physics.md §3):
    // cylinder D10 x 3 and block 10 x 10 x 3, Bz/Br at z from the face.
    [Theory]
    [InlineData(0.0, 0.25725, 0.23704)]
    [InlineData(1.0, 0.21429, 0.20270)]
    [InlineData(2.0, 0.16786, 0.16416)]
    [InlineData(5.0, 0.07045, 0.07603)]
    public void OnAxisTable(double z, double cyl, double block)
    {
        double zc = z + 1e-12; // just outside the face
        Assert.Equal(cyl, CylinderField.Bz(1, 5, 1.5, 0, 1.5 + zc), 5);
        Assert.Equal(block, CuboidField.Bz(1, -5, 5, -5, 5, -3, 0, 0, 0, zc), 5);
        // The formulas themselves, written out here.
        double cf = 0.5 * ((zc + 3) / Math.Sqrt(Math.Pow(zc + 3, 2) + 25) - zc / Math.Sqrt(zc * zc + 25));
        double bf = 1 / Math.PI * (Math.Atan(100 / (2 * zc * Math.Sqrt(4 * zc * zc + 200))) - Math.Atan(100 / (2 * (zc + 3) * Math.Sqrt(4 * Math.Pow(zc + 3, 2) + 200))));
        Assert.Equal(cf, CylinderField.Bz(1, 5, 1.5, 0, 1.5 + zc), 9);
        Assert.Equal(bf, CuboidField.Bz(1, -5, 5, -5, 5, -3, 0, 0, 0, zc), 9);
    }

    // Source: docs/physics.md §3, cuboid (Akoun and Yonnet 1984) check points, Br 1.30, x,y in [-5,5], z in [-3,0].
    [Theory]
    [InlineData(0, 0, 1, double.NaN, double.NaN, 0.263508)]
    [InlineData(2, 3, 1, 0.050349, 0.103747, 0.267269)]
    [InlineData(4, -1, 2, 0.127964, -0.018440, 0.155915)]
    public void CuboidCheckPoints(double x, double y, double z, double bx, double by, double bz)
    {
        var b = CuboidField.B(1.30, -5, 5, -5, 5, -3, 0, x, y, z);
        Assert.Equal(bz, b.Bz, 6);
        if (!double.IsNaN(bx)) Assert.Equal(bx, b.Bx, 6);
        if (!double.IsNaN(by)) Assert.Equal(by, b.By, 6);
    }

    // Source: docs/physics.md §3, flux through a centred 10 x 10 mm square 1 mm above the block face: 2.3003e-5 Wb.
    [Fact]
    public void CuboidFluxThroughSquare()
    {
        var (x, w) = GaussLegendre.Composite(new[] { -5.0, -4.5, -4, -3, 0, 3, 4, 4.5, 5 }, 10, false);
        double phi = 0;
        for (int i = 0; i < x.Length; i++)
            for (int j = 0; j < x.Length; j++) phi += w[i] * w[j] * CuboidField.Bz(1.30, -5, 5, -5, 5, -3, 0, x[i], x[j], 1);
        Assert.Equal(2.3003e-5, phi * 1e-6, 3e-9);
    }

    // Source: Bulirsch cel, Numer. Math. 13 (1969); check values computed by direct quadrature (docs/physics.md §3).
    [Theory]
    [InlineData(0.5, 1, 1, -1, -0.364710006)]
    [InlineData(0.3, 0.25, 1, 0.5, 3.884366566)]
    [InlineData(0.2, 1, 1, 1, 3.016112492)]
    public void CelValues(double kc, double p, double c, double s, double v) => Assert.Equal(v, Bulirsch.Cel(kc, p, c, s), 8);

    // Source: the complete elliptic integral K(k) = cel(kc, 1, 1, 1) with kc = sqrt(1 - k^2); K(1/sqrt 2) = 1.854074677 (standard table value).
    [Fact]
    public void CelGivesEllipticK() => Assert.Equal(1.854074677, Bulirsch.Cel(Math.Sqrt(0.5), 1, 1, 1), 8);

    // Source: docs/physics.md §3, cylinder (Derby and Olbert 2010) check points, Br 1.30, a 5, b 1.5, h above the face.
    [Theory]
    [InlineData(0, 1, 0, 0.278576)]
    [InlineData(3, 1, 0.121234, 0.274564)]
    [InlineData(5, 1, 0.244585, 0.110373)]
    public void CylinderCheckPoints(double rho, double h, double brho, double bz)
    {
        var b = CylinderField.B(1.30, 5, 1.5, rho, 1.5 + h);
        Assert.Equal(bz, b.Bz, 6);
        Assert.Equal(brho, b.BRho, 6);
        Assert.Equal(b.Bz, CylinderField.Bz(1.30, 5, 1.5, rho, 1.5 + h), 12);
    }

    // Source: docs/physics.md §3, flux through a coaxial circle r 5 mm at h 1 mm above the D10 x 3 face: 1.86809e-5 Wb.
    [Fact]
    public void CylinderFluxThroughCoaxialCircle()
    {
        var (x, w) = GaussLegendre.Composite(new[] { 0.0, 2, 4, 4.5, 4.8, 5 }, 12, false);
        double phi = 0;
        for (int i = 0; i < x.Length; i++) phi += w[i] * 2 * Math.PI * x[i] * CylinderField.Bz(1.30, 5, 1.5, x[i], 2.5);
        Assert.Equal(1.86809e-5, phi * 1e-6, 2e-10);
    }

    // Independent check: closed forms against brute-force surface-charge integration done here, at points the
    // implementation was not tuned to (off-axis, beside and below the magnets).
    [Theory]
    [InlineData(3.3, -6.1, 1.7)]
    [InlineData(-7.2, 2.4, -4.9)]
    [InlineData(6.5, 6.5, 0.8)]
    public void CuboidAgainstSurfaceChargeIntegration(double x, double y, double z)
    {
        var top = SurfaceCharge.Rectangle(-5, 5, -4, 4, 0, x, y, z, 600);
        var bot = SurfaceCharge.Rectangle(-5, 5, -4, 4, -3, x, y, z, 600);
        var b = CuboidField.B(1.2, -5, 5, -4, 4, -3, 0, x, y, z);
        Assert.Equal(1.2 * (top.Z - bot.Z), b.Bz, 5e-5);
        Assert.Equal(1.2 * (top.X - bot.X), b.Bx, 5e-5);
        Assert.Equal(1.2 * (top.Y - bot.Y), b.By, 5e-5);
    }

    // Independent check: Derby-Olbert (current-sheet model) against the surface-charge model integrated here.
    [Theory]
    [InlineData(7.0, 2.3)]
    [InlineData(2.2, 3.9)]
    [InlineData(5.6, -0.4)]
    public void CylinderAgainstSurfaceChargeIntegration(double rho, double z)
    {
        // Cylinder radius 4, half-length 2 centred at the origin; field point at (rho, 0, z) relative to the centre... outside.
        var top = SurfaceCharge.Sector(0, 4, 0, 2 * Math.PI, 2, rho, 0, z, 400, 720);
        var bot = SurfaceCharge.Sector(0, 4, 0, 2 * Math.PI, -2, rho, 0, z, 400, 720);
        var b = CylinderField.B(1.1, 4, 2, rho, z);
        Assert.Equal(1.1 * (top.Z - bot.Z), b.Bz, 5e-5);
        Assert.Equal(1.1 * (top.X - bot.X), b.BRho, 5e-5);
    }

    // Independent check: the polygon-face (solid angle) model of an arc segment against surface-charge integration.
    [Theory]
    [InlineData(38.0, 3.0, 1.2)]
    [InlineData(47.0, -9.0, 0.7)]
    [InlineData(25.0, 12.0, -5.0)]
    public void ArcAgainstSurfaceChargeIntegration(double x, double y, double z)
    {
        var g = new ArcMagnet(30, 45, 28, 3);
        var src = new MagnetSource(g, 0, -3, 0, 1.25, 0);
        double a = 14 * Math.PI / 180;
        var top = SurfaceCharge.Sector(30, 45, -a, a, 0, x, y, z, 600, 600);
        var bot = SurfaceCharge.Sector(30, 45, -a, a, -3, x, y, z, 600, 600);
        Assert.Equal(1.25 * (top.Z - bot.Z), src.BzExact(x, y, z), 1e-4);
    }

    // Consistency: a block placed as a rotor source gives the closed-form cuboid field rotated into place, and the
    // dipole used for far magnets agrees with the exact field far away.
    [Fact]
    public void SourcePlacementAndDipole()
    {
        var g = new BlockMagnet(20, 10, 5, 60);
        var src = new MagnetSource(g, 90, 1, 6, 1.3, 3);
        // At 90 degrees the block's radial length lies along +y.
        Assert.Equal(CuboidField.Bz(1.3, 50, 70, -5, 5, 1, 6, 58, -2, -1), src.BzExact(2, 58, -1), 12);
        double exact = src.BzExact(60 * Math.Cos(Math.PI / 2 + 1.4), 60 * Math.Sin(Math.PI / 2 + 1.4), 0);
        double approx = src.Bz(60 * Math.Cos(Math.PI / 2 + 1.4), 60 * Math.Sin(Math.PI / 2 + 1.4), 0);
        Assert.Equal(exact, approx, Math.Abs(exact) * 0.02);
    }
}

public class ArcPolygonConvergenceTests
{
    // Convergence of the arc faces' polygons: the default chordal tolerance against one 20 times finer, at the
    // distances the copper sits from the magnets (0.5 mm and more), relative to the field over the magnet.
    [Theory]
    [InlineData(37.5, 0.0, -0.5)]
    [InlineData(44.9, 5.3, -0.5)]
    [InlineData(30.2, -8.0, -1.0)]
    [InlineData(46.0, 11.5, -2.0)]
    public void DefaultToleranceIsConverged(double x, double y, double z)
    {
        var g = new ArcMagnet(30, 45, 28, 3);
        var a = new MagnetSource(g, 0, 0, 3, 1.3, 0);
        var f = new MagnetSource(g, 0, 0, 3, 1.3, 0, MagnetSource.ArcChordalToleranceMm / 20);
        double scale = Math.Abs(f.BzExact(37.5, 0, -0.5));
        Assert.Equal(f.BzExact(x, y, z), a.BzExact(x, y, z), scale * 5e-4);
    }
}

public class ArcDetailLevelTests
{
    // The closed-form-radial sector rules (graded near, plain far) agree with the polygon of exact triangle solid angles, relative to the field the
    // copper sees over a magnet (its scale), everywhere from beside the magnet to far away.
    [Theory]
    [InlineData(37.5, 0.0, -0.5)]
    [InlineData(44.9, 5.3, -0.5)]
    [InlineData(30.2, -8.0, -1.0)]
    [InlineData(36.0, 6.5, 3.4)]
    [InlineData(52.0, 0.0, -0.5)]
    [InlineData(20.0, 9.0, -1.0)]
    [InlineData(60.0, 30.0, -2.0)]
    [InlineData(-10.0, 75.0, -1.0)]
    [InlineData(-80.0, -5.0, -0.5)]
    public void CoarseLevelsAgreeWithTheFinest(double x, double y, double z)
    {
        var g = new ArcMagnet(30, 45, 28, 3);
        var a = new MagnetSource(g, 0, 0, 3, 1.3, 0);
        double scale = Math.Abs(a.BzFinest(37.5, 0, -0.5));
        Assert.Equal(a.BzFinest(x, y, z), a.BzExact(x, y, z), scale * 1e-4);
    }

    // Touching faces (a magnet on iron through a through-pocket): the force converges with the face grading.
    [Fact]
    public void TouchingImageForceIsConverged()
    {
        var g = new ArcMagnet(30, 45, 28, 3);
        var m = new MagnetSource(g, 0, 0, 3, 1.3, 0);
        var img = m.ImageIn(3, 0);
        double coarse = MagneticPull.AxialForceN(m, new[] { img }, 0);
        double fine = MagneticPull.AxialForceN(m, new[] { img }, 0, 8);
        Assert.Equal(fine, coarse, Math.Abs(fine) * 1e-3);
        // A touching pair pulls harder than the same pair 1 mm apart.
        Assert.True(Math.Abs(coarse) > Math.Abs(MagneticPull.AxialForceN(m, new[] { m.ImageIn(3.5, 0) }, 1)));
    }
}
