using System.Text;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// What one build leaves for the next in a long-running session (<c>partforge watch</c>): each part's solid and
/// mesh under its <see cref="PartModel.GeometryKey"/>, and each preview picture under the keys of the meshes it
/// draws (and, for the assembly, every copy's placement). A part whose exact layers did not change keeps its mesh
/// and its preview; anything else is made again. Meshes and pictures are pure functions of those keys, so a
/// cached build writes the same bytes as a fresh one. Thread-safe; only the last build's entries are kept.
/// </summary>
public sealed class BuildCache
{
    private readonly object _gate = new();
    private Dictionary<string, PartModel> _parts = new(StringComparer.Ordinal);
    private Dictionary<string, byte[]> _previews = new(StringComparer.Ordinal);
    private readonly Dictionary<string, byte[]> _previewsNow = new(StringComparer.Ordinal);

    /// <summary>Parts reused by the last <see cref="Reuse"/> (their names), for the session's log and the tests.</summary>
    public IReadOnlyList<string> LastReusedParts { get; private set; } = [];

    /// <summary>Previews reused by the last build.</summary>
    public int LastReusedPreviews { get; private set; }

    /// <summary>The parts with every unchanged part's solid and mesh taken from the previous build.</summary>
    public PartSet Reuse(PartSet parts)
    {
        ArgumentNullException.ThrowIfNull(parts);
        lock (_gate)
        {
            var reused = new List<string>();
            var list = parts.Parts.Select(p =>
            {
                if (_parts.TryGetValue(p.GeometryKey, out var earlier)) { reused.Add(p.Name); return p.ReusingMeshOf(earlier); }
                return p;
            }).ToArray();
            _parts = list.ToDictionary(p => p.GeometryKey, StringComparer.Ordinal);
            LastReusedParts = reused;
            _previews = new Dictionary<string, byte[]>(_previewsNow, StringComparer.Ordinal);
            _previewsNow.Clear();
            LastReusedPreviews = 0;
            return parts with { Parts = list };
        }
    }

    /// <summary>The preview under its key, made by <paramref name="render"/> only when the last build had none.</summary>
    public byte[] Preview(string key, Func<byte[]> render)
    {
        ArgumentNullException.ThrowIfNull(render);
        byte[]? png;
        lock (_gate)
        {
            if (_previews.TryGetValue(key, out png)) { _previewsNow[key] = png; LastReusedPreviews++; return png; }
        }
        png = render();
        lock (_gate) _previewsNow[key] = png;
        return png;
    }

    /// <summary>The key of a part's own preview.</summary>
    public static string PartPreviewKey(PartModel part) => "part|" + part.GeometryKey;

    /// <summary>The key of the assembly preview: every part's key and every copy's placement.</summary>
    public static string AssemblyPreviewKey(PartSet set)
    {
        var sb = new StringBuilder("assembly|").Append(set.ExplodeMm.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        foreach (var p in set.Parts)
        {
            sb.Append('#').Append(p.GeometryKey);
            foreach (var i in p.Instances) sb.Append('@').Append(i.ToString());
        }
        return sb.ToString();
    }
}
