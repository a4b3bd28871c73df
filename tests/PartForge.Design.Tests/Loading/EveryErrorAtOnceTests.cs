using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>
/// Finding: a file with four mistakes reported two (the cross-key rules were skipped whenever a key failed to map),
/// so the odd pole count appeared only on the next run. Now the rules run beside the mapping errors, each leaving
/// out only what it would judge on a key that failed to map (where the image holds a default), and every error is
/// listed in file order.
/// </summary>
public class EveryErrorAtOnceTests
{
    private static string FourMistakes =>
        Edit(Edit(Edit(Edit(Crank, "poles:", "poles: 13"), "layout:", "layout: single-rotr"), "turns:", "turns: many"), "air_gap:", "air_gap: -1");

    [Fact]
    public void Four_mistakes_are_four_errors_in_file_order_with_the_odd_pole_count_among_them()
    {
        string text = FourMistakes;
        var errs = Errors(text);
        Assert.Equal(new[] { "machine.layout", "machine.poles", "coils.turns", "gap.air_gap" }, errs.Select(e => e.KeyPath));
        Assert.Equal(new[] { LineOf(text, "layout:"), LineOf(text, "poles:"), LineOf(text, "turns:"), LineOf(text, "air_gap:") },
            errs.Select(e => e.Line));
        Assert.Contains("an even number", errs[1].ToString());
    }

    [Fact]
    public void A_rule_that_reads_a_key_which_failed_to_map_waits_for_that_key()
    {
        // rated_rpm above max_rpm is a rule error, but max_rpm did not map (its default 1200 stands in), so the
        // rule would judge a value the user did not write: only max_rpm's own error is given.
        string text = Edit(Edit(Crank, "max_rpm:", "max_rpm: fast"), "rated_rpm:", "rated_rpm: 5000");
        var errs = Errors(text);
        Assert.Equal(new[] { "machine.max_rpm" }, errs.Select(e => e.KeyPath));
        // With max_rpm fixed the rule speaks.
        var fixedErrs = Errors(Edit(text, "max_rpm:", "max_rpm: 1000"));
        Assert.Equal(new[] { "machine.rated_rpm" }, fixedErrs.Select(e => e.KeyPath));
    }

    [Fact]
    public void A_rule_about_a_misspelt_key_waits_for_the_key_it_was_meant_as()
    {
        // "diametr" is probably magnets.diameter; the disc's size rules would otherwise say the diameter is missing.
        string text = Edit(Edit(Crank, "diameter: 12", "diametr: 12"), "poles:", "poles: 13");
        var errs = Errors(text);
        Assert.Equal(new[] { "machine.poles", "magnets.diametr" }, errs.Select(e => e.KeyPath));
    }

    [Fact]
    public void A_shape_key_that_failed_to_map_never_reaches_the_shape_rules()
    {
        // magnets.diameter holds no value when it fails to map; the rules must not make a disc from it.
        string text = Edit(Crank, "diameter: 12", "diameter: [12]");
        var errs = Errors(text);
        Assert.Equal(new[] { "magnets.diameter" }, errs.Select(e => e.KeyPath));
    }

    [Fact]
    public void A_rule_error_in_a_section_with_no_mapping_error_is_kept_beside_errors_elsewhere()
    {
        // Bore not less than the rotor's diameter (rotor section clean) beside a bad number in the coils section.
        string text = Edit(Edit(Crank, "bore:", "bore: 500"), "turns:", "turns: -3");
        var errs = Errors(text);
        Assert.Contains(errs, e => e.KeyPath == "rotor.bore");
        Assert.Contains(errs, e => e.KeyPath == "coils.turns");
        Assert.Equal(errs.Select(e => e.Line).Order(), errs.Select(e => e.Line));
    }
}
