namespace PartForge.Checks.Tests.Rules;

/// <summary>The baseline made worse one parameter at a time fails with the check that parameter belongs to.</summary>
public class WorseningTests
{
    private static readonly TestMachine Base = new();

    public static TheoryData<string, string> Cases => new()
    {
        { "thinner gap", CheckIds.RunningGap },
        { "thicker coil", CheckIds.CoilCoilClearance },
        { "more turns", CheckIds.CoilCoilClearance },
        { "higher max_rpm", CheckIds.RotorHoopStress },
        { "softer material", CheckIds.MagnetPullDeflection },
        { "hotter coil", CheckIds.CoilTemperature },
    };

    private static TestMachine Worse(string what) => what switch
    {
        "thinner gap" => Base.With(m => m.AirGap = 0.6),
        "thicker coil" => Base.With(m => { m.WireBare = 0.5; m.WireOverall = 0.55; }),
        "more turns" => Base.With(m => m.Turns = 300),
        "higher max_rpm" => Base.With(m => m.MaxRpm = 16000),
        "softer material" => Base.With(m => { m.RotorOd = 200; m.MagnetPitch = 80; m.StatorOd = 220; m.RotorT = 4; m.MagnetT = 2.5; m.AirGap = 2.5; m.PullN = 50; m.RotorMaterial = "PA"; }),
        "hotter coil" => Base.With(m => m.CoilTemp = 60),
        _ => throw new ArgumentException(what),
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Fails_with_the_right_check(string what, string id)
    {
        var r = Worse(what).Check();
        Assert.Contains(r.Checks, c => c.Id == id && c.Status == CheckStatus.Fail);
    }

    [Fact]
    public void Softer_material_alone_turns_a_passing_rotor_into_a_failing_one()
    {
        var stiff = Base.With(m => { m.RotorOd = 200; m.MagnetPitch = 80; m.StatorOd = 220; m.RotorT = 4; m.MagnetT = 2.5; m.AirGap = 2.5; m.PullN = 50; m.RotorMaterial = "aluminium"; });
        Assert.DoesNotContain(stiff.Check().Checks, c => c.Status == CheckStatus.Fail);
        Assert.Contains(stiff.With(m => m.RotorMaterial = "PA").Check().Checks, c => c.Id == CheckIds.MagnetPullDeflection && c.Status == CheckStatus.Fail);
    }
}
