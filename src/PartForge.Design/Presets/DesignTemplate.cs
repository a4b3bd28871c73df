using System.Text;
using PartForge.Design.Keys;
using PartForge.Design.Loading;

namespace PartForge.Design.Presets;

/// <summary>
/// The starter file <c>partforge init</c> writes: a preset with every key of the design file listed in model
/// order, each with its one-line documentation; keys the preset leaves out are written commented out with
/// their default, so the file loads to exactly the same design as the preset.
/// </summary>
public static class DesignTemplate
{
    public static string Render(Preset preset)
    {
        var errors = new List<DesignError>();
        var root = YamlReader.Read(preset.Text, preset.Name + ".yaml", errors)
            ?? throw new InvalidOperationException($"bundled preset {preset.Name} does not parse: {string.Join("; ", errors)}");
        var sb = new StringBuilder();
        foreach (var line in preset.Text.Split('\n').TakeWhile(l => l.StartsWith('#'))) sb.Append(line).Append('\n');
        sb.Append("#\n# Every key of the design file is listed. Lines starting with '#' are left at the default shown;\n");
        sb.Append("# remove the '#' to change one. `partforge schema` prints the JSON Schema for an editor.\n");
        Section(sb, SectionSpec.Root, root, "", false);
        return sb.ToString();
    }

    private static void Section(StringBuilder sb, SectionSpec spec, YMapping? map, string indent, bool commented)
    {
        foreach (var k in spec.Keys)
        {
            var entry = map?.Entries.FirstOrDefault(e => e.Key is YScalar s && s.Text == k.Key);
            string doc = k.Doc == null ? "" : "  # " + k.Doc;
            if (k.Kind == ValueKind.Section)
            {
                var child = entry?.Value as YMapping;
                bool off = commented || child == null; // a section the preset leaves out is written commented, header included
                sb.Append(Prefix(indent, off)).Append(k.Key).Append(':').Append(doc).Append('\n');
                Section(sb, k.Section!, child, indent + "  ", off);
                continue;
            }
            if (!commented && entry?.Value is YScalar v && !v.IsNull)
            {
                sb.Append(indent).Append(k.Key).Append(": ").Append(Scalar(v)).Append(doc).Append('\n');
                continue;
            }
            string def = k.Default switch
            {
                null => "",
                double d => " " + KeySpec.Format(d),
                int i => " " + i.ToString(System.Globalization.CultureInfo.InvariantCulture),
                bool b => b ? " true" : " false",
                var o => " " + o,
            };
            sb.Append(Prefix(indent, true)).Append(k.Key).Append(':').Append(def).Append(doc).Append('\n');
        }
    }

    private static string Prefix(string indent, bool commented) => commented ? indent + "# " : indent;

    private static string Scalar(YScalar v) => v.Quoted ? "'" + v.Text.Replace("'", "''") + "'" : v.Text;
}
