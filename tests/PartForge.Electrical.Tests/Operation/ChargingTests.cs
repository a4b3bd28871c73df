using PartForge.Design.Machines;
using PartForge.Electrical.Operation;
using M = PartForge.Design.Model;

namespace PartForge.Electrical.Tests.Operation;

/// <summary>The generator charging a store through its rectifier, against closed forms.</summary>
public class ChargingTests
{
    private static double[] Sine(int n, Func<double, double> f) => Enumerable.Range(0, n).Select(i => f(Math.Sin(2 * Math.PI * i / n))).ToArray();

    [Theory]
    [InlineData(10.0, 4.0, 0.7, 2.0)]
    [InlineData(30.0, 12.0, 0.4, 0.5)]
    [InlineData(5.0, 0.0, 0.0, 1.0)]
    public void Bridge_and_half_wave_mean_current_match_the_closed_form_with_a_constant_drop(double e, double v, double vd, double r)
    {
        // Source: single-phase rectifier into a constant voltage (textbook circuit theory). With U = V + n Vd and
        // alpha = asin(U / E), a bridge conducts from alpha to pi - alpha in each half period:
        // I = (2 E cos(alpha) - U (pi - 2 alpha)) / (pi R); a half-wave rectifier conducts in one half only: half that.
        int n = 200000;
        double uB = v + 2 * vd, aB = Math.Asin(uB / e);
        double bridge = (2 * e * Math.Cos(aB) - uB * (Math.PI - 2 * aB)) / (Math.PI * r);
        double got = Charging.MeanCurrent(Sine(n, Math.Abs), e, v, 2 * vd, r); // EMF per rad/s = |sin| at omega = E
        Assert.Equal(bridge, got, 1e-6 * bridge + 1e-12);
        double uH = v + vd, aH = Math.Asin(uH / e);
        double half = (2 * e * Math.Cos(aH) - uH * (Math.PI - 2 * aH)) / (2 * Math.PI * r);
        Assert.Equal(half, Charging.MeanCurrent(Sine(n, x => Math.Max(0, x)), e, v, vd, r), 1e-6 * half + 1e-12);
    }

    [Fact]
    public void A_capacitor_charged_from_a_constant_emf_follows_the_rc_exponential_to_a_tenth_of_a_percent()
    {
        // Source: RC charging (textbook circuit theory): V(t) = E' + (V0 - E') exp(-t / RC), E' = E - drops, so the time
        // from V0 to V1 is RC ln((E' - V0) / (E' - V1)).
        double e = 9, drops = 1.4, r = 3.3, c = 0.47, v0 = 0.5, v1 = 7.2;
        double expected = r * c * Math.Log((e - drops - v0) / (e - drops - v1));
        double got = Charging.TimeToCharge(vc => (e - vc - drops) / r, c, v0, v1);
        Assert.Equal(expected, got, 1e-3 * expected);
    }

    private static MachineModel Crank(Action<M.Design>? _ = null, string rectifier = "bridge", double batteryV = 3.0, string diode = "silicon")
    {
        var d = TestDesigns.Crank();
        var with = new M.Design
        {
            Name = d.Name, Machine = d.Machine, Magnets = d.Magnets, Rotor = d.Rotor, Coils = d.Coils, Stator = d.Stator, Sensor = d.Sensor,
            Storage = new M.Storage { Kind = "battery", Voltage = batteryV, InternalResistance = 0.05 },
            Load = new M.Load { Rectifier = rectifier, Diode = diode },
        };
        return MachineModel.From(with);
    }

    [Theory]
    [InlineData(3.0, "silicon")]
    [InlineData(6.0, "schottky")]
    public void Battery_cut_in_is_where_the_line_emf_peak_equals_the_battery_voltage_plus_two_drops(double v, string diode)
    {
        // Source: a three-phase bridge conducts through two diodes between the two lines with the largest EMF
        // (textbook); charging starts where the line EMF peak reaches V + 2 Vd. The EMF is proportional to speed.
        var m = Crank(batteryV: v, diode: diode);
        var e = ElectricalEngine.Evaluate(m);
        var ch = e.Charging!;
        double vd = diode == "schottky" ? 0.4 : 0.7;
        double peakPerRpm = e.LineEmfPeakV / e.RatedRpm;
        Assert.Equal((v + 2 * vd) / peakPerRpm, ch.CutInRpm, 1e-3 * ch.CutInRpm);
        // Below cut-in no current flows; above it the current grows with speed.
        foreach (var s in ch.Curve)
        {
            if (s.Rpm < ch.CutInRpm * 0.999) Assert.Equal(0, s.CurrentA);
            if (s.Rpm > ch.CutInRpm * 1.001) Assert.True(s.CurrentA > 0);
            Assert.Equal(s.CurrentA * v, s.PowerW, 1e-12);
        }
    }
}
