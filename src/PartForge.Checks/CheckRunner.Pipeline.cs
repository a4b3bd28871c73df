using PartForge.Checks.Inputs;
using PartForge.Electrical;
using PartForge.Electrical.Field;
using PartForge.Parts;

namespace PartForge.Checks;

public static partial class CheckRunner
{
    /// <summary>
    /// Every check on a design with the electrical engine's results and the part builders' parts: the
    /// entry point of the `check` and `build` commands.
    /// </summary>
    public static CheckReport Run(Design.Model.Design design, ElectricalResult electrical, PartSet parts, CheckOptions? options = null)
    {
        var facts = FactsFrom(design, electrical);
        var views = ViewsFrom(parts);
        if (facts is null)
        {
            // Without a resolved coil the geometry checks cannot run; the electrical errors say why.
            var list = electrical.Diagnostics.Select(d => new CheckResult
            {
                Id = $"{CheckIds.Electrical}-{d.Id}", Part = "machine",
                Status = d.Severity == Electrical.DiagnosticSeverity.Error ? CheckStatus.Fail : CheckStatus.Warn,
                Value = 0, Limit = 0, Unit = "", Margin = 0, Message = d.Message, Where = new CheckLocation(d.Key),
                Basis = "electrical engine diagnostic",
            }).ToList();
            list.Add(new CheckResult
            {
                Id = "coil-unresolved", Part = "former", Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0,
                Message = "the coil could not be resolved, so no clearance check could run; fix the electrical errors first",
            });
            return new CheckReport(list.Concat(PartErrors(parts)).ToList());
        }
        var report = Run(design, facts, views, options);
        return new CheckReport(report.Checks.Concat(PartErrors(parts)).ToList());
    }

    /// <summary>The checker's view of the electrical results (null when the coil is unresolved).</summary>
    public static ElectricalFacts? FactsFrom(Design.Model.Design design, ElectricalResult e)
    {
        if (e.Coil is not { Outline: { } outline } coil) return null;
        // Which operating point: a machine with a timing sensor is driven as a motor (the sensor switches
        // the coils), one without is a generator into operation.load_resistance. Both at rated rpm.
        bool motor = design.Sensor.Kind != "none" && e.Motor is not null;
        double j = motor ? e.Motor!.CurrentDensityAtRatedAPerMm2 : e.Generator?.CurrentDensityAPerMm2 ?? 0;
        string point = motor
            ? $"motor operating point (rated {Judge.F(design.Machine.RatedRpm)} rpm, operation.supply_voltage {Judge.F(design.Operation.SupplyVoltage)} V)"
            : $"generator operating point (rated {Judge.F(design.Machine.RatedRpm)} rpm into operation.load_resistance {Judge.F(design.Operation.LoadResistance)} ohm)";
        var pulls = new Dictionary<string, double>();
        // Only dual-rotor machines feel a net axial pull on a rotor (the coreless stator holds no iron; a
        // magnet's attraction to its own back iron is internal to the rotor): skip the field work otherwise.
        MagneticPullResult? pull = null;
        if (design.Machine.Layout == "dual-rotor")
        {
            try { pull = MagneticPull.Compute(design); }
            catch (ArgumentException) { pull = null; }
        }
        var stack = Design.Stack.AxialStack.From(design);
        foreach (var rotor in stack.Slabs.Where(s => s.Kind == Design.Stack.SlabKind.Rotor).Select(s => s.Owner).Distinct())
            pulls[rotor] = pull?.RotorToRotorN ?? 0;
        return new ElectricalFacts
        {
            Turns = coil.Turns,
            WireBareMm = coil.WireBareMm,
            WireOverallMm = coil.WireOverallMm,
            Outline = outline,
            CurrentDensityAPerMm2 = double.IsFinite(j) ? j : 0,
            OperatingPoint = point,
            PullOnRotorN = pulls,
            SensorAnglesDeg = e.Sensors?.Sensors.Select(s => s.AngleDeg).ToArray() ?? Array.Empty<double>(),
            Diagnostics = e.Diagnostics.Select(d => (d.Id, d.Severity == Electrical.DiagnosticSeverity.Error, d.Key, d.Message)).ToArray(),
        };
    }

    /// <summary>The checker's view of the parts.</summary>
    public static IReadOnlyList<PartView> ViewsFrom(PartSet parts) =>
        parts.Parts.Select(p => new PartView(p.Name, p.Process, p.Material, p.ExactLayers, p.Features, p.Instances, p.Rotating)).ToArray();

    private static IEnumerable<CheckResult> PartErrors(PartSet parts) =>
        parts.Diagnostics.Where(d => d.Severity == Parts.DiagnosticSeverity.Error).Select(d => new CheckResult
        {
            Id = $"parts-{d.Code}", Part = d.Part, Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0,
            Message = d.Message, Basis = "part builder diagnostic",
        });
}
