using PartForge.Formats.Io;
using static PartForge.Formats.Tests.Io.OutputFolderFixture;

namespace PartForge.Formats.Tests.Io;

/// <summary>
/// The output set on real small devices (a 64 KiB tmpfs): a disk that fills during staging, and a file system
/// that is read-only. The previous set must come out byte for byte as it was, with no temporaries left.
/// </summary>
public class OutputDeviceTests
{
    [SmallDeviceFact]
    public void A_disk_that_fills_during_staging_leaves_the_previous_set_whole_and_no_temporaries()
    {
        using var dev = SmallDevice.Mount(64);
        string dir = Path.Combine(dev.Path, "out");
        // The previous set: 3 files of 8 KiB and the manifest, about half the device.
        var old = new Dictionary<string, byte[]>();
        using (var tx = OutputTransaction.Begin(dir))
        {
            foreach (var n in new[] { "demo-rotor.stl", "demo-stator.stl", "demo.3mf" })
            {
                old[n] = Content("old" + n, 8 * 1024);
                tx.Stage(n, old[n]);
            }
            tx.Commit(Info());
        }
        var before = Read(dir);
        Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);

        // The new set is bigger than what is left: three files of 16 KiB.
        var ex = Assert.Throws<OutputWriteException>(() =>
        {
            using var tx = OutputTransaction.Begin(dir, "out");
            foreach (var n in new[] { "demo-rotor.stl", "demo-stator.stl", "demo.3mf" })
                tx.Stage(n, s => { var b = Content("new" + n, 16 * 1024); s.Write(b, 0, b.Length); });
            tx.Commit(Info());
        });
        Assert.Equal(OutputProblem.NoSpace, ex.Problem);
        Assert.Equal("no space left on the device holding out; free space or choose another -o", ex.Message);
        Assert.IsAssignableFrom<IOException>(ex.InnerException);

        Assert.Equal(before, Read(dir)); // byte for byte, names and contents
        foreach (var (n, b) in old) Assert.Equal(b, File.ReadAllBytes(Path.Combine(dir, n)));
        Assert.Empty(Temporaries(dir));
        Assert.Equal("complete", OutputSetCheck.Verify(dir, "demo").ToString());
    }

    [SmallDeviceFact]
    public void A_disk_too_full_for_the_manifest_leaves_the_previous_set_whole()
    {
        using var dev = SmallDevice.Mount(64);
        string dir = Path.Combine(dev.Path, "out");
        WriteSet(dir, "demo", "old", "demo-rotor.stl");
        var before = Read(dir);
        string filler = Path.Combine(dev.Path, "filler");
        var ex = Assert.Throws<OutputWriteException>(() =>
        {
            using var tx = OutputTransaction.Begin(dir, "out");
            tx.Stage("demo-rotor.stl", Content("new", 4000));
            // Fill the device to the last byte, so that the manifest's temporary cannot be written.
            using (var fs = new FileStream(filler, FileMode.CreateNew))
            {
                var block = new byte[4096];
                try { while (true) { fs.Write(block); fs.Flush(); } }
                catch (IOException full) when (full.HResult == 28) { fs.SetLength(fs.Length / 4096 * 4096); }
            }
            tx.Commit(Info());
        });
        Assert.Equal(OutputProblem.NoSpace, ex.Problem);
        Assert.Contains("(the previous files are unchanged)", ex.Message);
        File.Delete(filler);
        Assert.Equal(before, Read(dir));
        Assert.Empty(Temporaries(dir));
        Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);
    }

    [SmallDeviceFact]
    public void A_read_only_file_system_is_refused_at_begin_and_the_set_is_untouched()
    {
        using var dev = SmallDevice.Mount(64);
        string dir = Path.Combine(dev.Path, "out");
        WriteSet(dir, "demo", "old", "demo-rotor.stl", "demo.3mf");
        var before = Read(dir);
        dev.Remount(readOnly: true);
        try
        {
            var ex = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(dir, "out"));
            Assert.Equal(OutputProblem.ReadOnly, ex.Problem);
            Assert.Equal("out is on a read-only file system; choose another -o", ex.Message);
            var fresh = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(Path.Combine(dev.Path, "new"), "new"));
            Assert.Equal(OutputProblem.ReadOnly, fresh.Problem);
            Assert.Equal(before, Read(dir));
            Assert.True(OutputSetCheck.Verify(dir, "demo").Complete);
        }
        finally { dev.Remount(readOnly: false); }
    }

    /// <summary>Root may write anywhere, so a forbidden folder is only seen by another user.</summary>
    [NotRootFact, System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
    public void A_folder_the_user_may_not_write_is_refused_with_permission_denied()
    {
        string dir = NewFolder();
        try
        {
            File.SetUnixFileMode(dir, UnixFileMode.UserRead | UnixFileMode.UserExecute);
            var ex = Assert.Throws<OutputWriteException>(() => OutputTransaction.Begin(dir, "out"));
            Assert.Equal(OutputProblem.PermissionDenied, ex.Problem);
            Assert.StartsWith("permission denied writing out", ex.Message);
        }
        finally
        {
            File.SetUnixFileMode(dir, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
            Directory.Delete(dir, true);
        }
    }

    public static TheoryData<Exception, OutputProblem, string> Classified => new()
    {
        { new IOException("No space left on device", 28), OutputProblem.NoSpace, "no space left on the device holding out; free space or choose another -o" },
        { new IOException("Disk quota exceeded", 122), OutputProblem.QuotaExceeded, "the disk quota for out is used up; free space or choose another -o" },
        { new IOException("Read-only file system", 30), OutputProblem.ReadOnly, "out is on a read-only file system; choose another -o" },
        { new UnauthorizedAccessException("Access denied"), OutputProblem.PermissionDenied, "permission denied writing out/a.stl; choose a folder you may write to with -o" },
        { new IOException("Operation not permitted", 1), OutputProblem.PermissionDenied, "permission denied writing out/a.stl; choose a folder you may write to with -o" },
        { new IOException("Is a directory", 21), OutputProblem.NameTaken, "out/a.stl is a folder; an output file cannot replace it (remove it or choose another -o)" },
        { new DirectoryNotFoundException("gone"), OutputProblem.NotAFolder, "out cannot be used as a folder (a part of the path is a file or was removed); give a folder with -o" },
        { new IOException("Input/output error\nat sector 9", 5), OutputProblem.Other, "cannot write out/a.stl: Input/output error at sector 9; choose another -o" },
    };

    [Theory]
    [MemberData(nameof(Classified))]
    public void System_errors_become_one_line_that_says_what_to_change(Exception system, OutputProblem problem, string message)
    {
        if (!OperatingSystem.IsLinux()) return; // errno values are Linux's
        var ex = OutputErrors.Classify(system, "out", "a.stl");
        Assert.Equal(problem, ex.Problem);
        Assert.Equal(message, ex.Message);
        Assert.Same(system, ex.InnerException);
        Assert.DoesNotContain('\n', ex.Message);
    }
}
