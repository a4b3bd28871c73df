namespace PartForge.Design.Loading;

/// <summary>
/// One problem with a design file, with where it is and what would be allowed. <see cref="ToString"/> gives the
/// one line the command line prints, e.g.
/// <c>crank.yaml:14:9: rotor.pocket_clearance: -0.2 is not allowed; allowed: 0 to 5 mm</c>.
/// </summary>
public sealed record DesignError
{
    /// <summary>File name as given by the caller (not resolved).</summary>
    public required string File { get; init; }

    /// <summary>1-based line; 0 when the problem is not at a place in the file (missing file, override).</summary>
    public int Line { get; init; }

    /// <summary>1-based column; 0 when Line is 0.</summary>
    public int Column { get; init; }

    /// <summary>Dotted key path such as <c>rotor.bolt_circle.hole</c>; empty for file-level problems.</summary>
    public string KeyPath { get; init; } = "";

    /// <summary>The offending value as written, or null.</summary>
    public string? Value { get; init; }

    /// <summary>What is allowed, in words, or null.</summary>
    public string? Allowed { get; init; }

    /// <summary>The nearest valid key or another concrete fix, or null.</summary>
    public string? Suggestion { get; init; }

    /// <summary>The problem in words, without location, value or allowed text (e.g. "is not allowed").</summary>
    public required string Message { get; init; }

    /// <summary>The value came from an override (a sweep's --vary), not from the file.</summary>
    public bool FromOverride { get; init; }

    /// <summary>Short machine-readable kind, e.g. "range", "unknown-key", "type", "syntax", "rule".</summary>
    public string Kind { get; init; } = "rule";

    public override string ToString()
    {
        var sb = new System.Text.StringBuilder();
        sb.Append(File);
        if (Line > 0) sb.Append(':').Append(Line).Append(':').Append(Column);
        sb.Append(": ");
        if (KeyPath.Length > 0)
        {
            sb.Append(KeyPath);
            if (FromOverride) sb.Append(" (override)");
            sb.Append(": ");
        }
        if (Value != null) sb.Append(Clip(Value, MaxValueChars)).Append(' ');
        sb.Append(Message);
        if (Allowed != null) sb.Append("; allowed: ").Append(Allowed);
        if (Suggestion != null) sb.Append("; ").Append(Suggestion);
        return Printable(Clip(sb.ToString(), MaxLineChars));
    }

    /// <summary>Longest value echoed in a message; a longer one is cut with an ellipsis.</summary>
    public const int MaxValueChars = 80;

    /// <summary>Longest message line; one problem stays one readable line even for a hostile file.</summary>
    public const int MaxLineChars = 1000;

    private static string Clip(string s, int max) => s.Length <= max ? s : s[..(max - 3)] + "...";

    /// <summary>Control characters from the file are shown as \xNN so that a message is always one clean line.</summary>
    private static string Printable(string s)
    {
        if (!s.Any(c => char.IsControl(c))) return s;
        var sb = new System.Text.StringBuilder(s.Length + 8);
        foreach (char c in s)
            if (char.IsControl(c)) sb.Append("\\x").Append(((int)c).ToString("x2", System.Globalization.CultureInfo.InvariantCulture));
            else sb.Append(c);
        return sb.ToString();
    }
}
