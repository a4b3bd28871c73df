using System.Diagnostics;
using System.Runtime.InteropServices;
using PartForge.Formats.Io;
using static PartForge.Formats.Tests.Io.OutputFolderFixture;

namespace PartForge.Formats.Tests.Io;

public class InterruptGuardTests
{
    /// <summary>Source: the shells' convention (POSIX 2.8.2, "exit status of a command terminated by a signal is
    /// greater than 128"; bash and dash use 128 + n), with the Linux signal numbers SIGINT 2 and SIGTERM 15.</summary>
    [Fact]
    public void Exit_codes_are_128_plus_the_signal_number()
    {
        Assert.Equal(130, InterruptGuard.ExitCodeFor(PosixSignal.SIGINT));
        Assert.Equal(143, InterruptGuard.ExitCodeFor(PosixSignal.SIGTERM));
    }

    [Fact]
    public void An_interrupt_rolls_back_prints_one_line_and_exits_once()
    {
        string dir = NewFolder();
        try
        {
            WriteSet(dir, "demo", "old", "demo-rotor.stl");
            var previous = Read(dir);
            var err = new StringWriter();
            var codes = new List<int>();
            using var guard = InterruptGuard.Manual(err, codes.Add);
            using var tx = guard.Begin(dir, "out");
            tx.Stage("demo-rotor.stl", [1, 2, 3]);
            guard.Interrupt(PosixSignal.SIGINT);
            guard.Interrupt(PosixSignal.SIGTERM); // a second signal while ending changes nothing
            Assert.Equal([130], codes);
            Assert.Equal("partforge: interrupted (SIGINT); nothing in out was changed (the temporary files were removed)\n", err.ToString().ReplaceLineEndings("\n"));
            Assert.True(tx.IsRolledBack);
            Assert.Empty(Temporaries(dir));
            Assert.Equal(previous, Read(dir));
            Assert.Equal(130, guard.WaitForExitCode());
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void An_interrupt_after_the_commit_says_the_outputs_were_complete()
    {
        string dir = NewFolder();
        try
        {
            var err = new StringWriter();
            int code = 0;
            using var guard = InterruptGuard.Manual(err, c => code = c);
            using (var tx = guard.Begin(dir, "out"))
            {
                tx.Stage("a.stl", [1]);
                tx.Commit(Info("a"));
            }
            guard.Interrupt(PosixSignal.SIGTERM);
            Assert.Equal(143, code);
            Assert.Equal("partforge: interrupted (SIGTERM); the outputs in out were already complete", err.ToString().Trim());
            Assert.True(OutputSetCheck.Verify(dir, "a").Complete);
        }
        finally { Directory.Delete(dir, true); }
    }

    public static TheoryData<int, int, string> Signals => new() { { 2, 130, "SIGINT" }, { 15, 143, "SIGTERM" } };

    /// <summary>
    /// A real process and a real signal: the probe (a test-only console program) stages one file, waits inside
    /// the writer of a second, and is sent the signal. It must exit 130 / 143 with one line on standard error,
    /// leave no temporary and leave the previous set whole.
    /// </summary>
    [Theory]
    [MemberData(nameof(Signals))]
    public void A_signalled_process_exits_with_the_signal_code_and_leaves_the_previous_set(int signal, int expected, string name)
    {
        if (!OperatingSystem.IsLinux()) return; // signal numbers are Linux's
        string dir = NewFolder("sig");
        try
        {
            WriteSet(dir, "probe", "old", "probe-a.stl", "probe-b.stl");
            var previous = Read(dir);
            string probe = Path.Combine(AppContext.BaseDirectory, "PartForge.Formats.InterruptProbe.dll");
            Assert.True(File.Exists(probe), probe);
            var psi = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
            psi.ArgumentList.Add(probe);
            psi.ArgumentList.Add(dir);
            using var p = Process.Start(psi)!;
            string? line = p.StandardOutput.ReadLine(); // "writing": one file staged, the second half written
            Assert.Equal("writing", line);
            Assert.Equal(2, Temporaries(dir).Length);
            Assert.Equal(0, kill(p.Id, signal));
            Assert.True(p.WaitForExit(30_000), "the probe did not end after the signal");
            string err = p.StandardError.ReadToEnd(); // a line or two: the pipe cannot fill before the exit
            Assert.True(p.ExitCode == expected, $"exit {p.ExitCode}, stderr: {err}");
            Assert.Equal($"interrupt-probe: interrupted ({name}); nothing in {dir} was changed (the temporary files were removed)", Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries)));
            Assert.Empty(Temporaries(dir));
            Assert.Equal(previous, Read(dir));
            Assert.True(OutputSetCheck.Verify(dir, "probe").Complete);
        }
        finally { Directory.Delete(dir, true); }
    }

    [DllImport("libc", SetLastError = true)]
    private static extern int kill(int pid, int sig);
}
