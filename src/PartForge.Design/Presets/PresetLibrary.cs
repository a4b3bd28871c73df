using System.Reflection;
using System.Text.RegularExpressions;

namespace PartForge.Design.Presets;

/// <summary>
/// The presets bundled in this assembly (presets/*.yaml, embedded as resources <c>presets/&lt;name&gt;.yaml</c>).
/// The description is the first sentence of the file's opening comment after "Invented scenario (...):".
/// </summary>
public static class PresetLibrary
{
    /// <summary>The preset <c>partforge init</c> writes when none is named.</summary>
    public const string DefaultName = "crank-bench";

    private static readonly Lazy<IReadOnlyList<Preset>> Loaded = new(LoadAll);

    /// <summary>Every bundled preset, ordered by name.</summary>
    public static IReadOnlyList<Preset> All => Loaded.Value;

    /// <summary>The default preset.</summary>
    public static Preset Default => Find(DefaultName) ?? throw new InvalidOperationException($"the default preset {DefaultName} is not bundled");

    /// <summary>The preset of that name, or null.</summary>
    public static Preset? Find(string name) => All.FirstOrDefault(p => p.Name == name);

    private static IReadOnlyList<Preset> LoadAll()
    {
        var asm = typeof(PresetLibrary).Assembly;
        var list = new List<Preset>();
        foreach (var res in asm.GetManifestResourceNames().Where(n => n.StartsWith("presets/", StringComparison.Ordinal) && n.EndsWith(".yaml", StringComparison.Ordinal)))
        {
            using var s = asm.GetManifestResourceStream(res)!;
            using var r = new StreamReader(s);
            string text = r.ReadToEnd().Replace("\r\n", "\n");
            string name = res["presets/".Length..^".yaml".Length];
            list.Add(new Preset(name, Describe(text), text));
        }
        return list.OrderBy(p => p.Name, StringComparer.Ordinal).ToArray();
    }

    private static string Describe(string text)
    {
        var comment = string.Join(' ', text.Split('\n').TakeWhile(l => l.StartsWith('#')).Select(l => l.TrimStart('#').Trim()));
        comment = Regex.Replace(comment, @"^Invented scenario \([^)]*\):\s*", "");
        int dot = comment.IndexOf(". ", StringComparison.Ordinal);
        if (dot > 0) comment = comment[..dot];
        comment = comment.TrimEnd('.');
        return comment.Length == 0 ? "(no description)" : char.ToUpperInvariant(comment[0]) + comment[1..];
    }
}
