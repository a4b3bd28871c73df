namespace PartForge.Design.Loading;

/// <summary>State of one mapping run: errors and where each key path was found.</summary>
internal sealed class MapContext(string file)
{
    public string File { get; } = file;
    public List<DesignError> Errors { get; } = [];

    /// <summary>Key path -> the key's node (position of the key in the file).</summary>
    public Dictionary<string, YNode> Keys { get; } = new(StringComparer.Ordinal);

    /// <summary>Key path -> the value's node.</summary>
    public Dictionary<string, YNode> Values { get; } = new(StringComparer.Ordinal);

    /// <summary>True when the key is in the file (or an override) with a non-null value.</summary>
    public bool Has(string path) => Values.TryGetValue(path, out var v) && !(v is YScalar s && s.IsNull);

    public void Add(DesignError e) => Errors.Add(e);

    /// <summary>
    /// Key paths whose value did not map (wrong type, out of range, missing, or probably meant by an unknown key):
    /// the design image holds a default there, so a cross-key rule that reads one of them would judge a value the
    /// user did not write (<see cref="DesignRules"/> leaves such a rule's error out until the key is fixed).
    /// </summary>
    public HashSet<string> Failed { get; } = new(StringComparer.Ordinal);

    /// <summary>True when any of <paramref name="paths"/> is, contains or lies inside a key that failed to map.</summary>
    public bool TouchesFailed(IEnumerable<string> paths)
    {
        if (Failed.Count == 0) return false;
        foreach (var p in paths)
        {
            foreach (var f in Failed)
            {
                if (p == f || Within(p, f) || Within(f, p)) return true;
            }
        }
        return false;
    }

    private static bool Within(string inner, string outer) =>
        outer.Length == 0 || (inner.Length > outer.Length && inner[outer.Length] == '.' && inner.StartsWith(outer, StringComparison.Ordinal));

    /// <summary>
    /// An error located at a node. A key path or value with characters outside printable ASCII is shown with
    /// them as code points (<c>p\u043Eles</c>), and the suggestion starts by naming them.
    /// </summary>
    public DesignError At(YNode? node, string path, string message, string kind, string? value = null, string? allowed = null, string? suggestion = null) => new()
    {
        File = File,
        Line = node == null || node.FromOverride ? 0 : node.Line,
        Column = node == null || node.FromOverride ? 0 : node.Column,
        FromOverride = node?.FromOverride ?? false,
        KeyPath = HiddenCharacters.Reveal(path),
        Message = message, Kind = kind,
        Value = value == null ? null : HiddenCharacters.Reveal(value),
        Allowed = allowed,
        Suggestion = Join(Note("the key", path.Contains('.') ? path[(path.LastIndexOf('.') + 1)..] : path), value == null ? null : Note("the value", value), suggestion),
    };

    /// <summary>"the key contains U+043E CYRILLIC SMALL LETTER O where 'o' looks the same", or null for plain ASCII.</summary>
    public static string? Note(string what, string text) => HiddenCharacters.Describe(text) is { } d ? what + " " + d : null;

    /// <summary>The non-null parts joined with "; ", or null when there are none.</summary>
    public static string? Join(params string?[] parts)
    {
        var present = parts.Where(p => !string.IsNullOrEmpty(p)).ToArray();
        return present.Length == 0 ? null : string.Join("; ", present);
    }

    /// <summary>
    /// An error about a key path, placed at the first of the given paths (or their parents) that is in the file:
    /// the value node if it came from an override, else the key.
    /// </summary>
    public DesignError AtKey(string path, string message, string? value = null, string? allowed = null, string? suggestion = null, params string[] fallbacks)
    {
        foreach (var p in new[] { path }.Concat(fallbacks))
        {
            for (string q = p; q.Length > 0; q = q.Contains('.') ? q[..q.LastIndexOf('.')] : "")
            {
                if (Values.TryGetValue(q, out var v) && v.FromOverride) return At(v, path, message, "rule", value, allowed, suggestion);
                if (Keys.TryGetValue(q, out var k)) return At(k, path, message, "rule", value, allowed, suggestion);
            }
        }
        return new DesignError { File = File, Line = 1, Column = 1, KeyPath = path, Message = message, Kind = "rule", Value = value, Allowed = allowed, Suggestion = suggestion };
    }
}
