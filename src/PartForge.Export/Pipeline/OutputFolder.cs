using PartForge.Formats.Io;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The folder given with <c>-o</c>, and the only place outputs go. <see cref="Prepare"/> refuses, before
/// anything is computed, a path that can never hold the outputs (empty, a file, under a file, inside /proc or
/// /sys); the files themselves are written as one <see cref="OutputTransaction"/> under plain file names (no
/// separators, no "..") directly inside the folder. A symbolic link or folder standing at an output name is
/// refused rather than followed or replaced; only the transaction's own temporaries are ever deleted, so
/// foreign files in the folder are left alone.
/// </summary>
public sealed class OutputFolder
{
    private OutputFolder(string fullPath, string shown)
    {
        FullPath = fullPath;
        Shown = shown;
    }

    /// <summary>Absolute path of the folder.</summary>
    public string FullPath { get; }

    /// <summary>The path as the user gave it, for messages.</summary>
    public string Shown { get; }

    /// <summary>
    /// Checks the folder can be used (it exists, or it and its missing parents can be made: no part of the
    /// path is a file; not a kernel file system). Creates nothing. A problem is one line naming what to change.
    /// </summary>
    public static OutputFolder? Prepare(string? path, out string? problem)
    {
        problem = null;
        if (string.IsNullOrWhiteSpace(path))
        {
            problem = "-o: the output folder is empty; give a folder, for example -o out";
            return null;
        }
        if (path.Contains('\0'))
        {
            problem = "-o: the output folder's name contains a NUL character; give a plain folder name";
            return null;
        }
        string full;
        try
        {
            full = Path.GetFullPath(path);
        }
        catch (Exception ex) when (ex is ArgumentException or PathTooLongException or NotSupportedException or IOException)
        {
            problem = $"-o {path}: not a usable folder path ({ex.Message.ReplaceLineEndings(" ")}); give another folder";
            return null;
        }
        string? kernel = IsUnder(full, "/proc") ? "/proc" : IsUnder(full, "/sys") ? "/sys" : null;
        if (kernel != null)
        {
            problem = $"-o {path}: this is inside {kernel}, a kernel file system that holds no ordinary files; give another folder";
            return null;
        }
        for (string? p = full; p != null; p = Path.GetDirectoryName(p))
        {
            if (Directory.Exists(p)) break;
            if (File.Exists(p))
            {
                problem = p == full
                    ? $"-o {path}: this is a file, not a folder; give a folder"
                    : $"-o {path}: {p} is a file, so no folder can be made under it; give another folder";
                return null;
            }
        }
        return new OutputFolder(full, path);
    }

    /// <summary>The full path of an output name, after checking it stays inside the folder and is not a link or folder.</summary>
    public string PathOf(string fileName)
    {
        if (fileName.Length == 0 || fileName != Path.GetFileName(fileName) || fileName is "." or ".." || fileName.Contains('/') || fileName.Contains('\\'))
            throw new InvalidOperationException($"output name '{fileName}' is not a plain file name");
        string p = Path.Combine(FullPath, fileName);
        var info = new FileInfo(p);
        if (info.LinkTarget != null)
            throw new OutputRefusedException($"{Path.Combine(Shown, fileName)} is a symbolic link; not followed (remove it or choose another -o folder)");
        if (Directory.Exists(p))
            throw new OutputRefusedException($"{Path.Combine(Shown, fileName)} is a folder; an output file cannot replace it (remove it or choose another -o folder)");
        return p;
    }

    private static bool IsUnder(string full, string root) =>
        !OperatingSystem.IsWindows() && (full == root || full.StartsWith(root + "/", StringComparison.Ordinal));
}
