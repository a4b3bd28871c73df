using System.Text;

namespace PartForge.Cli.Hosting;

/// <summary>
/// A text file written while the work that fills it runs (the sweep's CSV): <see cref="Open"/> checks the path
/// and creates the temporary file under a hidden name in the target's folder before any work starts, so a path
/// that cannot be written is refused at once; lines go to it as they come (memory does not grow with them);
/// <see cref="Commit"/> flushes it and renames it into place. Disposed (or aborted, on an interrupt) without a
/// commit, the temporary file is removed and the final name is never touched.
/// </summary>
public sealed class StreamedTextFile : IDisposable
{
    private static readonly UTF8Encoding Utf8 = new(false);

    private readonly string _path, _full, _tmp;
    private FileStream? _stream;
    private StreamWriter? _writer;
    private int _state; // 0 open, 1 committed, 2 aborted
    private readonly Lock _gate = new(); // an interrupt aborts from another thread

    private StreamedTextFile(string path, string full, string tmp, FileStream stream)
    {
        _path = path;
        _full = full;
        _tmp = tmp;
        _stream = stream;
        _writer = new StreamWriter(stream, Utf8, 1 << 16) { NewLine = "\n" };
    }

    /// <summary>Opens the temporary file for <paramref name="path"/>; a <see cref="UsageException"/> (exit 2) when it cannot be made.</summary>
    public static StreamedTextFile Open(string path)
    {
        if (path.Length == 0) throw new UsageException("the file name is empty; give a file name");
        string full;
        try { full = Path.GetFullPath(path); }
        catch (Exception ex) when (ex is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new UsageException($"{path}: not a usable file name ({ex.Message.ReplaceLineEndings(" ")})");
        }
        string dir = Path.GetDirectoryName(full) ?? ".";
        if (File.Exists(dir)) throw new UsageException($"{path}: {dir} is a file, not a folder");
        if (!Directory.Exists(dir)) throw new UsageException($"{path}: the folder {dir} does not exist");
        if (Directory.Exists(full)) throw new UsageException($"{path} is a folder; give a file name");
        string tmp = Path.Combine(dir, "." + Path.GetFileName(full) + "." + Environment.ProcessId + ".tmp");
        try
        {
            var fs = new FileStream(tmp, FileMode.Create, FileAccess.Write, FileShare.None);
            return new StreamedTextFile(path, full, tmp, fs);
        }
        catch (UnauthorizedAccessException)
        {
            throw new UsageException($"{path}: permission denied (cannot create a file in {dir})");
        }
        catch (IOException ex)
        {
            throw new UsageException($"{path}: cannot write: {ex.Message.ReplaceLineEndings(" ")}");
        }
    }

    /// <summary>Appends text; a full or failing disk is a <see cref="UsageException"/> and the temporary file is removed.</summary>
    public void Write(string text)
    {
        lock (_gate)
        {
            if (_state == 2) throw new OperationCanceledException("the file was abandoned");
            if (_writer == null) throw new InvalidOperationException("the file is closed");
            try { _writer.Write(text); }
            catch (IOException ex) { AbortLocked(); throw new UsageException($"{_path}: cannot write: {ex.Message.ReplaceLineEndings(" ")}"); }
        }
    }

    /// <summary>Flushes to disk and renames the file into place.</summary>
    public void Commit()
    {
        lock (_gate) CommitLocked();
    }

    private void CommitLocked()
    {
        if (_state == 2) throw new OperationCanceledException("the file was abandoned");
        if (_writer == null) throw new InvalidOperationException("the file is closed");
        try
        {
            _writer.Flush();
            _stream!.Flush(flushToDisk: true);
            _writer.Dispose();
            _writer = null;
            _stream = null;
            File.Move(_tmp, _full, overwrite: true);
            _state = 1;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            AbortLocked();
            throw new UsageException($"{_path}: cannot write: {ex.Message.ReplaceLineEndings(" ")}");
        }
    }

    /// <summary>Closes and removes the temporary file (safe to call from an interrupt, and more than once).</summary>
    public void Abort()
    {
        lock (_gate) AbortLocked();
    }

    private void AbortLocked()
    {
        if (_state != 0) return;
        _state = 2;
        try { _writer?.Dispose(); } catch (IOException) { } catch (ObjectDisposedException) { }
        _writer = null;
        _stream = null;
        try { if (File.Exists(_tmp)) File.Delete(_tmp); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }

    public void Dispose()
    {
        if (_state == 0) Abort();
    }
}
