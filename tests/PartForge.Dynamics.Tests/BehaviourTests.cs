using System.Collections.Concurrent;

namespace PartForge.Dynamics.Tests;

public class BehaviourTests
{
    private static (MachineSetup M, StartScenario S) Motor()
    {
        var f = new FluxSeries([new FluxHarmonic(4, 0.01, 0), new FluxHarmonic(12, 0.0008, 0)]);
        var m = new MachineSetup(new RotorParameters(2e-4, 2e-4, 1e-6), [new CoilCircuit(4.6, 2.2e-3, f, DriveConnection.Periodic(4, new ConductionWindow(50, 85)))],
            new Capacitor(0.05, 0.05, 6), Rigs.Unipolar(0.2, true, 0.7)) { InitialAngleDeg = 60 };
        return (m, new StartScenario(2) { StopWhenSteady = false });
    }

    private static void SameResult(SimulationResult a, SimulationResult b)
    {
        Assert.Equal(a with { Series = b.Series, Energy = b.Energy, Problems = b.Problems }, b);
        Assert.Equal(a.Energy, b.Energy);
        Assert.Equal(a.Series.TimeS, b.Series.TimeS);
        Assert.Equal(a.Series.Rpm, b.Series.Rpm);
        Assert.Equal(a.Series.AngleRad, b.Series.AngleRad);
        Assert.Equal(a.Series.StoreV, b.Series.StoreV);
        Assert.Equal(a.Series.TorqueNm, b.Series.TorqueNm);
        Assert.Equal(a.Series.CurrentsA[0], b.Series.CurrentsA[0]);
    }

    // Determinism: the same input gives bit-identical results, also from several threads at once (no shared state).
    [Fact]
    public void SameInputSameResult()
    {
        var (m, s) = Motor();
        var first = Simulator.Run(m, s);
        var again = Simulator.Run(m with { }, s with { });
        SameResult(first, again);
        var parallel = new ConcurrentBag<SimulationResult>();
        Parallel.For(0, 4, _ => parallel.Add(Simulator.Run(m, s)));
        foreach (var r in parallel) SameResult(first, r);
    }

    // The trace: at most SeriesMaxPoints samples, starting at t = 0 and ending at the end time, on a uniform grid
    // (the last interval may be shorter), with the run's initial state first.
    [Theory]
    [InlineData(2000)]
    [InlineData(37)]
    [InlineData(2)]
    public void SeriesIsBoundedAndUniform(int max)
    {
        var (m, s) = Motor();
        var r = Rigs.Run(m, s, new SimulationOptions { SeriesMaxPoints = max });
        var t = r.Series.TimeS;
        Assert.InRange(r.Series.Count, Math.Min(2, max), max);
        Assert.Equal(0, t[0]);
        Assert.Equal(r.EndTimeS, t[^1]);
        Assert.Equal(0, r.Series.CurrentsA[0][0]);
        Assert.Equal(r.FinalRpm, r.Series.Rpm[^1]);
        if (t.Count > 3)
        {
            double dt = t[1] - t[0];
            for (int i = 1; i < t.Count - 1; i++) Assert.Equal(dt, t[i] - t[i - 1], 1e-9 * r.EndTimeS);
            Assert.True(t[^1] - t[^2] <= dt * (1 + 1e-9));
            Assert.True(r.Series.Count >= max / 2 - 1, $"{r.Series.Count} of {max}");
        }
    }

    private sealed class Recorder : IProgress<double>
    {
        public readonly List<double> Values = [];
        public void Report(double value) => Values.Add(value);
    }

    // Progress: fractions in [0, 1], non-decreasing, ending at 1.
    [Fact]
    public void ProgressRisesToOne()
    {
        var (m, s) = Motor();
        var p = new Recorder();
        Simulator.Run(m, s, progress: p);
        Assert.True(p.Values.Count > 10);
        Assert.All(p.Values, v => Assert.InRange(v, 0, 1));
        for (int i = 1; i < p.Values.Count; i++) Assert.True(p.Values[i] >= p.Values[i - 1]);
        Assert.Equal(1, p.Values[^1]);
    }

    // Cancellation stops the run with the result so far.
    [Fact]
    public void CancellationStops()
    {
        var (m, s) = Motor();
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        var r = Simulator.Run(m, s, cancellationToken: cts.Token);
        Assert.Equal(SimulationOutcome.Cancelled, r.Outcome);
        Assert.Equal(0, r.EndTimeS);
        Assert.Equal(1, r.Series.Count);
    }

    // A step budget ends the run honestly.
    [Fact]
    public void StepLimit()
    {
        var (m, s) = Motor();
        var r = Simulator.Run(m, s, new SimulationOptions { MaxSteps = 100 });
        Assert.Equal(SimulationOutcome.StepLimit, r.Outcome);
        Assert.Equal(100, r.AcceptedSteps + r.RejectedSteps);
        Assert.True(r.EndTimeS > 0 && r.EndTimeS < 2);
    }

    // A flyback diode that turns on at zero current with L/R = 4.8 us under a loose tolerance: its true current
    // starts far below the integration's error; the run must neither chatter (turn off and on at one instant)
    // nor drift: the same speeds as a tight run.
    [Fact]
    public void DiodeTurnOnDoesNotChatterUnderLooseTolerance()
    {
        var f = new FluxSeries([new FluxHarmonic(4, 0.01, 0), new FluxHarmonic(12, 0.0008, 0)]);
        var m = new MachineSetup(new RotorParameters(2e-4, 2e-4, 1e-6), [new CoilCircuit(4.6, 2.2e-5, f, DriveConnection.Periodic(4, new ConductionWindow(50, 85)))],
            new IdealSupply(6), Rigs.Unipolar(0.2, true, 0.7)) { InitialAngleDeg = 60 };
        var s = new StartScenario(1) { StopWhenSteady = false };
        var loose = Rigs.Run(m, s, new SimulationOptions { RelativeTolerance = 1e-4, QuasiStaticRatio = 0 });
        var tight = Rigs.Run(m, s, new SimulationOptions { RelativeTolerance = 1e-8, QuasiStaticRatio = 0 });
        Assert.Equal(SimulationOutcome.TimeLimit, loose.Outcome);
        Assert.Equal(tight.FinalRpm, loose.FinalRpm, 1e-3 * tight.FinalRpm);
        Assert.True(loose.Energy.BalanceError < 1e-3, loose.Energy.ToString());
    }

    // A rotor parked where no window is closed never starts: it stalls (and says so) instead of running on.
    [Fact]
    public void ParkedOutsideTheWindowsStalls()
    {
        var (m, s) = Motor();
        var r = Rigs.Run(m with { InitialAngleDeg = 20 }, s with { });
        Assert.Equal(SimulationOutcome.Stalled, r.Outcome);
        Assert.Equal(0, r.FinalRpm);
        Assert.Null(r.SteadyRpm);
    }
}
