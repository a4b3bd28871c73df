using System.CommandLine;
using System.Globalization;
using PartForge.Cli.Hosting;
using PartForge.Design.Loading;
using PartForge.Dynamics;
using PartForge.Export.Pipeline;
using PartForge.Export.Simulation;

namespace PartForge.Cli.Commands;

/// <summary><c>partforge simulate DESIGN [--scenario start|run-down|charge] [--rpm N] [--seconds S] [--json] [--csv FILE]</c>:
/// the machine integrated in time (rotor, coils, drive or rectifier, store).</summary>
public static class SimulateCommand
{
    public static Command Create()
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (YAML)." };
        var scenario = new Option<string>("--scenario") { Description = "start: from rest (or --rpm) to steady speed; run-down: on the charged capacitor until the rotor stops; charge: driven at --rpm (default rated) charging the store.", DefaultValueFactory = _ => "start" };
        scenario.AcceptOnlyFromAmong("start", "run-down", "charge");
        var rpm = new Option<double?>("--rpm") { Description = "Start and run-down: the speed at the start (a push), rpm; charge: the held speed (default machine.rated_rpm).", HelpName = "N" };
        var seconds = new Option<double?>("--seconds") { Description = "Simulated time limit, s (default: start 10, run-down 120, charge 60).", HelpName = "S" };
        var json = new Option<bool>("--json") { Description = "Print the simulation document (JSON) on stdout instead of the summary." };
        var csv = new Option<string?>("--csv") { Description = "Write the time series to this CSV file.", HelpName = "FILE" };
        var cmd = new Command("simulate", "Simulate the machine in time: speed, store voltage and coil current against time, steady speed, spin-up, run time and the energy account.")
        {
            design, scenario, rpm, seconds, json, csv,
        };
        CommandAction.Set(cmd, (pr, s) =>
        {
            var kind = pr.GetValue(scenario) switch { "run-down" => SimulationKind.RunDown, "charge" => SimulationKind.Charge, _ => SimulationKind.Start };
            double? n = pr.GetValue(rpm), t = pr.GetValue(seconds);
            if (n is { } nv && !(nv >= 0 && nv <= 100000)) throw new UsageException("--rpm must be between 0 and 100000");
            if (t is { } tv && !(tv > 0 && tv <= 86400)) throw new UsageException("--seconds must be more than 0 and at most 86400");
            string path = pr.GetValue(design)!;
            var loaded = DesignLoader.Load(path);
            if (!loaded.Success)
            {
                foreach (var e in loaded.Errors) s.Problem(e.ToString());
                return ExitCodes.BadInput;
            }
            var ev = BuildPipeline.Evaluate(loaded.Machine!);
            if (ev.Parts is null)
            {
                s.Problem($"{path}: the coil could not be resolved, so there is no rotating assembly to simulate; run partforge check");
                return ExitCodes.BadInput;
            }
            var (setup, sc, asm, problem) = SimulationSetup.For(ev.Machine, ev.Electrical, ev.Parts, kind, n, t);
            if (problem is not null)
            {
                s.Problem($"{path}: {problem}");
                return ExitCodes.BadInput;
            }
            var watch = System.Diagnostics.Stopwatch.StartNew();
            var result = Simulator.Run(setup!, sc!);
            watch.Stop();
            if (result.Outcome == SimulationOutcome.InvalidInput)
            {
                foreach (var p in result.Problems) s.Problem($"{path}: simulation input: {p}");
                return ExitCodes.BadInput;
            }
            if (pr.GetValue(csv) is { } csvPath) TextFiles.WriteAtomic(csvPath, SimulationOutput.Csv(result));
            if (pr.GetValue(json)) s.Out.Write(SimulationOutput.Json(ev.Machine.Name, kind, result, asm!.InertiaKgM2));
            else Print(s, ev.Machine.Name, kind, result, asm!.InertiaKgM2, watch.Elapsed.TotalSeconds);
            return ExitCodes.Ok;
        });
        return cmd;
    }

    private static string F(double v) => Math.Round(v, 4).ToString("0.####", CultureInfo.InvariantCulture);

    private static void Print(CliSession s, string name, SimulationKind kind, SimulationResult r, double inertia, double wall)
    {
        var o = s.Out;
        o.WriteLine($"{name}: {SimulationOutput.Word(kind)} -> {SimulationOutput.Word(r.Outcome)} at {F(r.EndTimeS)} s");
        o.WriteLine($"rotating inertia      {inertia.ToString("G4", CultureInfo.InvariantCulture)} kg m^2");
        o.WriteLine($"final speed           {F(r.FinalRpm)} rpm");
        o.WriteLine($"final store voltage   {F(r.FinalStoreV)} V");
        if (r.SteadyRpm is { } st) o.WriteLine($"steady speed          {F(st)} rpm");
        if (r.SpinUp90S is { } s90) o.WriteLine($"spin-up to 90 %       {F(s90)} s");
        if (r.RunTimeS is { } rt) o.WriteLine($"run time on the store {F(rt)} s");
        if (r.TimeToVoltageS is { } tt) o.WriteLine($"time to charge        {F(tt)} s");
        if (r.PeakTurnOffKickV is { } k) o.WriteLine($"turn-off kick (est.)  {F(k)} V");
        o.WriteLine("energy account (J):");
        foreach (var term in r.Energy.Terms()) if (term.Value != 0) o.WriteLine($"  {term.Key,-26} {term.Value.ToString("G6", CultureInfo.InvariantCulture)}");
        o.WriteLine($"  balance error              {(r.Energy.BalanceError * 100).ToString("G3", CultureInfo.InvariantCulture)} %");
        o.WriteLine($"steps {r.AcceptedSteps} accepted, {r.RejectedSteps} rejected, {r.Events} events; {wall.ToString("0.###", CultureInfo.InvariantCulture)} s wall time");
        o.WriteLine("Cautions: rotors spin and magnets pinch; coils heat; a charged capacitor or battery delivers large currents. The figures come from an idealised model.");
    }
}
