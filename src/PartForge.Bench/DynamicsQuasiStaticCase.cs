using PartForge.Dynamics;

namespace PartForge.Bench;

/// <summary>The dynamics-start machine with L = 0: the quasi-static limit, currents solved algebraically.</summary>
public sealed class DynamicsQuasiStaticCase : IBenchCase
{
    private MachineSetup _machine = null!;
    private StartScenario _scenario = null!;

    public string Name => "dynamics-quasistatic";

    public string Description => "dynamics-start with L = 0 (algebraic currents): the quasi-static limit";

    public void Setup()
    {
        var (m, s) = DynamicsStartCase.PulseMotor();
        _machine = new MachineSetup(m.Rotor, [m.Circuits[0] with { InductanceH = 0 }], m.Storage, m.Drive) { InitialAngleDeg = m.InitialAngleDeg };
        _scenario = s;
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = Simulator.Run(_machine, _scenario);
        return new Dictionary<string, double>
        {
            ["steady_rpm"] = r.SteadyRpm ?? double.NaN,
            ["accepted_steps"] = r.AcceptedSteps,
            ["rejected_steps"] = r.RejectedSteps,
            ["balance_error"] = r.Energy.BalanceError,
        };
    }
}
