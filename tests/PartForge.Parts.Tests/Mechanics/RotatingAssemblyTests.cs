using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Geometry;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Parts.Mechanics;
using D = PartForge.Design.Model;

namespace PartForge.Parts.Tests.Mechanics;

/// <summary>Moments of inertia of the rotating assembly against the closed forms of discs and annuli.</summary>
public class RotatingAssemblyTests
{
    [Theory]
    [InlineData(50.0, 0.0)]
    [InlineData(50.0, 10.0)]
    [InlineData(7.5, 2.0)]
    public void A_plain_disc_and_an_annulus_have_the_polar_moment_of_the_closed_form(double r, double bore)
    {
        // Source: polar second moment of a disc pi r^4 / 2 about its centre, of an annulus pi (R^4 - r^4) / 2
        // (engineering handbook tables); so a disc of mass m has I = m r^2 / 2.
        var prec = Precision.FromChordalTolerance(0.01);
        var disc = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), r), prec);
        var region = bore > 0 ? disc.Difference(Region.FromContour(Contour.FullCircle(new Vec2(0, 0), bore), prec)) : disc;
        double expected = Math.PI * (Math.Pow(r, 4) - Math.Pow(bore, 4)) / 2;
        // The regions are polygons with their vertices on the circle (chordal tolerance s = 0.01 mm): an inscribed n-gon
        // has (pi/n)^2 = 2 s / r, and its J and mean r^2 fall short by about (2 pi / n)^2 / 6 = 4 s / (3 r); allowed 4 s / r.
        double rel = 4 * 0.01 / r;
        Assert.Equal(expected, region.PolarMomentMm4, rel * expected);
        double area = Math.PI * (r * r - bore * bore);
        Assert.Equal(expected / area, region.PolarMomentMm4 / region.Area, rel * expected / area);
        // m r^2 / 2 for the plain disc, with the region's own area as the mass per unit thickness.
        if (bore == 0) Assert.Equal(region.Area * r * r / 2, region.PolarMomentMm4, rel * expected);
    }

    [Fact]
    public void An_off_centre_disc_follows_the_parallel_axis_theorem()
    {
        // Source: parallel-axis (Steiner) theorem: J = pi a^4 / 2 + pi a^2 d^2.
        var prec = Precision.FromChordalTolerance(0.01);
        double a = 6, dist = 37.5;
        var region = Region.FromContour(Contour.FullCircle(new Vec2(dist * Math.Cos(0.7), dist * Math.Sin(0.7)), a), prec);
        double expected = Math.PI * Math.Pow(a, 4) / 2 + Math.PI * a * a * dist * dist;
        Assert.Equal(expected, region.PolarMomentMm4, 5e-3 * expected);
        Assert.Equal(a * a / 2 + dist * dist, region.PolarMomentMm4 / region.Area, 1e-3 * dist * dist);
    }

    private static D.Design Bare()
    {
        var d0 = TestDesigns.DualStator();
        return new D.Design
        {
            Name = d0.Name, Machine = d0.Machine, Coils = d0.Coils, Former = d0.Former, Stator = d0.Stator, Sensor = d0.Sensor, Mesh = d0.Mesh,
            Magnets = new D.Magnets { Shape = "disc", Diameter = 12, Thickness = 6, PitchRadius = 37.5 },
            Rotor = new D.Rotor
            {
                OuterDiameter = d0.Rotor.OuterDiameter, Thickness = d0.Rotor.Thickness, Bore = d0.Rotor.Bore, PocketClearance = 0.2, PocketFloor = 0,
                BoltCircle = d0.Rotor.BoltCircle, Marks = "none", Index = "none",
            },
            Mechanics = new D.Mechanics { ExtraInertia = 1e-4 },
        };
    }

    [Fact]
    public void The_rotor_disc_magnets_and_extra_inertia_add_up_to_the_closed_forms()
    {
        // Source: I = rho t [pi (R^4 - r_bore^4) / 2 - sum over holes pi a^2 (a^2 / 2 + d^2)] for the disc with its
        // pockets and bolt holes (parallel-axis theorem), and m (a^2 / 2 + d^2) for each disc magnet.
        var d = Bare();
        var m = MachineModel.From(d);
        var parts = PartsBuilder.Build(m, TestDesigns.RoundCoil(d, 6, 45), TestDesigns.Prec(d));
        var rotor = parts.Get(PartId.Rotor);
        double rho = rotor.Material.DensityKgM3, t = d.Rotor.Thickness * 1e-3;
        double R = d.Rotor.OuterDiameter / 2e3, rb = d.Rotor.Bore / 2e3;
        double j = Math.PI * (Math.Pow(R, 4) - Math.Pow(rb, 4)) / 2;
        double a = (12 + 0.2) / 2e3, dp = 37.5e-3;
        j -= 8 * Math.PI * a * a * (a * a / 2 + dp * dp);
        var bc = d.Rotor.BoltCircle!;
        double ah = bc.Hole / 2e3, dh = bc.Diameter / 2e3;
        j -= bc.Count * Math.PI * ah * ah * (ah * ah / 2 + dh * dh);
        double expectedRotor = rho * t * j;
        Assert.Equal(expectedRotor, rotor.InertiaKgM2, 3e-3 * expectedRotor);

        var asm = RotatingAssembly.Of(m, parts);
        double am = 6e-3, mag = Math.PI * am * am * 6e-3 * PartForge.Design.Materials.MaterialTable.NdFeBDensityKgM3;
        double magnets = 8 * mag * (am * am / 2 + dp * dp);
        Assert.Equal(magnets, asm.MagnetInertiaKgM2, 2e-3 * magnets);
        Assert.Equal(1e-4, asm.ExtraInertiaKgM2);
        double sum = asm.Shares.Sum(s => s.InertiaKgM2) + 1e-4;
        Assert.Equal(sum, asm.InertiaKgM2, 1e-15);
        Assert.Equal(rotor.MassG / 1000 + 8 * mag, asm.MassKg, 1e-9); // the rotor is the only rotating part here
    }
}
