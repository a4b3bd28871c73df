using PartForge.Formats.Io;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The folder given with <c>-o</c>, and the only place outputs go. Every file is written through
/// <see cref="AtomicFile"/> under a plain file name (no separators, no "..") directly inside the folder; a
/// symbolic link or folder standing at an output name is refused rather than followed; nothing is ever
/// deleted, so foreign files in the folder are left alone.
/// </summary>
public sealed class OutputFolder
{
    private OutputFolder(string fullPath, string shown)
    {
        FullPath = fullPath;
        Shown = shown;
    }

    /// <summary>Absolute path of the folder (symbolic links in the given path resolved once, here).</summary>
    public string FullPath { get; }

    /// <summary>The path as the user gave it, for messages.</summary>
    public string Shown { get; }

    /// <summary>Checks the folder can be used (exists or can be created, is not a file). Creates nothing.</summary>
    public static OutputFolder Prepare(string path, out string? problem)
    {
        problem = null;
        string full = Path.GetFullPath(path);
        if (File.Exists(full)) problem = $"{path} is a file, not a folder; give a folder with -o";
        return new OutputFolder(full, path);
    }

    /// <summary>Creates the folder if needed (only when something is about to be written).</summary>
    public void Create()
    {
        Directory.CreateDirectory(FullPath);
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
            throw new OutputRefusedException($"{Path.Combine(Shown, fileName)} is a folder; an output file cannot replace it");
        return p;
    }

    public void Write(string fileName, Action<Stream> write) => AtomicFile.Write(PathOf(fileName), write);

    public void Write(string fileName, byte[] bytes) => AtomicFile.Write(PathOf(fileName), bytes);

    public void WriteText(string fileName, string text) => AtomicFile.WriteText(PathOf(fileName), text);
}
