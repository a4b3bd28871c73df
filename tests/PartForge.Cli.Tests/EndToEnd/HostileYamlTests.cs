namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>
/// Files from the hostile-input review through the real executable. The first one, 39 bytes with an alias
/// inside the list it names, made check, build and sweep die of a stack overflow (exit 134); now every
/// command refuses it with exit 2 and one located line.
/// </summary>
public class HostileYamlTests
{
    public static TheoryData<string, string, string> Cases => new()
    {
        // name, design text, the single error line
        { "alias cycle", "partforge: 1\nname: demo\nextra: &e [*e]\n",
          "d.yaml:3:12: the alias *e is inside the value it refers to (&e on line 3), so it would repeat without end; write the value out instead" },
        { "tab", "partforge: 1\nname: demo\nmachine:\n  poles: 12\n\tcoils: 9\n",
          "d.yaml:5:1: YAML syntax error: a tab is used for indentation; YAML indents with spaces only: replace the tab with spaces" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Check_build_and_sweep_refuse_with_exit_2_and_one_line(string name, string text, string expected)
    {
        using var w = new WorkDir();
        w.Write("d.yaml", text);
        foreach (var args in new[]
                 {
                     new[] { "check", "d.yaml" },
                     new[] { "build", "d.yaml", "-o", "out" },
                     new[] { "sweep", "d.yaml", "--vary", "coils.turns=100..120:10" },
                 })
        {
            var r = PartforgeProcess.Run(w.Path, args);
            Assert.True(r.ExitCode == 2, $"{name}, {args[0]}: {r}");
            Assert.StartsWith(expected, Assert.Single(r.StderrLines));
            Assert.DoesNotContain("   at ", r.Stderr);
            Assert.False(Directory.Exists(w.File("out")));
        }
    }

    /// <summary>The review's CR-only file (a comment first) read as "the file is empty". Every command now gives
    /// a CR or CR LF file exactly the exit code and output of the LF file.</summary>
    [Fact]
    public void Cr_and_crlf_files_give_every_command_the_output_of_the_lf_file()
    {
        using var w = new WorkDir();
        string lf = "# comment\npartforge: 1\nname: demo\nmachine:\n  pols: 12\n";
        RunResult[] Runs(string text)
        {
            w.Write("d.yaml", text);
            return [PartforgeProcess.Run(w.Path, "check", "d.yaml"), PartforgeProcess.Run(w.Path, "sweep", "d.yaml", "--vary", "coils.turns=100..120:10")];
        }
        var expected = Runs(lf);
        Assert.Equal(2, expected[0].ExitCode);
        Assert.StartsWith("d.yaml:5:3: machine.pols: is not a known key", Assert.Single(expected[0].StderrLines));
        foreach (var eol in new[] { "\r\n", "\r" })
        {
            var got = Runs(lf.Replace("\n", eol));
            for (int i = 0; i < got.Length; i++)
            {
                Assert.Equal(expected[i].ExitCode, got[i].ExitCode);
                Assert.Equal(expected[i].Stdout, got[i].Stdout);
                Assert.Equal(Timeless(expected[i].Stderr), Timeless(got[i].Stderr));
            }
        }
    }

    /// <summary>The sweep's summary line carries its wall time; everything else must match.</summary>
    private static string Timeless(string s) => System.Text.RegularExpressions.Regex.Replace(s, @"in [0-9.]+ s", "in - s");
}
