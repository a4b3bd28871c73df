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

    // No-load speed is where the model's own mean torque is zero: with a rippled EMF (six-step-like |sin| profile
    // and a half-wave pulse profile) and currents that cannot reverse, the torque written out here,
    // T(w) = mean over samples of max(0, V' - k w) / R x k, is ~0 at the reported speed and positive just below it.
    // Source: the DC-machine torque relation T = k i per sample (any machine-design text), evaluated independently here.
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void NoLoadSpeedIsWhereTheTorqueIsZero(bool pulse)
    {
        int n = 360;
        var k = Enumerable.Range(0, n).Select(j => 0.05 * (pulse ? Math.Sin(2 * Math.PI * j / n) : 0.87 + 0.13 * Math.Abs(Math.Cos(6 * Math.PI * j / n)))).ToArray();
        var on = Enumerable.Range(0, n).Select(j => !pulse || j < n / 2).ToArray();
        var mp = OperatingPoints.Motor(pulse ? "pulse" : "six-step", 12, 1.4, 2, k, on, 1000, 1, 0.1);
        double v = 10.6;
        double Torque(double w) => Enumerable.Range(0, n).Where(j => on[j]).Sum(j => Math.Max(0, (v - k[j] * w) / 2) * k[j]) / n;
        double w0 = mp.NoLoadRpm * 2 * Math.PI / 60;
        Assert.True(Math.Abs(Torque(w0)) < 1e-6 * mp.StallTorqueNm, $"torque at the no-load speed {Torque(w0)}");
        Assert.True(Torque(0.999 * w0) > 0);
        Assert.Equal(Torque(0), mp.StallTorqueNm, 12);
        // Above the speed of the mean EMF constant (the old estimate).
        double kMean = Enumerable.Range(0, n).Where(j => on[j]).Average(j => k[j]);
        Assert.True(w0 > v / kMean);
    }

    // A window that closes where the EMF crosses zero holds a sample with k near 0; its zero-torque bound v / k is
    // absurd (it gave 7e17 rpm) while its torque is negligible. The speed reported is finite, the torque there is
    // below 0.1 % of the stall torque and still positive just below it.
    [Fact]
    public void A_sample_at_the_emf_zero_does_not_send_the_no_load_speed_to_infinity()
    {
        int n = 360;
        var k = Enumerable.Range(0, n).Select(j => 0.05 * Math.Sin(2 * Math.PI * j / n)).ToArray();
        k[1] = 0.05e-12;
        var on = Enumerable.Range(0, n).Select(j => j < n / 2).ToArray();
        var mp = OperatingPoints.Motor("pulse", 12, 1.4, 2, k, on, 1000, 1, 0.1);
        double v = 10.6;
        double Torque(double w) => Enumerable.Range(0, n).Where(j => on[j]).Sum(j => Math.Max(0, (v - k[j] * w) / 2) * k[j]) / n;
        double w0 = mp.NoLoadRpm * 2 * Math.PI / 60;
        double kMean = Enumerable.Range(0, n).Where(j => on[j]).Average(j => k[j]);
        Assert.InRange(w0, v / kMean, 100 * v / kMean);
        Assert.True(Torque(w0) < 1e-3 * mp.StallTorqueNm, $"torque at the no-load speed {Torque(w0)}");
        Assert.True(Torque(0.999 * w0) > 0);
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
