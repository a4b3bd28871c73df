using PartForge.Checks.Inputs;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Electrical;
using PartForge.Parts;

namespace PartForge.Checks;

public static partial class CheckRunner
{
    /// <summary>
    /// Every check on a machine with the electrical engine's results and the part builders' parts: the entry
    /// point of the stage orchestrator. <paramref name="parts"/> is null when no parts could be made (the coil
    /// could not be resolved): then only the electrical engine's diagnostics are reported, with one failing check
    /// that says why nothing else could run. The electrical diagnostics become check results here and only here.
    /// </summary>
    public static CheckReport Run(MachineModel design, ElectricalResult electrical, PartSet? parts, CheckOptions? options = null)
    {
        var facts = parts is null ? null : FactsFrom(design, electrical);
        if (facts is null)
        {
            var list = DiagnosticChecks(electrical).ToList();
            list.Add(new CheckResult
            {
                Id = "coil-unresolved", Part = PartId.Former, Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0, Measured = false,
                Message = "the coil could not be resolved, so no part could be made and no clearance check could run; fix the electrical errors first",
            });
            return new CheckReport(list.Concat(parts is null ? [] : PartErrors(parts)).ToList());
        }
        var report = Run(design, facts, ViewsFrom(parts!), options);
        var stock = new List<CheckResult>();
        Collect(stock, "cut sheet", () => Rules.CutSheetStockRules.Run(design, parts!));
        Collect(stock, "overhang", () => Rules.OverhangRules.Run(design, parts!));
        return report with { Checks = report.Checks.Concat(stock).Concat(PartErrors(parts!)).ToList() };
    }

    /// <summary>The electrical engine's diagnostics as checks: errors fail, warnings warn.</summary>
    public static IEnumerable<CheckResult> DiagnosticChecks(ElectricalResult e) =>
        Rules.ElectricalRules.Checks(e.Diagnostics.Select(d => (d.Id, d.Severity == Electrical.DiagnosticSeverity.Error, d.Key, d.Message, d.Measure)));

    /// <summary>The checker's view of the electrical results (null when the coil is unresolved).</summary>
    public static ElectricalFacts? FactsFrom(MachineModel design, ElectricalResult e)
    {
        if (e.Coil is not { Outline: { } outline } coil) return null;
        // Which operating point: machine.role, never the sensor. A motor-generator is judged at the harder of its two
        // points (the higher current density). Both at rated rpm.
        double jMotor = design.RunsAsMotor && e.Motor is { } mp ? mp.CurrentDensityAtRatedAPerMm2 : double.NaN;
        double jGen = design.RunsAsGenerator && e.Generator is { } gp ? gp.CurrentDensityAPerMm2 : double.NaN;
        bool motor = double.IsFinite(jMotor) && !(double.IsFinite(jGen) && jGen > jMotor);
        double j = motor ? jMotor : double.IsFinite(jGen) ? jGen : 0;
        string point = motor
            ? $"motor operating point (rated {Judge.F(design.RatedRpm)} rpm, operation.supply_voltage {Judge.F(design.Operation.SupplyVoltageV)} V)"
            : $"generator operating point (rated {Judge.F(design.RatedRpm)} rpm into operation.load_resistance {Judge.F(design.Operation.LoadResistanceOhm)} ohm)";
        // The pull is the electrical engine's (only dual-rotor machines feel a net axial pull on a rotor).
        var pulls = design.Layout.Rotors.ToDictionary(r => r, _ => e.Pull?.RotorToRotorN ?? 0);
        return new ElectricalFacts
        {
            Turns = coil.Turns,
            WireBareMm = coil.WireBareMm,
            WireOverallMm = coil.WireOverallMm,
            Outline = outline,
            CurrentDensityAPerMm2 = double.IsFinite(j) ? j : 0,
            OperatingPoint = point,
            PullOnRotorN = pulls,
            BackIron = e.BackIron,
            Switching = e.Switching,
            Charging = e.Charging,
            ShaftTorqueNm = Finite(motor ? e.Motor!.StallTorqueNm : e.Generator?.ShaftTorqueNm ?? 0),
            MagnetToBackIronN = Finite(e.Pull?.MagnetToBackIronN ?? 0),
            CoilTemperatureC = e.Thermal?.CoilTemperatureC ?? design.Operation.AmbientC,
            AmbientC = design.Operation.AmbientC,
            CopperLossPerCoilW = e.Thermal?.CopperLossPerCoilW ?? 0,
            CoilThermalResistanceKPerW = e.Thermal?.Cooling.ResistanceKPerW ?? 0,
            MotorGoverns = motor,
            GeneratorSource = e.Generator is { } g ? (g.SourceEmfRmsV, g.SourceResistanceOhm, g.SourceReactanceOhm, g.SourcePhases, design.CoilsInMachine) : null,
            MagnetTemperatureC = e.Thermal?.MagnetTemperatureC ?? design.Operation.AmbientC,
            SensorAnglesDeg = e.Sensors?.Sensors.Select(s => s.AngleDeg).ToArray() ?? Array.Empty<double>(),
            Diagnostics = e.Diagnostics.Select(d => (d.Id, d.Severity == Electrical.DiagnosticSeverity.Error, d.Key, d.Message, d.Measure)).ToArray(),
        };
    }

    private static double Finite(double v) => double.IsFinite(v) ? Math.Abs(v) : 0;

    /// <summary>The checker's view of the parts.</summary>
    public static IReadOnlyList<PartView> ViewsFrom(PartSet parts) =>
        parts.Parts.Select(p => new PartView(p.Id, p.Process, p.Material, p.ExactLayers, p.Features, p.Instances, p.Rotating)).ToArray();

    private static IEnumerable<CheckResult> PartErrors(PartSet parts) =>
        parts.Diagnostics.Where(d => d.Severity == Parts.DiagnosticSeverity.Error).Select(d => new CheckResult
        {
            Id = $"parts-{d.Code}", Part = d.Part, Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0, Measured = false,
            Message = d.Message, Basis = "part builder diagnostic",
        });
}
