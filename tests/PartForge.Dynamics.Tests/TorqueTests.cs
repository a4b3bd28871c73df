namespace PartForge.Dynamics.Tests;

public class TorqueTests
{
    private const double V = 6, R = 2, L = 1e-3;

    // Alternating magnets: lambda = L1 cos(4 theta) (one period per pole pair, 90 degrees). A reed switch closes
    // as each magnet passes, whatever its pole: two windows per electrical period, 45 degrees apart.
    private static readonly FluxSeries Alternating = FluxSeries.Cosine(4, 0.01);
    private static readonly DriveConnection EveryMagnet = DriveConnection.Periodic(8, new ConductionWindow(5, 35));

    // Every magnet shows the same pole: the linkage is largest over a magnet and smallest between magnets, so it
    // is an offset plus a fundamental with one period per magnet (45 degrees, mechanical order 8).
    private static readonly FluxSeries SamePole = new([new FluxHarmonic(0, 0.008, 0), new FluxHarmonic(8, 0.004, 0)]);
    // d lambda/d theta = -8 x 0.004 sin(8 theta) > 0 from 22.5 to 45 degrees of every 45.
    private static readonly DriveConnection AfterEachMagnet = DriveConnection.Periodic(8, new ConductionWindow(24, 42));

    private static MachineSetup Motor(FluxSeries f, DriveConnection w, double tf = 1e-4) =>
        new(Rigs.Rotor(1e-4, tf, 1e-6), [new CoilCircuit(R, L, f, w)], new IdealSupply(V), Rigs.Unipolar(0.2, true, 0.6));

    // Source: coenergy torque of an air-cored coil, T = i d lambda/d theta, with d lambda/d theta from a central
    // difference of lambda computed in the test: every sample of the engine's torque matches it, and the
    // torque integrated over each current pulse has the sign of d lambda/d theta over that pulse.
    [Fact]
    public void EveryPulseTorqueIsCurrentTimesFluxSlope()
    {
        var r = Rigs.Run(Motor(Alternating, EveryMagnet), new ChargeScenario(300, 1.0), new SimulationOptions { SeriesMaxPoints = 40000 });
        var s = r.Series;
        var pulses = new List<(double Torque, double Slope)>();
        double tq = 0, sl = 0;
        bool inPulse = false;
        for (int j = 0; j < s.Count; j++)
        {
            double i = s.CurrentsA[0][j], k = QuasiStatic.Slope(Alternating, s.AngleRad[j]);
            Assert.Equal(i * k, s.TorqueNm[j], 1e-9);
            Assert.True(i >= 0, "a unipolar circuit never carries negative current");
            if (i > 1e-6) { tq += s.TorqueNm[j]; sl += k * i; inPulse = true; }
            else if (inPulse) { pulses.Add((tq, sl)); tq = sl = 0; inPulse = false; }
        }
        Assert.True(pulses.Count >= 10, $"{pulses.Count} pulses");
        foreach (var (t, k) in pulses) Assert.Equal(Math.Sign(k), Math.Sign(t));
        // Reed switch on both poles: the pulses alternate between motoring and braking.
        Assert.Contains(pulses, p => p.Torque > 0);
        Assert.Contains(pulses, p => p.Torque < 0);
    }

    /// <summary>The settled torque with the rotor held at an angle (window state and current settled).</summary>
    private static double HeldTorque(FluxSeries f, DriveConnection w, double deg) =>
        Rigs.Run(Motor(f, w) with { InitialAngleDeg = deg }, new ChargeScenario(0, 20 * L / R)).Series.TorqueNm[^1];

    // Source: symmetry of the alternating arrangement, d lambda/d theta (theta + 45 deg) = -d lambda/d theta (theta),
    // with identical windows every 45 degrees: the angle-mean standstill torque is zero (the test averages the
    // engine's held torque over 360 angles, which cancels pairwise), while at speed the braking pulses, where
    // the back-EMF adds to the supply, carry more current than the motoring ones: the mean torque is negative.
    // Pushed and left alone it does not run: it ends trapped between two windows that push it back (it keeps
    // swinging there: the current's lag at each window's entry and the flyback current after its exit both push
    // outward, a small energy pump that the friction here does not absorb).
    [Fact]
    public void ReedSwitchOnAlternatingMagnetsBrakes()
    {
        var held = Enumerable.Range(0, 360).Select(d => HeldTorque(Alternating, EveryMagnet, d + 0.5)).ToArray();
        double peak = held.Max(Math.Abs);
        Assert.True(peak > 0.05, $"peak standstill torque {peak}");
        Assert.True(Math.Abs(held.Average()) < 1e-6 * peak, $"mean standstill torque {held.Average()}");
        var run = Rigs.Run(Motor(Alternating, EveryMagnet), new ChargeScenario(300, 12 * 60 / 300.0));
        Assert.True(run.CycleMeanTorqueNm < -1e-3, $"mean torque at 300 rpm {run.CycleMeanTorqueNm}");
        var coast = Rigs.Run(Motor(Alternating, EveryMagnet), new StartScenario(20) { InitialRpm = 300 });
        var late = coast.Series.AngleRad.Skip(coast.Series.Count / 2).ToArray();
        Assert.True(late.Max() - late.Min() < Math.PI / 4, $"late swing {(late.Max() - late.Min()) * 180 / Math.PI} degrees");
        Assert.Null(coast.SteadyRpm);
        Assert.True(coast.Energy.BalanceError < 1e-5, coast.Energy.ToString());
    }

    // Source: same-pole arrangement (offset plus order-8 fundamental), switch closed only where
    // d lambda/d theta > 0: the held torque is never negative, its angle mean is positive, and the motor starts
    // from rest to a steady speed.
    [Fact]
    public void SamePoleArrangementRuns()
    {
        var held = Enumerable.Range(0, 90).Select(d => HeldTorque(SamePole, AfterEachMagnet, 4 * d + 0.5)).ToArray();
        Assert.All(held, t => Assert.True(t >= 0));
        Assert.True(held.Average() > 1e-3, $"mean standstill torque {held.Average()}");
        var start = Rigs.Run(Motor(SamePole, AfterEachMagnet) with { InitialAngleDeg = 30 }, new StartScenario(30));
        Assert.Equal(SimulationOutcome.SteadySpeed, start.Outcome);
        Assert.True(start.SteadyRpm > 100, $"steady {start.SteadyRpm} rpm");
        Assert.True(start.SpinUp90S > 0 && start.SpinUp90S < start.SpinUp99S && start.SpinUp99S < start.EndTimeS);
    }

    // Source: the independent quasi-static H-bridge model (QuasiStatic.Bipolar: +V or -V through two switches,
    // the bridge diodes returning current to the supply, dead bands), at held speeds with L = 0; the windows
    // apply the sign of d lambda/d theta like a commutator.
    [Theory]
    [InlineData(20.0, true)]
    [InlineData(150.0, true)]
    [InlineData(400.0, true)]
    [InlineData(150.0, false)]
    public void BipolarHeldSpeedTorqueMatchesQuasiStatic(double w, bool diodes)
    {
        var f = FluxSeries.Cosine(2, 0.02); // d lambda/d theta = -0.04 sin(2 theta): positive from 90 to 180 degrees
        var win = DriveConnection.Periodic(2, new ConductionWindow(100, 170, 1), new ConductionWindow(10, 80, -1));
        double vsw = 0.3, vd = 0.7, ron = 0.1;
        var drive = new Drive(new BipolarSwitching(), new SwitchModel(vsw, ron), diodes ? new DiodeFreewheel(new DiodeModel(vd)) : new NoFreewheel());
        var m = new MachineSetup(Rigs.Rotor(), [new CoilCircuit(R, 0, f, win)], new IdealSupply(V), drive);
        var r = Rigs.Run(m, new ChargeScenario(w * 30 / Math.PI, 12 * 2 * Math.PI / w), new SimulationOptions { RelativeTolerance = 1e-9 });
        double expect = QuasiStatic.RevolutionMean(th =>
        {
            double k = QuasiStatic.Slope(f, th);
            return QuasiStatic.Bipolar(QuasiStatic.Command(win.Windows, th), k * w, V, vsw, ron, R, diodes ? vd : null) * k;
        }, win.Windows.SelectMany(x => new[] { x.OnDeg, x.OffDeg }), 20000);
        Assert.True(Math.Abs(r.CycleMeanTorqueNm!.Value - expect) <= 1e-6 * Math.Abs(expect), $"{r.CycleMeanTorqueNm} vs {expect}");
        Assert.True(r.Energy.BalanceError < 1e-6, r.Energy.ToString());
    }
}
