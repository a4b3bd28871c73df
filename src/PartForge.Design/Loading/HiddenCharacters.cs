using System.Globalization;
using System.Text;

namespace PartForge.Design.Loading;

/// <summary>
/// Makes characters a reader cannot see, or cannot tell from plain ASCII, visible in a message. Every key and
/// every word of a design file is plain ASCII, so anything else in a key or a value is shown as its code point
/// (<c>p\u043Eles</c>) and named: <c>contains U+043E CYRILLIC SMALL LETTER O where 'o' looks the same</c>.
/// </summary>
internal static class HiddenCharacters
{
    /// <summary>What a character is called and which ASCII character it passes for (null: it is invisible).</summary>
    private readonly record struct LookAlike(string Name, char? LooksLike);

    // The common confusables and invisible characters. Names as in the Unicode Character Database (from
    // memory); a character not listed here is still shown by its code point, with its general category.
    private static readonly Dictionary<int, LookAlike> Table = new()
    {
        // Spaces other than U+0020 and invisible format characters
        [0x00A0] = new("NO-BREAK SPACE", ' '),
        [0x2002] = new("EN SPACE", ' '),
        [0x2003] = new("EM SPACE", ' '),
        [0x2007] = new("FIGURE SPACE", ' '),
        [0x2009] = new("THIN SPACE", ' '),
        [0x200A] = new("HAIR SPACE", ' '),
        [0x202F] = new("NARROW NO-BREAK SPACE", ' '),
        [0x3000] = new("IDEOGRAPHIC SPACE", ' '),
        [0x00AD] = new("SOFT HYPHEN", null),
        [0x200B] = new("ZERO WIDTH SPACE", null),
        [0x200C] = new("ZERO WIDTH NON-JOINER", null),
        [0x200D] = new("ZERO WIDTH JOINER", null),
        [0x200E] = new("LEFT-TO-RIGHT MARK", null),
        [0x200F] = new("RIGHT-TO-LEFT MARK", null),
        [0x202A] = new("LEFT-TO-RIGHT EMBEDDING", null),
        [0x202B] = new("RIGHT-TO-LEFT EMBEDDING", null),
        [0x202C] = new("POP DIRECTIONAL FORMATTING", null),
        [0x202D] = new("LEFT-TO-RIGHT OVERRIDE", null),
        [0x202E] = new("RIGHT-TO-LEFT OVERRIDE", null),
        [0x2060] = new("WORD JOINER", null),
        [0x2066] = new("LEFT-TO-RIGHT ISOLATE", null),
        [0x2067] = new("RIGHT-TO-LEFT ISOLATE", null),
        [0x2068] = new("FIRST STRONG ISOLATE", null),
        [0x2069] = new("POP DIRECTIONAL ISOLATE", null),
        [0xFEFF] = new("ZERO WIDTH NO-BREAK SPACE, the byte-order mark", null),
        // Dashes, quotes and signs
        [0x2010] = new("HYPHEN", '-'),
        [0x2011] = new("NON-BREAKING HYPHEN", '-'),
        [0x2012] = new("FIGURE DASH", '-'),
        [0x2013] = new("EN DASH", '-'),
        [0x2014] = new("EM DASH", '-'),
        [0x2212] = new("MINUS SIGN", '-'),
        [0x2018] = new("LEFT SINGLE QUOTATION MARK", '\''),
        [0x2019] = new("RIGHT SINGLE QUOTATION MARK", '\''),
        [0x201C] = new("LEFT DOUBLE QUOTATION MARK", '"'),
        [0x201D] = new("RIGHT DOUBLE QUOTATION MARK", '"'),
        [0x2024] = new("ONE DOT LEADER", '.'),
        [0x00B7] = new("MIDDLE DOT", '.'),
        [0x00D7] = new("MULTIPLICATION SIGN", 'x'),
        [0x2044] = new("FRACTION SLASH", '/'),
        [0x0131] = new("LATIN SMALL LETTER DOTLESS I", 'i'),
        // Cyrillic letters drawn like Latin ones
        [0x0430] = new("CYRILLIC SMALL LETTER A", 'a'),
        [0x0435] = new("CYRILLIC SMALL LETTER IE", 'e'),
        [0x043E] = new("CYRILLIC SMALL LETTER O", 'o'),
        [0x0440] = new("CYRILLIC SMALL LETTER ER", 'p'),
        [0x0441] = new("CYRILLIC SMALL LETTER ES", 'c'),
        [0x0443] = new("CYRILLIC SMALL LETTER U", 'y'),
        [0x0445] = new("CYRILLIC SMALL LETTER HA", 'x'),
        [0x0456] = new("CYRILLIC SMALL LETTER BYELORUSSIAN-UKRAINIAN I", 'i'),
        [0x0458] = new("CYRILLIC SMALL LETTER JE", 'j'),
        [0x0455] = new("CYRILLIC SMALL LETTER DZE", 's'),
        [0x0501] = new("CYRILLIC SMALL LETTER KOMI DE", 'd'),
        [0x051B] = new("CYRILLIC SMALL LETTER QA", 'q'),
        [0x051D] = new("CYRILLIC SMALL LETTER WE", 'w'),
        [0x0410] = new("CYRILLIC CAPITAL LETTER A", 'A'),
        [0x0412] = new("CYRILLIC CAPITAL LETTER VE", 'B'),
        [0x0415] = new("CYRILLIC CAPITAL LETTER IE", 'E'),
        [0x041A] = new("CYRILLIC CAPITAL LETTER KA", 'K'),
        [0x041C] = new("CYRILLIC CAPITAL LETTER EM", 'M'),
        [0x041D] = new("CYRILLIC CAPITAL LETTER EN", 'H'),
        [0x041E] = new("CYRILLIC CAPITAL LETTER O", 'O'),
        [0x0420] = new("CYRILLIC CAPITAL LETTER ER", 'P'),
        [0x0421] = new("CYRILLIC CAPITAL LETTER ES", 'C'),
        [0x0422] = new("CYRILLIC CAPITAL LETTER TE", 'T'),
        [0x0425] = new("CYRILLIC CAPITAL LETTER HA", 'X'),
        // Greek letters drawn like Latin ones
        [0x03BF] = new("GREEK SMALL LETTER OMICRON", 'o'),
        [0x03B1] = new("GREEK SMALL LETTER ALPHA", 'a'),
        [0x03BD] = new("GREEK SMALL LETTER NU", 'v'),
        [0x03C1] = new("GREEK SMALL LETTER RHO", 'p'),
        [0x03B9] = new("GREEK SMALL LETTER IOTA", 'i'),
        [0x03BA] = new("GREEK SMALL LETTER KAPPA", 'k'),
        [0x03C4] = new("GREEK SMALL LETTER TAU", 't'),
        [0x0391] = new("GREEK CAPITAL LETTER ALPHA", 'A'),
        [0x0392] = new("GREEK CAPITAL LETTER BETA", 'B'),
        [0x0395] = new("GREEK CAPITAL LETTER EPSILON", 'E'),
        [0x0397] = new("GREEK CAPITAL LETTER ETA", 'H'),
        [0x0399] = new("GREEK CAPITAL LETTER IOTA", 'I'),
        [0x039A] = new("GREEK CAPITAL LETTER KAPPA", 'K'),
        [0x039C] = new("GREEK CAPITAL LETTER MU", 'M'),
        [0x039D] = new("GREEK CAPITAL LETTER NU", 'N'),
        [0x039F] = new("GREEK CAPITAL LETTER OMICRON", 'O'),
        [0x03A1] = new("GREEK CAPITAL LETTER RHO", 'P'),
        [0x03A4] = new("GREEK CAPITAL LETTER TAU", 'T'),
        [0x03A7] = new("GREEK CAPITAL LETTER CHI", 'X'),
    };

    /// <summary>True when the text has a character outside printable ASCII (U+0020 to U+007E).</summary>
    public static bool Any(string text)
    {
        foreach (char c in text) if (c is < ' ' or > '~') return true;
        return false;
    }

    /// <summary>The text with every character outside printable ASCII written as \uXXXX (\UXXXXXXXX beyond the BMP).</summary>
    public static string Reveal(string text)
    {
        if (!Any(text)) return text;
        var sb = new StringBuilder(text.Length + 16);
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (c is >= ' ' and <= '~') { sb.Append(c); continue; }
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                sb.Append("\\U").Append(char.ConvertToUtf32(c, text[++i]).ToString("X8", CultureInfo.InvariantCulture));
                continue;
            }
            sb.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
        }
        return sb.ToString();
    }

    /// <summary>
    /// What the hidden characters of <paramref name="text"/> are, e.g. "contains U+043E CYRILLIC SMALL LETTER O
    /// where 'o' looks the same", or null when it is plain ASCII. At most three distinct characters are named.
    /// </summary>
    public static string? Describe(string text)
    {
        if (!Any(text)) return null;
        var seen = new List<int>();
        for (int i = 0; i < text.Length && seen.Count < 4; i++)
        {
            int cp = text[i];
            if (char.IsHighSurrogate(text[i]) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1])) cp = char.ConvertToUtf32(text[i], text[++i]);
            if (cp is >= ' ' and <= '~' || seen.Contains(cp)) continue;
            seen.Add(cp);
        }
        var parts = seen.Take(3).Select(Name).ToList();
        if (seen.Count > 3) parts.Add("more");
        return "contains " + string.Join(", ", parts);
    }

    /// <summary>"U+00A0 NO-BREAK SPACE where ' ' looks the same", "U+200B ZERO WIDTH SPACE (invisible)", ...</summary>
    public static string Name(int codePoint)
    {
        string cp = "U+" + codePoint.ToString(codePoint > 0xFFFF ? "X6" : "X4", CultureInfo.InvariantCulture);
        if (Table.TryGetValue(codePoint, out var a))
            return a.LooksLike is { } l ? $"{cp} {a.Name} where '{l}' looks the same" : $"{cp} {a.Name} (invisible)";
        if (codePoint is >= 0xFF01 and <= 0xFF5E)
            return $"{cp} a full-width form where '{(char)(codePoint - 0xFF01 + 0x21)}' looks the same";
        if (codePoint < 0x20 || codePoint == 0x7F) return $"{cp} a control character";
        var category = codePoint <= 0xFFFF ? CharUnicodeInfo.GetUnicodeCategory((char)codePoint) : CharUnicodeInfo.GetUnicodeCategory(codePoint);
        return category switch
        {
            UnicodeCategory.Format => $"{cp} an invisible formatting character",
            UnicodeCategory.SpaceSeparator => $"{cp} a space other than the plain space",
            UnicodeCategory.LineSeparator or UnicodeCategory.ParagraphSeparator => $"{cp} a line separator",
            _ => $"{cp} (not plain ASCII; keys and words of a design file are)",
        };
    }

    /// <summary>
    /// The ASCII text a reader would take <paramref name="text"/> for: look-alikes replaced by the character they
    /// pass for, invisible characters dropped, other characters kept. Used to find the key that was meant.
    /// </summary>
    public static string Skeleton(string text)
    {
        if (!Any(text)) return text;
        var sb = new StringBuilder(text.Length);
        foreach (char c in text)
        {
            if (c is >= ' ' and <= '~') sb.Append(c);
            else if (Table.TryGetValue(c, out var a)) { if (a.LooksLike is { } l) sb.Append(l); }
            else if (c is >= '\uFF01' and <= '\uFF5E') sb.Append((char)(c - 0xFF01 + 0x21));
            else if (CharUnicodeInfo.GetUnicodeCategory(c) == UnicodeCategory.Format) { }
            else sb.Append(c);
        }
        return sb.ToString();
    }
}
