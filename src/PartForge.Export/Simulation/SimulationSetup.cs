using PartForge.Design.Machines;
using PartForge.Dynamics;
using PartForge.Electrical;
using PartForge.Parts;
using PartForge.Parts.Mechanics;

namespace PartForge.Export.Simulation;

/// <summary>
/// The design translated into the time simulation's inputs (<see cref="MachineSetup"/>, SI units): one circuit per
/// phase with its hot resistance, inductance and flux linkage against the rotor angle (the electrical engine's
/// harmonics), connected to the drive (windows from the sensor thresholds, <see cref="Electrical.Switching.SwitchingPlan"/>)
/// for start and run-down, or to the rectifier (each phase its own single-phase rectifier: a shared three-phase
/// bridge is not modelled) or to operation.load_resistance for charge; the store (capacitor, battery, or an ideal
/// supply of operation.supply_voltage); the rotating assembly's inertia and the friction and drag.
/// </summary>
public static class SimulationSetup
{
    /// <summary>The setup and scenario, or the reason the design cannot be simulated this way.</summary>
    public static (MachineSetup? Setup, Scenario? Scenario, RotatingAssembly? Rotor, string? Problem) For(MachineModel d, ElectricalResult e, PartSet parts,
        SimulationKind kind, double? rpm, double? seconds)
    {
        if (e.HasErrors || e.Phase is null || e.PhaseFlux.Count == 0)
            return (null, null, null, "the electrical model has errors (run partforge check); nothing to simulate");
        var asm = RotatingAssembly.Of(d, parts);
        var rotor = new RotorParameters(asm.InertiaKgM2, d.Mechanics.FrictionTorqueNm, d.Mechanics.ViscousDragNmsPerRad);
        double r = e.Phase.ResistanceHotOhm, l = e.Phase.InductanceUh * 1e-6;
        var plan = e.Switching;
        Storage store = d.Storage switch
        {
            CapacitorStorage c => new Capacitor(c.CapacitanceF, c.EsrOhm, c.StartVoltageV),
            BatteryStorage b => new Battery(b.VoltageV, b.InternalResistanceOhm),
            _ => new IdealSupply(d.Operation.SupplyVoltageV),
        };
        DiodeModel Diode(DiodeKind k) => k == DiodeKind.Schottky ? DiodeModel.Schottky : DiodeModel.Silicon;
        bool driven = kind != SimulationKind.Charge || !d.RunsAsGenerator;
        if (driven && plan is null)
            return (null, null, null, d.RunsAsMotor
                ? "the drive has no timing sensor (sensor.kind: none), so there is nothing that switches the coils; give the sensor, or simulate --scenario charge"
                : "machine.role is generator: there is no drive to start or run down; use --scenario charge, or machine.role: motor or motor-generator");
        if (driven && plan!.Switching == SwitchingKind.SixStep && d.Connection != Connection.Star)
            return (null, null, null, "the simulation drives a six-step bridge in star only; set machine.connection: star");
        if (kind == SimulationKind.RunDown && d.Storage is not CapacitorStorage)
            return (null, null, null, "run-down runs on a charged capacitor; set storage.kind: capacitor with storage.start_voltage");
        if (kind == SimulationKind.RunDown && d.Storage is CapacitorStorage { StartVoltageV: <= 0 })
            return (null, null, null, "run-down needs a charged capacitor; set storage.start_voltage above 0");

        var circuits = new List<CoilCircuit>();
        for (int c = 0; c < e.PhaseFlux.Count; c++)
        {
            var flux = new FluxSeries(e.PhaseFlux[c].Terms.Select(t => new FluxHarmonic(t.Order, t.CosWb, t.SinWb)));
            CircuitConnection conn;
            if (driven)
                conn = new DriveConnection(plan!.Circuits[c].Windows.Select(w => new ConductionWindow(w.OnDeg, w.OffDeg, w.Sign)));
            else conn = d.Load.Rectifier switch
            {
                RectifierKind.Bridge => new BridgeRectifier(Diode(d.Load.Diode)),
                RectifierKind.HalfWave => new HalfWaveRectifier(Diode(d.Load.Diode)),
                _ => new ResistiveLoad(d.Operation.LoadResistanceOhm),
            };
            circuits.Add(new CoilCircuit(r, l, flux, conn));
        }
        Dynamics.Switching sw = plan?.Switching switch
        {
            SwitchingKind.Bipolar => new BipolarSwitching(),
            SwitchingKind.SixStep => new SixStepSwitching(),
            _ => new UnipolarSwitching(),
        };
        Drive? drive = driven
            ? new Drive(sw, new SwitchModel(d.Operation.SwitchDropV), d.Drive.HasFreewheel ? new DiodeFreewheel(Diode(d.Drive.Diode)) : new NoFreewheel())
            : null;
        var setup = new MachineSetup(rotor, circuits, store, drive) { InitialAngleDeg = plan?.BestStartAngleDeg ?? 0 };
        Scenario scenario = kind switch
        {
            SimulationKind.Start => new StartScenario(seconds ?? 10) { InitialRpm = rpm ?? 0 },
            SimulationKind.RunDown => new RunDownScenario(seconds ?? 120) { InitialRpm = rpm ?? 0 },
            _ => new ChargeScenario(rpm ?? d.RatedRpm, seconds ?? 60)
            {
                TargetV = d.Storage is CapacitorStorage cap ? cap.RatedVoltageV : null,
            },
        };
        return (setup, scenario, asm, null);
    }
}
