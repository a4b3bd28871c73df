using System.Security.Cryptography;
using System.Text;

namespace PartForge.Formats.Io;

/// <summary>
/// Crash-safe file output: the content goes to a temporary file in the target folder
/// (".&lt;name&gt;.&lt;random&gt;.partial", a name no output ever has), is flushed to disk (fsync), then renamed over
/// the target in one step. A reader, or a build killed at any moment, sees either the previous file or the
/// complete new one, never a partial file under the final name. The temporary file is removed on failure.
/// A symbolic link at the target path is replaced by the new file, not followed.
/// </summary>
public static class AtomicFile
{
    /// <summary>Suffix of every temporary file (for cleaners and for tests).</summary>
    public const string PartialSuffix = ".partial";

    public static void Write(string path, Action<Stream> write)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        ArgumentNullException.ThrowIfNull(write);
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full) ?? throw new ArgumentException($"no folder in path '{path}'", nameof(path));
        string name = Path.GetFileName(full);
        if (name.Length == 0) throw new ArgumentException($"path '{path}' names a folder, not a file", nameof(path));
        string temp = Path.Combine(dir, "." + name + "." + Convert.ToHexString(RandomNumberGenerator.GetBytes(8)).ToLowerInvariant() + PartialSuffix);
        bool done = false;
        try
        {
            using (var fs = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1 << 16))
            {
                write(fs);
                fs.Flush(flushToDisk: true);
            }
            File.Move(temp, full, overwrite: true);
            done = true;
        }
        finally
        {
            if (!done)
            {
                try { File.Delete(temp); }
                catch (IOException) { /* the original error matters more; the name marks it as partial */ }
                catch (UnauthorizedAccessException) { }
            }
        }
    }

    public static void Write(string path, ReadOnlySpan<byte> bytes)
    {
        var copy = bytes.ToArray();
        Write(path, s => s.Write(copy, 0, copy.Length));
    }

    /// <summary>UTF-8 text without a byte-order mark.</summary>
    public static void WriteText(string path, string text) =>
        Write(path, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));
}
