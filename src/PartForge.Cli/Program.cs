using PartForge.Cli.Hosting;

namespace PartForge.Cli;

public static class Program
{
    public static int Main(string[] args)
    {
        try
        {
            return CliApp.Run(args);
        }
        catch (Exception ex)
        {
            // Only reached if the command-line library itself fails; every action has its own handler.
            Console.Error.WriteLine($"partforge: internal error ({ex.GetType().Name}): {ex.Message.ReplaceLineEndings(" ")}");
            if (args.Contains("--verbose") || args.Contains("-v")) Console.Error.WriteLine(ex);
            return ExitCodes.Internal;
        }
    }
}
