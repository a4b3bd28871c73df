namespace PartForge.Dynamics.Tests;

public class ValidationTests
{
    private static readonly FluxSeries F = FluxSeries.Cosine(4, 0.01);
    private static readonly RotorParameters Rotor = new(2e-4, 2e-4, 1e-6);
    private static readonly DriveConnection W = DriveConnection.Periodic(4, new ConductionWindow(50, 85));

    private static MachineSetup Good() => new(Rotor, [new CoilCircuit(4.6, 2.2e-3, F, W)], new IdealSupply(6), Rigs.Unipolar());

    public static TheoryData<string, string> Bad => new()
    {
        { "inertia", "rotor.inertia_kg_m2" },
        { "nan-friction", "rotor.friction_nm" },
        { "negative-resistance", "circuits[0].resistance_ohm" },
        { "infinite-inductance", "circuits[0].inductance_h" },
        { "nan-flux", "circuits[0].flux[0].cos_wb" },
        { "negative-order", "circuits[0].flux[0].order" },
        { "no-drive", "is driven but the setup has no drive" },
        { "window-range", "circuits[0].windows[0].on_deg" },
        { "window-empty", "on_deg and off_deg are equal" },
        { "window-overlap", "overlap" },
        { "unipolar-negative", "sign -1 is not allowed for unipolar" },
        { "sixstep-two", "six-step switching drives exactly 3 circuits" },
        { "sixstep-nodiode", "six-step switching needs a diode freewheel" },
        { "sixstep-zero-l", "inductance_h must be more than 0 in a six-step star" },
        { "capacitor", "storage.capacitance_f" },
        { "time", "scenario.time_limit_s" },
        { "target-battery", "scenario.target_v needs a capacitor store" },
        { "target-below", "must be above the capacitor's initial voltage" },
        { "cutoff-above", "must be below the capacitor's initial voltage" },
        { "tolerance", "options.relative_tolerance" },
        { "points", "options.series_max_points" },
    };

    private static (MachineSetup, Scenario, SimulationOptions) Make(string which)
    {
        var m = Good();
        Scenario s = new StartScenario(1);
        var o = new SimulationOptions();
        CoilCircuit C(Func<CoilCircuit, CoilCircuit> f) => f(m.Circuits[0]);
        var six = new Drive(new SixStepSwitching(), SwitchModel.Ideal, new DiodeFreewheel(DiodeModel.Ideal));
        var sixW = new DriveConnection([new ConductionWindow(0, 60, 1), new ConductionWindow(180, 240, -1)]);
        switch (which)
        {
            case "inertia": m = m with { Rotor = Rotor with { InertiaKgM2 = 0 } }; break;
            case "nan-friction": m = m with { Rotor = Rotor with { FrictionNm = double.NaN } }; break;
            case "negative-resistance": m = new MachineSetup(Rotor, [C(c => c with { ResistanceOhm = -1 })], m.Storage, m.Drive); break;
            case "infinite-inductance": m = new MachineSetup(Rotor, [C(c => c with { InductanceH = double.PositiveInfinity })], m.Storage, m.Drive); break;
            case "nan-flux": m = new MachineSetup(Rotor, [C(c => c with { Flux = new FluxSeries([new FluxHarmonic(4, double.NaN, 0)]) })], m.Storage, m.Drive); break;
            case "negative-order": m = new MachineSetup(Rotor, [C(c => c with { Flux = new FluxSeries([new FluxHarmonic(-4, 0.01, 0)]) })], m.Storage, m.Drive); break;
            case "no-drive": m = m with { Drive = null }; break;
            case "window-range": m = new MachineSetup(Rotor, [C(c => c with { Connection = new DriveConnection([new ConductionWindow(400, 10)]) })], m.Storage, m.Drive); break;
            case "window-empty": m = new MachineSetup(Rotor, [C(c => c with { Connection = new DriveConnection([new ConductionWindow(10, 10)]) })], m.Storage, m.Drive); break;
            case "window-overlap": m = new MachineSetup(Rotor, [C(c => c with { Connection = new DriveConnection([new ConductionWindow(350, 20), new ConductionWindow(10, 40)]) })], m.Storage, m.Drive); break;
            case "unipolar-negative": m = new MachineSetup(Rotor, [C(c => c with { Connection = new DriveConnection([new ConductionWindow(10, 40, -1)]) })], m.Storage, m.Drive); break;
            case "sixstep-two": m = new MachineSetup(Rotor, [C(c => c with { Connection = sixW }), C(c => c with { Connection = sixW })], m.Storage, six); break;
            case "sixstep-nodiode": m = new MachineSetup(Rotor, Enumerable.Repeat(C(c => c with { Connection = sixW }), 3), m.Storage, six with { Freewheel = new NoFreewheel() }); break;
            case "sixstep-zero-l": m = new MachineSetup(Rotor, Enumerable.Repeat(C(c => c with { Connection = sixW, InductanceH = 0 }), 3), m.Storage, six); break;
            case "capacitor": m = m with { Storage = new Capacitor(-1, 0, 5) }; break;
            case "time": s = new StartScenario(double.NaN); break;
            case "target-battery": m = m with { Storage = new Battery(12, 0.1) }; s = new ChargeScenario(100, 1) { TargetV = 13 }; break;
            case "target-below": m = m with { Storage = new Capacitor(0.01, 0, 5) }; s = new ChargeScenario(100, 1) { TargetV = 4 }; break;
            case "cutoff-above": m = m with { Storage = new Capacitor(0.01, 0, 5) }; s = new RunDownScenario(1) { CutoffV = 6 }; break;
            case "tolerance": o = o with { RelativeTolerance = 0.5 }; break;
            case "points": o = o with { SeriesMaxPoints = 1 }; break;
        }
        return (m, s, o);
    }

    // Bad input is reported (outcome InvalidInput with a message naming the value), never thrown.
    [Theory]
    [MemberData(nameof(Bad))]
    public void BadInputIsReported(string which, string message)
    {
        var (m, s, o) = Make(which);
        var r = Simulator.Run(m, s, o);
        Assert.Equal(SimulationOutcome.InvalidInput, r.Outcome);
        Assert.Contains(r.Problems, p => p.Contains(message, StringComparison.Ordinal));
        Assert.Equal(0, r.Series.Count);
    }

    [Fact]
    public void GoodInputIsAccepted()
    {
        var r = Simulator.Run(Good() with { InitialAngleDeg = 60 }, new StartScenario(0.01));
        Assert.Empty(r.Problems);
        Assert.Equal(SimulationOutcome.TimeLimit, r.Outcome);
    }

    // Missing parts (nulls from a careless caller) are reported too.
    [Fact]
    public void NullsAreReported()
    {
        Assert.Equal(SimulationOutcome.InvalidInput, Simulator.Run(null!, new StartScenario(1)).Outcome);
        Assert.Equal(SimulationOutcome.InvalidInput, Simulator.Run(Good(), null!).Outcome);
        var m = new MachineSetup(Rotor, [new CoilCircuit(1, 0, null!, null!)], null!, null);
        var r = Simulator.Run(m, new StartScenario(1));
        Assert.Equal(SimulationOutcome.InvalidInput, r.Outcome);
        Assert.Contains(r.Problems, p => p.Contains("circuits[0].flux is missing"));
        Assert.Contains(r.Problems, p => p.Contains("circuits[0].connection is missing"));
        Assert.Contains(r.Problems, p => p.Contains("storage is missing"));
    }

    // Values compare by value (lists included).
    [Fact]
    public void ValuesCompareByValue()
    {
        Assert.Equal(Good(), Good());
        Assert.Equal(Good().GetHashCode(), Good().GetHashCode());
        Assert.NotEqual(Good(), Good() with { InitialAngleDeg = 1 });
        Assert.Equal(FluxSeries.Cosine(4, 0.01), FluxSeries.Cosine(4, 0.01));
        Assert.Equal(W, DriveConnection.Periodic(4, new ConductionWindow(50, 85)));
    }
}
