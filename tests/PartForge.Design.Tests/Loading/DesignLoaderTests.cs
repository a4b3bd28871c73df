using PartForge.Design.Loading;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

public class DesignLoaderTests
{
    [Fact]
    public void Range_error_names_file_line_column_key_value_and_allowed_range()
    {
        string text = Edit(Crank, "pocket_clearance:", "pocket_clearance: -0.2");
        var e = Single(text, "rotor.pocket_clearance");
        Assert.Equal(LineOf(text, "pocket_clearance:"), e.Line);
        Assert.Equal(21, e.Column); // "  pocket_clearance: -0.2": the value starts in column 21
        Assert.Equal("-0.2", e.Value);
        Assert.Equal("0 to 5 mm", e.Allowed);
        Assert.Equal($"t.yaml:{e.Line}:21: rotor.pocket_clearance: -0.2 is not allowed; allowed: 0 to 5 mm", e.ToString());
    }

    [Theory]
    [InlineData(".nan")]
    [InlineData(".inf")]
    [InlineData("-.inf")]
    [InlineData("NaN")]
    public void Non_finite_numbers_are_refused(string value)
    {
        var e = Single(Edit(Crank, "outer_diameter: 110", "outer_diameter: " + value), "rotor.outer_diameter");
        Assert.Contains("is not a finite number", e.ToString());
        Assert.Equal("more than 0, up to 1000 mm", e.Allowed);
    }

    [Fact]
    public void Negative_size_is_refused()
    {
        var e = Single(Edit(Crank, "thickness: 5.2", "thickness: -5"), "rotor.thickness");
        Assert.Equal("-5", e.Value);
        Assert.Contains("allowed: 0.0001 to 100 mm", e.ToString());
    }

    /// <summary>Found by the long fuzz run: a rotor 5e-324 mm thick (the smallest double) passed "more than 0",
    /// and the magnets' load on it overflowed to infinity in a check's message. Thicknesses start at the mesh
    /// grid now.</summary>
    [Theory]
    [InlineData("5e-324")]
    [InlineData("0.00005")]
    public void Thickness_below_the_mesh_grid_is_refused(string value)
    {
        var e = Single(Edit(Crank, "thickness: 5.2", "thickness: " + value), "rotor.thickness");
        Assert.Equal(value, e.Value);
        Assert.Equal("0.0001 to 100 mm", e.Allowed);
    }

    [Fact]
    public void Wrong_types_are_refused_with_what_is_expected()
    {
        Assert.Contains("is not a number", Single(Edit(Crank, "rated_rpm:", "rated_rpm: fast"), "machine.rated_rpm").ToString());
        Assert.Contains("is not a whole number", Single(Edit(Crank, "poles:", "poles: 12.5"), "machine.poles").ToString());
        Assert.Contains("is text, not a number", Single(Edit(Crank, "poles:", "poles: '12'"), "machine.poles").ToString());
        Assert.Contains("a section is not allowed here", Single(Edit(Crank, "poles:", "poles: { a: 1 }"), "machine.poles").ToString());
        Assert.Contains("a list is not allowed here", Single(Edit(Crank, "poles:", "poles: [12, 14]"), "machine.poles").ToString());
        Assert.Contains("allowed: a section of keys", Single(Crank.Replace("former:\n  flange: 0.8\n  margin: 1.0\n", "former: 5\n"), "former").ToString());
    }

    [Fact]
    public void Integral_floats_are_accepted_for_whole_numbers()
    {
        var r = DesignLoader.LoadText(Edit(Crank, "poles:", "poles: 12.0"), "t.yaml");
        Assert.True(r.Success, string.Join(" | ", r.Errors));
        Assert.Equal(12, r.Design!.Machine.Poles);
    }

    [Fact]
    public void Word_lists_and_patterns_are_checked_with_a_suggestion()
    {
        var e = Single(Edit(Crank, "layout:", "layout: dual-rotr"), "machine.layout");
        Assert.Equal("one of: single-rotor, dual-rotor, dual-stator", e.Allowed);
        Assert.Equal("did you mean 'dual-rotor'?", e.Suggestion);
        var m = Single(Edit(Crank, "material: PLA", "material: pla"), "rotor.material");
        Assert.Equal("did you mean 'PLA'?", m.Suggestion);
        var n = Single(Edit(Crank, "name:", "name: Crank Bench"), "name");
        Assert.Contains("'-'", n.Allowed);
        Assert.Single(Errors(Edit(Crank, "name:", "name: ../../etc")), e2 => e2.KeyPath == "name");
    }

    [Fact]
    public void Unknown_key_suggests_the_nearest_key_at_that_level()
    {
        string text = Edit(Crank, "poles:", "pols: 12");
        var e = Single(text, "machine.pols");
        Assert.Equal("did you mean 'poles'?", e.Suggestion);
        Assert.Equal(LineOf(text, "pols:"), e.Line);
        Assert.Equal(3, e.Column);
        Assert.Contains("unknown", e.Kind);
        // Transposition counts as one edit (Damerau-Levenshtein).
        Assert.Equal("did you mean 'thickness'?", Single(Edit(Crank, "thickness: 5.2", "thikcness: 5.2"), "rotor.thikcness").Suggestion);
        // A key that belongs in another section is pointed there.
        var moved = Single(Crank + "\nair_gap: 1.0\n", "air_gap");
        Assert.Contains("gap.air_gap", moved.Suggestion);
    }

    [Fact]
    public void Every_error_is_reported_at_once()
    {
        string text = Edit(Edit(Edit(Crank, "poles:", "pols: 12"), "thickness: 5.2", "thickness: -1"), "turns:", "turns: many");
        var errs = Errors(text);
        Assert.Contains(errs, e => e.KeyPath == "machine.pols");
        Assert.Contains(errs, e => e.KeyPath == "rotor.thickness");
        Assert.Contains(errs, e => e.KeyPath == "coils.turns");
        Assert.Equal(errs.OrderBy(e => e.Line).Select(e => e.Line), errs.Select(e => e.Line));
    }

    [Fact]
    public void Syntax_error_gives_line_and_column()
    {
        string text = "partforge: 1\nname: x\nmachine:\n  poles: [12\n  coils: 9\n";
        var e = Assert.Single(Errors(text));
        Assert.Equal("syntax", e.Kind);
        Assert.True(e.Line >= 4, e.ToString());
        Assert.StartsWith("t.yaml:", e.ToString());
        Assert.DoesNotContain('\n', e.ToString());
    }

    [Fact]
    public void Duplicate_key_is_refused()
    {
        string text = Crank.Replace("  poles: 12\n", "  poles: 12\n  poles: 14\n");
        var e = Assert.Single(Errors(text));
        Assert.Contains("given twice", e.ToString());
        Assert.Equal("duplicate", e.Kind);
        Assert.Equal(TestSupport.LineOf(text, "poles: 14"), e.Line);
    }

    [Fact]
    public void Empty_and_comment_only_files_are_refused()
    {
        Assert.Equal("empty", Assert.Single(Errors("")).Kind);
        Assert.Equal("empty", Assert.Single(Errors("# nothing here\n\n")).Kind);
        Assert.Contains("mapping", Assert.Single(Errors("- a\n- b\n")).Message);
        Assert.Contains("mapping", Assert.Single(Errors("just words\n")).Message);
    }

    [Fact]
    public void Required_keys_and_version()
    {
        var errs = Errors("machine:\n  poles: 12\n");
        Assert.Contains(errs, e => e.KeyPath == "partforge" && e.Message.Contains("missing"));
        Assert.Contains(errs, e => e.KeyPath == "name" && e.Message.Contains("missing"));
        var v = Single(Edit(Crank, "partforge:", "partforge: 2"), "partforge");
        Assert.Equal("a whole number 1", v.Allowed);
    }

    [Fact]
    public void Defaults_are_filled_and_derived_keys_resolved()
    {
        string text = Crank.Replace("  connection: star\n", "");
        var loaded = DesignLoader.LoadText(text, "t.yaml");
        var d = loaded.Design!;
        var m = loaded.Machine!;
        Assert.Null(d.Machine.Connection);                     // the file as written ...
        Assert.Equal(PartForge.Design.Machines.Connection.Star, m.Connection); // ... and the machine it describes
        Assert.Equal(40, m.Coils.PitchRadiusMm);               // from magnets.pitch_radius
        Assert.Equal(0.1, m.Tolerances.PrintZMm);              // documented default
        Assert.Equal(0.01, m.ChordalToleranceMm);
        Assert.Equal(3, m.Sensor.Count);                       // one per phase when not given
        Assert.Null(m.Rotor.BackIronThicknessMm);
    }

    [Fact]
    public void Arc_magnets_resolve_their_pitch_radius_to_the_mid_radius()
    {
        var p = PartForge.Design.Presets.PresetLibrary.Find("hydro-arc")!;
        var m = DesignLoader.LoadText(p.Text, "h.yaml").Machine!;
        Assert.IsType<PartForge.Design.Machines.Magnets.ArcMagnet>(m.Magnets.Shape);
        Assert.Equal(37.5, m.Magnets.Shape.PitchRadiusMm);
        Assert.Equal(37.5, m.Coils.PitchRadiusMm);
    }

    [Fact]
    public void Too_many_aliases_and_too_deep_nesting_are_refused_quickly()
    {
        var sb = new System.Text.StringBuilder("partforge: 1\nname: x\nlol: &a [1]\n");
        for (int i = 0; i < 100; i++) sb.Append($"k{i}: *a\n");
        var e = Assert.Single(Errors(sb.ToString()));
        Assert.Equal("limit", e.Kind);
        Assert.Contains("alias", e.Message);
        string deep = "partforge: 1\nname: x\nz: " + new string('[', 5000) + new string(']', 5000) + "\n";
        var e2 = Assert.Single(Errors(deep));
        Assert.Equal("limit", e2.Kind);
        Assert.Contains("nested", e2.Message);
    }

    [Fact]
    public void Aliases_within_the_limit_work()
    {
        string text = Crank.Replace("  bolt_circle: { diameter: 24, count: 4, hole: 3.4 }", "  bolt_circle: &bc { diameter: 24, count: 4, hole: 3.4 }");
        Assert.True(DesignLoader.LoadText(text, "t").Success);
    }
}
