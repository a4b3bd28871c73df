using System.Runtime.InteropServices;

namespace PartForge.Formats.Tests.Io;

/// <summary>A fact skipped, with the reason, when the tests run as root (root is not bound by permission bits).</summary>
public sealed class NotRootFactAttribute : FactAttribute
{
    public NotRootFactAttribute()
    {
        if (OperatingSystem.IsWindows()) Skip = "Unix permission bits only";
        else if (geteuid() == 0) Skip = "running as root, which may write into any folder; run the tests as another user to include this";
    }

    [DllImport("libc")]
    private static extern uint geteuid();
}
