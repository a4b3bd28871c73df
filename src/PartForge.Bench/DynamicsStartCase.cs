using PartForge.Dynamics;

namespace PartForge.Bench;

/// <summary>
/// Time simulation of a 10-second start of an invented pulse motor: 8 alternating disc magnets (Br 1.3 T class),
/// 4 coils of 160 turns in series as one circuit (R 4.6 ohm hot, L 2.2 mH, flux linkage about 0.01 Wb-turns
/// peak with a small third harmonic), J 2e-4 kg m^2, Tf 2e-4 N m, b 1e-6 N m s/rad, unipolar drive from a 6 V
/// supply through a 0.2 V switch with a silicon flyback diode, the switch closed from 50 to 85 degrees of every
/// 90-degree period. Every number is invented for the benchmark. Target: under 1 s.
/// </summary>
public sealed class DynamicsStartCase : IBenchCase
{
    private MachineSetup _machine = null!;
    private StartScenario _scenario = null!;

    public string Name => "dynamics-start";

    public string Description => "time simulation: 10 s start of an invented 8-magnet unipolar pulse motor (target < 1 s)";

    public void Setup()
    {
        (_machine, _scenario) = PulseMotor();
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = Simulator.Run(_machine, _scenario);
        return new Dictionary<string, double>
        {
            ["outcome"] = (int)r.Outcome,
            ["final_rpm"] = r.FinalRpm,
            ["steady_rpm"] = r.SteadyRpm ?? double.NaN,
            ["spin_up_90_s"] = r.SpinUp90S ?? double.NaN,
            ["accepted_steps"] = r.AcceptedSteps,
            ["rejected_steps"] = r.RejectedSteps,
            ["events"] = r.Events,
            ["balance_error"] = r.Energy.BalanceError,
        };
    }

    /// <summary>The invented bench machine and its 10-second start (run to the end, steadiness judged there).</summary>
    public static (MachineSetup Machine, StartScenario Scenario) PulseMotor()
    {
        // Alternating magnets every 45 degrees: the linkage repeats every two magnets (mechanical order 4).
        var flux = new FluxSeries([new FluxHarmonic(4, 0.0100, 0), new FluxHarmonic(12, 0.0008, 0)]);
        // d lambda/d theta > 0 (motoring for a positive current) from 45 to 90 degrees of each 90-degree period.
        var window = DriveConnection.Periodic(4, new ConductionWindow(50, 85));
        var drive = new Drive(new UnipolarSwitching(), new SwitchModel(0.2), new DiodeFreewheel(DiodeModel.Silicon));
        var machine = new MachineSetup(new RotorParameters(2e-4, 2e-4, 1e-6), [new CoilCircuit(4.6, 2.2e-3, flux, window)],
            new IdealSupply(6), drive) { InitialAngleDeg = 60 };
        return (machine, new StartScenario(10) { StopWhenSteady = false });
    }
}
