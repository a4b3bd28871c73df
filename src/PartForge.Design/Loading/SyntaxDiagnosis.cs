using System.Text.RegularExpressions;

namespace PartForge.Design.Loading;

/// <summary>
/// Turns a YAML parser failure into our own one-line message at the character that is at fault, naming the
/// likely cause and what to do: a tab used for indentation, a hidden or look-alike space, an unclosed quote,
/// an unclosed bracket or brace, a missing space after ':', indentation that matches no section, a value with
/// ': ' in it. The parser's own wording is not shown: it names its internal state, not the mistake, and its
/// position is where the token being scanned began (for a tab, the value at the end of the line before).
/// </summary>
internal static partial class SyntaxDiagnosis
{
    /// <summary>Where the fault is (1-based) and the message.</summary>
    internal readonly record struct Finding(int Line, int Column, string Message);

    private const string Prefix = "YAML syntax error: ";

    /// <param name="text">The design text with LF line breaks.</param>
    /// <param name="parserMessage">The parser's message ("" when it failed with a non-YAML exception).</param>
    /// <param name="start">The parser's start mark (1-based line and column).</param>
    /// <param name="end">The parser's end mark.</param>
    public static Finding Explain(string text, string parserMessage, (int Line, int Column) start, (int Line, int Column) end)
    {
        var lines = text.Split('\n');
        int first = Math.Clamp(start.Line, 1, lines.Length);
        int last = Math.Clamp(Math.Max(end.Line, start.Line), 1, lines.Length);
        string m = parserMessage;
        bool aboutTab = m.Contains("tab", StringComparison.OrdinalIgnoreCase);

        if (Tab(lines, first, last, aboutTab) is { } tab)
            return new(tab.Line, tab.Column, Prefix + "a tab is used for indentation; YAML indents with spaces only: replace the tab with spaces");
        if (HiddenSpace(lines, first, last) is { } hidden)
            return new(hidden.Line, hidden.Column, Prefix + $"the line contains {HiddenCharacters.Name(hidden.CodePoint)}; replace it with a plain space or delete it");
        if (m.Contains("quoted scalar", StringComparison.OrdinalIgnoreCase) && OpenQuote(lines, start) is { } q)
        {
            string inside = q.Quote == '\'' ? "write a ' inside '...' as ''" : "write a \" inside \"...\" as \\\"";
            return new(q.Line, q.Column, Prefix + $"the quoted value that starts here has no closing {q.Quote}; close it on the same line ({inside})");
        }
        bool aboutFlow = m.Length == 0 || m.Contains("flow", StringComparison.OrdinalIgnoreCase)
                         || m.Contains("',' or ']'", StringComparison.Ordinal) || m.Contains("',' or '}'", StringComparison.Ordinal);
        if (aboutFlow && Flow(lines) is { } flow) return flow;
        if (MissingSpace(lines, first, last) is { } colon) return colon;
        if (Indentation(lines, first) is { } indent) return indent;
        if (Flow(lines) is { } anyFlow) return anyFlow;
        var at = m.Length == 0 ? end : start;
        return new(Math.Clamp(at.Line, 1, lines.Length), Math.Max(1, at.Column),
            Prefix + "this cannot be read as YAML; check the indentation (spaces only), the quotes and the brackets on this line and the one above");
    }

    /// <summary>The first tab in the indentation of lines first..last; failing that, when the parser spoke of a tab, any tab there or the first indenting tab in the file.</summary>
    private static (int Line, int Column)? Tab(string[] lines, int first, int last, bool aboutTab)
    {
        for (int l = first; l <= last; l++)
            if (IndentTab(lines[l - 1]) is { } c) return (l, c);
        if (!aboutTab) return null;
        for (int l = first; l <= last; l++)
        {
            int i = lines[l - 1].IndexOf('\t');
            if (i >= 0) return (l, i + 1);
        }
        // The parser may place a tab complaint at the start of the enclosing mapping: take the first indenting tab anywhere.
        for (int l = 1; l <= lines.Length; l++)
            if (IndentTab(lines[l - 1]) is { } c) return (l, c);
        return null;
    }

    private static int? IndentTab(string line)
    {
        for (int i = 0; i < line.Length && line[i] is ' ' or '\t'; i++)
            if (line[i] == '\t') return i + 1;
        return null;
    }

    /// <summary>A space-like or invisible character other than the plain space on lines first..last.</summary>
    private static (int Line, int Column, int CodePoint)? HiddenSpace(string[] lines, int first, int last)
    {
        for (int l = first; l <= last; l++)
        {
            string s = lines[l - 1];
            for (int i = 0; i < s.Length; i++)
            {
                char c = s[i];
                if (c <= '~') continue;
                var cat = char.GetUnicodeCategory(c);
                if (cat is System.Globalization.UnicodeCategory.SpaceSeparator or System.Globalization.UnicodeCategory.Format) return (l, i + 1, c);
            }
        }
        return null;
    }

    /// <summary>The quote that opens the unclosed quoted value: at the parser's start mark, or the first quote on that line after it.</summary>
    private static (int Line, int Column, char Quote)? OpenQuote(string[] lines, (int Line, int Column) start)
    {
        if (start.Line < 1 || start.Line > lines.Length) return null;
        string s = lines[start.Line - 1];
        for (int i = Math.Max(0, start.Column - 1); i < s.Length; i++)
            if (s[i] is '\'' or '"') return (start.Line, i + 1, s[i]);
        return null;
    }

    /// <summary>
    /// An unclosed or mismatched '[' / '{' anywhere in the file. A bracket opens a flow collection where a value
    /// starts (line start, after ': ', '- ', '? ') or inside another one; quoted text and comments are skipped.
    /// </summary>
    private static Finding? Flow(string[] lines)
    {
        var open = new Stack<(char Ch, int Line, int Column)>();
        char quote = '\0';
        int quoteLine = 0, quoteCol = 0;
        for (int l = 1; l <= lines.Length; l++)
        {
            string s = lines[l - 1];
            char lastSignificant = '\0';
            for (int i = 0; i < s.Length; i++)
            {
                char c = s[i];
                if (quote != '\0')
                {
                    if (quote == '\'' && c == '\'' && i + 1 < s.Length && s[i + 1] == '\'') { i++; continue; }
                    if (quote == '"' && c == '\\') { i++; continue; }
                    if (c == quote) { quote = '\0'; lastSignificant = c; }
                    continue;
                }
                if (c is ' ' or '\t') continue;
                if (c == '#' && (i == 0 || s[i - 1] is ' ' or '\t')) break;
                bool valueStart = open.Count > 0 ? lastSignificant is '\0' or '[' or '{' or ',' or ':' or '?'
                                                 : lastSignificant is '\0' or ':' or '-' or '?';
                if (c is '\'' or '"' && valueStart)
                {
                    quote = c; quoteLine = l; quoteCol = i + 1;
                    continue;
                }
                if (c is '[' or '{' && (open.Count > 0 || valueStart)) open.Push((c, l, i + 1));
                else if (c is ']' or '}' && open.Count > 0)
                {
                    var top = open.Pop();
                    char want = top.Ch == '[' ? ']' : '}';
                    if (c != want)
                        return new(l, i + 1, Prefix + $"this '{c}' does not close the '{top.Ch}' opened on line {top.Line}; close that one with '{want}' first");
                }
                lastSignificant = c;
            }
        }
        if (open.Count > 0)
        {
            var top = open.Peek();
            char want = top.Ch == '[' ? ']' : '}';
            string what = top.Ch == '[' ? "list" : "section";
            return new(top.Line, top.Column, Prefix + $"the '{top.Ch}' opened here is not closed; add the '{want}' at the end of the {what}, before the next key");
        }
        if (quote != '\0')
            return new(quoteLine, quoteCol, Prefix + $"the quoted value that starts here has no closing {quote}; close it on the same line");
        return null;
    }

    [GeneratedRegex(@"^(?<lead>[ ]*(?:-[ ]+)*)(?<key>[A-Za-z_][A-Za-z0-9_]*):(?<rest>[^\s:/\\].*)$", RegexOptions.CultureInvariant)]
    private static partial Regex KeyWithoutSpace();

    /// <summary>"key:value" (no space after the colon) on lines first..last or on the content line before them.</summary>
    private static Finding? MissingSpace(string[] lines, int first, int last)
    {
        var candidates = Enumerable.Range(first, last - first + 1).ToList();
        if (PreviousContent(lines, first) is { } p) candidates.Add(p);
        foreach (int l in candidates)
        {
            string s = StripComment(lines[l - 1]).TrimEnd();
            var match = KeyWithoutSpace().Match(s);
            if (!match.Success) continue;
            string key = match.Groups["key"].Value, rest = match.Groups["rest"].Value.Trim();
            int col = match.Groups["rest"].Index + 1;
            return new(l, col, Prefix + $"a space is missing after '{key}:'; write '{key}: {rest}' (without it, '{key}:{rest}' is read as one word, not a key and a value)");
        }
        return null;
    }

    /// <summary>A line indented more than the one above it (which does not open a section), or to a column no section above uses; or a value with ': ' in it.</summary>
    private static Finding? Indentation(string[] lines, int line)
    {
        if (line < 1 || line > lines.Length) return null;
        string s = lines[line - 1];
        if (IsBlankOrComment(s)) return null;
        int ind = Indent(s);
        if (PreviousContent(lines, line) is { } p)
        {
            string prev = StripComment(lines[p - 1]).TrimEnd();
            int pind = Indent(prev);
            bool opens = prev.EndsWith(':') || prev.TrimStart().StartsWith('-') || prev.EndsWith('|') || prev.EndsWith('>') || prev.EndsWith('[') || prev.EndsWith('{') || prev.EndsWith(',');
            if (ind > pind && !opens)
                return new(line, ind + 1, Prefix + $"this line is indented more than the line above ({ind} spaces, the line above {pind}), which does not open a section; give the keys of one section the same indentation");
            var used = new SortedSet<int>();
            int min = int.MaxValue;
            for (int q = p; q >= 1; q--)
            {
                string t = lines[q - 1];
                if (IsBlankOrComment(t)) continue;
                int qi = Indent(t);
                if (qi < min || used.Count == 0)
                {
                    used.Add(qi);
                    if (t.TrimStart().StartsWith("- ", StringComparison.Ordinal)) used.Add(qi + 2);
                    min = Math.Min(min, qi);
                }
            }
            if (!used.Contains(ind) && !(ind > pind && opens))
                return new(line, ind + 1, Prefix + $"this line is indented {ind} space{(ind == 1 ? "" : "s")}, which matches no section above (keys above start after {string.Join(" or ", used)} spaces); indent it like the other keys of its section");
        }
        string body = StripComment(s);
        int firstColon = ColonSpace(body, 0);
        if (firstColon >= 0)
        {
            int second = ColonSpace(body, firstColon + 1);
            if (second >= 0)
                return new(line, second + 1, Prefix + "the value contains ': ', which YAML reads as another key; put the value in quotes");
        }
        else if (!body.TrimStart().StartsWith('-'))
            return new(line, ind + 1, Prefix + "this line is not 'key: value'; add ': ' after the key, or remove the line");
        return null;
    }

    /// <summary>Index of the next ':' followed by a space or the line end, outside quotes; -1 if none.</summary>
    private static int ColonSpace(string s, int from)
    {
        char quote = '\0';
        for (int i = from; i < s.Length; i++)
        {
            char c = s[i];
            if (quote != '\0') { if (c == quote) quote = '\0'; continue; }
            if (c is '\'' or '"' && (i == 0 || s[i - 1] == ' ')) { quote = c; continue; }
            if (c == ':' && (i + 1 == s.Length || s[i + 1] == ' ')) return i;
        }
        return -1;
    }

    private static int? PreviousContent(string[] lines, int line)
    {
        for (int q = line - 1; q >= 1; q--)
            if (!IsBlankOrComment(lines[q - 1])) return q;
        return null;
    }

    private static bool IsBlankOrComment(string s)
    {
        string t = s.Trim();
        return t.Length == 0 || t.StartsWith('#') || t == "---" || t == "...";
    }

    private static int Indent(string s)
    {
        int i = 0;
        while (i < s.Length && s[i] == ' ') i++;
        return i;
    }

    /// <summary>The line without a trailing comment (a '#' after a space, outside quotes).</summary>
    private static string StripComment(string s)
    {
        char quote = '\0';
        for (int i = 0; i < s.Length; i++)
        {
            char c = s[i];
            if (quote != '\0') { if (c == quote) quote = '\0'; continue; }
            if (c is '\'' or '"' && (i == 0 || s[i - 1] is ' ' or '[' or '{' or ',')) { quote = c; continue; }
            if (c == '#' && (i == 0 || s[i - 1] is ' ' or '\t')) return s[..i];
        }
        return s;
    }
}
