using System.Text;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Architecture;

/// <summary>
/// The project cites only what a user of it has: published sources by title and docs/physics.md. No file in
/// src/, tests/, docs/, out-samples/, README.md or DEVELOPERS.md may name the notes kept outside the repository
/// (a path one folder up into the notes, or the notes' file names). The patterns are built from pieces so this
/// file does not contain them itself.
/// </summary>
public sealed class NoOutsideCitationTests
{
    private static readonly string[] Patterns =
    [
        ".." + "/" + "shared",
        ".." + "\\" + "shared",
        "REFERENCE" + ".md",
        "MEASURED" + ".md",
        "CONTRACT" + ".md",
    ];

    private static string Root => Path.GetDirectoryName(Repo.PresetsFolder)!;

    private static IEnumerable<string> Files()
    {
        foreach (var folder in new[] { "src", "tests", "docs", "out-samples" })
        {
            string dir = Path.Combine(Root, folder);
            if (!Directory.Exists(dir)) continue;
            foreach (var f in Directory.GetFiles(dir, "*", SearchOption.AllDirectories))
            {
                string rel = Path.GetRelativePath(Root, f).Replace('\\', '/');
                if (rel.Contains("/obj/", StringComparison.Ordinal) || rel.Contains("/bin/", StringComparison.Ordinal)
                    || rel.Contains("/.sandbox/", StringComparison.Ordinal)) continue;
                yield return rel;
            }
        }
        foreach (var top in new[] { "README.md", "DEVELOPERS.md" })
            if (File.Exists(Path.Combine(Root, top))) yield return top;
    }

    [Fact]
    public void NoFileCitesThePathOutsideTheRepository()
    {
        var files = Files().OrderBy(f => f, StringComparer.Ordinal).ToList();
        // The scan must see the files that matter, or it proves nothing.
        Assert.Contains("README.md", files);
        Assert.Contains("DEVELOPERS.md", files);
        Assert.Contains("docs/physics.md", files);
        Assert.Contains(files, f => f.StartsWith("out-samples/", StringComparison.Ordinal));
        Assert.Contains(files, f => f.StartsWith("src/", StringComparison.Ordinal) && f.EndsWith(".cs", StringComparison.Ordinal));

        var hits = new List<string>();
        foreach (var rel in files)
        {
            // Bytes as Latin-1, so binary files (STL, PNG, zipped 3MF) are scanned too without decoding errors.
            string text = Encoding.Latin1.GetString(File.ReadAllBytes(Path.Combine(Root, rel)));
            foreach (var p in Patterns)
            {
                int i = text.IndexOf(p, StringComparison.Ordinal);
                if (i < 0) continue;
                int line = 1 + text.AsSpan(0, i).Count('\n');
                hits.Add($"{rel}:{line}: {p}");
            }
        }
        Assert.True(hits.Count == 0, "cite the published source or docs/physics.md instead:\n" + string.Join('\n', hits));
    }
}
