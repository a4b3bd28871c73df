namespace PartForge.Dynamics.Tests;

public class SixStepTests
{
    private const int P = 2; // pole pairs: electrical angle = 2 x mechanical
    private const double Lambda = 0.02, R = 1.5, V = 12, Vsw = 0.3, Vd = 0.7;

    /// <summary>Phase x: lambda = Lambda cos(p theta - 120 x degrees).</summary>
    private static FluxSeries Flux(int x) => Fluxes[x];

    private static readonly FluxSeries[] Fluxes = Enumerable.Range(0, 3).Select(x => FluxSeries.Cosine(P, Lambda, 2 * Math.PI * x / 3)).ToArray();

    /// <summary>
    /// 120-degree conduction: d lambda_x/d theta = -p Lambda sin(p theta - 120 x) is largest at electrical
    /// 270 + 120 x degrees, so leg x's high side conducts from 210 + 120 x to 330 + 120 x (electrical) and its low
    /// side from 30 + 120 x to 150 + 120 x; mechanical degrees are those over p, repeated p times.
    /// </summary>
    private static readonly DriveConnection[] Cached = [MakeWindows(0), MakeWindows(1), MakeWindows(2)];

    private static DriveConnection Windows(int x) => Cached[x];

    private static DriveConnection MakeWindows(int x)
    {
        double Mech(double e) => ((e % 360) + 360) % 360 / P;
        return DriveConnection.Periodic(P,
            new ConductionWindow(Mech(210 + 120 * x), Mech(330 + 120 * x), 1),
            new ConductionWindow(Mech(30 + 120 * x), Mech(150 + 120 * x), -1));
    }

    private static MachineSetup Motor(double l, Storage? store = null, double j = 2e-4) =>
        new(Rigs.Rotor(j, 5e-4, 2e-6), Enumerable.Range(0, 3).Select(x => new CoilCircuit(R, l, Flux(x), Windows(x))),
            store ?? new IdealSupply(V), new Drive(new SixStepSwitching(), new SwitchModel(Vsw), new DiodeFreewheel(new DiodeModel(Vd))));

    /// <summary>
    /// Independent quasi-static six-step model (L -> 0): the high leg x and the low leg z put V - 2 Vsw across
    /// coils x and z in series, i = (V - 2 Vsw - (e_x - e_z)) / 2R when positive; the third leg floats (the test
    /// checks its potential stays inside the rails, so no diode conducts), T = i (k_x - k_z).
    /// </summary>
    private static double QuasiStaticTorque(double theta, double w)
    {
        int hi = -1, lo = -1;
        var k = new double[3];
        for (int x = 0; x < 3; x++)
        {
            k[x] = QuasiStatic.Slope(Flux(x), theta);
            int c = QuasiStatic.Command(Windows(x).Windows, theta);
            if (c == 1) hi = x;
            if (c == -1) lo = x;
        }
        Assert.True(hi >= 0 && lo >= 0, "two legs conduct at every angle");
        double i = Math.Max(0, (V - 2 * Vsw - (k[hi] - k[lo]) * w) / (2 * R));
        int fl = 3 - hi - lo;
        double vN = (V - Vsw - R * i - k[hi] * w + Vsw + R * i - k[lo] * w) / 2; // star point, both coils' equations
        double vFloat = vN + k[fl] * w;
        Assert.True(vFloat > -Vd && vFloat < V + Vd, "the floating leg stays between the rails");
        return i * (k[hi] - k[lo]);
    }

    private static double MeanTorque(double w, int perPiece = 4000) => QuasiStatic.RevolutionMean(th => QuasiStaticTorque(th, w),
        Enumerable.Range(0, 3).SelectMany(x => Windows(x).Windows.SelectMany(v => new[] { v.OnDeg, v.OffDeg })), perPiece);

    // Source: the independent quasi-static model above (two phases in series across the supply, 120-degree
    // conduction), at held speeds; the engine runs the star with L/R = 3 us so that commutation through the
    // bridge diodes takes a few microseconds of each 10-50 ms sector: agreement within 3e-3.
    [Theory]
    [InlineData(30.0)]
    [InlineData(100.0)]
    public void HeldSpeedTorqueMatchesTwoPhaseConduction(double w)
    {
        var r = Rigs.Run(Motor(4.5e-6), new ChargeScenario(w * 30 / Math.PI, 12 * 2 * Math.PI / w));
        double expect = MeanTorque(w);
        Assert.True(Math.Abs(r.CycleMeanTorqueNm!.Value - expect) <= 3e-3 * expect, $"{r.CycleMeanTorqueNm} vs {expect}");
        Assert.True(r.Energy.BalanceError < 1e-4, r.Energy.ToString());
    }

    // Source: the star point's Kirchhoff current law: the three phase currents sum to zero at every sample; and a
    // star motor with a realistic L starts from rest to a steady speed below the quasi-static one (lagging
    // currents), the cycle-mean torque equal to the drag (a tight steadiness tolerance: under the default 0.1 %
    // a slowly accelerating rotor can already count as steady).
    [Fact]
    public void StartsAndKeepsTheStarBalanced()
    {
        var r = Rigs.Run(Motor(1e-3, j: 5e-5) with { InitialAngleDeg = 10 }, new StartScenario(20), new SimulationOptions { SteadyTolerance = 1e-5 });
        Assert.Equal(SimulationOutcome.SteadySpeed, r.Outcome);
        var c = r.Series.CurrentsA;
        for (int j = 0; j < r.Series.Count; j++)
            Assert.True(Math.Abs(c[0][j] + c[1][j] + c[2][j]) <= 1e-9 * (1 + Math.Abs(c[0][j]) + Math.Abs(c[1][j])));
        double w = r.SteadyRpm!.Value * Math.PI / 30;
        double Excess(double x) => MeanTorque(x, 200) - (5e-4 + 2e-6 * x); // a bound only: coarse quadrature
        double hi = 100;
        while (Excess(hi) > 0) hi *= 1.1;
        double root = QuasiStatic.Root(Excess, hi / 1.1, hi);
        Assert.True(w < root && w > 0.5 * root, $"steady {w} rad/s, quasi-static {root} rad/s");
        double drag = 5e-4 + 2e-6 * r.CycleMeanRpm!.Value * Math.PI / 30;
        Assert.Equal(drag, r.CycleMeanTorqueNm!.Value, 1e-2 * drag);
    }
}
