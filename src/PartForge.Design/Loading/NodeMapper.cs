using System.Globalization;
using System.Reflection;
using PartForge.Design.Model;
using PartForge.Design.Keys;

namespace PartForge.Design.Loading;

/// <summary>
/// Maps a YAML mapping onto a model class by reflection over its <see cref="SectionSpec"/>: every key checked
/// for existence, type, range, word list and pattern; every problem recorded, none thrown.
/// </summary>
internal static class NodeMapper
{
    public static object MapSection(SectionSpec spec, YMapping map, string prefix, MapContext ctx)
    {
        var instance = spec.CreateDefault();
        var seen = new Dictionary<string, YNode>(StringComparer.Ordinal);
        foreach (var entry in map.Entries)
        {
            if (entry.Key is not YScalar ks || ks.IsNull)
            {
                ctx.Failed.Add(prefix);
                ctx.Add(ctx.At(entry.Key, prefix, "a key must be a plain word such as 'poles'", "type"));
                continue;
            }
            string key = ks.Text;
            string path = prefix.Length == 0 ? key : prefix + "." + key;
            if (seen.TryGetValue(key, out var first))
            {
                ctx.Add(ctx.At(ks, path, $"is given twice (first on line {first.Line}, again on line {ks.Line})", "duplicate", suggestion: "keep one"));
                // The second value is not used, but its own mistakes are reported too, so that removing either
                // copy leaves no surprise; its keys are not recorded (the first copy's are).
                if (spec.Find(key) is { } again)
                {
                    var scratch = new MapContext(ctx.File);
                    TryValue(again, entry.Value, path, scratch, out _);
                    foreach (var e in scratch.Errors) ctx.Add(e);
                }
                continue;
            }
            seen[key] = ks;
            var spec1 = spec.Find(key);
            if (spec1 == null)
            {
                // The key it was probably meant as holds its default: a rule reading that key waits for the fix.
                ctx.Failed.Add(path);
                if (KeySuggester.Nearest(key, spec.Keys.Select(k => k.Key)) is { } meant)
                    ctx.Failed.Add(prefix.Length == 0 ? meant : prefix + "." + meant);
                ctx.Add(ctx.At(ks, path, "is not a known key", "unknown-key",
                    allowed: "keys here: " + string.Join(", ", spec.Keys.Select(k => k.Key)),
                    suggestion: KeySuggester.ForKey(key, spec, prefix)));
                continue;
            }
            ctx.Keys[path] = ks;
            ctx.Values[path] = entry.Value;
            if (!TryValue(spec1, entry.Value, path, ctx, out var value)) ctx.Failed.Add(path);
            else if (value != null) spec1.Property.SetValue(instance, value);
        }
        foreach (var k in spec.Keys)
        {
            if (k.IsRequired && !seen.ContainsKey(k.Key))
            {
                string path = prefix.Length == 0 ? k.Key : prefix + "." + k.Key;
                ctx.Failed.Add(path);
                ctx.Add(ctx.At(map, path, "is missing; it is required", "missing", allowed: k.AllowedText()));
            }
        }
        return instance;
    }

    /// <summary>Converts one value; false (with an error recorded) when it is not allowed. Null value = leave the default.</summary>
    private static bool TryValue(KeySpec k, YNode node, string path, MapContext ctx, out object? value)
    {
        value = null;
        if (k.Kind == ValueKind.Section)
        {
            switch (node)
            {
                case YMapping m:
                    value = MapSection(k.Section!, m, path, ctx);
                    return true;
                case YScalar s when s.IsNull:
                    // "back_iron:" with nothing: an optional section stays absent; a section with defaults keeps them.
                    return true;
                default:
                    ctx.Add(ctx.At(node, path, $"{Describe(node)} is not allowed here", "type", allowed: "a section of keys (indented 'key: value' lines or { key: value })",
                        suggestion: MapContext.Join(node is YScalar hs ? MapContext.Note("the value", hs.Text) : null, MissingSpaceHint(node))));
                    return false;
            }
        }
        if (node is not YScalar sc)
        {
            ctx.Add(ctx.At(node, path, $"{Describe(node)} is not allowed here", "type", allowed: k.AllowedText()));
            return false;
        }
        if (sc.IsNull)
        {
            if (k.IsOptional) return true;
            ctx.Add(ctx.At(sc, path, "needs a value", "missing", allowed: k.AllowedText()));
            return false;
        }
        switch (k.Kind)
        {
            case ValueKind.Integer:
            {
                if (sc.Quoted || !TryNumber(sc.Text, out double d))
                {
                    ctx.Add(ctx.At(sc, path, sc.Quoted ? "is text, not a number (leave out the quotes)" : "is not a number", "type", sc.Shown, k.AllowedText()));
                    return false;
                }
                if (double.IsFinite(d) && d != Math.Floor(d))
                {
                    ctx.Add(ctx.At(sc, path, "is not a whole number", "type", sc.Shown, k.AllowedText()));
                    return false;
                }
                if (!k.InRange(d) || d is > int.MaxValue or < int.MinValue)
                {
                    ctx.Add(ctx.At(sc, path, double.IsFinite(d) ? "is not allowed" : "is not a finite number", "range", sc.Shown, k.AllowedText()));
                    return false;
                }
                int i = (int)d;
                if (k.OneOf != null && !k.OneOf.Contains(i.ToString(CultureInfo.InvariantCulture)))
                {
                    ctx.Add(ctx.At(sc, path, "is not allowed", "range", sc.Shown, k.AllowedText()));
                    return false;
                }
                value = i;
                return true;
            }
            case ValueKind.Number:
            {
                if (sc.Quoted || !TryNumber(sc.Text, out double d))
                {
                    ctx.Add(ctx.At(sc, path, sc.Quoted ? "is text, not a number (leave out the quotes)" : "is not a number", "type", sc.Shown, k.AllowedText()));
                    return false;
                }
                if (!k.InRange(d))
                {
                    ctx.Add(ctx.At(sc, path, double.IsFinite(d) ? "is not allowed" : "is not a finite number", "range", sc.Shown, k.AllowedText()));
                    return false;
                }
                value = d;
                return true;
            }
            case ValueKind.Boolean:
            {
                if (!sc.Quoted && sc.Text is "true" or "True" or "TRUE") { value = true; return true; }
                if (!sc.Quoted && sc.Text is "false" or "False" or "FALSE") { value = false; return true; }
                ctx.Add(ctx.At(sc, path, "is not true or false", "type", sc.Shown, k.AllowedText()));
                return false;
            }
            default:
            {
                string text = sc.Text;
                if (k.OneOf != null && !k.OneOf.Contains(text, StringComparer.Ordinal))
                {
                    var near = k.OneOf.FirstOrDefault(w => string.Equals(w, text, StringComparison.OrdinalIgnoreCase))
                               ?? KeySuggester.Nearest(text, k.OneOf);
                    ctx.Add(ctx.At(sc, path, "is not allowed", "range", sc.Shown, k.AllowedText(), near == null ? null : $"did you mean '{near}'?"));
                    return false;
                }
                if (k.Pattern != null && !k.Pattern.IsMatch(text))
                {
                    ctx.Add(ctx.At(sc, path, "is not allowed", "pattern", sc.Shown, k.AllowedText()));
                    return false;
                }
                if (k.Property.GetCustomAttribute<OutputNameAttribute>() != null)
                {
                    if (text.Length > OutputNameAttribute.MaxLength)
                    {
                        ctx.Add(ctx.At(sc, path, $"is {text.Length} characters long; output file names are made from it, so it may have at most {OutputNameAttribute.MaxLength}",
                            "range", sc.Shown, k.AllowedText(), "shorten it"));
                        return false;
                    }
                    if (OutputNameAttribute.IsReserved(text))
                    {
                        ctx.Add(ctx.At(sc, path, $"is a device name on Windows, where a file '{text}.3mf' cannot be made", "range", sc.Shown, k.AllowedText(),
                            $"choose another name, for example '{text}-1'"));
                        return false;
                    }
                }
                value = text;
                return true;
            }
        }
    }

    /// <summary>Parses a YAML 1.2 core-schema number (also .nan/.inf, which the ranges then refuse).</summary>
    public static bool TryNumber(string text, out double value)
    {
        switch (text)
        {
            case ".nan" or ".NaN" or ".NAN" or "nan" or "NaN" or "NAN":
                value = double.NaN; return true;
            case ".inf" or ".Inf" or ".INF" or "+.inf" or "+.Inf" or "+.INF" or "inf" or "Infinity" or "+inf":
                value = double.PositiveInfinity; return true;
            case "-.inf" or "-.Inf" or "-.INF" or "-inf" or "-Infinity":
                value = double.NegativeInfinity; return true;
        }
        if (text.Length == 0 || text.Length > 64 || text.Any(ch => !(char.IsAsciiDigit(ch) || ch is '.' or '-' or '+' or 'e' or 'E')))
        {
            value = 0;
            return false;
        }
        return double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value);
    }

    /// <summary>"poles:12" where a section was expected: the space after the colon is missing (or is not a plain space).</summary>
    private static string? MissingSpaceHint(YNode node)
    {
        if (node is not YScalar { Quoted: false } s) return null;
        int colon = s.Text.IndexOf(':');
        if (colon <= 0 || colon + 1 >= s.Text.Length || s.Text[colon + 1] == ' ') return null;
        string key = s.Text[..colon], rest = s.Text[(colon + 1)..].TrimStart(' ', '\u00A0', '\u2007', '\u202F', '\t');
        if (!key.All(ch => char.IsAsciiLetterOrDigit(ch) || ch == '_')) return null;
        return $"if '{key}' is meant as a key, put a plain space after its ':' ({key}: {HiddenCharacters.Reveal(rest)})";
    }

    private static string Describe(YNode node) => node switch
    {
        YMapping => "a section",
        YSequence => "a list",
        YScalar s => HiddenCharacters.Reveal(s.Shown),
        _ => "this value",
    };
}
