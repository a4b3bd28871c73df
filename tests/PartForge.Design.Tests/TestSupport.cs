using System.Globalization;
using PartForge.Design.Keys;
using PartForge.Design.Loading;
using PartForge.Design.Presets;

namespace PartForge.Design.Tests;

internal static class TestSupport
{
    /// <summary>Every leaf key with its value, one "path=value" per line: two designs are equal iff these are.</summary>
    public static string Canon(Model.Design d)
    {
        var sb = new System.Text.StringBuilder();
        Walk(sb, SectionSpec.Root, d, "");
        return sb.ToString();
    }

    private static void Walk(System.Text.StringBuilder sb, SectionSpec spec, object? obj, string prefix)
    {
        foreach (var k in spec.Keys)
        {
            string p = prefix.Length == 0 ? k.Key : prefix + "." + k.Key;
            object? v = obj == null ? null : k.Property.GetValue(obj);
            if (k.Kind == ValueKind.Section) Walk(sb, k.Section!, v, p);
            else sb.Append(p).Append('=').Append(v switch
            {
                null => "null",
                double x => x.ToString("R", CultureInfo.InvariantCulture),
                IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
                _ => v.ToString(),
            }).Append('\n');
        }
    }

    public static string Crank => PresetLibrary.Find("crank-bench")!.Text;

    /// <summary>The preset with one line replaced: the first line starting (after indentation) with <paramref name="startsWith"/>.</summary>
    public static string Edit(string text, string startsWith, string replacement)
    {
        var lines = text.Split('\n').ToList();
        int i = lines.FindIndex(l => l.TrimStart().StartsWith(startsWith, StringComparison.Ordinal));
        if (i < 0) throw new ArgumentException($"no line starts with {startsWith}");
        string indent = lines[i][..(lines[i].Length - lines[i].TrimStart().Length)];
        lines[i] = indent + replacement;
        return string.Join('\n', lines);
    }

    /// <summary>1-based line number of the first line starting (after indentation) with the text.</summary>
    public static int LineOf(string text, string startsWith) =>
        text.Split('\n').ToList().FindIndex(l => l.TrimStart().StartsWith(startsWith, StringComparison.Ordinal)) + 1;

    public static IReadOnlyList<DesignError> Errors(string text, string file = "t.yaml")
    {
        var r = DesignLoader.LoadText(text, file);
        Assert.False(r.Success, "expected the design to be refused");
        return r.Errors;
    }

    public static DesignError Single(string text, string keyPath)
    {
        var errs = Errors(text);
        var hits = errs.Where(e => e.KeyPath == keyPath).ToList();
        Assert.True(hits.Count == 1, $"expected one error at {keyPath}, got: {string.Join(" | ", errs)}");
        return hits[0];
    }
}
