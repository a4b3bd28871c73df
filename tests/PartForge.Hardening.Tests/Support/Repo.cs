using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Running;

namespace PartForge.Hardening.Tests.Support;

/// <summary>The repository's presets and the partforge executable built beside the tests.</summary>
public static class Repo
{
    public static string PresetsFolder =>
        SeedLoader.FindPresets(AppContext.BaseDirectory) ?? throw new InvalidOperationException("presets/ not found above " + AppContext.BaseDirectory);

    public static string PresetPath(string name) => Path.Combine(PresetsFolder, name + ".yaml");

    public static string PresetText(string name) => File.ReadAllText(PresetPath(name)).Replace("\r\n", "\n");

    public static IReadOnlyList<string> PresetNames =>
        Directory.GetFiles(PresetsFolder, "*.yaml").Select(Path.GetFileNameWithoutExtension).OrderBy(n => n, StringComparer.Ordinal).ToArray()!;

    /// <summary>PARTFORGE_EXE when set (the native executable, scripts/test-native.sh), else the one built beside the tests.</summary>
    public static ProcessCli Executable =>
        Environment.GetEnvironmentVariable("PARTFORGE_EXE") is { Length: > 0 } exe
            ? (File.Exists(exe) ? new ProcessCli(Path.GetFullPath(exe)) : throw new InvalidOperationException("PARTFORGE_EXE names " + exe + ", which does not exist"))
            : ProcessCli.Find(AppContext.BaseDirectory) ?? throw new InvalidOperationException("the partforge executable is not next to the tests");

    /// <summary>The preset text with one top-level scalar key replaced (or the line added when absent).</summary>
    public static string WithTopKey(string text, string key, string value)
    {
        var lines = text.Split('\n').ToList();
        int i = lines.FindIndex(l => l.StartsWith(key + ":", StringComparison.Ordinal));
        if (i >= 0) lines[i] = key + ": " + value;
        else lines.Add(key + ": " + value);
        return string.Join('\n', lines);
    }

    /// <summary>The preset text with <c>section.key</c> set (block style, two-space indent), adding what is missing.</summary>
    public static string WithKey(string text, string section, string key, string value)
    {
        var lines = text.Split('\n').ToList();
        int h = lines.FindIndex(l => l == section + ":");
        if (h < 0)
        {
            lines.Add(section + ":");
            lines.Add("  " + key + ": " + value);
            return string.Join('\n', lines);
        }
        int end = h + 1;
        while (end < lines.Count && lines[end].StartsWith("  ", StringComparison.Ordinal)) end++;
        for (int i = h + 1; i < end; i++)
        {
            if (lines[i].StartsWith("  " + key + ":", StringComparison.Ordinal))
            {
                lines[i] = "  " + key + ": " + value;
                return string.Join('\n', lines);
            }
        }
        lines.Insert(end, "  " + key + ": " + value);
        return string.Join('\n', lines);
    }
}
