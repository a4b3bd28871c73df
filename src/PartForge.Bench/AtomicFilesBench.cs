using PartForge.Formats.Io;

namespace PartForge.Bench;

/// <summary>
/// The baseline for <see cref="OutputTransactionBench"/>: the same 20 files (2 MiB) written one by one through
/// <see cref="AtomicFile"/> (temporary, fsync, rename; no manifest, no folder fsync), as the build writes today.
/// </summary>
public sealed class AtomicFilesBench : IBenchCase
{
    private string _dir = "";

    public string Name => "output-atomic-files";

    public string Description => "the same 20 files / 2 MiB through the per-file atomic write (baseline for output-transaction)";

    public void Setup() => _dir = OutputSetSample.Folder("atomic");

    public IReadOnlyDictionary<string, double> Run()
    {
        foreach (var (name, bytes) in OutputSetSample.Files) AtomicFile.Write(Path.Combine(_dir, name), bytes);
        return new Dictionary<string, double>
        {
            ["files"] = OutputSetSample.Files.Count,
            ["MiB"] = OutputSetSample.TotalBytes / 1048576.0,
        };
    }
}
