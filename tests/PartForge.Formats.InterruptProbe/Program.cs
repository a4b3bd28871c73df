using PartForge.Formats.Io;

// interrupt-probe FOLDER
// Installs the interrupt guard, begins a transaction on FOLDER, stages one file, then starts a second one and
// waits inside its writer (as a long build would), after printing "writing" on standard output. The test then
// sends SIGINT or SIGTERM; the guard must roll back, print one line on standard error and exit 130 or 143.
// Without a signal it gives up after 60 s with exit 1, so a broken guard cannot hang the tests.
if (args.Length != 1)
{
    Console.Error.WriteLine("usage: interrupt-probe FOLDER");
    return 2;
}
using var guard = InterruptGuard.Install(program: "interrupt-probe");
try
{
    using var tx = guard.Begin(args[0]);
    tx.Stage("probe-a.stl", new byte[20000]);
    tx.Stage("probe-b.stl", s =>
    {
        s.Write(new byte[5000]);
        Console.Out.WriteLine("writing");
        Console.Out.Flush();
        guard.Token.WaitHandle.WaitOne(TimeSpan.FromSeconds(60));
    });
    if (!guard.Interrupted) Console.Error.WriteLine("interrupt-probe: no signal arrived");
    return guard.Resolve(1);
}
catch (OperationCanceledException) when (guard.Interrupted)
{
    // The way the command line is to do it: print nothing more; the guard's line and exit code stand.
    return guard.Resolve(3);
}
