using System.CommandLine;

namespace PartForge.Cli.Hosting;

/// <summary>
/// Wraps every command action: builds the <see cref="CliSession"/>, turns a <see cref="UsageException"/> into
/// one line and exit 2, and any other exception into one line and exit 3 (stack trace only with --verbose).
/// </summary>
public static class CommandAction
{
    /// <summary>Streams used by actions; replaced in tests that run the CLI in-process.</summary>
    public static TextWriter Out { get; set; } = Console.Out;
    public static TextWriter Err { get; set; } = Console.Error;

    /// <summary>Overrides terminal detection (tests); null = detect from the console.</summary>
    public static bool? ForceTerminal { get; set; }

    public static void Set(Command command, Func<ParseResult, CliSession, int> action)
    {
        command.SetAction(pr =>
        {
            bool verbose = pr.GetValue(GlobalOptions.Verbose);
            bool terminal = ForceTerminal ?? !Console.IsOutputRedirected;
            bool colour = terminal && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));
            var session = new CliSession(Out, Err, verbose, pr.GetValue(GlobalOptions.Quiet), terminal, colour);
            try
            {
                return action(pr, session);
            }
            catch (UsageException ex)
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
