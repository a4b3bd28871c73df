using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Stack;

using static PartForge.Electrical.Tests.Flux.SectorFaceField;

namespace PartForge.Electrical.Tests.Flux;

/// <summary>
/// Same-pole magnets (<c>magnets.arrangement: same</c>, an odd count): the coil's flux linkage has a steady part
/// (a non-zero mean) plus every harmonic of the magnet pitch, and the EMF is its derivative. The engine's
/// linkage at several rotor angles is checked against the magnets integrated numerically here (surface-charge
/// model, Coulomb's law over each pole face, composite Gauss-Legendre), every magnet magnetised +z.
/// </summary>
public class SameArrangementFluxTests
{
    // Invented test machine: one rotor of 7 sector magnets all showing the same pole, 7 round coils, 1 phase.
    private const string Yaml = """
        partforge: 1
        name: same-test
        machine: { layout: single-rotor, role: motor, poles: 7, coils: 7, phases: 1, connection: series, rated_rpm: 300, max_rpm: 600 }
        magnets: { shape: sector, arrangement: same, inner_width: 10, outer_width: 14, length: 16, thickness: 5, br: 1.3, pitch_radius: 40 }
        rotor: { outer_diameter: 110, thickness: 6, bore: 8, pocket_floor: 1 }
        coils: { shape: round, wire: { awg: 26 }, turns: 100, fill_factor: 0.45, height: 5, core: { diameter: 8 } }
        stator: { inner_diameter: 30, outer_diameter: 120, thickness: 7 }
        sensor: { kind: reed, count: 1 }
        gap: { air_gap: 1.5 }
        """;

    private static MachineModel Load(string yaml)
    {
        var loaded = DesignLoader.LoadText(yaml, "same-test.yaml");
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        return loaded.Machine!;
    }

    [Fact]
    public void Flux_linkage_with_same_pole_magnets_agrees_with_a_numerical_integration_at_every_angle()
    {
        var m = Load(Yaml);
        Assert.Equal(MagnetArrangement.Same, m.Magnets.Arrangement);
        Assert.Equal(7, m.FieldPeriods);
        var shape = Assert.IsType<SectorMagnet>(m.Magnets.Shape);
        var e = ElectricalEngine.Evaluate(m);
        Assert.False(e.HasErrors, string.Join("; ", e.Diagnostics));
        var coil = e.Coil!;
        var magnet = m.Stack.OfKind(SlabKind.Magnet).Single();
        var copper = m.Stack.OfKind(SlabKind.Copper).Single();
        double xi = shape.PitchRadiusMm - shape.LengthMm / 2;
        var s = Rule(0, 1, 12);
        var t = Rule(0, 1, 8);
        // The engine evaluates the magnets at their operating temperature (the heat balance; Br's fall with temperature is
        // tested in Thermal/): the integration takes the Br the engine reports for it.
        double br = e.Magnet.BrOperatingTesla;
        Assert.True(br > 0.5 * m.Magnets.BrTesla && br <= m.Magnets.BrTesla, $"Br at the operating temperature {br} T ({e.Thermal!.MagnetTemperatureC} C)");
        double Bz(double x, double y, double z, double theta)
        {
            double b = 0;
            for (int k = 0; k < m.Poles; k++)
            {
                double a = -(k * 2 * Math.PI / m.Poles + theta), ca = Math.Cos(a), sa = Math.Sin(a);
                double u = x * ca - y * sa, v = x * sa + y * ca;
                b += br * (FaceBz(xi, shape.InnerWidthMm, shape.OuterWidthMm, shape.LengthMm, magnet.ZMax, u, v, z, s, t)
                                        - FaceBz(xi, shape.InnerWidthMm, shape.OuterWidthMm, shape.LengthMm, magnet.ZMin, u, v, z, s, t));
            }
            return b;
        }
        double rc = coil.InnerDiameterMm!.Value / 2, ro = coil.OuterDiameterMm!.Value / 2, cx = coil.PitchRadiusMm;
        var heights = Rule(copper.ZMin, copper.ZMax, 2);
        var radial = Rule(0, rc, 3).Concat(Rule(rc, ro, 3)).ToArray();
        var around = Rule(0, 2 * Math.PI, 16);
        double Lambda(double theta)
        {
            double l = 0;
            foreach (var (z, wz) in heights)
                foreach (var (rho, wr) in radial)
                {
                    double weight = rho <= rc ? 1 : (ro - rho) / (ro - rc);
                    foreach (var (phi, wp) in around)
                        l += wz * wr * wp * rho * weight * Bz(cx + rho * Math.Cos(phi), rho * Math.Sin(phi), z, theta);
                }
            return l * coil.Turns / (copper.ZMax - copper.ZMin) * 1e-6;
        }

        double pitch = 2 * Math.PI / m.Poles;
        double peak = Lambda(0);
        foreach (double f in new[] { 0.0, 0.5 })
        {
            double expected = Lambda(f * pitch), engine = e.FluxLinkage!.At(f * pitch);
            Assert.True(Math.Abs(engine - expected) <= 0.005 * Math.Abs(peak),
                $"at {f} magnet pitch: engine {engine:G6} Wb-turns, numerical integration {expected:G6} Wb-turns");
        }
        // A steady part: the mean linkage over a period (the offset) is positive with every magnet showing +z.
        Assert.True(peak > 0 && e.FluxLinkage!.OffsetWb > 0);
        // The EMF is the derivative of the linkage: its mean over a period is zero, and e = w dlambda/dtheta.
        double w = 2 * Math.PI * m.RatedRpm / 60;
        var wave = e.Waveforms!;
        Assert.True(Math.Abs(wave.CoilEmfV.Average()) < 1e-9 * wave.CoilEmfV.Max(Math.Abs));
        double h = 1e-5, th = 0.3 * pitch;
        double numeric = w * (e.FluxLinkage.At(th + h) - e.FluxLinkage.At(th - h)) / (2 * h); // central difference
        Assert.Equal(numeric, w * e.FluxLinkage.Derivative(th), 1e-6 * Math.Abs(numeric) + 1e-12);
        // One electrical period is one magnet pitch.
        Assert.Equal(7 * m.RatedRpm / 60, e.ElectricalHz, 9);
    }

    [Fact]
    public void An_odd_magnet_count_is_refused_when_the_magnets_alternate_and_accepted_when_they_show_one_pole()
    {
        var bad = DesignLoader.LoadText(Yaml.Replace("arrangement: same, ", ""), "same-test.yaml");
        Assert.False(bad.Success);
        var err = Assert.Single(bad.Errors, x => x.KeyPath == "machine.poles");
        Assert.Contains("magnets.arrangement: same", err.ToString());
        Assert.True(DesignLoader.LoadText(Yaml, "same-test.yaml").Success);
    }

    [Fact]
    public void Only_the_role_s_operating_points_are_computed_whatever_the_sensor()
    {
        // A generator with a reed sensor: generator point only; a motor: motor point only; both for motor-generator.
        var gen = ElectricalEngine.Evaluate(Load(Yaml.Replace("role: motor", "role: generator")));
        Assert.NotNull(gen.Generator);
        Assert.Null(gen.Motor);
        var mot = ElectricalEngine.Evaluate(Load(Yaml));
        Assert.Null(mot.Generator);
        Assert.NotNull(mot.Motor);
        var both = ElectricalEngine.Evaluate(Load(Yaml.Replace("role: motor", "role: motor-generator")));
        Assert.NotNull(both.Generator);
        Assert.NotNull(both.Motor);
        // The default role is generator, even with a timing sensor.
        var dflt = Load(Yaml.Replace("role: motor, ", ""));
        Assert.Equal(MachineRole.Generator, dflt.Role);
    }
}
