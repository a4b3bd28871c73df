using PartForge.Design.Machines.Magnets;
using PartForge.Electrical.Field;

namespace PartForge.Electrical.Tests.Field;

public class MagneticPullTests
{
    // Source: computed from the formula (docs/physics.md §6): simple estimate F = B^2 A/(2 mu0), 1 T over 1 cm^2 -> 39.79 N.
    [Fact]
    public void SimpleEstimate() => Assert.Equal(39.79, MagneticPull.SimpleEstimateN(1.0, 100), 2);

    // Source: computed from the formula (docs/physics.md §6): exact force between two D10 x 3 magnets (Br 1.30) facing each other.
    [Theory]
    [InlineData(0.5, 15.90)]
    [InlineData(1.0, 12.19)]
    [InlineData(2.0, 7.90)]
    [InlineData(4.0, 3.86)]
    public void TwoDiscMagnets(double gap, double newtons)
    {
        var g = new DiscMagnet(10, 3, 0);
        var lower = new MagnetSource(g, 0, -3, 0, 1.30, 0);
        var upper = new MagnetSource(g, 0, gap, gap + 3, 1.30, 0);
        double f = MagneticPull.AxialForceN(upper, new[] { lower }, gap);
        Assert.True(f < 0, "like-oriented magnets attract: the upper one is pulled down");
        Assert.Equal(newtons, -f, 0.001 * newtons); // the reference is given to 4 digits
        // Newton's third law from the other side.
        Assert.Equal(-f, MagneticPull.AxialForceN(lower, new[] { upper }, gap), 0.002 * newtons);
    }

    // Source: docs/physics.md §6: a magnet on ideal steel at gap g pulls like the magnet pair at 2g (image method).
    [Fact]
    public void ImageInIronIsThePairAtTwiceTheGap()
    {
        var g = new DiscMagnet(10, 3, 0);
        var m = new MagnetSource(g, 0, 0, 3, 1.30, 0);
        var image = m.ImageIn(3.5, 0); // iron face 0.5 mm above the magnet
        Assert.Equal(3.5 + 0.5, image.ZMinMm, 12);
        Assert.Equal(12.19, MagneticPull.AxialForceN(m, new[] { image }, 1.0), 0.12);
    }

    // Block faces: against the same brute-force surface-charge field integrated here over the target's faces.
    [Fact]
    public void BlockPairAgainstBruteForce()
    {
        var g = new BlockMagnet(10, 6, 3, 0);
        var a = new MagnetSource(g, 0, -3, 0, 1.2, 0);
        var b = new MagnetSource(g, 0, 2, 5, 1.2, 0);
        double f = MagneticPull.AxialForceN(b, new[] { a }, 2);
        // Reference: flux of a's Bz through b's faces by midpoint rule with the closed-form field.
        int n = 300;
        double s = 0;
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                double x = -5 + 10 * (i + 0.5) / n, y = -3 + 6 * (j + 0.5) / n;
                s += CuboidField.Bz(1.2, -5, 5, -3, 3, -3, 0, x, y, 5) - CuboidField.Bz(1.2, -5, 5, -3, 3, -3, 0, x, y, 2);
            }
        double refF = 1.2 / MagneticPull.Mu0 * s * (10.0 / n) * (6.0 / n) * 1e-6;
        Assert.Equal(refF, f, Math.Abs(refF) * 1e-3);
    }

    // Design level: dual rotor without iron pulls the rotors together; single rotor feels no net pull; iron adds a magnet-to-iron force.
    [Fact]
    public void DesignLevelPull()
    {
        var crank = TestDesigns.Crank();
        var p = MagneticPull.Compute(PartForge.Design.Machines.MachineModel.From(crank))!;
        Assert.True(p.RotorToRotorN > 0);
        Assert.Equal(0, p.MagnetToBackIronN);
        Assert.Equal(p.RotorToRotorPerMagnetN * 12, p.RotorToRotorN, 9);
        var single = MagneticPull.Compute(PartForge.Design.Machines.MachineModel.From(TestDesigns.Arc()))!;
        Assert.Equal(0, single.RotorToRotorN);
        Assert.True(single.MagnetToBackIronN > 0);
        var large = MagneticPull.Compute(PartForge.Design.Machines.MachineModel.From(TestDesigns.Large()))!;
        var noIron = MagneticPull.Compute(PartForge.Design.Machines.MachineModel.From(new PartForge.Design.Model.Design
        {
            Machine = TestDesigns.Large().Machine, Magnets = TestDesigns.Large().Magnets, Coils = TestDesigns.Large().Coils, Stator = TestDesigns.Large().Stator,
            Rotor = new PartForge.Design.Model.Rotor { OuterDiameter = 270, Thickness = 8, PocketFloor = 2 },
        }))!;
        Assert.True(large.RotorToRotorN > noIron.RotorToRotorN, "back iron strengthens the rotor-to-rotor pull");
    }
}

public class MagneticPullTouchingTests
{
    // Touching magnet and image (a through pocket on ideal iron): grading at the magnet thickness gives the same
    // force as fine grading down to the faces (the coplanar faces contribute their principal value, 0).
    [Fact]
    public void TouchingGradingShortcutIsExact()
    {
        var g = new BlockMagnet(12, 8, 3, 0);
        var m = new MagnetSource(g, 0, 0, 3, 1.3, 0);
        var img = m.ImageIn(3, 0);
        Assert.Equal(MagneticPull.AxialForceN(m, new[] { img }, 0, 8), MagneticPull.AxialForceN(m, new[] { img }, 3), 1e-3 * Math.Abs(MagneticPull.AxialForceN(m, new[] { img }, 0, 8)));
    }
}
