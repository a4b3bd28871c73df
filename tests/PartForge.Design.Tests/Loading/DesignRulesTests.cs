using PartForge.Design.Loading;
using PartForge.Design.Presets;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

public class DesignRulesTests
{
    private static string Wind => PresetLibrary.Find("wind-duo")!.Text;
    private static string Pulse => PresetLibrary.Find("pulse-sculpture")!.Text;
    private static string Hydro => PresetLibrary.Find("hydro-arc")!.Text;

    [Fact]
    public void Odd_pole_count_is_refused_at_the_key()
    {
        string text = Edit(Crank, "poles:", "poles: 13");
        var e = Single(text, "machine.poles");
        Assert.Equal(LineOf(text, "poles:"), e.Line);
        Assert.Contains("even", e.Allowed);
    }

    [Fact]
    public void Three_phase_coils_must_divide_by_three_and_connection_fit_the_phases()
    {
        Assert.Contains("multiple of 3", Single(Edit(Crank, "coils: 9", "coils: 10"), "machine.coils").Allowed);
        Assert.Equal("star or delta", Single(Edit(Crank, "connection:", "connection: series"), "machine.connection").Allowed);
        Assert.Equal("series or parallel", Single(Edit(Pulse, "connection:", "connection: delta"), "machine.connection").Allowed);
    }

    [Fact]
    public void Rated_speed_above_max_speed_is_refused()
    {
        var e = Single(Edit(Crank, "rated_rpm:", "rated_rpm: 1500"), "machine.rated_rpm");
        Assert.Contains("machine.max_rpm (1200)", e.Message);
    }

    [Fact]
    public void Magnet_shape_needs_its_own_size_keys_and_no_others()
    {
        var errs = Errors(Edit(Crank, "shape: disc", "shape: block"));
        Assert.Contains(errs, e => e.KeyPath == "magnets.length" && e.Message.Contains("missing"));
        Assert.Contains(errs, e => e.KeyPath == "magnets.width" && e.Message.Contains("missing"));
        Assert.Contains(errs, e => e.KeyPath == "magnets.diameter" && e.Message.Contains("does not apply"));
        var arc = Errors(Hydro.Replace("  span: 22\n", "  span: 22\n  pitch_radius: 37\n"));
        Assert.Contains(arc, e => e.KeyPath == "magnets.pitch_radius" && e.Message.Contains("does not apply"));
        Assert.Contains("less than magnets.outer_radius", Single(Edit(Hydro, "inner_radius:", "inner_radius: 50"), "magnets.inner_radius").Allowed);
    }

    [Fact]
    public void Disc_pockets_overlapping_each_other_are_refused_with_the_overlap()
    {
        // 12 pockets of 20.15 mm on radius 40: centres 2*40*sin(15 deg) = 20.7055 mm apart -> web 0.5555 mm (fits);
        // 22 mm magnets -> pockets 22.15 mm -> overlap 22.15 - 20.70552 = 1.44448 mm.
        // Source: chord length of a regular polygon, c = 2 R sin(pi/n).
        Assert.True(DesignLoader.LoadText(Edit(Crank, "diameter: 12", "diameter: 20"), "t").Success);
        var e = Single(Edit(Crank, "diameter: 12", "diameter: 22"), "magnets.diameter");
        Assert.Contains("overlap by 1.444 mm", e.Message);
    }

    [Fact]
    public void Block_pockets_overlap_is_computed_at_the_inner_corners()
    {
        // 16 blocks 20 x W on radius 60 (+0.15): inner edge at 60 - 10.075 = 49.925 mm; web =
        // 2 (49.925 sin(11.25 deg) - (W + 0.15)/2 cos(11.25 deg)) -> zero at W = 2 * 49.925 tan(11.25 deg) - 0.15 = 19.711.
        Assert.True(DesignLoader.LoadText(Edit(Wind, "width: 10", "width: 19.7"), "t").Success);
        Assert.Contains("overlap", Single(Edit(Wind, "width: 10", "width: 19.72"), "magnets.width").Message);
    }

    [Fact]
    public void Arc_pockets_overlap_when_the_span_leaves_no_gap()
    {
        // 12 poles: 30 deg pitch; span 29.5 leaves 0.5 deg: 2 * 30 * sin(0.25 deg) = 0.2618 > 0.15 clearance (fits);
        // span 29.8: 2 * 30 * sin(0.1 deg) = 0.1047 < 0.15 (overlap).
        Assert.True(DesignLoader.LoadText(Edit(Hydro, "span:", "span: 29.5"), "t").Success);
        Assert.Contains("overlap", Single(Edit(Hydro, "span:", "span: 29.8"), "magnets.span").Message);
    }

    [Fact]
    public void Pockets_through_the_rim_or_into_the_bore_are_refused()
    {
        // Pocket edge at 40 + 12.15/2 = 46.075 mm: a 92 mm disc (rim 46) is cut through.
        var rim = Single(Edit(Crank, "outer_diameter: 110", "outer_diameter: 92"), "magnets.pitch_radius");
        Assert.Contains("through the rotor rim at 46 mm", rim.Message);
        Assert.True(DesignLoader.LoadText(Edit(Crank, "outer_diameter: 110", "outer_diameter: 92.2"), "t").Success);
        var bore = Errors(Edit(Crank, "bore: 8", "bore: 70"));
        Assert.Contains(bore, e => e.KeyPath == "magnets.pitch_radius" && e.Message.Contains("into the bore"));
    }

    [Fact]
    public void Bolt_holes_must_stay_clear_of_each_other_the_bore_the_rim_and_the_pockets()
    {
        Assert.Contains("overlap", Single(Edit(Crank, "bolt_circle:", "bolt_circle: { diameter: 24, count: 24, hole: 3.4 }"), "rotor.bolt_circle.count").Message);
        Assert.Contains("into the bore", Single(Edit(Crank, "bolt_circle:", "bolt_circle: { diameter: 10, count: 4, hole: 3.4 }"), "rotor.bolt_circle.diameter").Message);
        Assert.Contains("into the magnet pockets", Single(Edit(Crank, "bolt_circle:", "bolt_circle: { diameter: 70, count: 4, hole: 3.4 }"), "rotor.bolt_circle.diameter").Message);
        var errs = Errors(Edit(Crank, "bolt_circle:", "bolt_circle: { diameter: 112, count: 4, hole: 3.4 }"));
        Assert.Contains(errs, e => e.KeyPath == "rotor.bolt_circle.diameter" && e.Message.Contains("beyond the rotor rim"));
    }

    [Fact]
    public void Pocket_floor_must_leave_a_pocket_and_dual_stator_needs_through_pockets_without_back_iron()
    {
        Assert.Contains("leaves no pocket", Single(Edit(Crank, "pocket_floor:", "pocket_floor: 5.2"), "rotor.pocket_floor").Message);
        Assert.Contains("through pockets", Single(Edit(Pulse, "pocket_floor:", "pocket_floor: 1"), "rotor.pocket_floor").Message);
        var bi = Single(Pulse.Replace("  material: PLA\ncoils:", "  back_iron: { thickness: 1.5 }\n  material: PLA\ncoils:"), "rotor.back_iron");
        Assert.Contains("dual-stator", bi.Message);
    }

    [Fact]
    public void Stator_ring_and_mount_holes()
    {
        Assert.Contains("not less than stator.outer_diameter", Single(Edit(Crank, "inner_diameter: 30", "inner_diameter: 140"), "stator.inner_diameter").Message);
        Assert.Contains("outside the stator ring", Single(Edit(Crank, "mount:", "mount: { circle_diameter: 131, count: 4, hole: 4.5 }"), "stator.mount.circle_diameter").Message);
    }

    [Fact]
    public void Wire_turns_and_core_alternatives()
    {
        Assert.Contains("give one", Single(Edit(Crank, "wire:", "wire: { awg: 28, diameter: 0.3 }"), "coils.wire.diameter").Message);
        Assert.Contains("is missing", Single(Edit(Crank, "wire:", "wire: {}"), "coils.wire").Message);
        Assert.Contains("target_emf solves", Single(Crank.Replace("  turns: 120\n", "  turns: 120\n  target_emf: { rms: 6, rpm: 400 }\n"), "coils.target_emf").Message);
        Assert.Contains("is missing", Single(Crank.Replace("  turns: 120\n", ""), "coils.turns").Message);
        Assert.True(DesignLoader.LoadText(Crank.Replace("  turns: 120\n", "  target_emf: { rms: 6, rpm: 400 }\n"), "t").Success);
        var keystone = Errors(Edit(Crank, "shape: round", "shape: keystone"));
        Assert.Contains(keystone, e => e.KeyPath == "coils.core.width" && e.Message.Contains("missing"));
        Assert.Contains(keystone, e => e.KeyPath == "coils.core.diameter" && e.Message.Contains("does not apply"));
    }

    [Fact]
    public void Three_sensors_need_three_phases()
    {
        var e = Single(Edit(Pulse, "count: 1", "count: 3"), "sensor.count");
        Assert.Equal(LineOf(Edit(Pulse, "count: 1", "count: 3"), "count: 3"), e.Line);
    }
}
