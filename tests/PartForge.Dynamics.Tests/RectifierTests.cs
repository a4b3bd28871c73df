namespace PartForge.Dynamics.Tests;

public class RectifierTests
{
    private const int Order = 3;
    private const double Lambda = 0.05, R = 0.5, Vbat = 12, Rint = 0.1;

    private static MachineSetup Generator(CircuitConnection c, double l) =>
        new(Rigs.Rotor(), [new CoilCircuit(R, l, FluxSeries.Cosine(Order, Lambda), c)], new Battery(Vbat, Rint));

    /// <summary>Mean battery charging current over whole revolutions at a held speed, A.</summary>
    private static SimulationResult Charge(CircuitConnection c, double l, double w, int revs = 6) =>
        Rigs.Run(Generator(c, l), new ChargeScenario(w * 30 / Math.PI, revs * 2 * Math.PI / w), new SimulationOptions { RelativeTolerance = 1e-9, QuasiStaticRatio = 0 });

    /// <summary>
    /// Closed form for a sinusoidal EMF of peak ep into a constant voltage vt through rt with L -> 0: conduction
    /// while ep sin x > vt, x1 = asin(vt/ep); per half-wave integral of (ep sin x - vt)/rt is (2 ep cos x1 -
    /// vt (pi - 2 x1)) / rt; the mean over a period is that over pi (bridge: both halves) or 2 pi (half-wave).
    /// </summary>
    private static double MeanCurrent(double ep, double vt, double rt, bool bridge)
    {
        if (ep <= vt) return 0;
        double x1 = Math.Asin(vt / ep);
        return (2 * ep * Math.Cos(x1) - vt * (Math.PI - 2 * x1)) / rt / (bridge ? Math.PI : 2 * Math.PI);
    }

    // Source: rectifier theory for a sinusoidal source into a battery through a resistance, L -> 0 (closed form
    // above); the battery's internal resistance adds to the coil's. L = 0 is solved exactly (1e-6); a small L
    // (L/R = 1 us against a 16 ms period) through the current-state path within 1e-3.
    [Theory]
    [InlineData(true, 0.0, 0.0)]
    [InlineData(true, 0.7, 0.0)]
    [InlineData(false, 0.0, 0.0)]
    [InlineData(false, 0.45, 0.0)]
    [InlineData(true, 0.7, 5e-7)]
    [InlineData(false, 0.45, 5e-7)]
    public void MeanChargingCurrentMatchesTheClosedForm(bool bridge, double vd, double l)
    {
        double ep = 20, w = ep / (Order * Lambda);
        var diode = new DiodeModel(vd);
        CircuitConnection c = bridge ? new BridgeRectifier(diode) : new HalfWaveRectifier(diode);
        var r = Charge(c, l, w);
        double expect = MeanCurrent(ep, Vbat + (bridge ? 2 : 1) * vd, R + Rint, bridge);
        double got = -r.StoreChargeDrawnC / r.EndTimeS;
        double tol = l == 0 ? 1e-6 : 1e-3;
        Assert.True(Math.Abs(got - expect) <= tol * expect, $"mean current {got} A, closed form {expect} A");
        Assert.True(r.Energy.BalanceError < 1e-6, r.Energy.ToString());
        // Energy into the battery's EMF is V x charge.
        Assert.Equal(-Vbat * got * r.EndTimeS, r.Energy.StoreDeliveredJ, 1e-9 * Vbat * got * r.EndTimeS);
    }

    // Source: the same closed form: the battery starts to charge at the speed where the EMF peak equals the
    // battery voltage plus two diode drops, omega_cut = (V + 2 Vd) / (n lambda).
    [Fact]
    public void BatteryCutInSpeed()
    {
        double vd = 0.7, wCut = (Vbat + 2 * vd) / (Order * Lambda);
        var below = Charge(new BridgeRectifier(DiodeModel.Silicon), 0, 0.99 * wCut);
        Assert.Equal(0, below.StoreChargeDrawnC);
        Assert.Equal(0, below.Energy.DiodeLossJ); // no diode ever conducted
        var above = Charge(new BridgeRectifier(DiodeModel.Silicon), 0, 1.01 * wCut);
        double expect = MeanCurrent(1.01 * (Vbat + 2 * vd), Vbat + 2 * vd, R + Rint, true);
        Assert.True(-above.StoreChargeDrawnC / above.EndTimeS > 0);
        Assert.Equal(expect, -above.StoreChargeDrawnC / above.EndTimeS, 1e-6 * expect);
    }

    // Source: AC circuit theory (phasors): a sinusoidal EMF of peak Ep behind R and L into a load resistance
    // delivers P = (Ep^2 / 2) R_load / ((R + R_load)^2 + (omega_e L)^2) on average.
    [Fact]
    public void ResistiveLoadPowerMatchesPhasors()
    {
        double l = 4e-3, rl = 4.5, ep = 20, w = ep / (Order * Lambda), we = Order * w;
        var m = new MachineSetup(Rigs.Rotor(), [new CoilCircuit(R, l, FluxSeries.Cosine(Order, Lambda), new ResistiveLoad(rl))], new IdealSupply(0));
        double t = 200 * 2 * Math.PI / we; // 200 electrical periods; the start transient decays in about 1 ms
        var r = Rigs.Run(m, new ChargeScenario(w * 30 / Math.PI, t));
        double p = ep * ep / 2 * rl / ((R + rl) * (R + rl) + we * l * we * l);
        Assert.Equal(p, r.Energy.LoadJ / r.EndTimeS, 1e-3 * p);
        Assert.Equal(0, r.Energy.StoreDeliveredJ);
        Assert.True(r.Energy.BalanceError < 1e-5, r.Energy.ToString());
    }
}
