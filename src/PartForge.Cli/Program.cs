using PartForge.Cli.Hosting;
using PartForge.Formats.Io;

namespace PartForge.Cli;

public static class Program
{
    public static int Main(string[] args)
    {
        // SIGINT / SIGTERM: the guard rolls back an open output set, writes one line and ends the process with
        // 130 / 143. Main returns through Resolve, so a signal that arrives as a command ends keeps its code.
        using var guard = InterruptGuard.Install();
        CommandAction.Guard = guard;
        try
        {
            return guard.Resolve(CliApp.Run(args));
        }
        catch (Exception ex)
        {
            // Only reached if the command-line library itself fails; every action has its own handler.
            Console.Error.WriteLine($"partforge: internal error ({ex.GetType().Name}): {ex.Message.ReplaceLineEndings(" ")}");
            if (args.Contains("--verbose") || args.Contains("-v")) Console.Error.WriteLine(ex);
            return guard.Resolve(ExitCodes.Internal);
        }
    }
}
