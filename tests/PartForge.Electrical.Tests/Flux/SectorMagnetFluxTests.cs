using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Stack;

using static PartForge.Electrical.Tests.Flux.SectorFaceField;

namespace PartForge.Electrical.Tests.Flux;

/// <summary>
/// The sector (trapezoidal) magnet, a shape added through the shape registry alone: the engine's flux linkage of a
/// coil facing a ring of them, against the same magnets integrated numerically here (surface-charge model,
/// Coulomb's law over each pole face, composite Gauss-Legendre), with the turns spread evenly over the winding.
/// </summary>
public class SectorMagnetFluxTests
{
    // Invented test machine: one rotor of 8 sector magnets (10 mm wide at the inner edge, 14 at the outer, 16 long,
    // 5 thick, Br 1.3 T), 6 round coils; no back iron, so the field is the magnets' own.
    private const string Yaml = """
        partforge: 1
        name: sector-test
        machine: { layout: single-rotor, poles: 8, coils: 6, phases: 3, connection: star, rated_rpm: 300, max_rpm: 600 }
        magnets: { shape: sector, inner_width: 10, outer_width: 14, length: 16, thickness: 5, br: 1.3, pitch_radius: 40 }
        rotor: { outer_diameter: 110, thickness: 6, bore: 8, pocket_floor: 1 }
        coils: { shape: round, wire: { awg: 26 }, turns: 100, fill_factor: 0.45, height: 5, core: { diameter: 8 } }
        stator: { inner_diameter: 30, outer_diameter: 120, thickness: 7 }
        sensor: { kind: none }
        gap: { air_gap: 1.5 }
        """;

    [Fact]
    public void Flux_linkage_of_a_coil_over_sector_magnets_agrees_with_a_numerical_integration()
    {
        var loaded = DesignLoader.LoadText(Yaml, "sector-test.yaml");
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        var m = loaded.Machine!;
        var shape = Assert.IsType<SectorMagnet>(m.Magnets.Shape);
        var e = ElectricalEngine.Evaluate(m);
        Assert.False(e.HasErrors, string.Join("; ", e.Diagnostics));
        var coil = e.Coil!;

        // The field of the 8 alternating magnets (magnet k at k x 45 degrees, +z for even k) on the copper, with the
        // magnets at their operating temperature (the Br the engine reports using there).
        var magnet = m.Stack.OfKind(SlabKind.Magnet).Single();
        var copper = m.Stack.OfKind(SlabKind.Copper).Single();
        double xi = shape.PitchRadiusMm - shape.LengthMm / 2;
        var s = Rule(0, 1, 24);
        var t = Rule(0, 1, 16);
        double Bz(double x, double y, double z)
        {
            double b = 0;
            for (int k = 0; k < m.Poles; k++)
            {
                double a = -k * 2 * Math.PI / m.Poles, ca = Math.Cos(a), sa = Math.Sin(a);
                double u = x * ca - y * sa, v = x * sa + y * ca; // the point in magnet k's own frame
                double sign = k % 2 == 0 ? 1 : -1;
                b += sign * e.Magnet.BrOperatingTesla * (FaceBz(xi, shape.InnerWidthMm, shape.OuterWidthMm, shape.LengthMm, magnet.ZMax, u, v, z, s, t)
                                                - FaceBz(xi, shape.InnerWidthMm, shape.OuterWidthMm, shape.LengthMm, magnet.ZMin, u, v, z, s, t));
            }
            return b;
        }

        // Turns spread evenly over the winding (core radius rc to outer radius ro, over the height): a point at
        // distance rho from the coil's axis is linked by every turn when inside the core and by the fraction
        // (ro - rho)/(ro - rc) of them across the winding. Flux linkage at rotor angle 0 (magnet 0 over coil 0).
        double rc = coil.InnerDiameterMm!.Value / 2, ro = coil.OuterDiameterMm!.Value / 2, cx = coil.PitchRadiusMm;
        var heights = Rule(copper.ZMin, copper.ZMax, 2);
        var inner = Rule(0, rc, 3);
        var across = Rule(rc, ro, 3);
        var around = Rule(0, 2 * Math.PI, 16);
        double lambda = 0;
        foreach (var (z, wz) in heights)
            foreach (var (rho, wr) in inner.Concat(across))
            {
                double weight = rho <= rc ? 1 : (ro - rho) / (ro - rc);
                foreach (var (phi, wp) in around)
                    lambda += wz * wr * wp * rho * weight * Bz(cx + rho * Math.Cos(phi), rho * Math.Sin(phi), z);
            }
        lambda *= coil.Turns / (copper.ZMax - copper.ZMin) * 1e-6; // mm^2 -> m^2, averaged over the height

        double engine = e.FluxLinkage!.At(0);
        Assert.True(Math.Abs(engine - lambda) <= 0.005 * Math.Abs(lambda),
            $"engine {engine:G6} Wb-turns, numerical integration {lambda:G6} Wb-turns ({100 * (engine - lambda) / lambda:0.###} %)");
    }

    [Fact]
    public void A_sector_with_equal_widths_is_the_block_of_that_size()
    {
        var sector = new SectorMagnet(10, 10, 20, 5, 60);
        var block = new BlockMagnet(20, 10, 5, 60);
        Assert.Equal(block.FaceAreaMm2, sector.FaceAreaMm2, 12);
        Assert.Equal(block.PerimeterMm, sector.PerimeterMm, 12);
        Assert.Equal(block.WebMm(16, 0.2), sector.WebMm(16, 0.2), 12);
        Assert.Equal(block.RadialRangeMm(0.2).Max, sector.RadialRangeMm(0.2).Max, 9);
        Assert.Equal(block.CentroidRadiusMm, sector.CentroidRadiusMm, 12);
        // The field of the two through the engine's generic polygon face equals the cuboid closed form.
        var a = new PartForge.Electrical.Field.MagnetSource(sector, 0, -5, 0, 1.3, 0);
        var b = new PartForge.Electrical.Field.MagnetSource(block, 0, -5, 0, 1.3, 0);
        foreach (var (x, y, z) in new[] { (60.0, 0.0, 1.0), (66.0, 4.0, 2.0), (50.0, -7.0, 0.5), (80.0, 10.0, 6.0) })
            Assert.Equal(b.Bz(x, y, z), a.Bz(x, y, z), 1e-9);
    }

    [Fact]
    public void The_pocket_grows_every_side_by_half_the_clearance()
    {
        var sector = new SectorMagnet(12, 18, 25, 6, 62);
        var bare = sector.Corners(0);
        var grown = sector.Corners(0.4);
        // Source: plane geometry: the distance between a side and the same side of the grown outline.
        for (int i = 0; i < 4; i++)
        {
            var p = bare[i];
            var q = bare[(i + 1) % 4];
            var g0 = grown[i];
            var n = new PartForge.Geometry.Primitives.Vec2(q.Y - p.Y, -(q.X - p.X)); // outward (right-hand) normal of a counter-clockwise edge
            double len = n.Length;
            Assert.Equal(0.2, (g0 - p).Dot(n) / len, 12);
        }
        // Face area and centroid of a trapezoid (geometry): L (a + b)/2, from the inner edge L (a + 2b)/(3 (a + b)).
        Assert.Equal(25 * 15, sector.FaceAreaMm2, 12);
        Assert.Equal(62 - 12.5 + 25 * (12 + 36) / (3.0 * 30), sector.CentroidRadiusMm, 12);
    }
}
