using System.Diagnostics;
using PartForge.Cli;
using PartForge.Cli.Hosting;

namespace PartForge.Fuzz.Running;

/// <summary>
/// Runs the same entry point the executable uses (<see cref="CliApp.Run"/>) in this process, with stdout and
/// stderr captured (both the CLI's own writers and <see cref="Console"/>, in case a stage writes there), on a
/// thread with the main thread's stack size. Calls are serialised: the CLI's writers are process-wide.
/// A call that does not finish in time is reported as a hang; the thread cannot be stopped, so the runner
/// refuses further calls afterwards (a hang ends an in-process fuzz run; rerun the case with the executable).
/// </summary>
public sealed class InProcessCli : ICliRunner
{
    private static readonly object Gate = new();
    private static bool _poisoned;

    public string Kind => "in-process";

    /// <summary>True once a call has hung; no further in-process calls are possible.</summary>
    public static bool Poisoned => _poisoned;

    public CliRun Run(IReadOnlyList<string> args, TimeSpan timeout)
    {
        lock (Gate)
        {
            if (_poisoned) throw new InvalidOperationException("an earlier in-process case hung; the process cannot run more cases");
            var outW = new StringWriter { NewLine = "\n" };
            var errW = new StringWriter { NewLine = "\n" };
            var (oldOut, oldErr, oldCOut, oldCErr, oldTerm) = (CommandAction.Out, CommandAction.Err, Console.Out, Console.Error, CommandAction.ForceTerminal);
            var syncOut = TextWriter.Synchronized(outW);
            var syncErr = TextWriter.Synchronized(errW);
            CommandAction.Out = syncOut;
            CommandAction.Err = syncErr;
            CommandAction.ForceTerminal = false;
            Console.SetOut(syncOut);
            Console.SetError(syncErr);
            int exit = -1;
            var argv = args.ToArray();
            var t = new Thread(() =>
            {
                try
                {
                    exit = CliApp.Run(argv);
                }
                catch (Exception ex)
                {
                    // What Program.Main does with an exception that escapes the command tree.
                    syncErr.WriteLine($"partforge: internal error ({ex.GetType().Name}): {ex.Message.ReplaceLineEndings(" ")}");
                    exit = ExitCodes.Internal;
                }
            }, 8 * 1024 * 1024) { IsBackground = true, Name = "partforge-case" };
            var sw = Stopwatch.StartNew();
            t.Start();
            bool done = t.Join(timeout);
            sw.Stop();
            if (!done)
            {
                _poisoned = true;
                return new CliRun(null, SafeString(outW), SafeString(errW), sw.Elapsed);
            }
            CommandAction.Out = oldOut;
            CommandAction.Err = oldErr;
            CommandAction.ForceTerminal = oldTerm;
            Console.SetOut(oldCOut);
            Console.SetError(oldCErr);
            return new CliRun(exit, outW.ToString(), errW.ToString(), sw.Elapsed);
        }
    }

    private static string SafeString(StringWriter w)
    {
        lock (w) return w.ToString();
    }
}
