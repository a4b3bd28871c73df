using System.Globalization;
using System.Text.RegularExpressions;

namespace PartForge.Fuzz.Mutations;

/// <summary>
/// A light, line-based view of a block-style YAML design (the shape the presets have): key lines, scalar value
/// spans (also inside one-line flow mappings) and top-level sections. Good enough to aim mutations; the
/// mutated text is never parsed by this class again, only by the program under test.
/// </summary>
public sealed class YamlLines
{
    private static readonly Regex KeyLine = new(@"^(?<ind> *)(?<key>[A-Za-z_][A-Za-z0-9_]*):(?<rest>.*)$", RegexOptions.CultureInvariant);
    private static readonly Regex FlowPair = new(@"(?<k>[A-Za-z_][A-Za-z0-9_]*):\s*(?<v>[^,{}\s][^,{}]*?)\s*(?=[,}])", RegexOptions.CultureInvariant);

    public YamlLines(string text)
    {
        Lines = text.Split('\n').ToList();
        string section = "";
        for (int i = 0; i < Lines.Count; i++)
        {
            var m = KeyLine.Match(Lines[i]);
            if (!m.Success) continue;
            KeyLines.Add(i);
            int indent = m.Groups["ind"].Length;
            string key = m.Groups["key"].Value;
            if (indent == 0) section = key;
            else key = section + "." + key;
            var rest = m.Groups["rest"];
            int hash = rest.Value.IndexOf(" #", StringComparison.Ordinal);
            string restText = hash >= 0 ? rest.Value[..hash] : rest.Value;
            string trimmed = restText.Trim();
            if (trimmed.Length == 0)
            {
                if (indent == 0) SectionStarts.Add(i);
                continue;
            }
            int lead = restText.Length - restText.TrimStart().Length;
            int start = rest.Index + lead;
            if (trimmed.StartsWith('{'))
            {
                foreach (Match p in FlowPair.Matches(Lines[i], start))
                {
                    var v = p.Groups["v"];
                    Scalars.Add(new ScalarSpan(i, v.Index, v.Length, key + "." + p.Groups["k"].Value, IsNumber(v.Value)));
                }
            }
            else Scalars.Add(new ScalarSpan(i, start, trimmed.Length, key, IsNumber(trimmed)));
        }
    }

    public List<string> Lines { get; }

    /// <summary>Indices of lines of the form <c>key: ...</c>.</summary>
    public List<int> KeyLines { get; } = new();

    /// <summary>Indices of top-level section headers (<c>rotor:</c> with nothing after the colon).</summary>
    public List<int> SectionStarts { get; } = new();

    public List<ScalarSpan> Scalars { get; } = new();

    public string Text => string.Join('\n', Lines);

    public string ValueOf(ScalarSpan s) => Lines[s.Line].Substring(s.Start, s.Length);

    public void Replace(ScalarSpan s, string value)
    {
        string l = Lines[s.Line];
        Lines[s.Line] = l[..s.Start] + value + l[(s.Start + s.Length)..];
    }

    /// <summary>The line range [start, end) of the top-level section whose header is at <paramref name="header"/>.</summary>
    public (int Start, int End) SectionRange(int header)
    {
        int end = header + 1;
        while (end < Lines.Count && (Lines[end].Length == 0 || Lines[end].StartsWith(' ') || Lines[end].StartsWith('#'))) end++;
        return (header, end);
    }

    /// <summary>The header line index of the top-level section with this key, or -1.</summary>
    public int FindSection(string key) => SectionStarts.FirstOrDefault(i => Lines[i].StartsWith(key + ":", StringComparison.Ordinal), -1);

    public static bool IsNumber(string s) =>
        double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v);
}
