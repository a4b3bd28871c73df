using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace PartForge.Design.Loading;

/// <summary>
/// Reads design text into a <see cref="YMapping"/> straight from YamlDotNet's parser events, without its
/// representation model: the tree is built with an explicit stack (no recursion, whatever the input), and the
/// nesting, node-count and alias limits are enforced while the events stream in, so a hostile file fails
/// before any large structure is built.
/// <para>
/// Aliases are resolved here and shared, never copied. An alias to a node that is still open (<c>a: &amp;x [*x]</c>)
/// would make a cycle and is refused at the alias; so is an alias whose value, put in its place, would nest
/// deeper than <see cref="LoadLimits.MaxDepth"/> or repeat more than <see cref="LoadLimits.MaxNodes"/> values.
/// So the tree handed on is finite, acyclic and shallow, and any walk over it ends.
/// </para>
/// <para>
/// Line breaks are normalised first (CR LF and a lone CR become LF), so a file reads the same, with the same
/// line numbers in every message, whichever line ends it was saved with.
/// </para>
/// </summary>
internal static class YamlReader
{
    private const string EmptyMessage = "the file is empty; a design needs at least 'partforge: 1' and 'name'";

    public static YMapping? Read(string text, string file, List<DesignError> errors)
    {
        text = NormalizeLineBreaks(text);
        if (IsBlank(text))
        {
            errors.Add(new DesignError { File = file, Message = EmptyMessage, Kind = "empty" });
            return null;
        }
        int nul = text.IndexOf('\0');
        if (nul >= 0)
        {
            var (l, c) = LineColumn(text, nul);
            errors.Add(new DesignError { File = file, Line = l, Column = c, Message = "the file contains a NUL byte; it is not a text file", Kind = "bytes" });
            return null;
        }
        var builder = new TreeBuilder();
        var parser = new Parser(new StringReader(text));
        try
        {
            while (parser.MoveNext())
            {
                if (!builder.Accept(parser.Current!)) break;
            }
        }
        catch (Refused ex)
        {
            errors.Add(new DesignError { File = file, Line = ex.Line, Column = ex.Column, Message = ex.Message, Kind = ex.Kind });
            return null;
        }
        catch (YamlException ex)
        {
            // YamlDotNet's marks are 1-based (line 1, column 1 is the first character). An exception's Start is
            // where the token being scanned began, which for a tab in the next line's indentation is the value
            // at the end of the line above: the diagnosis finds the character that is really at fault.
            var d = SyntaxDiagnosis.Explain(text, ex.Message, Mark(ex.Start), Mark(ex.End));
            errors.Add(new DesignError { File = file, Line = d.Line, Column = d.Column, Message = d.Message, Kind = "syntax" });
            return null;
        }
        catch (Exception ex) when (ex is InvalidOperationException or ArgumentException or IndexOutOfRangeException or FormatException or OverflowException)
        {
            // The YAML scanner occasionally fails with a non-YAML exception on malformed input (an unclosed
            // flow collection at the end of the file, for one); diagnose from the last position it reached.
            var at = (builder.LastLine, builder.LastColumn);
            var d = SyntaxDiagnosis.Explain(text, "", at, at);
            errors.Add(new DesignError { File = file, Line = d.Line, Column = d.Column, Message = d.Message, Kind = "syntax" });
            return null;
        }
        if (builder.SecondDocument is { } second)
        {
            errors.Add(new DesignError { File = file, Line = second.Line, Column = second.Column, Message = "only one YAML document is allowed in a design file (remove the second '---')", Kind = "syntax" });
            return null;
        }
        if (builder.Root == null)
        {
            errors.Add(new DesignError { File = file, Message = EmptyMessage, Kind = "empty" });
            return null;
        }
        if (builder.Root is not YMapping map)
        {
            errors.Add(new DesignError
            {
                File = file, Line = builder.Root.Line, Column = builder.Root.Column,
                Message = "a design file is a mapping of keys ('key: value' lines), starting with 'partforge: 1'", Kind = "type",
            });
            return null;
        }
        return map;
    }

    /// <summary>CR LF and lone CR become LF; nothing else changes (columns stay the same).</summary>
    internal static string NormalizeLineBreaks(string text) =>
        text.Contains('\r') ? text.Replace("\r\n", "\n", StringComparison.Ordinal).Replace('\r', '\n') : text;

    private static (int Line, int Column) Mark(Mark m) => ((int)Math.Clamp(m.Line, 1, int.MaxValue), (int)Math.Clamp(m.Column, 1, int.MaxValue));

    private static bool IsBlank(string text)
    {
        foreach (var raw in text.Split('\n'))
        {
            var line = raw.Trim().TrimStart('\uFEFF');
            if (line.Length == 0 || line.StartsWith('#') || line == "---" || line == "...") continue;
            return false;
        }
        return true;
    }

    private static (int Line, int Column) LineColumn(string text, int index)
    {
        int line = 1, col = 1;
        for (int i = 0; i < index; i++)
        {
            if (text[i] == '\n') { line++; col = 1; }
            else col++;
        }
        return (line, col);
    }

    /// <summary>A limit or alias problem found while reading; reported at its place, reading stops.</summary>
    private sealed class Refused(string message, string kind, int line, int column) : Exception(message)
    {
        public string Kind { get; } = kind;
        public int Line { get; } = line;
        public int Column { get; } = column;
    }

    /// <summary>An anchor (&amp;name) as the reader met it: open while its node is being read, then the node.</summary>
    private sealed class Anchor(int line, int column)
    {
        public int Line { get; } = line;
        public int Column { get; } = column;
        public YNode? Node { get; set; }

        /// <summary>Nesting levels of the node (a scalar 0, a list of scalars 1, ...).</summary>
        public int Height { get; set; }

        /// <summary>Values in the node with every alias inside it counted in full.</summary>
        public long Size { get; set; }
    }

    /// <summary>A mapping or sequence whose end has not been read yet.</summary>
    private sealed class Frame(bool mapping, int line, int column, Anchor? anchor)
    {
        public bool Mapping { get; } = mapping;
        public int Line { get; } = line;
        public int Column { get; } = column;
        public Anchor? Anchor { get; } = anchor;
        public List<YNode> Items { get; } = [];
        public int Height { get; set; } = 1;
        public long Size { get; set; } = 1;
    }

    /// <summary>Builds the tree from events with an explicit stack, enforcing every limit as it goes.</summary>
    private sealed class TreeBuilder
    {
        private readonly Stack<Frame> _open = new();
        private readonly Dictionary<string, Anchor> _anchors = new(StringComparer.Ordinal);
        private int _documents, _events, _aliases;
        private long _expanded;

        public YNode? Root { get; private set; }
        public (int Line, int Column)? SecondDocument { get; private set; }
        public int LastLine { get; private set; } = 1;
        public int LastColumn { get; private set; } = 1;

        /// <summary>Takes one event; false when reading should stop (a second document began).</summary>
        public bool Accept(ParsingEvent e)
        {
            LastLine = (int)Math.Clamp(e.End.Line, 1, int.MaxValue);
            LastColumn = (int)Math.Clamp(e.End.Column, 1, int.MaxValue);
            int line = (int)e.Start.Line, col = (int)e.Start.Column;
            switch (e)
            {
                case DocumentStart:
                    if (++_documents > 1)
                    {
                        SecondDocument = (line, col);
                        return false;
                    }
                    return true;
                case Scalar s:
                {
                    Count(e);
                    var anchor = Define(s.Anchor, line, col);
                    bool quoted = s.Style is ScalarStyle.SingleQuoted or ScalarStyle.DoubleQuoted or ScalarStyle.Literal or ScalarStyle.Folded
                                  || (!s.Tag.IsEmpty && !s.Tag.IsNonSpecific && s.Tag.Value == "tag:yaml.org,2002:str");
                    var node = new YScalar(s.Value ?? "", quoted, line, col);
                    if (anchor != null) { anchor.Node = node; anchor.Height = 0; anchor.Size = 1; }
                    Add(node, 0, 1);
                    return true;
                }
                case MappingStart or SequenceStart:
                {
                    if (_open.Count + 1 > LoadLimits.MaxDepth)
                        throw new Refused($"sections are nested more than {LoadLimits.MaxDepth} deep; a design file is at most 3 deep", "limit", line, col);
                    Count(e);
                    var anchor = Define(((NodeEvent)e).Anchor, line, col);
                    _open.Push(new Frame(e is MappingStart, line, col, anchor));
                    return true;
                }
                case MappingEnd or SequenceEnd:
                {
                    var f = _open.Pop();
                    YNode node = f.Mapping
                        ? new YMapping(Pairs(f.Items), f.Line, f.Column)
                        : new YSequence(f.Items.ToArray(), f.Line, f.Column);
                    if (f.Anchor != null) { f.Anchor.Node = node; f.Anchor.Height = f.Height; f.Anchor.Size = f.Size; }
                    Add(node, f.Height, f.Size);
                    return true;
                }
                case AnchorAlias a:
                {
                    if (++_aliases > LoadLimits.MaxAliases)
                        throw new Refused($"more than {LoadLimits.MaxAliases} alias references (*name); write the values out", "limit", line, col);
                    Count(e);
                    string name = a.Value.Value;
                    if (!_anchors.TryGetValue(name, out var target))
                        throw new Refused($"the alias *{name} has no anchor &{name} before it; define '&{name}' on an earlier value or write the value out", "alias", line, col);
                    if (target.Node == null)
                        throw new Refused($"the alias *{name} is inside the value it refers to (&{name} on line {target.Line}), so it would repeat without end; write the value out instead", "alias", line, col);
                    if (_open.Count + target.Height > LoadLimits.MaxDepth)
                        throw new Refused($"the alias *{name} puts sections more than {LoadLimits.MaxDepth} deep; a design file is at most 3 deep", "limit", line, col);
                    _expanded += target.Size - 1; // the alias event itself was counted once
                    if (_events + _expanded > LoadLimits.MaxNodes)
                        throw new Refused($"aliases repeat values to more than {LoadLimits.MaxNodes} in all; a design file has about 120; write the values out", "limit", line, col);
                    Add(target.Node, target.Height, target.Size);
                    return true;
                }
                default:
                    return true;
            }
        }

        private void Count(ParsingEvent e)
        {
            if (++_events + _expanded > LoadLimits.MaxNodes)
                throw new Refused($"more than {LoadLimits.MaxNodes} YAML values; a design file has about 120", "limit", (int)e.Start.Line, (int)e.Start.Column);
        }

        private Anchor? Define(AnchorName name, int line, int col)
        {
            if (name.IsEmpty) return null;
            // A later anchor of the same name replaces the earlier one for the aliases after it (YAML 1.2, 3.2.2.2).
            var a = new Anchor(line, col);
            _anchors[name.Value] = a;
            return a;
        }

        private void Add(YNode node, int height, long size)
        {
            if (_open.Count == 0)
            {
                Root ??= node;
                return;
            }
            var f = _open.Peek();
            f.Items.Add(node);
            f.Height = Math.Max(f.Height, height + 1);
            f.Size = Math.Min(f.Size + size, long.MaxValue / 2);
        }

        private static YEntry[] Pairs(List<YNode> items)
        {
            var entries = new YEntry[items.Count / 2];
            for (int i = 0; i < entries.Length; i++) entries[i] = new YEntry(items[2 * i], items[2 * i + 1]);
            return entries;
        }
    }
}
