using PartForge.Design.Presets;

namespace PartForge.Fuzz.Mutations;

/// <summary>
/// The starting designs: the preset files in the repository's presets/ folder (found by walking up from a
/// folder), or the copies embedded in the program when the repository is not around.
/// </summary>
public static class SeedLoader
{
    public static IReadOnlyList<SeedText> Load(string? startFolder = null)
    {
        string? dir = FindPresets(startFolder ?? AppContext.BaseDirectory) ?? FindPresets(Environment.CurrentDirectory);
        if (dir != null)
        {
            var files = Directory.GetFiles(dir, "*.yaml").OrderBy(f => f, StringComparer.Ordinal).ToArray();
            if (files.Length > 0)
                return files.Select(f => new SeedText(Path.GetFileNameWithoutExtension(f), File.ReadAllText(f).Replace("\r\n", "\n"))).ToArray();
        }
        return PresetLibrary.All.Select(p => new SeedText(p.Name, p.Text)).ToArray();
    }

    /// <summary>The repository's presets/ folder above <paramref name="start"/>, or null.</summary>
    public static string? FindPresets(string start)
    {
        for (var d = new DirectoryInfo(start); d != null; d = d.Parent)
        {
            string p = Path.Combine(d.FullName, "presets");
            if (Directory.Exists(p) && File.Exists(Path.Combine(d.FullName, "PartForge.sln"))) return p;
        }
        return null;
    }
}
