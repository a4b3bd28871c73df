using PartForge.Design.Keys;

namespace PartForge.Design.Loading;

/// <summary>Nearest valid word by Damerau-Levenshtein distance (optimal string alignment variant).</summary>
public static class KeySuggester
{
    /// <summary>Edit distance counting insertions, deletions, substitutions and transpositions of neighbours.</summary>
    public static int Distance(string a, string b)
    {
        int n = a.Length, m = b.Length;
        var d = new int[n + 1, m + 1];
        for (int i = 0; i <= n; i++) d[i, 0] = i;
        for (int j = 0; j <= m; j++) d[0, j] = j;
        for (int i = 1; i <= n; i++)
        {
            for (int j = 1; j <= m; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                int v = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1]) v = Math.Min(v, d[i - 2, j - 2] + 1);
                d[i, j] = v;
            }
        }
        return d[n, m];
    }

    /// <summary>
    /// The candidate nearest to <paramref name="word"/>, or null when none is plausibly meant (distance more
    /// than half the word's length, at least 2). Ties go to the earlier candidate. Look-alike characters count
    /// as the letter they pass for and invisible ones are ignored (Cyrillic 'о' in "pоles" finds "poles").
    /// </summary>
    public static string? Nearest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        int bestD = int.MaxValue;
        word = HiddenCharacters.Skeleton(word);
        string w = word.ToLowerInvariant();
        foreach (var c in candidates)
        {
            int dist = Distance(w, c.ToLowerInvariant());
            if (dist < bestD) { bestD = dist; best = c; }
        }
        int limit = Math.Max(2, word.Length / 2);
        return bestD <= limit ? best : null;
    }

    /// <summary>Suggestion text for an unknown key in a section (also finds a key that belongs to another section).</summary>
    internal static string? ForKey(string key, SectionSpec section, string prefix)
    {
        key = HiddenCharacters.Skeleton(key);
        var near = Nearest(key, section.Keys.Select(k => k.Key));
        if (near != null) return $"did you mean '{near}'?";
        if (prefix.Length == 0 || section == SectionSpec.Root)
        {
            var elsewhere = SectionSpec.Root.LeafPaths().Select(p => p.Path)
                .FirstOrDefault(p => p.EndsWith("." + key, StringComparison.Ordinal) && p.Count(ch => ch == '.') >= 1);
            if (elsewhere != null) return $"did you mean '{elsewhere}'? (it belongs in the {elsewhere[..elsewhere.LastIndexOf('.')]} section)";
        }
        return null;
    }
}
