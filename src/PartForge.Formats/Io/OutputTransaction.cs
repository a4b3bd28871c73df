using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;

namespace PartForge.Formats.Io;

/// <summary>
/// Writes one design's output set into a folder so that the folder holds either the previous set or the whole
/// new one, and a reader can tell which: every file is staged under a temporary name in the same folder and
/// flushed to the device, then <see cref="Commit"/> renames them all into place and writes the manifest
/// (<c>&lt;design&gt;-manifest.json</c>, see <see cref="OutputManifest"/>) last, also by rename.
/// <para>
/// What a reader sees if the process dies (killed, power lost) at any moment:
/// </para>
/// <list type="bullet">
/// <item>while staging: the previous set and its manifest, whole (temporaries are hidden names, below);</item>
/// <item>during <see cref="Commit"/>, which first removes the previous manifest and flushes the folder, and
/// only then renames the first file: no manifest, so the folder is visibly incomplete (some files new, some
/// old) and <see cref="OutputSetCheck.Verify"/> says so. No manifest ever describes a mixed set;</item>
/// <item>after the manifest's rename: the new set, complete.</item>
/// </list>
/// <para>
/// Temporaries are named <c>.partforge-&lt;16 hex digits&gt;-&lt;name&gt;.partial</c> (<see cref="IsTemporaryName"/>).
/// <see cref="Begin(string, string?, CancellationToken)"/> removes such leftovers of earlier, interrupted runs,
/// and also those of <see cref="AtomicFile"/> (<c>.&lt;name&gt;.&lt;16 hex digits&gt;.partial</c>); nothing else
/// in the folder is touched. Two builds into one folder would remove each other's temporaries, so a
/// transaction holds the folder's lock file <c>.partforge.lock</c> (an advisory lock; the file is removed
/// again when the transaction ends) from Begin to Commit or Rollback, and a second one is refused with
/// <see cref="OutputProblem.Busy"/>.
/// </para>
/// <para>
/// <see cref="Rollback"/>, or <see cref="Dispose"/> without a commit, removes every temporary and leaves the
/// previous set whole; a folder the transaction created is removed again. A failure while staging rolls the
/// whole transaction back at once. A cancellation token given to Begin rolls it back when it is cancelled
/// (from another thread, e.g. a signal handler: see <see cref="InterruptGuard"/>); a commit in progress
/// finishes first, so a rollback never meets a half-renamed set.
/// </para>
/// <para>
/// File-system failures come out as <see cref="OutputWriteException"/> (one line naming what to change);
/// a writer callback's own exception comes out unchanged, after the rollback. A staged set needs room for the
/// new files while the old ones are still there.
/// </para>
/// </summary>
public sealed partial class OutputTransaction : IDisposable
{
    /// <summary>Start of every temporary name.</summary>
    public const string TemporaryPrefix = ".partforge-";

    /// <summary>End of every temporary name.</summary>
    public const string TemporarySuffix = ".partial";

    /// <summary>The folder's lock file, held while a transaction is open.</summary>
    public const string LockFileName = ".partforge.lock";

    [GeneratedRegex(@"^\.partforge-[0-9a-f]{16}-.+\.partial$", RegexOptions.CultureInvariant)]
    private static partial Regex OwnTemporary();

    [GeneratedRegex(@"^\..+\.[0-9a-f]{16}\.partial$", RegexOptions.CultureInvariant)]
    private static partial Regex AtomicFileTemporary();

    private enum State { Open, Committing, Committed, RolledBack, Failed }

    private sealed record Staged(string Name, string TempPath, long SizeBytes, string Sha256);

    private readonly object _gate = new();
    private readonly List<Staged> _staged = [];
    private readonly Dictionary<string, string> _writing = new(StringComparer.Ordinal); // name -> temp path
    private readonly List<string> _createdFolders;
    private readonly CancellationToken _cancel;
    private FileStream? _lock;
    private CancellationTokenRegistration _registration;
    private State _state = State.Open;
    private string? _manifestTemp;
    private bool _incomplete;

    /// <summary>
    /// Called after each step of a commit ("manifest-removed", "renamed:NAME", "files-flushed",
    /// "manifest-written"), inside the commit: tests look at the folder there, or throw to stand for the
    /// process dying at that moment.
    /// </summary>
    internal Action<string>? CommitStep { get; set; }

    private OutputTransaction(string fullPath, string shown, List<string> createdFolders, FileStream lockFile, IReadOnlyList<string> removed, CancellationToken cancel)
    {
        FolderPath = fullPath;
        Folder = shown;
        _createdFolders = createdFolders;
        _lock = lockFile;
        RemovedTemporaries = removed;
        _cancel = cancel;
    }

    /// <summary>Absolute path of the output folder.</summary>
    public string FolderPath { get; }

    /// <summary>The folder as the user gave it, for messages.</summary>
    public string Folder { get; }

    /// <summary>Leftover temporaries of earlier runs that <see cref="Begin(string, string?, CancellationToken)"/> removed.</summary>
    public IReadOnlyList<string> RemovedTemporaries { get; }

    /// <summary>True once <see cref="Commit"/> has finished.</summary>
    public bool IsCommitted { get { lock (_gate) return _state == State.Committed; } }

    /// <summary>True once the transaction was rolled back (asked for, after a failure, or cancelled): the previous set is as it was.</summary>
    public bool IsRolledBack { get { lock (_gate) return _state is State.RolledBack || _state == State.Failed && !_incomplete; } }

    /// <summary>True when a commit failed after its first rename: the folder holds a mixed set and no manifest.</summary>
    public bool LeftIncomplete { get { lock (_gate) return _incomplete; } }

    /// <summary>The names staged so far, in staging order.</summary>
    public IReadOnlyList<string> StagedNames { get { lock (_gate) return _staged.Select(s => s.Name).ToArray(); } }

    /// <summary>True for a name this class (or <see cref="AtomicFile"/>) uses for a temporary file.</summary>
    public static bool IsTemporaryName(string fileName) => OwnTemporary().IsMatch(fileName) || AtomicFileTemporary().IsMatch(fileName);

    /// <summary>Begins a transaction on <paramref name="folder"/> (see <see cref="Begin(string, string?, CancellationToken)"/>).</summary>
    public static OutputTransaction Begin(string folder, CancellationToken cancel = default) => Begin(folder, null, cancel);

    /// <summary>
    /// Begins a transaction: checks the folder can hold files (creating it, and missing parents, when it does
    /// not exist), takes its lock file, and removes leftover temporaries of earlier runs.
    /// </summary>
    /// <param name="folder">The output folder.</param>
    /// <param name="shown">The folder as messages should name it (default: <paramref name="folder"/>).</param>
    /// <param name="cancel">Cancelling it rolls the transaction back.</param>
    public static OutputTransaction Begin(string folder, string? shown, CancellationToken cancel = default)
    {
        ArgumentException.ThrowIfNullOrEmpty(folder);
        cancel.ThrowIfCancellationRequested();
        shown ??= folder;
        string full = Path.GetFullPath(folder);
        if (IsUnder(full, "/proc") || IsUnder(full, "/sys"))
            throw new OutputWriteException(OutputProblem.VirtualFileSystem, shown, null,
                $"{shown} is inside {(IsUnder(full, "/proc") ? "/proc" : "/sys")}, a kernel file system that holds no ordinary files; choose another -o");
        if (File.Exists(full))
            throw new OutputWriteException(OutputProblem.NotAFolder, shown, null, $"{shown} is a file, not a folder; give a folder with -o");
        var created = new List<string>();
        FileStream? lockFile = null;
        try
        {
            for (string? p = full; p != null && !Directory.Exists(p); p = Path.GetDirectoryName(p))
            {
                if (File.Exists(p))
                    throw new OutputWriteException(OutputProblem.NotAFolder, shown, null, $"{p} is a file, so {shown} cannot be made a folder; give a folder with -o");
                created.Add(p);
            }
            if (created.Count > 0) Directory.CreateDirectory(full);
            lockFile = TakeLock(full);
            var removed = RemoveStale(full, shown);
            var tx = new OutputTransaction(full, shown, created, lockFile, removed, cancel);
            if (cancel.CanBeCanceled) tx._registration = cancel.Register(tx.RollbackOnCancel);
            return tx;
        }
        catch (Exception ex) when (OutputErrors.IsFileSystem(ex) || ex is OutputWriteException)
        {
            lockFile?.Dispose();
            var mapped = OutputErrors.Classify(ex, shown, null);
            try
            {
                RemoveCreated(created, full);
            }
            catch (Exception again) when (OutputErrors.IsFileSystem(again))
            {
                throw new OutputWriteException(mapped.Problem, shown, null, WithCleanup(mapped.Message, [$"{shown} ({again.Message.ReplaceLineEndings(" ")})"]), ex);
            }
            throw mapped;
        }
    }

    /// <summary>Writes one output file under a temporary name through <paramref name="write"/>, then flushes it to the device.</summary>
    /// <param name="name">The final file name: a plain name inside the folder.</param>
    /// <param name="write">Writes the content; the stream is seekable.</param>
    public void Stage(string name, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        string temp = Reserve(name);
        try
        {
            using (var fs = new FileStream(temp, FileMode.CreateNew, FileAccess.ReadWrite, FileShare.None, 1 << 16))
            {
                write(fs);
                fs.Flush(flushToDisk: true);
                fs.Position = 0;
                string sha = Convert.ToHexStringLower(SHA256.HashData(fs));
                Complete(name, temp, fs.Length, sha);
            }
        }
        catch (Exception ex)
        {
            throw Fail(name, ex);
        }
    }

    /// <summary>Stages a file with the given bytes.</summary>
    public void Stage(string name, ReadOnlySpan<byte> bytes)
    {
        string temp = Reserve(name);
        try
        {
            using (var fs = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1 << 16))
            {
                fs.Write(bytes);
                fs.Flush(flushToDisk: true);
            }
            Complete(name, temp, bytes.Length, Convert.ToHexStringLower(SHA256.HashData(bytes)));
        }
        catch (Exception ex)
        {
            throw Fail(name, ex);
        }
    }

    /// <summary>Stages a UTF-8 text file (no byte-order mark).</summary>
    public void StageText(string name, string text) => Stage(name, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));

    /// <summary>
    /// Puts the staged set in place: removes the design's previous manifest (and flushes the folder), renames
    /// every staged file to its final name (in name order), flushes the folder, then writes the new manifest by
    /// rename and flushes again. Returns the manifest written.
    /// </summary>
    public OutputManifest Commit(ManifestInfo info)
    {
        ArgumentNullException.ThrowIfNull(info);
        string manifestName = OutputManifest.FileNameFor(info.DesignName);
        CheckName(manifestName);
        lock (_gate)
        {
            if (_cancel.IsCancellationRequested && _state == State.Open) RollbackLocked();
            EnsureOpen();
            if (_writing.Count > 0) throw new InvalidOperationException($"cannot commit while {string.Join(", ", _writing.Keys)} is still being staged");
            if (_staged.Any(s => s.Name == manifestName)) throw new ArgumentException($"'{manifestName}' is the manifest's own name; it cannot be staged as an output", nameof(info));
            _state = State.Committing;
            var order = _staged.OrderBy(s => s.Name, StringComparer.Ordinal).ToList();
            int renamed = 0;
            string? manifestTemp = null;
            string current = manifestName;
            try
            {
                // Before any change: nothing may stand in the way of a rename.
                foreach (var name in order.Select(s => s.Name).Append(manifestName))
                    if (Directory.Exists(Path.Combine(FolderPath, name)))
                        throw new OutputWriteException(OutputProblem.NameTaken, Folder, name, $"{Path.Combine(Folder, name)} is a folder; an output file cannot replace it (remove it or choose another -o)");
                var manifest = OutputManifest.Of(info, order.Select(s => new ManifestEntry(s.Name, s.SizeBytes, s.Sha256)));
                byte[] bytes = manifest.ToUtf8();
                manifestTemp = _manifestTemp = TempPath(manifestName);
                using (var fs = new FileStream(manifestTemp, FileMode.CreateNew, FileAccess.Write, FileShare.None, 4096))
                {
                    fs.Write(bytes);
                    fs.Flush(flushToDisk: true);
                }
                // From here the folder changes. First the old manifest goes, durably, so that it can never
                // describe the mixed set the renames below pass through.
                string manifestPath = Path.Combine(FolderPath, manifestName);
                if (File.Exists(manifestPath) || new FileInfo(manifestPath).LinkTarget != null) File.Delete(manifestPath);
                OutputErrors.SyncFolder(FolderPath, Folder);
                CommitStep?.Invoke("manifest-removed");
                foreach (var s in order)
                {
                    current = s.Name;
                    File.Move(s.TempPath, Path.Combine(FolderPath, s.Name), overwrite: true);
                    renamed++;
                    CommitStep?.Invoke("renamed:" + s.Name);
                }
                OutputErrors.SyncFolder(FolderPath, Folder);
                CommitStep?.Invoke("files-flushed");
                current = manifestName;
                File.Move(manifestTemp, manifestPath, overwrite: true);
                manifestTemp = _manifestTemp = null;
                OutputErrors.SyncFolder(FolderPath, Folder);
                CommitStep?.Invoke("manifest-written");
                _state = State.Committed;
                _staged.Clear();
                return manifest;
            }
            catch (Exception ex) when (OutputErrors.IsFileSystem(ex) || ex is OutputWriteException)
            {
                var cleanup = new List<string>();
                foreach (var s in order.Skip(renamed)) TryDelete(s.TempPath, cleanup);
                if (manifestTemp != null) TryDelete(manifestTemp, cleanup);
                _manifestTemp = null;
                _staged.Clear();
                _state = State.Failed;
                _incomplete = renamed > 0;
                var mapped = OutputErrors.Classify(ex, Folder, current);
                string state = renamed == 0
                    ? "the previous files are unchanged"
                    : $"the set is incomplete ({renamed} of {order.Count} files replaced, no manifest); build again";
                throw new OutputWriteException(mapped.Problem, Folder, current, WithCleanup($"{mapped.Message} ({state})", cleanup), ex);
            }
            finally
            {
                ReleaseLock();
            }
        }
    }

    /// <summary>Removes every temporary of this transaction; the previous set stays as it was. Does nothing after a commit.</summary>
    public void Rollback()
    {
        lock (_gate)
        {
            if (_state is State.Committed or State.RolledBack or State.Failed) return;
            RollbackLocked();
        }
    }

    /// <summary>Rolls back unless committed, and lets go of the folder's lock.</summary>
    public void Dispose()
    {
        // Unregister never waits for a running callback (Dispose of the registration would, and that callback
        // may be waiting for this transaction's gate).
        _registration.Unregister();
        Rollback();
        lock (_gate) ReleaseLock();
    }

    private void RollbackOnCancel()
    {
        lock (_gate)
        {
            if (_state != State.Open) return;
            RollbackLocked();
        }
    }

    private void RollbackLocked()
    {
        var cleanup = new List<string>();
        foreach (var s in _staged) TryDelete(s.TempPath, cleanup);
        foreach (var temp in _writing.Values) TryDelete(temp, cleanup);
        if (_manifestTemp != null) TryDelete(_manifestTemp, cleanup); // a commit that ended in a program error
        _manifestTemp = null;
        _staged.Clear();
        _state = State.RolledBack;
        ReleaseLock();
        if (cleanup.Count == 0) RemoveCreatedFolders(cleanup);
        if (cleanup.Count > 0)
            throw new OutputWriteException(OutputProblem.Other, Folder, null, WithCleanup($"the output set in {Folder} was rolled back", cleanup));
    }

    private string Reserve(string name)
    {
        CheckName(name);
        lock (_gate)
        {
            if (_cancel.IsCancellationRequested && _state == State.Open) RollbackLocked();
            EnsureOpen();
            if (_staged.Any(s => s.Name == name) || _writing.ContainsKey(name))
                throw new ArgumentException($"'{name}' is staged twice", nameof(name));
            string temp = TempPath(name);
            _writing[name] = temp;
            return temp;
        }
    }

    private void Complete(string name, string temp, long size, string sha)
    {
        lock (_gate)
        {
            _writing.Remove(name);
            // The token reads cancelled before its callbacks (the rollback) have run: a file finished in that
            // moment must not count as staged.
            if (_state == State.Open && _cancel.IsCancellationRequested) RollbackLocked();
            if (_state != State.Open)
            {
                // Rolled back (cancelled) while this file was being written: it goes too.
                var cleanup = new List<string>();
                TryDelete(temp, cleanup);
                if (cleanup.Count > 0) throw new OutputWriteException(OutputProblem.Other, Folder, name, WithCleanup($"the output set in {Folder} was rolled back", cleanup));
                throw new OperationCanceledException($"the output set in {Folder} was rolled back while {name} was being written");
            }
            _staged.Add(new Staged(name, temp, size, sha));
        }
    }

    /// <summary>After a failure while staging: roll everything back and give the exception to throw.</summary>
    private Exception Fail(string name, Exception ex)
    {
        var cleanup = new List<string>();
        lock (_gate)
        {
            if (_writing.Remove(name, out var temp)) TryDelete(temp, cleanup);
            if (_state == State.Open)
            {
                foreach (var s in _staged) TryDelete(s.TempPath, cleanup);
                foreach (var t in _writing.Values) TryDelete(t, cleanup);
                _staged.Clear();
                _state = State.Failed;
                ReleaseLock();
                if (cleanup.Count == 0) RemoveCreatedFolders(cleanup);
            }
        }
        if (ex is OperationCanceledException or OutputWriteException) return ex;
        if (OutputErrors.IsFileSystem(ex))
        {
            var mapped = OutputErrors.Classify(ex, Folder, name);
            return new OutputWriteException(mapped.Problem, Folder, name, WithCleanup(mapped.Message, cleanup), ex);
        }
        // The writer's own exception, unchanged; temporaries that could not be removed are noted on it.
        if (cleanup.Count > 0) ex.Data["partforge.cleanup"] = WithCleanup("", cleanup).TrimStart(' ', ';');
        return ex;
    }

    private void EnsureOpen()
    {
        switch (_state)
        {
            case State.Open: return;
            case State.Committed: throw new InvalidOperationException("the transaction is already committed");
            case State.Committing: throw new InvalidOperationException("the transaction is committing");
            default:
                if (_cancel.IsCancellationRequested) throw new OperationCanceledException($"the output set in {Folder} was rolled back (cancelled)", _cancel);
                throw new InvalidOperationException("the transaction was rolled back");
        }
    }

    private string TempPath(string name) =>
        Path.Combine(FolderPath, TemporaryPrefix + Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(8)) + "-" + name + TemporarySuffix);

    private static void CheckName(string name)
    {
        ArgumentException.ThrowIfNullOrEmpty(name);
        if (name != Path.GetFileName(name) || name is "." or ".." || name.Contains('/') || name.Contains('\\') || name.Contains('\0'))
            throw new ArgumentException($"output name '{name}' is not a plain file name", nameof(name));
        if (name == LockFileName || IsTemporaryName(name))
            throw new ArgumentException($"output name '{name}' is a name the transaction keeps for itself", nameof(name));
    }

    private static bool IsUnder(string full, string root) =>
        !OperatingSystem.IsWindows() && (full == root || full.StartsWith(root + "/", StringComparison.Ordinal));

    /// <summary>
    /// Opens the folder's lock file for this transaction alone. FileShare.None is an advisory whole-file lock
    /// on Unix (flock; a held lock fails with EWOULDBLOCK) and a sharing lock on Windows (a sharing
    /// violation); the caller's classifier calls either <see cref="OutputProblem.Busy"/>.
    /// The lock file is removed again when the transaction ends (unlinked while still held, then closed), so
    /// a build leaves nothing of its own beside the output set. A second build that opened the file just before
    /// the unlink finds, once it holds the lock, that its file is gone and takes a fresh one.
    /// </summary>
    private static FileStream TakeLock(string full)
    {
        string path = Path.Combine(full, LockFileName);
        for (int attempt = 0; ; attempt++)
        {
            var fs = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None, 1);
            if (File.Exists(path) || attempt >= 4) return fs;
            fs.Dispose();
        }
    }

    /// <summary>Removes leftover temporaries of earlier runs (our names only, plain files and links, this folder only).</summary>
    private static IReadOnlyList<string> RemoveStale(string full, string shown)
    {
        var removed = new List<string>();
        foreach (var entry in new DirectoryInfo(full).EnumerateFileSystemInfos())
        {
            if (entry is DirectoryInfo && entry.LinkTarget == null) continue;
            if (!IsTemporaryName(entry.Name)) continue;
            try
            {
                File.Delete(entry.FullName);
            }
            catch (Exception ex) when (OutputErrors.IsFileSystem(ex))
            {
                throw OutputErrors.Classify(ex, shown, entry.Name);
            }
            removed.Add(entry.Name);
        }
        removed.Sort(StringComparer.Ordinal);
        return removed;
    }

    private void ReleaseLock()
    {
        if (_lock != null)
        {
            try
            {
                File.Delete(_lock.Name);
            }
            catch (Exception ex) when (OutputErrors.IsFileSystem(ex))
            {
                // A lock file that cannot be removed (read-only folder after the set was written) stays, empty.
            }
        }
        _lock?.Dispose();
        _lock = null;
    }

    /// <summary>Removes the folders Begin created, innermost first, when they hold nothing but the lock file.</summary>
    private void RemoveCreatedFolders(List<string> cleanup)
    {
        if (_createdFolders.Count == 0) return;
        try
        {
            RemoveCreated(_createdFolders, FolderPath);
        }
        catch (Exception ex) when (OutputErrors.IsFileSystem(ex))
        {
            cleanup.Add($"{Folder} ({ex.Message.ReplaceLineEndings(" ")})");
        }
    }

    private static void RemoveCreated(List<string> created, string full)
    {
        if (created.Count == 0) return;
        string lockPath = Path.Combine(full, LockFileName);
        if (Directory.Exists(full) && File.Exists(lockPath) && Directory.EnumerateFileSystemEntries(full).Count() == 1) File.Delete(lockPath);
        foreach (var dir in created) // innermost first
        {
            if (!Directory.Exists(dir) || Directory.EnumerateFileSystemEntries(dir).Any()) return;
            Directory.Delete(dir);
        }
    }

    private static void TryDelete(string path, List<string> cleanup)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception ex) when (OutputErrors.IsFileSystem(ex))
        {
            cleanup.Add($"{Path.GetFileName(path)} ({ex.Message.ReplaceLineEndings(" ")})");
        }
    }

    private static string WithCleanup(string message, List<string> cleanup) =>
        cleanup.Count == 0 ? message
            : $"{message}; also could not remove {string.Join(", ", cleanup)} (a later build removes leftover temporaries)";
}
