using CsCheck;

namespace PartForge.Checks.Tests.Rules;

public class RobustnessTests
{
    // Random variants of the test machine, including extreme ones: the checker never throws, never reports a
    // non-finite number, and gives the same report twice.
    [Fact]
    public void Random_machines_never_crash_and_are_deterministic()
    {
        var gen = Gen.Select(Gen.Double[0.05, 5], Gen.Double[1, 20], Gen.Int[20, 2000], Gen.Double[100, 60000], Gen.Double[0.05, 0.95],
            Gen.Double[0, 3000], Gen.Int[0, 4], Gen.Int[0, 2]);
        string[] materials = ["PLA", "PETG", "PA", "aluminium", "plywood"];
        string[] layouts = ["single-rotor", "dual-rotor", "dual-stator"];
        gen.Sample(t =>
        {
            var (gap, rotorT, turns, rpm, fill, pull, mi, li) = t;
            string material = materials[mi], layout = layouts[li];
            var m = new TestMachine().With(x =>
            {
                x.AirGap = gap; x.RotorT = rotorT; x.Turns = turns; x.MaxRpm = rpm; x.Fill = fill; x.PullN = pull;
                x.RotorMaterial = material; x.Layout = layout; x.PocketFloor = Math.Min(1.2, rotorT / 2);
            });
            var a = m.Check();
            var b = m.Check();
            Assert.NotEmpty(a.Checks);
            foreach (var c in a.Checks)
            {
                Assert.True(double.IsFinite(c.Value) && double.IsFinite(c.Limit) && double.IsFinite(c.Margin), $"{c.Id}: {c.Message}");
                Assert.False(string.IsNullOrWhiteSpace(c.Message));
            }
            Assert.Equal(a.Checks.Select(c => (c.Id, c.Part, c.Status, c.Value, c.Message)), b.Checks.Select(c => (c.Id, c.Part, c.Status, c.Value, c.Message)));
        }, iter: 60);
    }
}
