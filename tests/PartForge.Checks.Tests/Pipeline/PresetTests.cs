using Xunit.Abstractions;

namespace PartForge.Checks.Tests.Pipeline;

public class PresetTests(ITestOutputHelper output)
{
    public static TheoryData<string> Presets()
    {
        var t = new TheoryData<string>();
        foreach (var n in PresetPipeline.PresetNames()) t.Add(n);
        return t;
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_preset_passes_or_only_warns(string preset)
    {
        var report = PresetPipeline.Check(PresetPipeline.Load(preset));
        foreach (var c in report.Checks) output.WriteLine($"{c.StatusText,-4} {c.Id,-24} {c.Part,-12} {c.Value,10:0.###} {c.Limit,10:0.###} {c.Unit,-5} {c.Message}");
        Assert.False(report.HasFailures, string.Join("\n", report.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"{c.Id}: {c.Message}")));
        foreach (var id in new[] { CheckIds.RunningGap, CheckIds.RotationClearance, CheckIds.PocketWeb, CheckIds.PocketRimWall, CheckIds.WindingFill, CheckIds.RotorHoopStress })
            Assert.Contains(report.Checks, c => c.Id == id);
    }
}
