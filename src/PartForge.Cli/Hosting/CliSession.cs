using PartForge.Formats.Io;
using Spectre.Console;

namespace PartForge.Cli.Hosting;

/// <summary>
/// What a command action gets: the output streams, the global switches and whether stdout is a terminal
/// (then tables are drawn, with colour unless NO_COLOR is set; otherwise plain text).
/// </summary>
public sealed class CliSession
{
    public CliSession(TextWriter output, TextWriter error, bool verbose, bool quiet, bool outputIsTerminal, bool colour, InterruptGuard? guard = null)
    {
        Guard = guard;
        Out = output;
        Err = error;
        Verbose = verbose;
        Quiet = quiet;
        IsTerminal = outputIsTerminal;
        Colour = colour;
    }

    public TextWriter Out { get; }
    public TextWriter Err { get; }
    public bool Verbose { get; }

    /// <summary>The process's SIGINT/SIGTERM guard, or null inside another host.</summary>
    public InterruptGuard? Guard { get; }
    public bool Quiet { get; }

    /// <summary>Stdout is an interactive terminal.</summary>
    public bool IsTerminal { get; }

    /// <summary>Colour may be used on stdout.</summary>
    public bool Colour { get; }

    /// <summary>One problem, one line, on stderr (always printed, also with --quiet).</summary>
    public void Problem(string line) => Err.WriteLine(line.ReplaceLineEndings(" "));

    /// <summary>A progress or summary line on stdout, suppressed by --quiet.</summary>
    public void Info(string line)
    {
        if (!Quiet) Out.WriteLine(line);
    }

    /// <summary>Diagnostic detail on stderr, only with --verbose.</summary>
    public void Detail(string line)
    {
        if (Verbose) Err.WriteLine(line);
    }

    /// <summary>A console for tables on stdout: ANSI and colour only when stdout is a terminal.</summary>
    public IAnsiConsole Console() => AnsiConsole.Create(new AnsiConsoleSettings
    {
        Ansi = IsTerminal ? AnsiSupport.Detect : AnsiSupport.No,
        ColorSystem = Colour ? ColorSystemSupport.Detect : ColorSystemSupport.NoColors,
        Out = new AnsiConsoleOutput(Out),
        Interactive = InteractionSupport.No,
    });
}
