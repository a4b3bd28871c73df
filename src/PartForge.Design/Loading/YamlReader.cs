using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using YamlDotNet.RepresentationModel;

namespace PartForge.Design.Loading;

/// <summary>
/// Reads design text into a <see cref="YMapping"/> with YamlDotNet's representation model, behind a parser
/// that enforces the nesting, alias and node-count limits while the events stream in (so a hostile file fails
/// before any large structure is built).
/// </summary>
internal static class YamlReader
{
    public static YMapping? Read(string text, string file, List<DesignError> errors)
    {
        if (IsBlank(text))
        {
            errors.Add(new DesignError { File = file, Message = "the file is empty; a design needs at least 'partforge: 1' and 'name'", Kind = "empty" });
            return null;
        }
        int nul = text.IndexOf('\0');
        if (nul >= 0)
        {
            var (l, c) = LineColumn(text, nul);
            errors.Add(new DesignError { File = file, Line = l, Column = c, Message = "the file contains a NUL byte; it is not a text file", Kind = "bytes" });
            return null;
        }
        var stream = new YamlStream();
        var guarded = new GuardedParser(new Parser(new StringReader(text)));
        try
        {
            stream.Load(guarded);
        }
        catch (LimitExceeded ex)
        {
            errors.Add(new DesignError { File = file, Line = ex.Line, Column = ex.Column, Message = ex.Message, Kind = "limit" });
            return null;
        }
        catch (YamlException ex)
        {
            bool dup = ex.Message.Contains("Duplicate key", StringComparison.Ordinal);
            errors.Add(new DesignError
            {
                File = file, Line = (int)Math.Max(1, ex.Start.Line), Column = (int)Math.Max(1, ex.Start.Column),
                Message = dup ? "this key is given twice in the same section; keep one" : "YAML syntax error: " + OneLine(ex.Message),
                Kind = dup ? "duplicate" : "syntax",
            });
            return null;
        }
        catch (Exception ex) when (ex is InvalidOperationException or ArgumentException or IndexOutOfRangeException or FormatException or OverflowException)
        {
            // The YAML scanner occasionally fails with a non-YAML exception on malformed input; report it as
            // a syntax error at the last position it reached.
            errors.Add(new DesignError
            {
                File = file, Line = Math.Max(1, guarded.LastLine), Column = Math.Max(1, guarded.LastColumn),
                Message = "YAML syntax error after this point (the text cannot be read as YAML)", Kind = "syntax",
            });
            return null;
        }
        if (stream.Documents.Count == 0)
        {
            errors.Add(new DesignError { File = file, Message = "the file is empty; a design needs at least 'partforge: 1' and 'name'", Kind = "empty" });
            return null;
        }
        if (stream.Documents.Count > 1)
        {
            var second = stream.Documents[1].RootNode;
            errors.Add(new DesignError { File = file, Line = (int)second.Start.Line, Column = (int)second.Start.Column, Message = "only one YAML document is allowed in a design file (remove the second '---')", Kind = "syntax" });
            return null;
        }
        var root = stream.Documents[0].RootNode;
        var memo = new Dictionary<YamlNode, YNode>(ReferenceEqualityComparer.Instance);
        var converted = Convert(root, memo);
        if (converted is not YMapping map)
        {
            errors.Add(new DesignError
            {
                File = file, Line = converted.Line, Column = converted.Column,
                Message = "a design file is a mapping of keys ('key: value' lines), starting with 'partforge: 1'", Kind = "type",
            });
            return null;
        }
        return map;
    }

    private static YNode Convert(YamlNode node, Dictionary<YamlNode, YNode> memo)
    {
        if (memo.TryGetValue(node, out var done)) return done;
        int line = (int)node.Start.Line, col = (int)node.Start.Column;
        YNode result = node switch
        {
            YamlScalarNode s => new YScalar(s.Value ?? "", s.Style is ScalarStyle.SingleQuoted or ScalarStyle.DoubleQuoted or ScalarStyle.Literal or ScalarStyle.Folded
                                                             || (!s.Tag.IsEmpty && !s.Tag.IsNonSpecific && s.Tag.Value == "tag:yaml.org,2002:str"), line, col),
            YamlSequenceNode q => new YSequence(q.Children.Select(c => Convert(c, memo)).ToArray(), line, col),
            YamlMappingNode m => new YMapping(m.Children.Select(kv => new YEntry(Convert(kv.Key, memo), Convert(kv.Value, memo))).ToArray(), line, col),
            _ => new YScalar("", false, line, col),
        };
        memo[node] = result;
        return result;
    }

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

    private static string OneLine(string s)
    {
        // YamlDotNet messages start with "(Line: 3, Col: 5, Idx: ..) - (...): "; the location is ours to print.
        int i = s.IndexOf("): ", StringComparison.Ordinal);
        if (s.StartsWith("(Line", StringComparison.Ordinal) && i > 0) s = s[(i + 3)..];
        return string.Join(' ', s.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries)).Trim();
    }

    private sealed class LimitExceeded(string message, int line, int column) : Exception(message)
    {
        public int Line { get; } = line;
        public int Column { get; } = column;
    }

    /// <summary>Counts nesting depth, nodes and aliases as events arrive; throws past the limits.</summary>
    private sealed class GuardedParser(IParser inner) : IParser
    {
        private int _depth, _nodes, _aliases;

        public ParsingEvent? Current => inner.Current;

        public int LastLine { get; private set; }
        public int LastColumn { get; private set; }

        public bool MoveNext()
        {
            if (!inner.MoveNext()) return false;
            var e = inner.Current!;
            LastLine = (int)e.End.Line;
            LastColumn = (int)e.End.Column;
            switch (e)
            {
                case MappingStart or SequenceStart:
                    if (++_depth > LoadLimits.MaxDepth)
                        throw Limit(e, $"sections are nested more than {LoadLimits.MaxDepth} deep; a design file is at most 3 deep");
                    Count(e);
                    break;
                case MappingEnd or SequenceEnd:
                    _depth--;
                    break;
                case Scalar:
                    Count(e);
                    break;
                case AnchorAlias:
                    if (++_aliases > LoadLimits.MaxAliases)
                        throw Limit(e, $"more than {LoadLimits.MaxAliases} alias references (*name); write the values out");
                    Count(e);
                    break;
            }
            return true;
        }

        private void Count(ParsingEvent e)
        {
            if (++_nodes > LoadLimits.MaxNodes)
                throw Limit(e, $"more than {LoadLimits.MaxNodes} YAML values; a design file has about 120");
        }

        private static LimitExceeded Limit(ParsingEvent e, string message) => new(message, (int)e.Start.Line, (int)e.Start.Column);
    }
}
