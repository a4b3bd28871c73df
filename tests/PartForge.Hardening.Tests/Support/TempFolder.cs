namespace PartForge.Hardening.Tests.Support;

/// <summary>A fresh folder under the system temp folder, removed on dispose.</summary>
public sealed class TempFolder : IDisposable
{
    public TempFolder(string tag = "t")
    {
        string name = $"pf-h8-{tag}-{Environment.ProcessId}-{Guid.NewGuid():N}";
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), name[..Math.Min(name.Length, 48)]);
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    public string Sub(string name) => System.IO.Path.Combine(Path, name);

    public void Dispose()
    {
        try { Directory.Delete(Path, recursive: true); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }
}
