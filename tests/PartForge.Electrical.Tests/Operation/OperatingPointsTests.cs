using PartForge.Electrical.Operation;

namespace PartForge.Electrical.Tests.Operation;

public class OperatingPointsTests
{
    // Circuit theory (Ohm's law, star-equivalent): E 10 V, R 1, R_load 4, no inductance -> I 2 A, P_out 3 x 16 W.
    [Fact]
    public void GeneratorIntoResistiveLoad()
    {
        var g = OperatingPoints.Generator(3, 10, 1, 0, 4, 600, 4, 1, 0.5);
        Assert.Equal(2, g.CurrentA, 12);
        Assert.Equal(48, g.OutputPowerW, 12);
        Assert.Equal(12, g.CopperLossW, 12);
        Assert.Equal(0.8, g.Efficiency, 12);
        Assert.Equal(Math.Sqrt(3) * 8, g.TerminalVoltageV, 12);
        Assert.Equal(60 / (2 * Math.PI * 600 / 60), g.ShaftTorqueNm, 12);
        Assert.Equal(4, g.CurrentDensityAPerMm2, 12);
        // Inductive reactance lowers the current: |Z| = sqrt(5^2 + (omega_e L)^2).
        var gl = OperatingPoints.Generator(1, 10, 1, 1000, 4, 600, 4, 1, 0.5);
        double x = 2 * Math.PI * 4 * 600 / 60 * 1e-3;
        Assert.Equal(10 / Math.Sqrt(25 + x * x), gl.CurrentA, 12);
    }

    // DC machine relations with a constant EMF constant k: no-load speed V'/k, stall torque V' k / R, I = (V' - k w)/R.
    [Fact]
    public void MotorWithConstantEmf()
    {
        int n = 360;
        var k = Enumerable.Repeat(0.05, n).ToArray();
        var on = Enumerable.Repeat(true, n).ToArray();
        var mp = OperatingPoints.Motor("six-step", 12, 1.4, 2, k, on, 1000, 1, 0.1);
        double v = 10.6;
        Assert.Equal(v / 0.05 * 60 / (2 * Math.PI), mp.NoLoadRpm, 6);
        Assert.Equal(v * 0.05 / 2, mp.StallTorqueNm, 9);
        double w = 2 * Math.PI * 1000 / 60, i = (v - 0.05 * w) / 2;
        Assert.Equal(i, mp.CurrentAtRatedA, 9);
        Assert.Equal(i * 0.05, mp.TorqueAtRatedNm, 9);
        Assert.Equal(i * 0.05 * w / (12 * i), mp.EfficiencyAtRated, 9);
        Assert.Equal(i / 0.1, mp.CurrentDensityAtRatedAPerMm2, 9);
        // Half-period conduction halves the averages.
        var half = Enumerable.Range(0, n).Select(j => j < n / 2).ToArray();
        var mh = OperatingPoints.Motor("pulse", 12, 1.4, 2, k, half, 1000, 1, 0.1);
        Assert.Equal(mp.StallTorqueNm / 2, mh.StallTorqueNm, 12);
        Assert.Equal(mp.NoLoadRpm, mh.NoLoadRpm, 6);
    }

    // Engine level: generator power balance and a motor that slows down under the no-load speed.
    [Theory]
    [InlineData("crank")]
    [InlineData("pulse")]
    [InlineData("arc")]
    public void EngineOperatingPointsAreConsistent(string which)
    {
        var machine = PartForge.Design.Machines.MachineModel.From(Flux.CoilFluxTests.Pick(which));
        var r = ElectricalEngine.Evaluate(machine);
        // Only the role's points are computed (machine.role).
        Assert.Equal(machine.RunsAsGenerator, r.Generator is not null);
        Assert.Equal(machine.RunsAsMotor, r.Motor is not null);
        if (r.Generator is { } g)
        {
        double w = 2 * Math.PI * r.RatedRpm / 60;
        Assert.Equal(g.OutputPowerW + g.CopperLossW, g.ShaftTorqueNm * w, 1e-9);
        Assert.InRange(g.Efficiency, 0, 1);
        }
        if (r.Motor is not { } m) return;
        Assert.True(m.NoLoadRpm > 0 && m.StallTorqueNm > 0);
        if (m.NoLoadRpm > r.RatedRpm) Assert.True(m.TorqueAtRatedNm > 0 && m.TorqueAtRatedNm < m.StallTorqueNm);
        Assert.InRange(m.EfficiencyAtRated, 0, 1);
    }
}
