using PartForge.Checks;
using PartForge.Checks.Inputs;
using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// The same checks as <see cref="ChecksAllBench"/> with the electrical facts (including the magnetic pull,
/// which needs a field integration) prepared in Setup: what the checker itself costs. Target: under 50 ms.
/// </summary>
public sealed class ChecksGivenFactsBench : IBenchCase
{
    private PartForge.Design.Machines.MachineModel _design = ElectricalBenchCase.Largest();
    private ElectricalFacts? _facts;
    private IReadOnlyList<PartView> _views = Array.Empty<PartView>();

    public string Name => "checks-given-facts";

    public string Description => "checks-all without the pull's field integration (facts prepared in Setup; target < 50 ms)";

    public void Setup()
    {
        _design = ElectricalBenchCase.Largest();
        var e = ElectricalEngine.Evaluate(_design);
        var parts = PartsBuilder.Build(_design, e);
        _facts = CheckRunner.FactsFrom(_design, e) ?? throw new InvalidOperationException("the bench design's coil did not resolve");
        _views = CheckRunner.ViewsFrom(parts);
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var report = CheckRunner.Run(_design, _facts!, _views, new CheckOptions { SweepStepDeg = 0.5 });
        return new Dictionary<string, double>
        {
            ["checks"] = report.Checks.Count,
            ["fail"] = report.FailCount,
            ["min_clearance_mm"] = report.WithId(CheckIds.RotationClearance).FirstOrDefault()?.Value ?? double.NaN,
        };
    }
}
