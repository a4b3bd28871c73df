using System.Runtime.InteropServices;

namespace PartForge.Formats.Io;

/// <summary>
/// Ctrl-C (SIGINT) and SIGTERM for the command line: on the first such signal it cancels <see cref="Token"/>
/// (which rolls back every <see cref="OutputTransaction"/> begun with it, removing their temporaries; a commit
/// in progress finishes first), writes one line on standard error, and ends the process with
/// <see cref="ExitCodeFor"/> the signal: 130 for SIGINT, 143 for SIGTERM (128 + the signal number, the
/// shells' convention). Later signals while it is ending are ignored.
/// <code>
/// using var guard = InterruptGuard.Install();
/// using var tx = guard.Begin(outputDir);        // or OutputTransaction.Begin(outputDir, guard.Token)
/// ... tx.Stage(...) ...; tx.Commit(info);
/// // When guard.Token is cancelled, the guard prints the line and ends the process. Main returns through
/// // guard.Resolve(code); code that catches the OperationCanceledException first prints nothing and
/// // returns guard.Resolve(anything).
/// </code>
/// </summary>
public sealed class InterruptGuard : IDisposable
{
    private readonly CancellationTokenSource _cts = new();
    private readonly List<PosixSignalRegistration> _registrations = [];
    private readonly List<OutputTransaction> _transactions = [];
    private readonly TextWriter _error;
    private readonly Action<int> _exit;
    private readonly string _program;
    private readonly ManualResetEventSlim _done = new(false);
    private readonly object _gate = new();
    private int _exitCode;
    private bool _handling;

    private InterruptGuard(TextWriter error, Action<int> exit, string program)
    {
        _error = error;
        _exit = exit;
        _program = program;
    }

    /// <summary>
    /// Registers for SIGINT and SIGTERM. <paramref name="error"/> defaults to standard error,
    /// <paramref name="exit"/> to <see cref="Environment.Exit"/>; tests give their own.
    /// </summary>
    public static InterruptGuard Install(TextWriter? error = null, Action<int>? exit = null, string program = "partforge")
    {
        var g = new InterruptGuard(error ?? Console.Error, exit ?? Environment.Exit, program);
        foreach (var s in new[] { PosixSignal.SIGINT, PosixSignal.SIGTERM })
        {
            g._registrations.Add(PosixSignalRegistration.Create(s, ctx =>
            {
                ctx.Cancel = true; // the guard ends the process itself, after the cleanup
                g.Interrupt(ctx.Signal);
            }));
        }
        return g;
    }

    /// <summary>A guard without signal registrations, driven only by <see cref="Interrupt"/> (for tests and hosts that handle signals themselves).</summary>
    public static InterruptGuard Manual(TextWriter error, Action<int> exit, string program = "partforge") => new(error, exit, program);

    /// <summary>Cancelled when an interrupt arrives.</summary>
    public CancellationToken Token => _cts.Token;

    /// <summary>True once an interrupt has arrived.</summary>
    public bool Interrupted => _cts.IsCancellationRequested;

    /// <summary>128 + the signal number: 130 for SIGINT, 143 for SIGTERM, 131 for SIGQUIT, 129 for SIGHUP.</summary>
    public static int ExitCodeFor(PosixSignal signal) => signal switch
    {
        PosixSignal.SIGHUP => 129,
        PosixSignal.SIGINT => 130,
        PosixSignal.SIGQUIT => 131,
        PosixSignal.SIGTERM => 143,
        _ => 128,
    };

    /// <summary>Begins a transaction that this guard rolls back on an interrupt (and names in its message).</summary>
    public OutputTransaction Begin(string folder, string? shown = null)
    {
        var tx = OutputTransaction.Begin(folder, shown, Token);
        lock (_gate) _transactions.Add(tx);
        return tx;
    }

    /// <summary>
    /// What a signal does: cancel the token (rolling back open transactions), write one line on standard error,
    /// end the process with the signal's exit code. Only the first call acts; later ones return at once.
    /// </summary>
    public void Interrupt(PosixSignal signal)
    {
        lock (_gate)
        {
            if (_handling) return;
            _handling = true;
            _exitCode = ExitCodeFor(signal);
        }
        string? cleanupProblem = null;
        try
        {
            _cts.Cancel();
        }
        catch (AggregateException ex)
        {
            // A rollback that could not remove a temporary: say so on the one line rather than lose it.
            cleanupProblem = string.Join("; ", ex.InnerExceptions.Select(e => e.Message.ReplaceLineEndings(" ")));
        }
        string name = signal switch { PosixSignal.SIGINT => "SIGINT", PosixSignal.SIGTERM => "SIGTERM", _ => signal.ToString() };
        _error.WriteLine($"{_program}: interrupted ({name}); {Outcome(cleanupProblem)}");
        _error.Flush();
        _done.Set();
        _exit(_exitCode);
    }

    /// <summary>
    /// The exit code for the command line to return: <paramref name="exitCode"/>, or, once an interrupt has
    /// arrived, the signal's (after its line is written). Returning from Main ends the process at once, so
    /// Main returns through this and an interrupt that arrives as the work ends keeps its code and line.
    /// </summary>
    public int Resolve(int exitCode) => Interrupted ? WaitForExitCode() : exitCode;

    /// <summary>Waits until an interrupt has been handled (its line written) and returns its exit code.</summary>
    public int WaitForExitCode()
    {
        _done.Wait();
        return _exitCode;
    }

    private string Outcome(string? cleanupProblem)
    {
        if (cleanupProblem != null) return cleanupProblem;
        OutputTransaction[] txs;
        lock (_gate) txs = _transactions.ToArray();
        var committed = txs.Where(t => t.IsCommitted).Select(t => t.Folder).Distinct().ToArray();
        var broken = txs.Where(t => t.LeftIncomplete).Select(t => t.Folder).Distinct().ToArray();
        var rolledBack = txs.Where(t => !t.IsCommitted && !t.LeftIncomplete).Select(t => t.Folder).Distinct().ToArray();
        if (broken.Length > 0)
            return $"the outputs in {string.Join(", ", broken)} are incomplete (a commit had failed); build again";
        if (rolledBack.Length > 0)
            return $"nothing in {string.Join(", ", rolledBack)} was changed (the temporary files were removed)"
                   + (committed.Length > 0 ? $"; the outputs in {string.Join(", ", committed)} were already complete" : "");
        if (committed.Length > 0) return $"the outputs in {string.Join(", ", committed)} were already complete";
        return "no output files were written";
    }

    public void Dispose()
    {
        foreach (var r in _registrations) r.Dispose();
        _registrations.Clear();
        _cts.Dispose();
        _done.Dispose();
    }
}
