using PartForge.Checks.Hardware;
using PartForge.Design.Hardware;
using PartForge.Checks.Tests.Pipeline;
using PartForge.Design.Machines;
using PartForge.Design.Parts;

namespace PartForge.Checks.Tests.Rules;

public sealed class HardwareRulesTests
{
    [Theory]
    // Source: ISO 898-1 table of tensile stress areas for coarse threads (from memory): M3 5.03, M4 8.78, M5 14.2,
    // M6 20.1, M8 36.6, M10 58.0, M12 84.3 mm^2.
    [InlineData("M3", 5.03)]
    [InlineData("M4", 8.78)]
    [InlineData("M5", 14.2)]
    [InlineData("M6", 20.1)]
    [InlineData("M8", 36.6)]
    [InlineData("M10", 58.0)]
    [InlineData("M12", 84.3)]
    public void StressAreaMatchesTheIsoTable(string size, double table)
    {
        var t = MetricThreads.All.Single(x => x.Size == size);
        Assert.True(Math.Abs(t.StressAreaMm2 - table) <= 0.006 * table, $"{size}: {t.StressAreaMm2} vs {table}");
    }

    private static (MachineModel M, Inputs.ElectricalFacts F, IReadOnlyList<Inputs.PartView> V) WindDuo()
    {
        var d = PresetPipeline.Load("wind-duo");
        var (e, parts) = PresetPipeline.Stages(d);
        var m = MachineModel.From(d);
        return (m, CheckRunner.FactsFrom(m, e)!, CheckRunner.ViewsFrom(parts));
    }

    /// <summary>wind-duo: 6 x M4 (hole 4.5 on D36) through-studs. The stud tension is computed here by hand:
    /// clamp = 2 T / (0.2 r) + pull, over 6 studs, over the ISO 898-1 table's 8.78 mm^2; the limit is half of
    /// class 8.8's proof stress 580 MPa (from memory).</summary>
    [Theory]
    [InlineData(350.0, CheckStatus.Fail)]
    [InlineData(200.0, CheckStatus.Pass)]
    public void StudTensionTripsAtHalfTheProofStress(double targetMpa, CheckStatus expected)
    {
        var (m, f, v) = WindDuo();
        double pull = f.PullOnRotorN[PartId.RotorFront];
        double r = 0.018;
        double torque = (targetMpa * 8.78 * 6 - pull) * 0.2 * r / 2;
        var report = CheckRunner.Run(m, f with { ShaftTorqueNm = torque }, v);
        var row = report.WithId(CheckIds.FastenerTension).Single(c => c.Part == PartId.BackIron);
        Assert.Equal(targetMpa, row.Value, targetMpa * 0.006);
        Assert.Equal(expected, row.Status);
        if (expected == CheckStatus.Fail)
        {
            Assert.Contains("rotor.bolt_circle.", row.Message);
            // The thread it names carries the load within the warning band.
            var named = MetricThreads.All.First(t => row.Message.Contains($"({t.Size})"));
            Assert.True(targetMpa * 8.78 / named.StressAreaMm2 <= 290 * 0.8);
        }
    }

    [Fact]
    public void DualRotorStudsClampBothRotorsAndTheSpacerAndTheStatorIsScrewedToItsFrame()
    {
        var (m, f, v) = WindDuo();
        var joints = FastenerPlanner.Plan(m, f, v);
        var stud = joints.Single(j => j.Kind == JointKind.ThroughStud);
        Assert.Equal(HolePattern.RotorBoltCircle, stud.Pattern);
        Assert.Equal(6, stud.Count);
        Assert.Equal([PartRole.BackIron, PartRole.Rotor, PartRole.HubSpacer, PartRole.Rotor, PartRole.BackIron], stud.Clamped.Select(c => c.Part.Role));
        // The stack's outermost faces are the back irons' (AxialStack): the grip is their distance.
        var slabs = m.Stack.OfKind(PartForge.Design.Stack.SlabKind.BackIron).ToList();
        Assert.Equal(slabs.Max(s => s.ZMax) - slabs.Min(s => s.ZMin), stud.GripMm, 9);
        var mount = joints.Single(j => j.Pattern == HolePattern.StatorMount);
        Assert.Equal(JointKind.BoltToMount, mount.Kind);
        Assert.Equal([PartId.Stator], mount.Clamped.Select(c => c.Part));
    }

    [Fact]
    public void AssemblyStepsCarryThePullWhereTheRotorsClose()
    {
        var (m, f, v) = WindDuo();
        var report = CheckRunner.Run(m, f, v);
        double pull = f.PullOnRotorN[PartId.RotorFront];
        Assert.True(pull > 0);
        Assert.Equal(Enumerable.Range(1, report.Assembly.Count), report.Assembly.Select(s => s.Order));
        // wind-duo's last rotor has jacking screws: the step that backs them off is where the rotors close.
        var closing = report.Assembly.Single(s => s.Action.Contains("back the screws off", StringComparison.Ordinal));
        Assert.Contains("set rotor-front", closing.Action);
        Assert.NotNull(report.Jacks);
        Assert.Equal(6, report.Jacks!.Count);
        Assert.Equal(pull, closing.PullN);
        Assert.Contains(AssemblyPlanner.Fingers, closing.Caution);
        Assert.Contains(AssemblyPlanner.Spacer, closing.Caution);
        Assert.Contains(report.Assembly, s => s.Caution == AssemblyPlanner.Flying && s.PullN == f.MagnetToBackIronN);
        // Nothing before the second rotor arrives is pulled across the stator.
        Assert.All(report.Assembly.TakeWhile(s => s != closing), s => Assert.True(s.PullN <= f.MagnetToBackIronN));
    }
}
