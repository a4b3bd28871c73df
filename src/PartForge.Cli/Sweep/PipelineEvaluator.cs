using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Geometry;
using PartForge.Export.Pipeline;
using PartForge.Parts;

namespace PartForge.Cli.Sweep;

/// <summary>
/// The real sweep evaluation of one variant: the same stages as <c>partforge check</c> (electrical engine,
/// part builders, every check), nothing written. One difference, for speed: the parts' polygons are made at
/// a coarse chordal tolerance, because the checks measure the exact primitives (lines and true arcs) and
/// never the polygons; a test asserts that the check results equal those of <see cref="BuildPipeline.Evaluate"/>.
/// Status is the checks' summary; a variant whose parts cannot be made is "fail" with the reason.
/// </summary>
public sealed class PipelineEvaluator : ISweepEvaluator
{
    /// <summary>Chordal tolerance of the sweep's throw-away polygons and meshes, mm.</summary>
    public const double SweepChordalToleranceMm = 0.2;

    /// <summary>The stages for one machine, as <see cref="Stages.Evaluate"/> runs them but with the coarse polygons.</summary>
    public static Evaluation EvaluateStages(MachineModel d) =>
        Stages.Evaluate(d, partsPrecision: Precision.FromChordalTolerance(Math.Max(d.ChordalToleranceMm, SweepChordalToleranceMm)));

    public SweepOutcome Evaluate(MachineModel d)
    {
        Evaluation ev;
        try { ev = EvaluateStages(d); }
        catch (PartsException ex) { return new SweepOutcome("fail", ex.Message, new Dictionary<string, double>()); }

        var e = ev.Electrical;
        var m = new Dictionary<string, double>(StringComparer.Ordinal)
        {
            [SweepMetrics.ElectricalHz] = e.ElectricalHz,
            [SweepMetrics.MagneticGap] = e.MagneticGapMm,
            [SweepMetrics.LineEmfRms] = e.LineEmfRmsV,
            [SweepMetrics.KeVPerKrpm] = e.KeVPerKrpm,
        };
        if (e.Coil is { } c)
        {
            m[SweepMetrics.FillFactor] = c.FillFactor;
            m[SweepMetrics.Turns] = c.Turns;
            m[SweepMetrics.CoilWireLength] = c.WireLengthM;
        }
        if (e.Phase is { } ph)
        {
            m[SweepMetrics.PhaseEmfRms] = ph.EmfRmsV;
            m[SweepMetrics.PhaseResistance] = ph.Resistance20COhm;
            m[SweepMetrics.PhaseResistanceHot] = ph.ResistanceHotOhm;
        }
        var report = ev.Checks;
        var gaps = report.WithId(CheckIds.RunningGap).Select(x => x.Value).ToList();
        if (gaps.Count > 0) m[SweepMetrics.WorstRunningGap] = gaps.Min();
        m[SweepMetrics.FailCount] = report.FailCount;
        m[SweepMetrics.WarnCount] = report.WarnCount;
        if (ev.Parts is { HasErrors: true } ps)
            return new SweepOutcome("fail", string.Join("; ", ps.Diagnostics.Where(x => x.Severity == Parts.DiagnosticSeverity.Error).Select(x => $"{x.Part.Name}: {x.Message}")), m);
        var worst = report.Checks.Where(x => x.Status == report.Status && x.Status != CheckStatus.Pass)
            .Select(x => $"{x.Id} ({x.PartName}): {x.Message}").FirstOrDefault();
        return new SweepOutcome(report.StatusText, worst ?? "", m);
    }
}
