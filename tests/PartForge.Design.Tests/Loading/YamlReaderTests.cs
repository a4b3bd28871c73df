using System.Text;
using PartForge.Design.Loading;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>
/// The YAML reading stage through the public loader: alias cycles and alias depth, parser errors turned into
/// our own located messages, and line endings. Each case is a file the hostile-input review wrote.
/// </summary>
public class YamlReaderTests
{
    // ---- aliases -----------------------------------------------------------------------------------------

    /// <summary>The review's 41-byte file: the alias sits inside the list it names, so resolving it never ends
    /// (the process died of a stack overflow, exit 134).</summary>
    [Theory]
    [InlineData("partforge: 1\nname: demo-x\nextra: &e [*e]\n", "*e")]
    [InlineData("partforge: 1\nname: x\nmachine: &m { poles: *m }\n", "*m")]
    [InlineData("partforge: 1\nname: x\nrotor: &r\n  bolt_circle:\n    - *r\n", "*r")]
    [InlineData("partforge: 1\nname: x\na: &x [1, [2, [3, *x]]]\n", "*x")]
    public void An_alias_inside_the_value_it_names_is_refused_at_the_alias(string text, string alias)
    {
        var e = Assert.Single(Errors(text));
        Assert.Equal("alias", e.Kind);
        Assert.Equal(At(text, alias), (e.Line, e.Column));
        Assert.Contains("is inside the value it refers to", e.Message);
        Assert.Matches(@"^t\.yaml:\d+:\d+: the alias \*\w+ is inside the value it refers to \(&\w+ on line \d+\)", e.ToString());
    }

    /// <summary>1-based line and column of the last occurrence of <paramref name="token"/>.</summary>
    private static (int Line, int Column) At(string text, string token)
    {
        int i = text.LastIndexOf(token, StringComparison.Ordinal);
        int line = text[..i].Count(c => c == '\n') + 1;
        return (line, i - (text.LastIndexOf('\n', Math.Max(0, i - 1)) + 1) + 1);
    }

    [Fact]
    public void An_alias_whose_anchor_comes_later_or_never_is_refused()
    {
        var e = Assert.Single(Errors("partforge: 1\nname: x\nextra: *later\nmore: &later 3\n"));
        Assert.Equal("alias", e.Kind);
        Assert.Equal((3, 8), (e.Line, e.Column));
        Assert.Contains("*later has no anchor &later before it", e.Message);
    }

    /// <summary>A redefined anchor: an alias takes the latest one before it (YAML 1.2, 3.2.2.2 "anchors and
    /// aliases"), so the inner &amp;x here is complete and there is no cycle.</summary>
    [Fact]
    public void A_redefined_anchor_resolves_to_the_latest_complete_one()
    {
        string text = Crank.Replace("  poles: 12\n", "  poles: &x 12\n").Replace("  coils: 9\n", "  coils: &x 9\n").Replace("  phases: 3\n", "  phases: *x\n");
        var errs = Errors(text); // 9 phases is refused by the word list, which shows the alias took the later anchor
        var e = Assert.Single(errs, x => x.KeyPath == "machine.phases");
        Assert.Equal("9", e.Value);
    }

    /// <summary>Each alias alone is shallow, but the value it stands for is deep: put in its place it would nest
    /// past the limit, so any later walk over the tree could recurse that deep.</summary>
    [Fact]
    public void Aliases_cannot_nest_values_deeper_than_the_limit()
    {
        var sb = new StringBuilder("partforge: 1\nname: x\n");
        int depth = LoadLimits.MaxDepth - 3; // a0 is inside the file's own mapping: MaxDepth - 2 levels in all
        sb.Append("a0: &a0 ").Append(new string('[', depth)).Append(new string(']', depth)).Append('\n');
        sb.Append("a1: &a1 [[*a0]]\n");  // 1 + 2 + (MaxDepth - 3) = MaxDepth: still allowed
        sb.Append("a2: &a2 [[*a1]]\n");  // two levels more: refused here
        sb.Append("a3: &a3 [[*a2]]\n");
        string text = sb.ToString();
        var e = Assert.Single(Errors(text));
        Assert.Equal("limit", e.Kind);
        Assert.Contains($"more than {LoadLimits.MaxDepth} deep", e.Message);
        Assert.Equal(At(text[..text.IndexOf("a3:", StringComparison.Ordinal)], "*a1"), (e.Line, e.Column));
    }

    /// <summary>Billion laughs within the alias count: levels of 8 aliases each, 8 times the values per level.
    /// Level 4 would repeat 8^4 values 8 times, past the node limit: refused at the alias that crosses it.</summary>
    [Fact]
    public void Aliases_cannot_repeat_more_values_than_the_node_limit()
    {
        var sb = new StringBuilder("partforge: 1\nname: x\nl0: &l0 [1, 2, 3, 4, 5, 6, 7, 8]\n");
        for (int i = 1; i < 8; i++)
            sb.Append($"l{i}: &l{i} [").Append(string.Join(", ", Enumerable.Repeat($"*l{i - 1}", 8))).Append("]\n");
        var e = Assert.Single(Errors(sb.ToString()));
        Assert.Equal("limit", e.Kind);
        Assert.Contains($"more than {LoadLimits.MaxNodes}", e.Message);
        Assert.Equal(7, e.Line); // l4
    }

    [Fact]
    public void Aliases_of_values_and_of_whole_sections_still_work()
    {
        var scalar = DesignLoader.LoadText(Crank.Replace("  max_rpm: 1200\n", "  max_rpm: &top 1200\n").Replace("  rated_rpm: 400\n", "  rated_rpm: 700\n")
            .Replace("operation:\n", "tolerances:\n  print_xy: &xy 0.2\n  print_z: *xy\noperation:\n"), "t.yaml");
        Assert.True(scalar.Success, string.Join(" | ", scalar.Errors));
        Assert.Equal(0.2, scalar.Design!.Tolerances.PrintZ);
        var section = DesignLoader.LoadText(Crank + "parts:\n  rotor: &ov { process: print, material: PETG }\n  stator: *ov\n", "t.yaml");
        Assert.True(section.Success, string.Join(" | ", section.Errors));
        Assert.Equal("PETG", section.Design!.Parts.Stator!.Material);
    }

    // ---- parser errors -----------------------------------------------------------------------------------

    /// <summary>The review's tab case: the parser's own position is the value at the end of the line above
    /// ("4:10"), one line off; the tab itself is at line 5, column 1.</summary>
    [Theory]
    [InlineData("partforge: 1\nname: x\nmachine:\n  poles: 12\n\tcoils: 9\n", 5, 1)]
    [InlineData("partforge: 1\nname: x\nmachine:\n\tpoles: 12\n", 4, 1)]
    [InlineData("partforge: 1\n\tname: x\n", 2, 1)]
    [InlineData("partforge: 1\nname: x\nmachine:\n  poles: 12\n \t coils: 9\n", 5, 2)]
    public void A_tab_in_the_indentation_is_named_at_the_tab(string text, int line, int column)
    {
        var e = Assert.Single(Errors(text));
        Assert.Equal("syntax", e.Kind);
        Assert.Equal((line, column), (e.Line, e.Column));
        Assert.Equal($"t.yaml:{line}:{column}: YAML syntax error: a tab is used for indentation; YAML indents with spaces only: replace the tab with spaces", e.ToString());
    }

    public static TheoryData<string, string, int, int, string> SyntaxCases => new()
    {
        // name, text (after the first two lines "partforge: 1\nname: x\n"), line, column, what the message says
        { "unclosed single quote", "machine:\n  layout: 'dual-rotor\n  poles: 12\n", 4, 11, "the quoted value that starts here has no closing '" },
        { "unclosed double quote", "machine:\n  layout: \"dual-rotor\n  poles: 12\n", 4, 11, "the quoted value that starts here has no closing \"" },
        { "unclosed bracket", "rotor:\n  bolt_circle: [24, 4\nstator:\n  thickness: 6\n", 4, 16, "the '[' opened here is not closed; add the ']'" },
        { "unclosed brace", "rotor:\n  bolt_circle: { diameter: 24, count: 4\n  thickness: 5\n", 4, 16, "the '{' opened here is not closed; add the '}'" },
        { "mismatched bracket", "rotor:\n  bolt_circle: { diameter: 24, count: 4 ]\n", 4, 41, "this ']' does not close the '{' opened on line 4" },
        { "missing space after colon", "machine:\n  poles: 12\n  coils:9\n  phases: 3\n", 5, 9, "a space is missing after 'coils:'; write 'coils: 9'" },
        { "indented too far", "machine:\n  poles: 12\n   coils: 9\n", 5, 4, "indented more than the line above (3 spaces, the line above 2)" },
        { "indented to no section", "machine:\n  poles: 12\n coils: 9\n", 5, 2, "indented 1 space, which matches no section above" },
        { "value with colon-space", "machine:\n  layout: dual: rotor\n", 4, 15, "the value contains ': '" },
    };

    [Theory]
    [MemberData(nameof(SyntaxCases))]
    public void Parser_errors_name_the_likely_cause_at_its_place(string name, string body, int line, int column, string says)
    {
        string text = "partforge: 1\nname: x\n" + body;
        var e = Assert.Single(Errors(text));
        Assert.True(e.Kind == "syntax", name + ": " + e);
        Assert.True((line, column) == (e.Line, e.Column), $"{name}: expected {line}:{column}, got {e}");
        Assert.Contains(says, e.Message);
        Assert.StartsWith("YAML syntax error: ", e.Message);
        // Our own words only: none of the parser's ("While scanning ...", "did not find expected ...").
        Assert.DoesNotContain("While ", e.Message);
        Assert.DoesNotContain("expected", e.Message);
        Assert.DoesNotContain('\n', e.ToString());
    }

    [Fact]
    public void A_no_break_space_where_yaml_needs_a_space_is_named()
    {
        // "poles:<NBSP>12" is one word to YAML, so machine gets text instead of a section.
        var e = Assert.Single(Errors("partforge: 1\nname: x\nmachine:\n  poles:\u00A012\n"));
        Assert.Equal("machine", e.KeyPath);
        Assert.Contains("poles:\\u00A012 is not allowed here", e.ToString());
        Assert.Contains("U+00A0 NO-BREAK SPACE where ' ' looks the same", e.ToString());
        Assert.Contains("put a plain space after its ':' (poles: 12)", e.ToString());
        // Between two keys of a section the same mistake breaks the YAML; the message names the character.
        var f = Assert.Single(Errors("partforge: 1\nname: x\nmachine:\n  poles: 12\n  coils:\u00A09\n  phases: 3\n"));
        Assert.Equal("syntax", f.Kind);
        Assert.Equal("YAML syntax error: the line contains U+00A0 NO-BREAK SPACE where ' ' looks the same; replace it with a plain space or delete it", f.Message);
        Assert.Equal((5, 9), (f.Line, f.Column));
        // In a flow section it is part of the key.
        var k = Assert.Single(Errors(Crank.Replace("bolt_circle: { diameter", "bolt_circle: {\u00A0diameter")), x => x.Kind == "unknown-key");
        Assert.Equal("rotor.bolt_circle.\\u00A0diameter", k.KeyPath);
        Assert.Equal("the key contains U+00A0 NO-BREAK SPACE where ' ' looks the same; did you mean 'diameter'?", k.Suggestion);
    }

    // ---- line endings ------------------------------------------------------------------------------------

    public static TheoryData<string> Broken => new()
    {
        "# a comment first\npartforge: 1\nname: x\nmachine:\n  pols: 12\n  coils: nine\n",
        "partforge: 1\nname: x\nmachine:\n  poles: 12\n\tcoils: 9\n",
        "# header\n\npartforge: 1\nname: x\nmachine:\n  poles: [12\n",
        "partforge: 1\nname: x\nmachine:\n  poles: 12\n  poles: 14\n",
        "partforge: 1\nname: x\nextra: &e\n  - *e\n",
        "# only comments\n# and more\n",
    };

    /// <summary>The review's CR-only file (a comment first) read as "the file is empty"; CR LF and CR files
    /// give exactly the errors, lines and columns of the LF file, from text and from disk.</summary>
    [Theory]
    [MemberData(nameof(Broken))]
    public void Cr_and_crlf_files_read_exactly_like_lf_files(string lf)
    {
        string Show(IEnumerable<DesignError> errs) => string.Join("\n", errs.Select(e => e.ToString()));
        string expected = Show(DesignLoader.LoadText(lf, "t.yaml").Errors);
        Assert.NotEqual("", expected);
        foreach (var eol in new[] { "\r\n", "\r" })
        {
            string text = lf.Replace("\n", eol);
            Assert.Equal(expected, Show(DesignLoader.LoadText(text, "t.yaml").Errors));
            string dir = Path.Combine(Path.GetTempPath(), "pf-eol-" + Guid.NewGuid().ToString("N"));
            Directory.CreateDirectory(dir);
            try
            {
                string path = Path.Combine(dir, "t.yaml");
                File.WriteAllBytes(path, Encoding.UTF8.GetBytes(text));
                Assert.Equal(expected.Replace("t.yaml", path), Show(DesignLoader.Load(path).Errors));
            }
            finally { Directory.Delete(dir, true); }
        }
    }

    [Fact]
    public void A_valid_design_loads_the_same_with_any_line_ending()
    {
        string lf = Canon(DesignLoader.LoadText(Crank, "t.yaml").Design!);
        Assert.Equal(lf, Canon(DesignLoader.LoadText(Crank.Replace("\n", "\r\n"), "t.yaml").Design!));
        Assert.Equal(lf, Canon(DesignLoader.LoadText(Crank.Replace("\n", "\r"), "t.yaml").Design!));
    }

    /// <summary>Invalid UTF-8 in a CR-only file is placed on its line like in an LF file.</summary>
    [Fact]
    public void A_bad_byte_in_a_cr_only_file_is_placed_on_its_line()
    {
        string dir = Path.Combine(Path.GetTempPath(), "pf-eol-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            foreach (var eol in new[] { "\n", "\r\n", "\r" })
            {
                var bytes = new List<byte>(Encoding.ASCII.GetBytes(string.Join(eol, "partforge: 1", "name: x", "machine:", "  layout: ")));
                bytes.Add(0xFF);
                string path = Path.Combine(dir, "b.yaml");
                File.WriteAllBytes(path, bytes.ToArray());
                var e = Assert.Single(DesignLoader.Load(path).Errors);
                Assert.Equal(4, e.Line);
            }
        }
        finally { Directory.Delete(dir, true); }
    }
}
