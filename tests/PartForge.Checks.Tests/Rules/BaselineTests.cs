namespace PartForge.Checks.Tests.Rules;

public class BaselineTests
{
    [Fact]
    public void The_test_machine_passes_every_check()
    {
        var report = new TestMachine().Check();
        foreach (var c in report.Checks) Assert.True(c.Status == CheckStatus.Pass, $"{c.Id} {c.Part}: {c.StatusText} {c.Message}");
        Assert.False(report.HasFailures);
        var ids = report.Checks.Select(c => c.Id).ToHashSet();
        foreach (var id in new[] { CheckIds.RunningGap, CheckIds.MagnetPullDeflection, CheckIds.MagnetPullStress, CheckIds.RotationClearance,
                     CheckIds.WindingFill, CheckIds.CurrentDensity, CheckIds.CoilTemperature, CheckIds.RotorHoopStress,
                     CheckIds.MagnetRetention, CheckIds.MagnetPullOut, CheckIds.CoilCoilClearance, CheckIds.MagnetTemperature })
            Assert.Contains(id, ids);
    }
}
