using PartForge.Design.Stack;
using PartForge.Electrical.Field;
using PartForge.Geometry.Primitives;

namespace PartForge.Electrical.Tests.Sensors;

public class SensorPlannerTests
{
    // Six-step practice: each hall's output follows its line EMF (A-C, B-A, C-B) so it switches at a commutation
    // instant. Checked physically: the sign of the rotor field at the sensor (from the field model) against the
    // sign of that line EMF over one electrical period.
    [Theory]
    [InlineData("crank")]
    [InlineData("large")]
    [InlineData("dual-stator")]
    [InlineData("arc")]
    public void HallsFollowTheirLineEmf(string which)
    {
        var d = Flux.CoilFluxTests.Pick(which);
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var s = r.Sensors!.Sensors;
        Assert.Equal(3, s.Count);
        Assert.All(s, x => Assert.True(x.Fits));
        var field = RotorField.From(PartForge.Design.Machines.MachineModel.From(d));
        var wv = r.Waveforms!;
        int p = r.PolePairs, m = wv.ThetaElecDeg.Count;
        for (int x = 0; x < 3; x++)
        {
            var e = wv.PhaseEmfV[x].Zip(wv.PhaseEmfV[(x + 2) % 3], (a, b) => a - b).ToArray();
            int agree = 0;
            for (int i = 0; i < m; i++)
            {
                double th = wv.ThetaMechDeg[i];
                var pt = Vec2.FromAngleDeg(s[x].AngleDeg - th) * s[x].RadiusMm; // sensor position in the rotor frame
                double b = field.Bz(pt.X, pt.Y, 0.5 * (field.CopperZMinMm + field.CopperZMaxMm));
                if (s[x].Inverted) b = -b;
                if (Math.Sign(b) == Math.Sign(e[i])) agree++;
            }
            Assert.True(agree >= m * 0.9, $"sensor {s[x].Label}: {agree}/{m}");
        }
        // 120 electrical degrees apart once the inversion (a pole pitch) is accounted for.
        for (int x = 1; x < 3; x++)
        {
            double de = s[x].ElectricalDeg - s[0].ElectricalDeg - 120 * x - 180 * ((s[x].Inverted ? 1 : 0) - (s[0].Inverted ? 1 : 0));
            Assert.Equal(0, Math.IEEERemainder(de, 360), 6);
        }
    }

    // Pulse drive: at the switch-on angle the phase EMF crosses zero going positive and the field at the sensor changes sign.
    [Fact]
    public void SingleSensorSwitchesAtTheEmfZeroCrossing()
    {
        var d = TestDesigns.Pulse();
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var sl = r.Sensors!;
        var s = Assert.Single(sl.Sensors);
        Assert.True(s.Fits);
        double onElec = sl.SwitchOnElecDeg!.Value;
        var series = r.FluxLinkage!;
        double th = onElec / r.PolePairs * Math.PI / 180, h = 1e-4;
        // EMF ~ d lambda/d theta of the phase (series-connected, coil 0 in phase): zero and rising.
        Assert.True(Math.Abs(series.Derivative(th)) < 1e-3 * r.CoilFluxLinkagePeakWb * r.PolePairs);
        Assert.True(series.Derivative(th + h) > 0 && series.Derivative(th - h) < 0);
        var field = RotorField.From(PartForge.Design.Machines.MachineModel.From(d));
        double thDeg = onElec / r.PolePairs;
        Vec2 At(double rotorDeg) => Vec2.FromAngleDeg(s.AngleDeg - rotorDeg) * s.RadiusMm;
        double before = field.Bz(At(thDeg - 0.5).X, At(thDeg - 0.5).Y, 0), after = field.Bz(At(thDeg + 0.5).X, At(thDeg + 0.5).Y, 0);
        Assert.True(Math.Sign(before) != Math.Sign(after), "the sensor sees the field change sign at switch-on");
    }

    // Advance moves the sensor against the rotation by advance/p mechanical degrees.
    [Fact]
    public void AdvanceShiftsTheSensor()
    {
        var d = TestDesigns.Pulse();
        var a = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d)).Sensors!;
        var b = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(Copy.With(d, sensor: new PartForge.Design.Model.Sensor { Kind = "hall", Count = 1, AdvanceElec = 20 }))).Sensors!;
        Assert.Equal(a.SwitchOnElecDeg!.Value - 20, b.SwitchOnElecDeg!.Value, 9);
        double shift = Math.IEEERemainder(b.Sensors[0].AngleDeg - a.Sensors[0].AngleDeg + 20.0 / 4, 180.0 / 4);
        Assert.Equal(0, shift, 6);
    }
}
