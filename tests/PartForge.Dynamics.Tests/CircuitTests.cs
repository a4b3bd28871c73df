namespace PartForge.Dynamics.Tests;

public class CircuitTests
{
    // Source: textbook first-order RL step response, i(t) = V/R (1 - exp(-R t / L)): a switch closed at standstill
    // (no EMF) on an ideal supply; switch drop and on-resistance in series.
    [Fact]
    public void RlCurrentRise()
    {
        double v = 12, vsw = 0.5, ron = 0.3, r = 2.7, l = 3e-3;
        var drive = new Drive(new UnipolarSwitching(), new SwitchModel(vsw, ron), new DiodeFreewheel(DiodeModel.Silicon));
        var m = new MachineSetup(Rigs.Rotor(), [new CoilCircuit(r, l, FluxSeries.Cosine(4, 0.01), Rigs.AlwaysOn)], new IdealSupply(v), drive);
        var res = Rigs.Run(m, new ChargeScenario(0, 10 * l / (r + ron)), new SimulationOptions { RelativeTolerance = 1e-9 });
        Assert.Equal(SimulationOutcome.TimeLimit, res.Outcome);
        var s = res.Series;
        double tau = l / (r + ron), iInf = (v - vsw) / (r + ron);
        for (int j = 0; j < s.Count; j++)
        {
            double expect = iInf * (1 - Math.Exp(-s.TimeS[j] / tau));
            Assert.True(Math.Abs(s.CurrentsA[0][j] - expect) <= 1e-6 * iInf, $"t {s.TimeS[j]}: {s.CurrentsA[0][j]} vs {expect}");
        }
        // Energy: supply = copper + switch + magnetic.
        Assert.True(res.Energy.BalanceError < 1e-6, res.Energy.ToString());
    }

    /// <summary>
    /// A constant EMF E: lambda = (E / omega) sin(theta) turned slowly from theta = 0, so over the test window
    /// (theta below 1e-3 rad) e = E cos(theta) stays within 5e-7 of E.
    /// </summary>
    private static MachineSetup ConstantEmfIntoCapacitor(double e, double omega, double r, double l, double c, double esr) =>
        new(Rigs.Rotor(), [new CoilCircuit(r, l, new FluxSeries([new FluxHarmonic(1, 0, e / omega)]), new HalfWaveRectifier(DiodeModel.Ideal))],
            new Capacitor(c, esr, 0));

    // Source: textbook RC charging from a constant EMF through a resistance, v(t) = E (1 - exp(-t / RC)), R being
    // the coil resistance plus the ESR; with L = 0 the circuit is exactly first order.
    [Fact]
    public void RcCharging()
    {
        double e = 10, w = 0.2, r = 0.8, esr = 0.2, c = 1e-3, rc = (r + esr) * c;
        var res = Rigs.Run(ConstantEmfIntoCapacitor(e, w, r, 0, c, esr), new ChargeScenario(w * 30 / Math.PI, 5 * rc),
            new SimulationOptions { RelativeTolerance = 1e-9 });
        var s = res.Series;
        Assert.True(s.Count > 100);
        for (int j = 0; j < s.Count; j++)
            Assert.Equal(e * (1 - Math.Exp(-s.TimeS[j] / rc)), s.StoreV[j], 1e-5 * e);
        // Stored energy 1/2 C v^2 is exactly what the EMF delivered less the resistive losses.
        Assert.Equal(0.5 * c * s.StoreV[^1] * s.StoreV[^1], -res.Energy.StoreDeliveredJ, 1e-6 * 0.5 * c * e * e);
        Assert.True(res.Energy.BalanceError < 1e-6, res.Energy.ToString());
    }

    // Source: textbook series RLC step response (overdamped): v(t) = E [1 - (s2 e^{s1 t} - s1 e^{s2 t}) / (s2 - s1)],
    // s1,2 = -R/2L +- sqrt((R/2L)^2 - 1/LC); with L/R much shorter than RC it is the RC curve within 0.1 %.
    // Both are checked.
    [Fact]
    public void RlcChargingApproachesRc()
    {
        double e = 10, w = 0.2, r = 0.8, esr = 0.2, c = 1e-3, rt = r + esr, rc = rt * c;
        double l = 1e-4 * rt * rc; // L/R = 1e-4 RC
        var res = Rigs.Run(ConstantEmfIntoCapacitor(e, w, r, l, c, esr), new ChargeScenario(w * 30 / Math.PI, 5 * rc),
            new SimulationOptions { RelativeTolerance = 1e-8, QuasiStaticRatio = 0 });
        Assert.Empty(res.QuasiStaticCircuits);
        double disc = Math.Sqrt(rt * rt / (4 * l * l) - 1 / (l * c));
        double s1 = -rt / (2 * l) + disc, s2 = -rt / (2 * l) - disc;
        var s = res.Series;
        for (int j = 0; j < s.Count; j++)
        {
            double t = s.TimeS[j];
            double rlc = e * (1 - (s2 * Math.Exp(s1 * t) - s1 * Math.Exp(s2 * t)) / (s2 - s1));
            Assert.Equal(rlc, s.StoreV[j], 1e-5 * e);
            Assert.Equal(e * (1 - Math.Exp(-t / rc)), s.StoreV[j], 1e-3 * e);
        }
        Assert.True(res.Energy.BalanceError < 1e-5, res.Energy.ToString());
    }

    // Source: first-order RL decay through a diode of constant drop Vd: L di/dt = -Vd - R i from i0 gives
    // i(t) = (i0 + Vd/R) exp(-t/tau) - Vd/R, reaching zero at t = tau ln(1 + i0 R / Vd); the diode then blocks.
    // The rise before it is the RL step response. No flux, so no EMF: the held rotor only times the window.
    [Fact]
    public void FreewheelDiodeDecayEndsAtTheAnalyticTime()
    {
        double v = 6, r = 3, l = 6e-3, vd = 0.7, tau = l / r;
        double w = 2 * Math.PI; // one revolution per second; window 0 to 18 degrees: 50 ms on
        double tOn = 0.05;
        var drive = new Drive(new UnipolarSwitching(), SwitchModel.Ideal, new DiodeFreewheel(new DiodeModel(vd)));
        var m = new MachineSetup(Rigs.Rotor(), [new CoilCircuit(r, l, new FluxSeries([]), new DriveConnection([new ConductionWindow(0, 18)]))],
            new IdealSupply(v), drive);
        var res = Rigs.Run(m, new ChargeScenario(w * 30 / Math.PI, 0.2), new SimulationOptions { RelativeTolerance = 1e-10, SeriesMaxPoints = 100_000 });
        double i0 = v / r * (1 - Math.Exp(-tOn / tau));
        double tZero = tau * Math.Log(1 + i0 * r / vd);
        var s = res.Series;
        for (int j = 0; j < s.Count; j++)
        {
            double t = s.TimeS[j];
            double expect = t < tOn ? v / r * (1 - Math.Exp(-t / tau))
                : t < tOn + tZero ? (i0 + vd / r) * Math.Exp(-(t - tOn) / tau) - vd / r : 0;
            Assert.True(Math.Abs(s.CurrentsA[0][j] - expect) < 1e-7, $"t {t}: {s.CurrentsA[0][j]} vs {expect}");
        }
        // Diode loss Vd x charge through it (closed-form integral of the decay).
        double q = (i0 + vd / r) * tau * (1 - Math.Exp(-tZero / tau)) - vd / r * tZero;
        Assert.Equal(vd * q, res.Energy.DiodeLossJ, 1e-9);
        Assert.Equal(0, res.Energy.SwitchTurnOffLossJ);
        Assert.Null(res.PeakTurnOffKickV);
    }

    // Source: without a freewheel the current is forced to zero at turn-off: the energy 1/2 L i^2 (i from the RL
    // step response at the window's end) is the switch's turn-off loss, and the kick estimate is V + i sqrt(L/C).
    [Fact]
    public void TurnOffWithoutFreewheelCountsTheInductiveEnergy()
    {
        double v = 6, r = 3, l = 6e-3, tau = l / r, cs = 220e-12;
        double w = 2 * Math.PI, tOn = 0.05;
        var drive = new Drive(new UnipolarSwitching(), SwitchModel.Ideal, new NoFreewheel()) { StrayCapacitanceF = cs };
        var m = new MachineSetup(Rigs.Rotor(), [new CoilCircuit(r, l, new FluxSeries([]), new DriveConnection([new ConductionWindow(0, 18), new ConductionWindow(180, 198)]))],
            new IdealSupply(v), drive);
        var res = Rigs.Run(m, new ChargeScenario(w * 30 / Math.PI, 0.99), new SimulationOptions { RelativeTolerance = 1e-10 });
        double i0 = v / r * (1 - Math.Exp(-tOn / tau));
        Assert.Equal(2 * 0.5 * l * i0 * i0, res.Energy.SwitchTurnOffLossJ, 1e-9);
        Assert.Equal(v + i0 * Math.Sqrt(l / cs), res.PeakTurnOffKickV!.Value, 1e-6);
        Assert.True(res.Energy.BalanceError < 1e-7, res.Energy.ToString());
    }
}
