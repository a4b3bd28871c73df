namespace PartForge.Checks.Tests.Pipeline;

/// <summary>
/// coil-seat-in-ring and coil-faces-magnets on the real stages. Finding: coils on a pitch radius outside the
/// stator ring made a stator with no seats, an EMF of 0.001 V and "pass".
/// </summary>
public class CoilPlacementTests
{
    private static CheckResult One(CheckReport r, string id) => r.Checks.Single(c => c.Id == id);

    [Fact]
    public void Coils_outside_the_stator_ring_fail_both_placement_checks_with_an_achievable_fix()
    {
        // crank-bench: stator ring 15..65 mm, magnets of 12 mm on radius 40 (invented preset); coils moved to r 80.
        var d = PresetPipeline.Load("crank-bench", ("coils.pitch_radius", "80"));
        var r = PresetPipeline.Check(d);
        var seat = One(r, CheckIds.CoilSeatInRing);
        Assert.Equal(CheckStatus.Fail, seat.Status);
        Assert.True(seat.Value < -15, seat.Message); // the coil centre alone is 15 mm past the 65 mm edge
        Assert.Contains("coils.pitch_radius", seat.Message);
        var faces = One(r, CheckIds.CoilFacesMagnets);
        Assert.Equal(CheckStatus.Fail, faces.Status);
        Assert.Contains("set coils.pitch_radius to 40", faces.Message);
        // The fix is inside the key's range: following it makes both checks pass.
        var fixedDesign = PresetPipeline.Load("crank-bench", ("coils.pitch_radius", "40"));
        var r2 = PresetPipeline.Check(fixedDesign);
        Assert.Equal(CheckStatus.Pass, One(r2, CheckIds.CoilSeatInRing).Status);
        Assert.Equal(CheckStatus.Pass, One(r2, CheckIds.CoilFacesMagnets).Status);
    }

    [Fact]
    public void A_coil_half_off_the_magnet_track_warns()
    {
        // Magnets span 40 +- 6 mm (disc 12 mm, geometry). Round coil outline at pitch 40 spans 40 +- (4 + build);
        // move it out until it covers less than half of the 12 mm track but keep the seats in the ring.
        var d0 = PresetPipeline.Load("crank-bench");
        var r0 = PresetPipeline.Check(d0);
        var f0 = One(r0, CheckIds.CoilFacesMagnets);
        Assert.Equal(CheckStatus.Pass, f0.Status);
        Assert.Equal(12.0, f0.Value, 3); // the winding spans the whole 12 mm track
        Assert.Equal(6.0, f0.Limit, 3);
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_preset_passes_both_placement_checks(string preset)
    {
        var r = PresetPipeline.Check(PresetPipeline.Load(preset));
        Assert.Equal(CheckStatus.Pass, One(r, CheckIds.CoilSeatInRing).Status);
        Assert.NotEqual(CheckStatus.Fail, One(r, CheckIds.CoilFacesMagnets).Status);
    }

    public static TheoryData<string> Presets()
    {
        var t = new TheoryData<string>();
        foreach (var p in PresetPipeline.PresetNames()) t.Add(p);
        return t;
    }
}
