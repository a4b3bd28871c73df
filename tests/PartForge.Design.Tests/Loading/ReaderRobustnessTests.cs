using CsCheck;
using PartForge.Design.Loading;
using static PartForge.Design.Tests.TestSupport;

namespace PartForge.Design.Tests.Loading;

/// <summary>
/// Property tests of the reader and its error messages: whatever text comes in, loading returns (never throws),
/// and every error is one printable line placed inside the file.
/// </summary>
public class ReaderRobustnessTests
{
    // The characters YAML gives meaning to, line breaks of all kinds, tabs, and the hidden ones.
    private const string Alphabet =
        ":-[]{}'\",#&*!|>?%@` \t\n\r\n\n  abcpoles019.\u00A0\u200B\uFEFF\u043E\u2013";

    private static void AssertWellFormed(string text)
    {
        var r = DesignLoader.LoadText(text, "t.yaml");
        int lines = YamlLines(text);
        foreach (var e in r.Errors)
        {
            string s = e.ToString();
            Assert.DoesNotContain('\n', s);
            Assert.DoesNotContain('\r', s);
            Assert.True(s.All(c => c >= ' '), s);
            Assert.True(e.Line >= 0 && e.Line <= lines + 1, $"line {e.Line} of {lines}: {s}");
            Assert.True(e.Line == 0 || e.Column >= 1, s);
        }
    }

    /// <summary>Lines as the reader counts them: LF, CR LF and a lone CR each end one.</summary>
    private static int YamlLines(string text) => text.Replace("\r\n", "\n").Replace('\r', '\n').Split('\n').Length;

    [Fact]
    public void Random_yaml_like_text_never_throws_and_gives_one_line_errors()
    {
        Gen.Char[Alphabet].Array[0, 200].Select(a => new string(a)).Sample(AssertWellFormed, iter: 3000);
    }

    [Fact]
    public void A_design_with_random_characters_put_in_never_throws_and_gives_one_line_errors()
    {
        string crank = Crank;
        Gen.Select(Gen.Int[0, crank.Length], Gen.Char[Alphabet].Array[1, 6], Gen.Int[0, 3])
            .Sample((at, insert, drop) =>
            {
                string text = crank[..at] + new string(insert) + crank[Math.Min(crank.Length, at + drop)..];
                AssertWellFormed(text);
            }, iter: 3000);
    }
}
