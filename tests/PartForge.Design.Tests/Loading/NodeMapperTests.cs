using PartForge.Design.Loading;
using PartForge.Design.Model;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>
/// The mapping stage through the public loader: duplicate keys, hidden and look-alike characters, the design
/// name's limits, and every mapping error of a file in one pass.
/// </summary>
public class NodeMapperTests
{
    // ---- duplicates --------------------------------------------------------------------------------------

    /// <summary>The review found "this key is given twice in the same section" without the key or the first line.</summary>
    [Fact]
    public void A_duplicate_key_names_the_key_and_both_lines()
    {
        string text = Crank.Replace("  poles: 12\n  coils: 9\n", "  poles: 12\n  coils: 9\n  poles: 14\n");
        var e = Assert.Single(Errors(text));
        int first = LineOf(text, "poles: 12"), again = LineOf(text, "poles: 14");
        Assert.Equal("duplicate", e.Kind);
        Assert.Equal((again, 3), (e.Line, e.Column));
        Assert.Equal($"t.yaml:{again}:3: machine.poles: is given twice (first on line {first}, again on line {again}); keep one", e.ToString());
    }

    [Fact]
    public void A_duplicate_section_is_named_and_its_own_mistakes_are_reported_too()
    {
        string text = Crank + "gap:\n  air_gap: -1\n";
        var errs = Errors(text);
        int first = LineOf(text, "gap:"), again = text.Split('\n').ToList().FindLastIndex(l => l == "gap:") + 1;
        Assert.Contains(errs, e => e.ToString() == $"t.yaml:{again}:1: gap: is given twice (first on line {first}, again on line {again}); keep one");
        Assert.Contains(errs, e => e.KeyPath == "gap.air_gap" && e.Value == "-1" && e.Line == again + 1);
        Assert.Equal(2, errs.Count);
    }

    // ---- hidden and look-alike characters ----------------------------------------------------------------

    /// <summary>The review's Cyrillic 'о' (U+043E) in "pоles": the message looked like "pоles is not a known
    /// key, did you mean 'poles'?" with nothing to see.</summary>
    [Fact]
    public void A_look_alike_letter_in_a_key_is_shown_as_its_code_point_and_named()
    {
        string text = Crank.Replace("  poles: 12\n", "  p\u043Eles: 12\n");
        var e = Assert.Single(Errors(text), x => x.Kind == "unknown-key");
        Assert.Equal("machine.p\\u043Eles", e.KeyPath);
        Assert.Equal("the key contains U+043E CYRILLIC SMALL LETTER O where 'o' looks the same; did you mean 'poles'?", e.Suggestion);
        Assert.StartsWith($"t.yaml:{LineOf(text, "p\u043Eles")}:3: machine.p\\u043Eles: is not a known key", e.ToString());
        Assert.True(e.ToString().All(c => c is >= ' ' and <= '~'), e.ToString());
    }

    public static TheoryData<string, string, string, string> HiddenValues => new()
    {
        // replaced line, key path, value as shown, the note
        { "  layout: dual-r\u043Etor", "machine.layout", "dual-r\\u043Etor", "U+043E CYRILLIC SMALL LETTER O where 'o' looks the same" },
        { "  layout: dual\u2013rotor", "machine.layout", "dual\\u2013rotor", "U+2013 EN DASH where '-' looks the same" },
        { "  poles: 12\u200B", "machine.poles", "12\\u200B", "U+200B ZERO WIDTH SPACE (invisible)" },
        { "  poles: 1\u00A02", "machine.poles", "1\\u00A02", "U+00A0 NO-BREAK SPACE where ' ' looks the same" },
        { "  poles: \uFEFF12", "machine.poles", "\\uFEFF12", "U+FEFF ZERO WIDTH NO-BREAK SPACE, the byte-order mark (invisible)" },
        { "  poles: \uFF11\uFF12", "machine.poles", "\\uFF11\\uFF12", "U+FF11 a full-width form where '1' looks the same" },
        { "  layout: dual-rotor\u202E", "machine.layout", "dual-rotor\\u202E", "U+202E RIGHT-TO-LEFT OVERRIDE (invisible)" },
    };

    [Theory]
    [MemberData(nameof(HiddenValues))]
    public void Hidden_and_look_alike_characters_in_values_are_shown_and_named(string line, string keyPath, string shown, string note)
    {
        string key = line.Trim()[..line.Trim().IndexOf(':')];
        var e = Single(Edit(Crank, key + ":", line.Trim()), keyPath);
        Assert.Equal(shown, e.Value);
        Assert.Contains("the value contains " + note, e.Suggestion);
        Assert.True(e.ToString().All(c => c is >= ' ' and <= '~'), e.ToString());
    }

    [Fact]
    public void A_look_alike_word_still_gets_the_word_it_passes_for()
    {
        var e = Single(Edit(Crank, "layout:", "layout: dual-r\u043Etor"), "machine.layout");
        Assert.EndsWith("did you mean 'dual-rotor'?", e.Suggestion);
    }

    [Fact]
    public void A_byte_order_mark_or_zero_width_space_inside_the_file_is_shown()
    {
        var bom = Assert.Single(Errors(Crank.Replace("\nmachine:\n", "\n\uFEFFmachine:\n")), e => e.Kind == "unknown-key");
        Assert.Equal("\\uFEFFmachine", bom.KeyPath);
        Assert.EndsWith("did you mean 'machine'?", bom.Suggestion);
        var zw = Assert.Single(Errors(Crank.Replace("  coils: 9\n", "  co\u200Bils: 9\n")), e => e.Kind == "unknown-key");
        Assert.Equal("machine.co\\u200Bils", zw.KeyPath);
        Assert.Equal("the key contains U+200B ZERO WIDTH SPACE (invisible); did you mean 'coils'?", zw.Suggestion);
    }

    // ---- the design name ---------------------------------------------------------------------------------

    [Fact]
    public void A_name_of_the_maximum_length_is_accepted_and_one_more_is_refused()
    {
        string ok = new string('a', OutputNameAttribute.MaxLength - 2) + "-b";
        Assert.True(DesignLoader.LoadText(Edit(Crank, "name:", "name: " + ok), "t.yaml").Success);
        string text = Edit(Crank, "name:", "name: " + ok + "c");
        var e = Single(text, "name");
        Assert.Equal((LineOf(text, "name:"), 7), (e.Line, e.Column));
        Assert.Equal("range", e.Kind);
        Assert.Contains($"is {OutputNameAttribute.MaxLength + 1} characters long; output file names are made from it, so it may have at most {OutputNameAttribute.MaxLength}", e.ToString());
    }

    /// <summary>
    /// Two names that agree in their first 64 characters used to write the same files (the output names are
    /// cut to 64); now neither loads, so no design can overwrite another's files that way.
    /// </summary>
    [Fact]
    public void Two_long_names_with_the_same_start_are_both_refused()
    {
        string stem = new('m', 64);
        foreach (var name in new[] { stem + "-front", stem + "-back" })
            Assert.Equal("range", Single(Edit(Crank, "name:", "name: " + name), "name").Kind);
    }

    [Theory]
    [InlineData("con")]
    [InlineData("prn")]
    [InlineData("aux")]
    [InlineData("nul")]
    [InlineData("com1")]
    [InlineData("com9")]
    [InlineData("lpt1")]
    [InlineData("lpt9")]
    [InlineData("com0")]
    public void Windows_device_names_are_refused_at_the_name(string name)
    {
        string text = Edit(Crank, "name:", "name: " + name);
        var e = Single(text, "name");
        Assert.Equal((LineOf(text, "name:"), 7), (e.Line, e.Column));
        Assert.Equal($"t.yaml:{e.Line}:7: name: {name} is a device name on Windows, where a file '{name}.3mf' cannot be made", e.ToString()[..e.ToString().IndexOf("; allowed", StringComparison.Ordinal)]);
        Assert.EndsWith($"choose another name, for example '{name}-1'", e.ToString());
    }

    [Theory]
    [InlineData("CON")]
    [InlineData("Nul")]
    [InlineData("LPT3")]
    public void Device_names_in_capitals_are_refused_too(string name) =>
        Assert.Single(Errors(Edit(Crank, "name:", "name: " + name)), e => e.KeyPath == "name");

    /// <summary>Only the exact names are reserved: "con-bench" makes "con-bench.3mf" and "con-bench-rotor.stl".</summary>
    [Theory]
    [InlineData("con-bench")]
    [InlineData("com10")]
    [InlineData("lpt")]
    [InlineData("console")]
    [InlineData("aux2")]
    public void Names_that_only_start_like_a_device_are_accepted(string name) =>
        Assert.True(DesignLoader.LoadText(Edit(Crank, "name:", "name: " + name), "t.yaml").Success);

    [Fact]
    public void The_name_limits_are_documented_where_the_key_is()
    {
        var key = PartForge.Design.Keys.SectionSpec.Root.Find("name")!;
        Assert.Contains($"at most {OutputNameAttribute.MaxLength} characters", key.Doc);
        foreach (var n in new[] { "con", "prn", "aux", "nul", "com0-com9", "lpt0-lpt9" }) Assert.Contains(n, key.Doc);
    }

    // ---- every mapping error at once ---------------------------------------------------------------------

    /// <summary>
    /// The review's file with four mistakes of which two were reported: the duplicate key made the YAML reader
    /// stop with one error. Now the mapper sees the whole file: a duplicate, an unknown key, a type error and a
    /// range error in four sections, all reported, in file order.
    /// </summary>
    [Fact]
    public void Four_mistakes_in_one_file_are_four_errors_in_file_order()
    {
        string text = Crank
            .Replace("  poles: 12\n", "  poles: 12\n  poles: 14\n")
            .Replace("  thickness: 4\n", "  thicknes: 4\n")
            .Replace("  turns: 120\n", "  turns: many\n")
            .Replace("  air_gap: 1.0\n", "  air_gap: -1\n");
        var errs = Errors(text);
        Assert.Equal(new[] { "machine.poles", "magnets.thicknes", "coils.turns", "gap.air_gap" }, errs.Select(e => e.KeyPath));
        Assert.Equal(new[] { "duplicate", "unknown-key", "type", "range" }, errs.Select(e => e.Kind));
        Assert.Equal(errs.Select(e => e.Line).Order(), errs.Select(e => e.Line));
    }

    /// <summary>Every kind of mistake the mapper can find, each in its own key, flow and block style mixed:
    /// one error each, none lost.</summary>
    [Fact]
    public void Every_kind_of_mapping_error_in_one_file_is_found_in_one_pass()
    {
        string text = Crank
            .Replace("name: crank-bench\n", "name: Crank\n")                                    // pattern
            .Replace("  layout: single-rotor\n", "  layout: single\n")                           // word list
            .Replace("  poles: 12\n", "  poles: 12.5\n")                                         // whole number
            .Replace("  coils: 9\n", "  coils: '9'\n")                                           // quoted number
            .Replace("  rated_rpm: 400\n", "  rated_rpm: [400]\n")                               // list for a number
            .Replace("  thickness: 4\n", "  thickness: .nan\n")                                  // not finite
            .Replace("  bolt_circle: { diameter: 24, count: 4, hole: 3.4 }", "  bolt_circle: { diameter: 24, count: four, hole: -3 }") // two in flow style
            .Replace("former:\n  flange: 0.8\n  margin: 1.0\n", "former: 5\n")                   // scalar for a section
            .Replace("  kind: none\n", "  kind: none\n  kinds: none\n")                          // unknown key
            .Replace("  air_gap: 1.0\n", "  air_gap: 1.0\n  air_gap: 2.0\n");                   // duplicate
        var errs = Errors(text);
        string[] expected =
        [
            "name", "machine.layout", "machine.poles", "machine.coils", "machine.rated_rpm", "magnets.thickness",
            "rotor.bolt_circle.count", "rotor.bolt_circle.hole", "former", "sensor.kinds", "gap.air_gap",
        ];
        Assert.Equal(expected, errs.Select(e => e.KeyPath));
        Assert.Equal(errs.OrderBy(e => e.Line).ThenBy(e => e.Column).Select(e => e.ToString()), errs.Select(e => e.ToString()));
    }
}
