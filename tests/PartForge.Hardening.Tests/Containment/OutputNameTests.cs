using PartForge.Export.Pipeline;

namespace PartForge.Hardening.Tests.Containment;

/// <summary>
/// The output-name sanitiser on its own, with names the design loader would refuse anyway (defence in depth:
/// names also come from sweeps and from code): always a plain, short file name of lowercase letters, digits
/// and '-', never empty, "." or "..", never a path.
/// </summary>
public sealed class OutputNameTests
{
    public static TheoryData<string?> Names => new()
    {
        null, "", "..", ".", "../../etc/passwd", "/abs/path", "a/b", "a\\b", "C:\\x", "crank\0bench", new string('x', 5000),
        "сrank", "ｃｒａｎｋ", "crank\u200Bbench", "crank\u2215bench", "..\u2215..", "-", "---", "--force", "~", "$HOME", "a\nb",
        "CRANK-Bench", "ünïcödé", "\u202Eevil", "con", "nul.stl",
    };

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_name_becomes_a_plain_short_file_name(string? name)
    {
        string s = OutputNames.Sanitize(name);
        Assert.Matches("^[a-z0-9]+(-[a-z0-9]+)*$", s);
        Assert.True(s.Length <= 64, s);
        foreach (var f in new[] { OutputNames.PartFile(name ?? "", "rotor", "stl"), OutputNames.ThreeMf(name ?? ""), OutputNames.AssemblyThreeMf(name ?? ""), OutputNames.Results(name ?? "") })
        {
            Assert.Equal(f, Path.GetFileName(f));
            Assert.DoesNotContain("..", f);
            Assert.False(Path.IsPathRooted(f));
        }
    }
}
