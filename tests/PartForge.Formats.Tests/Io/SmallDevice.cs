using System.Diagnostics;

namespace PartForge.Formats.Tests.Io;

/// <summary>
/// A small tmpfs mounted for one test (root only: <c>mount -t tmpfs -o size=64k tmpfs DIR</c>), so a test can
/// fill a real device or make it read-only. Unmounted and removed on dispose.
/// </summary>
internal sealed class SmallDevice : IDisposable
{
    private SmallDevice(string path) => Path = path;

    public string Path { get; }

    /// <summary>Why small devices cannot be mounted here, or null when they can (probed once, by mounting one).</summary>
    public static string? Unavailable => Probe.Value;

    private static readonly Lazy<string?> Probe = new(() =>
    {
        if (!OperatingSystem.IsLinux()) return "tmpfs mounts are a Linux test";
        try
        {
            using var d = Mount(16, readOnly: false);
            return null;
        }
        catch (InvalidOperationException ex)
        {
            return "mounting a tmpfs is not allowed here (" + ex.Message + "); run the tests as root to include it";
        }
    });

    public static SmallDevice Mount(int kib, bool readOnly = false)
    {
        string dir = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "pf-dev-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        var r = Run("mount", "-t", "tmpfs", "-o", $"size={kib}k{(readOnly ? ",ro" : "")}", "tmpfs", dir);
        if (r.Code != 0)
        {
            Directory.Delete(dir);
            throw new InvalidOperationException($"mount exited {r.Code}: {r.Err.Trim()}");
        }
        return new SmallDevice(dir);
    }

    /// <summary>Makes the mounted device read-only (or writable again).</summary>
    public void Remount(bool readOnly)
    {
        var r = Run("mount", "-o", readOnly ? "remount,ro" : "remount,rw", Path);
        if (r.Code != 0) throw new InvalidOperationException($"remount exited {r.Code}: {r.Err.Trim()}");
    }

    public void Dispose()
    {
        var r = Run("umount", Path);
        if (r.Code != 0) throw new InvalidOperationException($"umount {Path} exited {r.Code}: {r.Err.Trim()}");
        Directory.Delete(Path);
    }

    private static (int Code, string Err) Run(string file, params string[] args)
    {
        var psi = new ProcessStartInfo(file) { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        try
        {
            using var p = Process.Start(psi)!;
            string err = p.StandardError.ReadToEnd();
            p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            return (p.ExitCode, err);
        }
        catch (System.ComponentModel.Win32Exception ex)
        {
            return (-1, ex.Message);
        }
    }
}
