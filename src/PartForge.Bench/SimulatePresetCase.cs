using PartForge.Design.Loading;
using PartForge.Design.Presets;
using PartForge.Dynamics;
using PartForge.Export.Pipeline;
using PartForge.Export.Simulation;

namespace PartForge.Bench;

/// <summary>
/// <c>partforge simulate presets/pulse-sculpture.yaml</c> in-process: the 10-second start of the bundled preset
/// (run to the end, steadiness judged there), from the design's own flux harmonics, drive windows and rotating
/// inertia. The design's evaluation is set up once (not timed); the timed part is the time simulation. Target: under 1 s.
/// </summary>
public sealed class SimulatePresetCase : IBenchCase
{
    private MachineSetup _setup = null!;
    private StartScenario _scenario = null!;

    public string Name => "simulate-pulse-sculpture";

    public string Description => "time simulation: 10 s start of the pulse-sculpture preset from its design (target < 1 s)";

    public void Setup()
    {
        var preset = PresetLibrary.Find("pulse-sculpture") ?? throw new InvalidOperationException("pulse-sculpture is not bundled");
        var loaded = DesignLoader.LoadText(preset.Text, "pulse-sculpture.yaml");
        if (!loaded.Success) throw new InvalidOperationException(string.Join("; ", loaded.Errors));
        var ev = BuildPipeline.Evaluate(loaded.Machine!);
        var (setup, _, _, problem) = SimulationSetup.For(ev.Machine, ev.Electrical, ev.Parts!, SimulationKind.Start, null, 10);
        if (problem is not null) throw new InvalidOperationException(problem);
        _setup = setup!;
        _scenario = new StartScenario(10) { StopWhenSteady = false };
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = Simulator.Run(_setup, _scenario);
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
}
