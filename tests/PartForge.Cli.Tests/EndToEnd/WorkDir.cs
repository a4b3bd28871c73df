namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>A fresh temporary working folder per test, removed afterwards.</summary>
public sealed class WorkDir : IDisposable
{
    public string Path { get; } = Directory.CreateTempSubdirectory("pf-cli-").FullName;

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public string Write(string name, string text)
    {
        System.IO.File.WriteAllText(File(name), text);
        return name;
    }

    /// <summary>Every file below the folder, relative, sorted.</summary>
    public string[] Files() => Directory.EnumerateFiles(Path, "*", SearchOption.AllDirectories)
        .Select(f => System.IO.Path.GetRelativePath(Path, f)).Order(StringComparer.Ordinal).ToArray();

    public void Dispose()
    {
        try { Directory.Delete(Path, true); }
        catch (IOException) { /* a child process may still hold a file; the temp folder is cleaned by the OS */ }
    }
}
