using PartForge.Checks;
using PartForge.Export.Pipeline;
using PartForge.Parts;

namespace PartForge.Cli.Sweep;

/// <summary>
/// The real sweep evaluation of one variant: the same stages as <c>partforge check</c>
/// (<see cref="BuildPipeline.Evaluate"/>: electrical engine, part builders, every check), nothing written.
/// Status is the checks' summary; a variant whose parts cannot be made is "fail" with the reason.
/// </summary>
public sealed class PipelineEvaluator : ISweepEvaluator
{
    public SweepOutcome Evaluate(Design.Model.Design d)
    {
        Evaluation ev;
        try { ev = BuildPipeline.Evaluate(d); }
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
        if (gaps.Count > 0) m[SweepMetrics.MinRunningGap] = gaps.Min();
        m[SweepMetrics.FailCount] = report.FailCount;
        m[SweepMetrics.WarnCount] = report.WarnCount;
        if (ev.Parts is { HasErrors: true } ps)
            return new SweepOutcome("fail", string.Join("; ", ps.Diagnostics.Where(x => x.Severity == DiagnosticSeverity.Error).Select(x => $"{x.Part}: {x.Message}")), m);
        var worst = report.Checks.Where(x => x.Status == report.Status && x.Status != CheckStatus.Pass)
            .Select(x => $"{x.Id} ({x.Part}): {x.Message}").FirstOrDefault();
        return new SweepOutcome(report.StatusText, worst ?? "", m);
    }
}
