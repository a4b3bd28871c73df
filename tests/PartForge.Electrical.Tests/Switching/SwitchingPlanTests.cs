using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Stack;
using PartForge.Electrical.Switching;
using PartForge.Electrical.Tests.Field;

namespace PartForge.Electrical.Tests.Switching;

/// <summary>
/// The drive as the sensor really switches it. The field at the sensing point is checked against an independent
/// surface-charge integration of the magnets (Coulomb's law over each pole face, written in the test); every
/// pulse's torque integral against T = i d lambda / d theta integrated in the test from the coil linkage and the
/// winding table (central differences, trapezoid rule), not from the planner's harmonics.
/// </summary>
public class SwitchingPlanTests
{
    // Invented test machine: the pulse-sculpture layout (one rotor of 8 disc magnets between two rings of 4 coils),
    // a reed switch and a unipolar drive.
    private static string Yaml(string arrangement, string sensor) => $$"""
        partforge: 1
        name: pulse-test
        machine: { layout: dual-stator, role: motor, poles: 8, coils: 4, phases: 1, connection: series, rated_rpm: 200, max_rpm: 600 }
        magnets: { shape: disc, arrangement: {{arrangement}}, diameter: 20, thickness: 5, grade: N42, pitch_radius: 40 }
        rotor: { outer_diameter: 110, thickness: 5, bore: 8, pocket_floor: 0 }
        coils: { shape: round, wire: { awg: 26 }, turns: 160, fill_factor: 0.42, height: 8, core: { diameter: 8 } }
        stator: { inner_diameter: 30, outer_diameter: 142, thickness: 8 }
        sensor: {{sensor}}
        gap: { air_gap: 1.0 }
        operation: { supply_voltage: 6, switch_drop: 0.2 }
        """;

    private const string Reed = "{ kind: reed, count: 1 }";

    private static MachineModel Load(string yaml)
    {
        var loaded = DesignLoader.LoadText(yaml, "pulse-test.yaml");
        Assert.True(loaded.Success, string.Join("; ", loaded.Errors));
        return loaded.Machine!;
    }

    /// <summary>The phase's linkage from coil 0's series and the winding table: sum of d_k lambda_0(theta - psi_k), both rings.</summary>
    private static double PhaseLambda(ElectricalResult e, MachineModel m, double thetaRad)
    {
        double s = 0;
        foreach (var c in e.Winding.Table.Where(c => c.Phase == 'A'))
            s += c.Direction * e.FluxLinkage!.At(thetaRad - c.AngleDeg * Math.PI / 180);
        return s * m.Layout.Stators.Count;
    }

    [Theory]
    [InlineData("alternating", Reed)]
    [InlineData("same", Reed)]
    [InlineData("alternating", "{ kind: hall, count: 1 }")]
    [InlineData("alternating", "{ kind: hall, count: 1, operate: 3, release: -3 }")]
    public void Every_pulse_torque_integral_matches_i_dlambda_dtheta_integrated_in_the_test(string arrangement, string sensor)
    {
        // Source: coenergy torque of an air-cored coil, T = i d lambda / d theta (textbook machine theory).
        var m = Load(Yaml(arrangement, sensor));
        var e = ElectricalEngine.Evaluate(m);
        var plan = e.Switching!;
        Assert.NotNull(plan);
        double largest = plan.Circuits[0].Windows.Max(w => Math.Abs(w.FluxChangeWb));
        foreach (var w in plan.Circuits[0].Windows)
        {
            int n = 400;
            double a0 = w.OnDeg * Math.PI / 180, width = w.WidthDeg * Math.PI / 180, h = width / n, dd = 1e-5, integral = 0;
            for (int i = 0; i <= n; i++)
            {
                double th = a0 + i * h;
                double k = (PhaseLambda(e, m, th + dd) - PhaseLambda(e, m, th - dd)) / (2 * dd);
                integral += (i == 0 || i == n ? 0.5 : 1) * w.Sign * k * h; // torque per ampere, integrated over the window
            }
            Assert.Equal(integral, w.FluxChangeWb, 1e-6 * largest + 2e-4 * Math.Abs(integral));
            Assert.Equal(integral < -SwitchingPlanner.BrakingShare * largest, w.Brakes);
        }
    }

    [Fact]
    public void A_reed_on_alternating_magnets_with_a_unipolar_drive_brakes_on_every_second_pulse_and_averages_zero()
    {
        // Source: a reed closes on |B| (either pole); with alternating magnets the coil's EMF reverses every magnet
        // pitch, so half the closures meet the opposite EMF (half-wave symmetry lambda(theta + pi/p) = -lambda(theta)).
        var e = ElectricalEngine.Evaluate(Load(Yaml("alternating", Reed)));
        var plan = e.Switching!;
        Assert.Equal(8, plan.Circuits[0].Windows.Count);
        Assert.Equal(4, plan.BrakingPulses);
        var driving = plan.Circuits[0].Windows.Where(w => !w.Brakes).Sum(w => w.FluxChangeWb);
        Assert.Equal(0, plan.MeanStallTorqueNm, 1e-6 * Math.Abs(driving) * plan.PeakCurrentA);
    }

    [Fact]
    public void The_sensor_field_agrees_with_a_surface_charge_integration_of_the_magnets()
    {
        // Source: surface-charge model of a uniformly magnetised magnet, sigma = Br / mu0 on its pole faces, integrated
        // by Coulomb's law in the test (SurfaceCharge, polar midpoints over each disc face).
        var m = Load(Yaml("alternating", Reed));
        var e = ElectricalEngine.Evaluate(m);
        var plan = e.Switching!;
        var ring = m.Stack.Slab(SlabKind.Stator, m.Layout.Stators[0]);
        var magnet = m.Stack.OfKind(SlabKind.Magnet).Single();
        bool above = ring.ZMin >= magnet.ZMax;
        double z = above ? ring.ZMin + m.Sensor.Body.HeightMm / 2 : ring.ZMax - m.Sensor.Body.HeightMm / 2;
        Assert.Equal(z, plan.SensorZMm, 1e-9);
        var s = e.Sensors!.Sensors[0];
        double br = m.Magnets.BrTesla, r = 10, pitch = 40;
        foreach (int i in new[] { 0, 100, 360, 700, 1000 })
        {
            double theta = plan.FieldAngleDeg[i];
            double bz = 0;
            for (int k = 0; k < 8; k++)
            {
                double a = (k * 45 + theta) * Math.PI / 180, cx = pitch * Math.Cos(a), cy = pitch * Math.Sin(a);
                double px = s.RadiusMm * Math.Cos(s.AngleDeg * Math.PI / 180) - cx, py = s.RadiusMm * Math.Sin(s.AngleDeg * Math.PI / 180) - cy;
                double top = SurfaceCharge.Sector(0, r, 0, 2 * Math.PI, magnet.ZMax, px, py, z, 60, 240).Z;
                double bottom = SurfaceCharge.Sector(0, r, 0, 2 * Math.PI, magnet.ZMin, px, py, z, 60, 240).Z;
                bz += (k % 2 == 0 ? 1 : -1) * br * (top - bottom);
            }
            double expected = bz * (s.Inverted ? -1 : 1); // the field along +z
            Assert.Equal(expected, plan.FieldTesla[i], 0.01 * Math.Abs(plan.FieldMaxTesla));
        }
    }

    [Fact]
    public void Peak_current_and_turn_off_voltage_follow_the_circuit()
    {
        // Source: stall current (V - drops) / R; turn-off clamp V + Vd with a flyback diode, V + i sqrt(L / C) without
        // (LC ring-up, textbook circuit theory).
        var m = Load(Yaml("same", Reed));
        var e = ElectricalEngine.Evaluate(m);
        var plan = e.Switching!;
        Assert.Equal((6 - 0.2) / e.Phase!.ResistanceHotOhm, plan.PeakCurrentA, 1e-9);
        Assert.Equal(6 + 0.7, plan.TurnOffVoltageV, 1e-12);
        var none = Load(Yaml("same", Reed) + "\ndrive: { freewheel: none }\n");
        var p2 = ElectricalEngine.Evaluate(none).Switching!;
        Assert.Equal(6 + p2.PeakCurrentA * Math.Sqrt(e.Phase.InductanceUh * 1e-6 / 100e-12), p2.TurnOffVoltageV, 1e-9);
    }
}
