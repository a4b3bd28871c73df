using System.Diagnostics;
using PartForge.Formats.Io;

namespace PartForge.Formats.Tests.Io;

/// <summary>Helpers for the output-set tests: temporary folders, reading a folder, an independent SHA-256.</summary>
internal static class OutputFolderFixture
{
    public static string NewFolder(string tag = "tx")
    {
        string d = Path.Combine(Path.GetTempPath(), $"pf-{tag}-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(d);
        return d;
    }

    /// <summary>Every regular file directly in the folder, by name.</summary>
    public static SortedDictionary<string, byte[]> Read(string folder) =>
        new(Directory.GetFiles(folder).ToDictionary(f => Path.GetFileName(f), File.ReadAllBytes), StringComparer.Ordinal);

    /// <summary>The names in the folder that are temporaries of ours.</summary>
    public static string[] Temporaries(string folder) =>
        Directory.GetFileSystemEntries(folder).Select(Path.GetFileName).Where(n => OutputTransaction.IsTemporaryName(n!)).ToArray()!;

    /// <summary>Deterministic bytes standing for one output file.</summary>
    public static byte[] Content(string seed, int length)
    {
        var b = new byte[length];
        var rng = new Random(seed.Aggregate(17, (h, c) => h * 31 + c));
        rng.NextBytes(b);
        return b;
    }

    public static ManifestInfo Info(string design = "demo") => ManifestInfo.For(design, "0.0-test", "design text"u8);

    /// <summary>Writes a complete set of files through a transaction; returns what was written.</summary>
    public static Dictionary<string, byte[]> WriteSet(string folder, string design, string seed, params string[] names)
    {
        var files = names.ToDictionary(n => n, n => Content(seed + n, 3000 + n.Length * 100));
        using var tx = OutputTransaction.Begin(folder);
        foreach (var (n, b) in files) tx.Stage(n, b);
        tx.Commit(Info(design));
        return files;
    }

    /// <summary>
    /// SHA-256 by coreutils' sha256sum, an implementation outside .NET (null when it is not installed).
    /// Source: FIPS 180-4 (the algorithm); coreutils sha256sum (the reference reader).
    /// </summary>
    public static string? Sha256Sum(string path)
    {
        if (!File.Exists("/usr/bin/sha256sum")) return null;
        var psi = new ProcessStartInfo("/usr/bin/sha256sum") { RedirectStandardOutput = true, UseShellExecute = false };
        psi.ArgumentList.Add(path);
        using var p = Process.Start(psi)!;
        string line = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        return line.Split(' ')[0];
    }
}
