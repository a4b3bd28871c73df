namespace PartForge.Dynamics.Tests;

/// <summary>Small invented machines for the tests (every number here is invented for the test, not measured).</summary>
internal static class Rigs
{
    public static RotorParameters Rotor(double j = 2e-4, double tf = 0, double b = 0) => new(j, tf, b);

    public static Drive Unipolar(double vsw = 0, bool diode = true, double vd = 0) =>
        new(new UnipolarSwitching(), new SwitchModel(vsw), diode ? new DiodeFreewheel(new DiodeModel(vd)) : new NoFreewheel());

    public static Drive Bipolar(double vsw = 0, bool diode = true, double vd = 0) =>
        new(new BipolarSwitching(), new SwitchModel(vsw), diode ? new DiodeFreewheel(new DiodeModel(vd)) : new NoFreewheel());

    public static DriveConnection AlwaysOn => new([new ConductionWindow(0, 180), new ConductionWindow(180, 0)]);

    /// <summary>Simulates and fails the test with the problems if the input was rejected.</summary>
    public static SimulationResult Run(MachineSetup m, Scenario s, SimulationOptions? o = null)
    {
        var r = Simulator.Run(m, s, o);
        Assert.True(r.Outcome != SimulationOutcome.InvalidInput, string.Join("; ", r.Problems));
        Assert.True(r.Outcome != SimulationOutcome.NumericalFailure, string.Join("; ", r.Problems));
        return r;
    }

    /// <summary>Linear interpolation of a sampled series at time t.</summary>
    public static double At(IReadOnlyList<double> ts, IReadOnlyList<double> v, double t)
    {
        int i = 1;
        while (i < ts.Count - 1 && ts[i] < t) i++;
        double f = (t - ts[i - 1]) / (ts[i] - ts[i - 1]);
        return v[i - 1] + f * (v[i] - v[i - 1]);
    }
}
