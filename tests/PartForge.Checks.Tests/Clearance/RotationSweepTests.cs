using PartForge.Design.Parts;
using PartForge.Geometry.Exact;
using PartForge.Checks.Clearance;
using PartForge.Geometry.Primitives;

namespace PartForge.Checks.Tests.Clearance;

public class RotationSweepTests
{
    private static SweepPrism[] Magnets(int count, double pitchRadius, double radius, double z0, double z1) =>
        Enumerable.Range(0, count)
            .Select(i => new SweepPrism(PartId.Rotor, $"magnet {i}", z0, z1, Shape2D.Disc(Vec2.FromAngleDeg(i * 360.0 / count) * pitchRadius, radius)))
            .ToArray();

    [Fact]
    public void Two_discs_at_a_known_axial_distance()
    {
        // Closed form: coaxial discs whose faces are 1.000 mm apart.
        var rot = new[] { new SweepPrism(PartId.Rotor, "disc", 1.0, 4.0, Shape2D.Annulus(4, 50)) };
        var sta = new[] { new SweepPrism(PartId.Stator, "ring", -3.0, 0.0, Shape2D.Annulus(15, 60)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 30), 0.5);
        Assert.Equal(1.0, r.ClearanceMm, 3);
        Assert.Equal(1.0, r.AxialMm, 9);
        Assert.Equal(0.0, r.PlanarMm, 9);
    }

    [Fact]
    public void A_post_at_a_known_radial_gap_is_found_at_its_angle()
    {
        // Closed form: a stationary round post r 3 centred at radius 50, angle 7.3 degrees, in the same
        // z-range as 12 disc magnets r 5 on radius 40. The nearest approach is when a magnet is aligned
        // with the post (rotor angle 7.3 mod 30): 50 - 40 - 5 - 3 = 2.000.
        var rot = Magnets(12, 40, 5, 0, 3);
        var sta = new[] { new SweepPrism(PartId.Stator, "post", 0, 3, Shape2D.Disc(Vec2.FromAngleDeg(7.3) * 50, 3)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 30), 0.5);
        Assert.Equal(2.0, r.ClearanceMm, 3);
        Assert.Equal(7.3, r.AngleDeg, 2);
        Assert.Equal("post", r.Stationary!.Feature);
    }

    [Fact]
    public void Axial_and_planar_offsets_combine_in_quadrature()
    {
        // Same post, raised 1.5 mm above the magnets' z-range: sqrt(1.5^2 + 2^2) = 2.5.
        var rot = Magnets(12, 40, 5, 0, 3);
        var sta = new[] { new SweepPrism(PartId.Stator, "post", 4.5, 6, Shape2D.Disc(Vec2.FromAngleDeg(7.3) * 50, 3)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 30), 0.5);
        Assert.Equal(2.5, r.ClearanceMm, 3);
        Assert.Equal(1.5, r.AxialMm, 9);
    }

    [Fact]
    public void A_coil_seat_at_a_known_radial_gap_between_magnet_passes()
    {
        // Closed form: magnets r 5 on radius 40 at z 0..3 and a ring (a coil seat wall seen as a full
        // annulus, inner radius 45.7) in the same z-range: radial gap 45.7 - 45 = 0.7 at every angle.
        var rot = Magnets(16, 40, 5, 0, 3);
        var sta = new[] { new SweepPrism(PartId.Stator, "ring", 0, 3, Shape2D.Annulus(45.7, 60)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 22.5), 0.5);
        Assert.Equal(0.7, r.ClearanceMm, 3);
    }

    [Fact]
    public void Interference_is_reported_as_minus_the_axial_shift_that_separates()
    {
        var rot = Magnets(12, 40, 5, 0, 3);
        var sta = new[] { new SweepPrism(PartId.Stator, "copper", 2.6, 5, Shape2D.Ring(new Vec2(40, 0), 2, 9)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 30), 0.5);
        Assert.True(r.Interference);
        Assert.Equal(-0.4, r.ClearanceMm, 9);
    }

    [Fact]
    public void Step_is_never_coarser_than_the_smallest_feature()
    {
        // 0.5 mm posts on radius 100 subtend about 0.4 degrees: the step must follow.
        var rot = new[] { new SweepPrism(PartId.Rotor, "pin", 0, 1, Shape2D.Disc(new Vec2(100, 0), 0.25)) };
        var sta = new[] { new SweepPrism(PartId.Stator, "pin", 0, 1, Shape2D.Disc(Vec2.FromAngleDeg(0.9) * 100, 0.25)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 360), 5);
        Assert.True(r.StepDeg <= RotationSweep.SmallestFeatureDeg(new SweepScene(rot, sta, 360)) + 1e-12);
        // Pins meet head-on at 0.9 degrees: distance 0 (touching) at best; here they overlap -> interference.
        Assert.True(r.ClearanceMm <= 0);
    }

    [Fact]
    public void A_hub_spacer_wider_than_the_stator_bore_interferes_at_every_angle()
    {
        // A rotating hub ring of outer radius 24.75 through a stator ring of inner radius 20, z-ranges
        // overlapping: interference, reported as minus the axial shift that separates them: the hub would have
        // to move 3.8 + 5.3 = 9.1 mm (either way) to clear the ring.
        var rot = new[] { new SweepPrism(PartId.HubSpacer, "hub", -5.3, 5.3, Shape2D.Annulus(6, 24.75)) };
        var sta = new[] { new SweepPrism(PartId.Stator, "ring", -3.8, 3.8, Shape2D.Annulus(20, 95)) };
        var r = RotationSweep.Run(new SweepScene(rot, sta, 22.5), 0.5);
        Assert.True(r.Interference);
        Assert.Equal(-9.1, r.ClearanceMm, 9);
        // Same hub 1 mm inside the bore: a radial clearance of exactly 1.
        var ok = new[] { new SweepPrism(PartId.HubSpacer, "hub", -5.3, 5.3, Shape2D.Annulus(6, 19)) };
        Assert.Equal(1.0, RotationSweep.Run(new SweepScene(ok, sta, 22.5), 0.5).ClearanceMm, 9);
    }
}
