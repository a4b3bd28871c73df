namespace PartForge.Dynamics.Tests;

public class RotorTests
{
    private static MachineSetup Bare(double j, double tf, double b) => new(Rigs.Rotor(j, tf, b), [], new IdealSupply(0));

    // Source: J d omega/dt = -b omega  =>  omega(t) = omega0 exp(-b t / J) (first-order linear ODE).
    [Fact]
    public void ViscousCoastIsExponential()
    {
        double j = 2e-4, b = 1e-5, rpm0 = 1000;
        var r = Rigs.Run(Bare(j, 0, b), new RunDownScenario(10) { InitialRpm = rpm0 }, new SimulationOptions { RelativeTolerance = 1e-9 });
        Assert.Equal(SimulationOutcome.TimeLimit, r.Outcome);
        var s = r.Series;
        Assert.True(s.Count > 100);
        for (int i = 0; i < s.Count; i++)
            Assert.Equal(rpm0 * Math.Exp(-b * s.TimeS[i] / j), s.Rpm[i], rpm0 * 1e-7);
        // The kinetic energy lost is the viscous loss.
        Assert.Equal(-r.Energy.KineticChangeJ, r.Energy.ViscousLossJ, 1e-9 * r.Energy.ViscousLossJ);
    }

    // Source: J d omega/dt = -Tf  =>  linear decay, stop at t = J omega0 / Tf; then static friction holds it.
    [Fact]
    public void CoulombCoastIsLinearAndStops()
    {
        double j = 2e-4, tf = 1e-3, w0 = 50;
        var r = Rigs.Run(Bare(j, tf, 0), new RunDownScenario(100) { InitialRpm = w0 * 30 / Math.PI });
        Assert.Equal(SimulationOutcome.RotorStopped, r.Outcome);
        double tStop = j * w0 / tf;
        Assert.NotNull(r.RunTimeS);
        Assert.Equal(tStop, r.RunTimeS!.Value, 1e-9 * tStop);
        Assert.Equal(0, r.FinalRpm);
        var s = r.Series;
        for (int i = 0; i < s.Count; i++)
            Assert.Equal(Math.Max(0, w0 - tf / j * s.TimeS[i]) * 30 / Math.PI, s.Rpm[i], 1e-6);
        Assert.Equal(0.5 * j * w0 * w0, r.Energy.FrictionLossJ, 1e-9);
    }

    // Source: same linear decay, backwards: the friction always opposes the motion.
    [Fact]
    public void CoulombFrictionOpposesBackwardMotion()
    {
        double j = 1e-4, tf = 5e-4, w0 = -20;
        var r = Rigs.Run(Bare(j, tf, 0), new RunDownScenario(100) { InitialRpm = w0 * 30 / Math.PI });
        Assert.Equal(SimulationOutcome.RotorStopped, r.Outcome);
        Assert.Equal(j * Math.Abs(w0) / tf, r.RunTimeS!.Value, 1e-9);
        Assert.True(r.Series.AngleRad[^1] < 0);
        Assert.Equal(-0.5 * j * w0 * w0 / tf, r.Series.AngleRad[^1], 1e-9); // theta = omega0^2 / (2 a)
    }
}
