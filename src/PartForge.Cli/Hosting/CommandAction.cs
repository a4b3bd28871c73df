using System.CommandLine;
using PartForge.Formats.Io;

namespace PartForge.Cli.Hosting;

/// <summary>
/// Wraps every command action: builds the <see cref="CliSession"/>, turns a <see cref="UsageException"/> into
/// one line and exit 2, an output that cannot be written (<see cref="OutputWriteException"/>) into its one line and
/// exit 2, and any other exception into one line and exit 3 (stack trace only with --verbose).
/// </summary>
public static class CommandAction
{
    /// <summary>Streams used by actions; replaced in tests that run the CLI in-process.</summary>
    public static TextWriter Out { get; set; } = Console.Out;
    public static TextWriter Err { get; set; } = Console.Error;

    /// <summary>The process's SIGINT/SIGTERM guard (set by Main; null when the CLI runs inside another host).</summary>
    public static InterruptGuard? Guard { get; set; }

    /// <summary>Overrides terminal detection (tests); null = detect from the console.</summary>
    public static bool? ForceTerminal { get; set; }

    public static void Set(Command command, Func<ParseResult, CliSession, int> action)
    {
        command.SetAction(pr =>
        {
            bool verbose = pr.GetValue(GlobalOptions.Verbose);
            bool terminal = ForceTerminal ?? !Console.IsOutputRedirected;
            bool colour = terminal && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));
            var session = new CliSession(Out, Err, verbose, pr.GetValue(GlobalOptions.Quiet), terminal, colour, Guard);
            try
            {
                return action(pr, session);
            }
            catch (OperationCanceledException) when (Guard is { Interrupted: true } g)
            {
                // An interrupt: the guard has rolled back, writes its one line and ends the process.
                return g.WaitForExitCode();
            }
            catch (UsageException ex)
            {
                session.Problem("partforge: " + ex.Message);
                return ExitCodes.BadInput;
            }
            catch (OutputWriteException ex)
            {
                session.Problem("partforge: " + ex.Message);
                return ExitCodes.BadInput;
            }
            catch (Exception ex)
            {
                session.Problem($"partforge: internal error ({ex.GetType().Name}): {ex.Message}; this is a bug, please report it with the design file");
                if (verbose) Err.WriteLine(ex.ToString());
                return ExitCodes.Internal;
            }
        });
    }
}
