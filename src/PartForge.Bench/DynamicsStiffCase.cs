using PartForge.Dynamics;

namespace PartForge.Bench;

/// <summary>
/// The dynamics-start machine with its inductance cut to 22 uH (L/R = 4.8 us) and the L = 0 substitution off:
/// the cost of the explicit integrator on a stiff circuit (its step is then held near 3 L/R). For comparison only.
/// </summary>
public sealed class DynamicsStiffCase : IBenchCase
{
    private MachineSetup _machine = null!;
    private StartScenario _scenario = null!;

    public string Name => "dynamics-stiff";

    public string Description => "dynamics-start with L/R = 4.8 us integrated explicitly (substitution off): the stiff cost";

    public void Setup()
    {
        var (m, s) = DynamicsStartCase.PulseMotor();
        _machine = new MachineSetup(m.Rotor, [m.Circuits[0] with { InductanceH = 2.2e-5 }], m.Storage, m.Drive) { InitialAngleDeg = m.InitialAngleDeg };
        _scenario = s;
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = Simulator.Run(_machine, _scenario, new SimulationOptions { QuasiStaticRatio = 0 });
        return new Dictionary<string, double>
        {
            ["steady_rpm"] = r.SteadyRpm ?? double.NaN,
            ["accepted_steps"] = r.AcceptedSteps,
            ["rejected_steps"] = r.RejectedSteps,
            ["balance_error"] = r.Energy.BalanceError,
        };
    }
}
