namespace PartForge.Export.Pipeline;

/// <summary>The words of <c>--formats</c> and <c>--parts</c>, and their parsing with the allowed list on error.</summary>
public static class ExportFormats
{
    /// <summary>Every export format, in the order outputs are written.</summary>
    public static readonly IReadOnlyList<string> All = ["stl", "3mf", "dxf", "svg", "json", "html", "csv", "png"];

    /// <summary>Every part name of the contract.</summary>
    public static readonly IReadOnlyList<string> PartNames = ["rotor", "rotor-front", "rotor-back", "back-iron", "former", "stator", "stator-front", "stator-back", "spacer"];

    /// <summary>Parses a comma-separated list against allowed words; null list = all. Problems are one line each.</summary>
    public static IReadOnlySet<string>? ParseList(string? list, IReadOnlyList<string> allowed, string option, List<string> problems)
    {
        if (list == null) return null;
        var set = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var raw in list.Split(',', StringSplitOptions.TrimEntries))
        {
            if (raw.Length == 0) continue;
            string w = raw.ToLowerInvariant();
            if (allowed.Contains(w)) set.Add(w);
            else problems.Add($"{option}: '{raw}' is not allowed; allowed: {string.Join(", ", allowed)}");
        }
        if (set.Count == 0 && problems.Count == 0) problems.Add($"{option}: the list is empty; allowed: {string.Join(", ", allowed)}");
        return set;
    }
}
