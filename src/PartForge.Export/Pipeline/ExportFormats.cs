using PartForge.Design.Parts;
using PartForge.Export.Exporters;

namespace PartForge.Export.Pipeline;

/// <summary>Parsing of <c>--formats</c> and <c>--parts</c> against their allowed words, with the allowed list on error.</summary>
public static class ExportFormats
{
    /// <summary>Every export format's word, in the order outputs are written.</summary>
    public static IReadOnlyList<string> All => ExportRegistry.Names;

    /// <summary>Every word <c>--parts</c> takes: the contract's part names and the spacer alias.</summary>
    public static IReadOnlyList<string> PartNames => Design.Parts.PartNames.All;

    /// <summary>The formats a <c>--formats</c> list names; null list = all.</summary>
    public static IReadOnlyCollection<ExportFormat>? ParseFormats(string? list, List<string> problems) =>
        ParseList(list, All, "--formats", problems)?.Select(w => ExportRegistry.Find(w)!).ToArray();

    /// <summary>The parts a <c>--parts</c> list names (the spacer alias names every spacer role); null list = all.</summary>
    public static IReadOnlySet<PartId>? ParseParts(string? list, List<string> problems) =>
        ParseList(list, PartNames, "--parts", problems)?.SelectMany(Design.Parts.PartNames.Select).ToHashSet();

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
