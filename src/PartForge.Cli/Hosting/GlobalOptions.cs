using System.CommandLine;

namespace PartForge.Cli.Hosting;

/// <summary>Options every command accepts.</summary>
public static class GlobalOptions
{
    public static readonly Option<bool> Verbose = new("--verbose", "-v")
    {
        Description = "More detail on stderr, including the stack trace of an internal error.",
        Recursive = true,
    };

    public static readonly Option<bool> Quiet = new("--quiet", "-q")
    {
        Description = "Print only problems and requested output (no progress or summary lines).",
        Recursive = true,
    };
}
