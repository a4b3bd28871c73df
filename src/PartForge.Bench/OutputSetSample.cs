namespace PartForge.Bench;

/// <summary>
/// An output set like a full build's: 20 files, 2 MiB in all (four 3MF/STL-sized files of 320 KiB, sixteen
/// smaller ones of 48 KiB: drawings, previews, the report), deterministic bytes, written into a folder under
/// the system's temporary folder (or PF_BENCH_DIR, to measure another device), removed when the process ends.
/// </summary>
internal static class OutputSetSample
{
    public static IReadOnlyList<(string Name, byte[] Bytes)> Files { get; } = Make();

    public static long TotalBytes => Files.Sum(f => (long)f.Bytes.Length);

    public static string Folder(string tag)
    {
        string root = Environment.GetEnvironmentVariable("PF_BENCH_DIR") is { Length: > 0 } d ? d : Path.GetTempPath();
        string dir = Path.Combine(root, $"partforge-bench-{tag}-{Environment.ProcessId}");
        if (Directory.Exists(dir)) Directory.Delete(dir, true);
        Directory.CreateDirectory(dir);
        // Two megabytes per case would otherwise stay in the temporary folder after every bench run.
        AppDomain.CurrentDomain.ProcessExit += (_, _) => { if (Directory.Exists(dir)) Directory.Delete(dir, true); };
        return dir;
    }

    private static (string, byte[])[] Make()
    {
        var rng = new Random(20240601);
        var files = new List<(string, byte[])>();
        for (int i = 0; i < 20; i++)
        {
            var b = new byte[i < 4 ? 320 * 1024 : 48 * 1024];
            rng.NextBytes(b);
            files.Add(($"bench-part-{i:00}.{(i < 4 ? "stl" : "svg")}", b));
        }
        return files.ToArray();
    }
}
