namespace PartForge.Design.Loading;

// The loader's own immutable copy of a YAML document: positions kept, aliases resolved (shared, never
// copied), plus a flag for values that came from an override. Immutable so that one parsed file can be
// re-mapped for many sweep variants in parallel.

internal abstract record YNode(int Line, int Column)
{
    /// <summary>The node was created by an override, not read from the file.</summary>
    public bool FromOverride { get; init; }
}

internal sealed record YScalar(string Text, bool Quoted, int Line, int Column) : YNode(Line, Column)
{
    /// <summary>An unquoted empty, ~ or null scalar (YAML 1.2 core schema null).</summary>
    public bool IsNull => !Quoted && Text is "" or "~" or "null" or "Null" or "NULL";

    /// <summary>The text as a user would recognise it in a message.</summary>
    public string Shown => Quoted ? "'" + Text + "'" : Text.Length == 0 ? "(empty)" : Text;
}

internal sealed record YSequence(IReadOnlyList<YNode> Items, int Line, int Column) : YNode(Line, Column);

internal sealed record YEntry(YNode Key, YNode Value);

internal sealed record YMapping(IReadOnlyList<YEntry> Entries, int Line, int Column) : YNode(Line, Column);
