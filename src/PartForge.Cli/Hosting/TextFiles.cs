using System.Text;

namespace PartForge.Cli.Hosting;

/// <summary>Small text outputs of the CLI itself (init, schema): written atomically, UTF-8 without BOM, LF.</summary>
public static class TextFiles
{
    private static readonly UTF8Encoding Utf8 = new(false);

    /// <summary>Writes to a temporary file in the target's folder, then renames it into place.</summary>
    public static void WriteAtomic(string path, string text)
    {
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full) ?? ".";
        if (!Directory.Exists(dir)) throw new UsageException($"{path}: the folder {dir} does not exist");
        if (Directory.Exists(full)) throw new UsageException($"{path} is a folder; give a file name");
        string tmp = Path.Combine(dir, "." + Path.GetFileName(full) + "." + Environment.ProcessId + ".tmp");
        try
        {
            using (var fs = new FileStream(tmp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                var bytes = Utf8.GetBytes(text);
                fs.Write(bytes);
                fs.Flush(flushToDisk: true);
            }
            File.Move(tmp, full, overwrite: true);
        }
        catch (UnauthorizedAccessException)
        {
            TryDelete(tmp);
            throw new UsageException($"{path}: permission denied");
        }
        catch (IOException ex)
        {
            TryDelete(tmp);
            throw new UsageException($"{path}: cannot write: {ex.Message.ReplaceLineEndings(" ")}");
        }
    }

    private static void TryDelete(string tmp)
    {
        try
        {
            if (File.Exists(tmp)) File.Delete(tmp);
        }
        catch (IOException)
        {
            // The temporary file stays behind under its hidden name; the final name was never touched.
        }
    }
}
