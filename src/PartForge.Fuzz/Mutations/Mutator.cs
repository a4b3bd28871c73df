using System.Globalization;
using System.Text;
using PartForge.Design.Keys;

namespace PartForge.Fuzz.Mutations;

/// <summary>
/// Seeded, deterministic mutation of design files. Case <c>i</c> of run seed <c>s</c> is always the same bytes
/// (System.Random with an explicit seed is stable across runs and machines), so every finding is reproducible
/// with <c>partforge-fuzz --seed s --only i</c>.
/// Text mutations (keys, values, types, sections, enum swaps, splices, indentation, nesting, anchors) are
/// applied first, 1 to 3 per case; byte mutations (truncation, inserted bytes, encodings) last.
/// </summary>
public sealed class Mutator
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    private static readonly string[] SpecialValues =
    [
        "0", "-1", "-0", "0.0", ".nan", ".NaN", "NaN", "nan", ".inf", "-.inf", "+.inf", "Infinity", "-Infinity", "1e308", "-1e308",
        "1e-308", "4.9e-324", "1e309", "99999999999999999999", "-2147483649", "2147483648", "0x1F", "0o17", "1_000", "12.5.3",
        "1,5", "abc", "\"12\"", "'7'", "\"\"", "", "~", "null", "true", "false", "yes", "[1, 2]", "[]", "{ x: 1 }", "{}",
        "!!binary AAAA", "!!float 1", "!!str 5", "!<tag:example.org,2002:x> 5", "*undefined", "&a 5", "|\n  12", ">\n  12",
        "\"\\u0000\"", "\"\\x1b[31m\"", "\"\\uFFFF\"", "\u00A0", "\u202Eabc", "１２", "12mm", "1e5", "-1e-9", "0.000001",
    ];

    private static readonly string[] HostileNames =
    [
        "../../escape", "/tmp/abs", "a/b", "a\\b", "..", ".", "\"\"", "con", "nul", "x" + new string('y', 300), "\"crank\\0x\"",
        "crank‐bench", "сrank", "crank\u200Bbench", "\"a\\nb\"", "-", "--force", "\"-o\"", "ａｂｃ", "\"../x\"", "name with space",
        "\"%2e%2e%2f\"", "CRANK", "crank_bench", "\"\\\\server\\share\"", "~root",
    ];

    private static readonly Func<Mutator, Random, YamlLines, string?>[] TextMutations =
    [
        (m, r, y) => m.KeyTypo(r, y),
        (m, r, y) => m.ValueSpecial(r, y),
        (m, r, y) => m.ValueSpecial(r, y),
        (m, r, y) => m.NumberScale(r, y),
        (m, r, y) => m.NumberScale(r, y),
        (m, r, y) => m.NumberScale(r, y),
        (m, r, y) => m.NumberEdge(r, y),
        (m, r, y) => m.TypeChange(r, y),
        (m, r, y) => m.DeleteLine(r, y),
        (m, r, y) => m.DuplicateLine(r, y),
        (m, r, y) => m.DeleteSection(r, y),
        (m, r, y) => m.DuplicateSection(r, y),
        (m, r, y) => m.MoveSection(r, y),
        (m, r, y) => m.SwapEnum(r, y),
        (m, r, y) => m.SwapEnum(r, y),
        (m, r, y) => m.SpliceSection(r, y),
        (m, r, y) => m.SpliceSection(r, y),
        (m, r, y) => m.AddKey(r, y),
        (m, r, y) => m.Indentation(r, y),
        (m, r, y) => m.DeepNesting(r, y),
        (m, r, y) => m.Anchors(r, y),
        (m, r, y) => m.HostileName(r, y),
        (m, r, y) => m.LongValue(r, y),
        (m, r, y) => m.DocumentLevel(r, y),
    ];

    private readonly IReadOnlyList<SeedText> _seeds;
    private readonly (string Path, KeySpec Key)[] _leaves;

    public Mutator(IReadOnlyList<SeedText> seeds)
    {
        if (seeds.Count == 0) throw new ArgumentException("at least one seed design is needed", nameof(seeds));
        _seeds = seeds;
        _leaves = SectionSpec.Root.LeafPaths().ToArray();
    }

    /// <summary>The per-case seed: a fixed mix of the run seed and the case index.</summary>
    public static int CaseSeed(int runSeed, int index)
    {
        unchecked
        {
            uint h = (uint)runSeed * 0x9E3779B1u ^ (uint)index * 0x85EBCA77u;
            h ^= h >> 15; h *= 0x2C1B3C6Du; h ^= h >> 12; h *= 0x297A2D39u; h ^= h >> 15;
            return (int)(h & 0x7FFFFFFF);
        }
    }

    public FuzzInput Make(int index, int runSeed)
    {
        int seed = CaseSeed(runSeed, index);
        var r = new Random(seed);
        var baseSeed = _seeds[r.Next(_seeds.Count)];
        var y = new YamlLines(baseSeed.Text);
        var applied = new List<string>();
        int count = r.NextDouble() switch { < 0.6 => 1, < 0.88 => 2, _ => 3 };
        for (int i = 0; i < count; i++)
        {
            var op = TextMutations[r.Next(TextMutations.Length)];
            string? what = op(this, r, y);
            if (what != null)
            {
                applied.Add(what);
                y = new YamlLines(y.Text); // re-index after a structural change
            }
        }
        byte[] bytes = Encoding.UTF8.GetBytes(y.Text);
        if (r.NextDouble() < 0.15)
        {
            (bytes, string what) = ByteMutation(r, bytes);
            applied.Add(what);
        }
        return new FuzzInput(index, seed, baseSeed.Name, applied, bytes);
    }

    private static T Pick<T>(Random r, IReadOnlyList<T> list) => list[r.Next(list.Count)];

    private static string Num(double v) => v.ToString("R", Inv);

    private string? KeyTypo(Random r, YamlLines y)
    {
        if (y.KeyLines.Count == 0) return null;
        int li = Pick(r, y.KeyLines);
        string line = y.Lines[li];
        int ind = line.Length - line.TrimStart(' ').Length;
        int colon = line.IndexOf(':');
        string key = line[ind..colon];
        string typo = key.Length switch
        {
            < 2 => key + "x",
            _ => r.Next(5) switch
            {
                0 => key.Remove(r.Next(key.Length), 1),
                1 => key.Insert(r.Next(key.Length + 1), ((char)('a' + r.Next(26))).ToString()),
                2 => Swap(key, r.Next(key.Length - 1)),
                3 => key.ToUpperInvariant(),
                _ => key.Replace('_', '-'),
            },
        };
        if (typo == key) typo = key + "s";
        y.Lines[li] = line[..ind] + typo + line[colon..];
        return $"key-typo {key}->{typo}";
    }

    private static string Swap(string s, int i) => s[..i] + s[i + 1] + s[i] + s[(i + 2)..];

    private string? ValueSpecial(Random r, YamlLines y)
    {
        if (y.Scalars.Count == 0) return null;
        var s = Pick(r, y.Scalars);
        string v = Pick(r, SpecialValues);
        if (v.Contains('\n'))
        {
            // Block scalars need the continuation indented deeper than the key.
            string line = y.Lines[s.Line];
            int ind = line.Length - line.TrimStart(' ').Length;
            v = v.Replace("\n  ", "\n" + new string(' ', ind + 2));
            if (line.AsSpan(s.Start + s.Length).Trim().Length > 0) v = "\"12\""; // inside a flow mapping
        }
        y.Replace(s, v);
        return $"value {s.Key}={Show(v)}";
    }

    private string? NumberScale(Random r, YamlLines y)
    {
        var nums = y.Scalars.Where(s => s.IsNumber).ToList();
        if (nums.Count == 0) return null;
        var s = Pick(r, nums);
        double v = double.Parse(y.ValueOf(s), Inv);
        double[] factors = [0.5, 0.8, 0.9, 0.95, 0.99, 1.01, 1.05, 1.1, 1.25, 1.5, 2, 3, 10, 0.1];
        double f = Pick(r, factors);
        double nv = v * f;
        bool integer = _leaves.FirstOrDefault(l => l.Path == s.Key).Key?.Kind == ValueKind.Integer;
        string text = integer ? Math.Max(0, Math.Round(nv) == v ? v + (f > 1 ? 1 : -1) : Math.Round(nv)).ToString("R", Inv) : Num(Math.Round(nv, 4));
        y.Replace(s, text);
        return $"scale {s.Key}={text}";
    }

    private string? NumberEdge(Random r, YamlLines y)
    {
        var nums = y.Scalars.Where(s => s.IsNumber).ToList();
        if (nums.Count == 0) return null;
        var s = Pick(r, nums);
        double v = double.Parse(y.ValueOf(s), Inv);
        string[] edge = ["0", Num(-v), "1e308", "1e-308", ".nan", ".inf", "-.inf", Num(v * 1e6), Num(v * 1e-6), "5e-324", Num(v + 1e-9)];
        string text = Pick(r, edge);
        y.Replace(s, text);
        return $"edge {s.Key}={text}";
    }

    private string? TypeChange(Random r, YamlLines y)
    {
        if (r.Next(3) == 0 && y.SectionStarts.Count > 0)
        {
            // A section given as a scalar or a list: header gets a value, the body is dropped or kept.
            int h = Pick(r, y.SectionStarts);
            var (start, end) = y.SectionRange(h);
            string key = y.Lines[h].TrimEnd(':', ' ');
            string v = Pick(r, new[] { "5", "\"text\"", "[1, 2, 3]", "~", "[]" });
            y.Lines[h] = key + ": " + v;
            bool keepBody = r.Next(2) == 0;
            if (!keepBody) y.Lines.RemoveRange(start + 1, end - start - 1);
            return $"section {key} as {v}{(keepBody ? " (body kept)" : "")}";
        }
        if (y.Scalars.Count == 0) return null;
        var s = Pick(r, y.Scalars);
        string val = y.ValueOf(s);
        string nv = r.Next(4) switch
        {
            0 => "\"" + val + "\"",
            1 => "[" + val + ", " + val + "]",
            2 => "{ value: " + val + " }",
            _ => "'" + val + " mm'",
        };
        y.Replace(s, nv);
        return $"type {s.Key}={nv}";
    }

    private string? DeleteLine(Random r, YamlLines y)
    {
        if (y.KeyLines.Count == 0) return null;
        int li = Pick(r, y.KeyLines);
        string gone = y.Lines[li].Trim();
        y.Lines.RemoveAt(li);
        return $"delete-line '{Show(gone)}'";
    }

    private string? DuplicateLine(Random r, YamlLines y)
    {
        if (y.KeyLines.Count == 0) return null;
        int li = Pick(r, y.KeyLines);
        y.Lines.Insert(li + 1 + (r.Next(2) == 0 ? 0 : 0), y.Lines[li]);
        return $"duplicate-line '{Show(y.Lines[li].Trim())}'";
    }

    private string? DeleteSection(Random r, YamlLines y)
    {
        if (y.SectionStarts.Count == 0) return null;
        int h = Pick(r, y.SectionStarts);
        var (start, end) = y.SectionRange(h);
        string key = y.Lines[h].TrimEnd(':', ' ');
        y.Lines.RemoveRange(start, end - start);
        return $"delete-section {key}";
    }

    private string? DuplicateSection(Random r, YamlLines y)
    {
        if (y.SectionStarts.Count == 0) return null;
        int h = Pick(r, y.SectionStarts);
        var (start, end) = y.SectionRange(h);
        var body = y.Lines.GetRange(start, end - start);
        y.Lines.AddRange(body);
        return $"duplicate-section {y.Lines[h].TrimEnd(':', ' ')}";
    }

    private string? MoveSection(Random r, YamlLines y)
    {
        if (y.SectionStarts.Count < 2) return null;
        int h = Pick(r, y.SectionStarts);
        var (start, end) = y.SectionRange(h);
        var body = y.Lines.GetRange(start, end - start);
        y.Lines.RemoveRange(start, end - start);
        int to = r.Next(2) == 0 ? 0 : y.Lines.Count;
        if (to == 0)
        {
            // Keep the comment lines at the top in front.
            while (to < y.Lines.Count && y.Lines[to].StartsWith('#')) to++;
        }
        y.Lines.InsertRange(to, body);
        return $"move-section {body[0].TrimEnd(':', ' ')} to {(to == y.Lines.Count - body.Count ? "end" : "start")}";
    }

    private string? SwapEnum(Random r, YamlLines y)
    {
        var enums = y.Scalars.Select(s => (s, spec: _leaves.FirstOrDefault(l => l.Path == s.Key).Key))
            .Where(t => t.spec?.OneOf != null).ToList();
        if (enums.Count == 0) return null;
        var (span, spec) = Pick(r, enums);
        string v = Pick(r, spec!.OneOf!);
        y.Replace(span, v);
        return $"swap {span.Key}={v}";
    }

    private string? SpliceSection(Random r, YamlLines y)
    {
        // Replace (or add) one section with the same section of another seed: a shape or layout swap that keeps
        // the section self-consistent (e.g. arc magnets into a disc design).
        var other = new YamlLines(Pick(r, _seeds).Text);
        if (other.SectionStarts.Count == 0) return null;
        int oh = Pick(r, other.SectionStarts);
        var (os, oe) = other.SectionRange(oh);
        var body = other.Lines.GetRange(os, oe - os);
        string key = other.Lines[oh].TrimEnd(':', ' ');
        int h = y.FindSection(key);
        if (h >= 0)
        {
            var (s, e) = y.SectionRange(h);
            y.Lines.RemoveRange(s, e - s);
            y.Lines.InsertRange(s, body);
        }
        else y.Lines.AddRange(body);
        return $"splice-section {key}";
    }

    private string? AddKey(Random r, YamlLines y)
    {
        // A valid key path from the schema (present or not), or an unknown one, with a plausible value.
        if (y.SectionStarts.Count == 0) return null;
        if (r.Next(3) == 0)
        {
            int h = Pick(r, y.SectionStarts);
            string[] junk = ["colour: red", "pocket_clearence: 0.15", "extra: { a: 1 }", "thickness_mm: 5", "Thickness: 5", "\"quoted key\": 1", "? complex\n  : 1"];
            string add = Pick(r, junk);
            y.Lines.Insert(h + 1, "  " + add.Replace("\n", "\n  "));
            return $"unknown-key {y.Lines[h].TrimEnd(':', ' ')}.{Show(add)}";
        }
        var leaf = Pick(r, _leaves);
        var parts = leaf.Path.Split('.');
        string value = leaf.Key.OneOf != null ? Pick(r, leaf.Key.OneOf)
            : leaf.Key.Default is double d ? Num(d * (0.5 + r.NextDouble()))
            : leaf.Key.Default is int n ? (n + r.Next(-1, 3)).ToString(Inv)
            : leaf.Key.Range != null ? Num(Math.Round(leaf.Key.Range.Min + (Math.Min(leaf.Key.Range.Max, leaf.Key.Range.Min + 100) - leaf.Key.Range.Min) * r.NextDouble(), 3))
            : leaf.Key.Default?.ToString() ?? "1";
        if (parts.Length == 1) y.Lines.Add(parts[0] + ": " + value);
        else
        {
            int h = y.FindSection(parts[0]);
            string nested = parts.Length == 2 ? "  " + parts[1] + ": " + value : "  " + parts[1] + ": { " + string.Join(": { ", parts[2..]) + ": " + value + new string(' ', 1) + string.Concat(Enumerable.Repeat("} ", parts.Length - 2)).TrimEnd();
            if (h < 0) { y.Lines.Add(parts[0] + ":"); y.Lines.Add(nested); }
            else y.Lines.Insert(h + 1, nested);
        }
        return $"add-key {leaf.Path}={value}";
    }

    private string? Indentation(Random r, YamlLines y)
    {
        var nested = y.KeyLines.Where(i => y.Lines[i].StartsWith(' ')).ToList();
        if (nested.Count == 0) return null;
        int li = Pick(r, nested);
        string line = y.Lines[li];
        string t = line.TrimStart(' ');
        int ind = line.Length - t.Length;
        string nl = r.Next(4) switch
        {
            0 => "\t" + t,
            1 => new string(' ', ind + 1) + t,
            2 => new string(' ', Math.Max(0, ind - 1)) + t,
            _ => t,
        };
        y.Lines[li] = nl;
        return $"indent line {li + 1} '{Show(nl)}'";
    }

    private string? DeepNesting(Random r, YamlLines y)
    {
        int depth = Pick(r, new[] { 5, 33, 200, 5000, 100000 });
        string v;
        if (r.Next(2) == 0) v = new string('[', depth) + "1" + new string(']', depth);
        else v = string.Concat(Enumerable.Repeat("{a: ", depth)) + "1" + new string('}', depth);
        if (r.Next(3) == 0)
        {
            // Block-style nesting appended at the end.
            var sb = new StringBuilder();
            int d = Math.Min(depth, 2000);
            for (int i = 0; i < d; i++) sb.Append(new string(' ', i)).Append("k").Append(i.ToString(Inv)).Append(":\n");
            sb.Append(new string(' ', d)).Append("leaf");
            y.Lines.Add(sb.ToString());
            return $"deep-block {d}";
        }
        if (y.Scalars.Count == 0) return null;
        var s = Pick(r, y.Scalars);
        if (y.Lines[s.Line].AsSpan(s.Start + s.Length).Trim().Length > 0) v = new string('[', depth) + new string(']', depth);
        y.Replace(s, v);
        return $"deep-flow {s.Key} depth {depth}";
    }

    private string? Anchors(Random r, YamlLines y)
    {
        switch (r.Next(4))
        {
            case 0:
            {
                // Billion laughs: 10 levels of 10 aliases each, referenced from a real key or an unknown one.
                var sb = new StringBuilder();
                int levels = Pick(r, new[] { 3, 6, 10 });
                sb.Append("lol0: &l0 [\"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\"]\n");
                for (int i = 1; i < levels; i++)
                    sb.Append("lol").Append(i).Append(": &l").Append(i).Append(" [")
                      .Append(string.Join(", ", Enumerable.Repeat("*l" + (i - 1).ToString(Inv), 10))).Append("]\n");
                string bomb = sb.ToString().TrimEnd('\n');
                int at = y.Lines.FindIndex(l => l.StartsWith("name:", StringComparison.Ordinal));
                y.Lines.Insert(at < 0 ? 0 : at + 1, bomb);
                if (r.Next(2) == 0 && at >= 0) y.Lines[at] = "name: *l" + (levels - 1).ToString(Inv);
                return $"billion-laughs {levels}";
            }
            case 1:
            {
                // A legitimate anchor on one number, aliased into another key.
                var nums = y.Scalars.Where(s => s.IsNumber).ToList();
                if (nums.Count < 2) return null;
                var a = Pick(r, nums);
                var b = Pick(r, nums);
                if (a.Line == b.Line) return null;
                string av = y.ValueOf(a);
                y.Replace(b, "*x");
                y.Replace(a, "&x " + av);
                return $"alias {b.Key}=*{a.Key}";
            }
            case 2:
            {
                // A whole section aliased to another (merge-key and plain alias).
                if (y.SectionStarts.Count < 2) return null;
                int h1 = Pick(r, y.SectionStarts), h2 = Pick(r, y.SectionStarts);
                if (h1 == h2) return null;
                string k1 = y.Lines[h1].TrimEnd(':', ' '), k2 = y.Lines[h2].TrimEnd(':', ' ');
                y.Lines[h1] = k1 + ": &sec";
                var (s2, e2) = y.SectionRange(h2);
                if (h1 > h2) return null;
                bool merge = r.Next(2) == 0;
                y.Lines.RemoveRange(s2, e2 - s2);
                y.Lines.Insert(s2, merge ? k2 + ":\n  <<: *sec" : k2 + ": *sec");
                return $"section-alias {k2}={(merge ? "<<: " : "")}*{k1}";
            }
            default:
            {
                // Many aliases of one anchor (above the alias limit) or an undefined alias.
                int n = Pick(r, new[] { 10, 65, 1000 });
                var sb = new StringBuilder("junk: &j 1\nmany: [");
                sb.Append(string.Join(", ", Enumerable.Repeat("*j", n))).Append(']');
                if (r.Next(3) == 0) sb.Append("\nundefined: *nothere");
                y.Lines.Add(sb.ToString());
                return $"aliases x{n}";
            }
        }
    }

    private string? HostileName(Random r, YamlLines y)
    {
        int at = y.Lines.FindIndex(l => l.StartsWith("name:", StringComparison.Ordinal));
        if (at < 0) return null;
        string v = Pick(r, HostileNames);
        y.Lines[at] = "name: " + v;
        return $"name={Show(v)}";
    }

    private string? LongValue(Random r, YamlLines y)
    {
        if (y.Scalars.Count == 0) return null;
        var s = Pick(r, y.Scalars);
        int n = Pick(r, new[] { 300, 5000, 200000 });
        string v = r.Next(2) == 0 ? "1" + new string('0', n) : new string('9', 1) + "." + new string('9', n);
        if (r.Next(3) == 0) v = new string('z', n);
        y.Replace(s, v);
        return $"long {s.Key} ({n} chars)";
    }

    private string? DocumentLevel(Random r, YamlLines y)
    {
        switch (r.Next(6))
        {
            case 0: y.Lines.Add("---"); y.Lines.Add("name: second"); return "second-document";
            case 1: y.Lines.Insert(0, "%YAML 1.1\n---"); return "yaml-directive";
            case 2:
            {
                int i = y.Lines.FindIndex(l => l.StartsWith("partforge:", StringComparison.Ordinal));
                if (i < 0) return null;
                string v = Pick(r, new[] { "2", "0", "\"1\"", "1.0", "one", "" });
                y.Lines[i] = "partforge: " + v;
                return $"version={v}";
            }
            case 3:
            {
                for (int i = 0; i < y.Lines.Count; i++) y.Lines[i] += "\r";
                return "crlf";
            }
            case 4:
            {
                var body = string.Join('\n', y.Lines.Where(l => !l.StartsWith('#')));
                y.Lines.Clear();
                y.Lines.Add("- " + body.Replace("\n", "\n  "));
                return "root-as-list";
            }
            default:
            {
                y.Lines.Clear();
                y.Lines.Add(Pick(r, new[] { "", "   ", "# only a comment", "---", "~", "[]", "name", "partforge: 1" }));
                return "near-empty";
            }
        }
    }

    private static (byte[] Bytes, string What) ByteMutation(Random r, byte[] b)
    {
        switch (r.Next(5))
        {
            case 0:
            {
                int at = b.Length == 0 ? 0 : r.Next(b.Length);
                return (b[..at], $"truncate at byte {at}");
            }
            case 1:
            case 2:
            {
                byte[][] inserts =
                [
                    [0x00], [0xFF], [0xFE], [0xC3], [0x80], [0xED, 0xA0, 0x80], [0xF4, 0x90, 0x80, 0x80], [(byte)'\t'], [(byte)'\r'],
                    [0x1B, (byte)'[', (byte)'2', (byte)'J'], [0xEF, 0xBB, 0xBF], [0x7F], [0x0B], [0x0C], [0xE2, 0x80, 0xA8],
                    [(byte)r.Next(256), (byte)r.Next(256), (byte)r.Next(256), (byte)r.Next(256)],
                ];
                var ins = inserts[r.Next(inserts.Length)];
                int at = r.Next(b.Length + 1);
                var nb = new byte[b.Length + ins.Length];
                b.AsSpan(0, at).CopyTo(nb);
                ins.CopyTo(nb, at);
                b.AsSpan(at).CopyTo(nb.AsSpan(at + ins.Length));
                return (nb, $"insert bytes {Convert.ToHexString(ins)} at {at}");
            }
            case 3:
            {
                string kind = r.Next(3) switch { 0 => "utf8-bom", 1 => "utf16le-bom", _ => "utf16le" };
                byte[] nb = kind switch
                {
                    "utf8-bom" => [0xEF, 0xBB, 0xBF, .. b],
                    "utf16le-bom" => [0xFF, 0xFE, .. Encoding.Unicode.GetBytes(Encoding.UTF8.GetString(b))],
                    _ => Encoding.Unicode.GetBytes(Encoding.UTF8.GetString(b)),
                };
                return (nb, kind);
            }
            default:
            {
                int n = Math.Max(1, b.Length / 100);
                var nb = (byte[])b.Clone();
                for (int i = 0; i < n && nb.Length > 0; i++) nb[r.Next(nb.Length)] = (byte)r.Next(256);
                return (nb, $"flip {n} bytes");
            }
        }
    }

    private static string Show(string s)
    {
        var sb = new StringBuilder();
        foreach (char c in s.Length > 40 ? s[..40] + "..." : s)
            sb.Append(c < 0x20 || c == 0x7F ? $"\\x{(int)c:X2}" : c.ToString());
        return sb.ToString();
    }
}
