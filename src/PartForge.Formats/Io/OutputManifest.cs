using System.Globalization;
using System.Text.Json;

namespace PartForge.Formats.Io;

/// <summary>
/// The list of files that make one complete output set, written last into the folder as
/// <c>&lt;design&gt;-manifest.json</c>. A set is complete when its manifest exists and every file it lists
/// has the listed size and SHA-256 (<see cref="OutputSetCheck"/>). The bytes are deterministic: keys in a
/// fixed order, files sorted by name (ordinal), invariant numbers, LF line ends, no time stamps; so the same
/// outputs of the same design and program always give the same manifest.
/// <code>
/// {
///   "format": "partforge-output-manifest",
///   "version": 1,
///   "tool_version": "0.9.0",
///   "design": "crank-bench",
///   "design_sha256": "…64 hex…",
///   "files": [
///     { "name": "crank-bench-rotor.stl", "size": 123484, "sha256": "…64 hex…" }
///   ]
/// }
/// </code>
/// </summary>
public sealed class OutputManifest
{
    /// <summary>The value of the "format" key, so that a reader can tell this file from any other JSON.</summary>
    public const string FormatName = "partforge-output-manifest";

    /// <summary>The manifest layout version written and read.</summary>
    public const int FormatVersion = 1;

    /// <summary>The end of a manifest's file name.</summary>
    public const string FileSuffix = "-manifest.json";

    public required string DesignName { get; init; }
    public required string ToolVersion { get; init; }
    public required string DesignSha256 { get; init; }

    /// <summary>The files of the set, sorted by name (ordinal).</summary>
    public required IReadOnlyList<ManifestEntry> Files { get; init; }

    /// <summary>The manifest's file name for a design: <c>&lt;design&gt;-manifest.json</c>.</summary>
    public static string FileNameFor(string designName) => designName + FileSuffix;

    /// <summary>A manifest for the given files (sorted here, so the caller's order does not matter).</summary>
    public static OutputManifest Of(ManifestInfo info, IEnumerable<ManifestEntry> files) => new()
    {
        DesignName = info.DesignName,
        ToolVersion = info.ToolVersion,
        DesignSha256 = info.DesignSha256,
        Files = files.OrderBy(f => f.Name, StringComparer.Ordinal).ToArray(),
    };

    /// <summary>The manifest as UTF-8 JSON, byte-identical for equal manifests.</summary>
    public byte[] ToUtf8()
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true, NewLine = "\n", IndentSize = 2 }))
        {
            w.WriteStartObject();
            w.WriteString("format", FormatName);
            w.WriteNumber("version", FormatVersion);
            w.WriteString("tool_version", ToolVersion);
            w.WriteString("design", DesignName);
            w.WriteString("design_sha256", DesignSha256);
            w.WriteStartArray("files");
            foreach (var f in Files.OrderBy(f => f.Name, StringComparer.Ordinal))
            {
                w.WriteStartObject();
                w.WriteString("name", f.Name);
                w.WriteNumber("size", f.SizeBytes);
                w.WriteString("sha256", f.Sha256);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        ms.WriteByte((byte)'\n');
        return ms.ToArray();
    }

    /// <summary>Reads a manifest; <see cref="FormatException"/> (one line) when the bytes are not one.</summary>
    public static OutputManifest Parse(ReadOnlySpan<byte> utf8)
    {
        JsonDocument doc;
        try
        {
            doc = JsonDocument.Parse(utf8.ToArray(), new JsonDocumentOptions { MaxDepth = 8 });
        }
        catch (JsonException ex)
        {
            throw new FormatException("is not JSON (" + ex.Message.ReplaceLineEndings(" ") + ")", ex);
        }
        using (doc)
        {
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object || Text(root, "format") != FormatName)
                throw new FormatException($"is not an output manifest (no \"format\": \"{FormatName}\")");
            if (!root.TryGetProperty("version", out var v) || v.ValueKind != JsonValueKind.Number || !v.TryGetInt32(out int version) || version != FormatVersion)
                throw new FormatException($"has a manifest version this program does not read (it reads version {FormatVersion})");
            if (!root.TryGetProperty("files", out var files) || files.ValueKind != JsonValueKind.Array)
                throw new FormatException("has no \"files\" list");
            var entries = new List<ManifestEntry>();
            foreach (var f in files.EnumerateArray())
            {
                if (f.ValueKind != JsonValueKind.Object || !f.TryGetProperty("size", out var size) || size.ValueKind != JsonValueKind.Number || !size.TryGetInt64(out long bytes) || bytes < 0)
                    throw new FormatException($"has a file entry without a size (entry {(entries.Count + 1).ToString(CultureInfo.InvariantCulture)})");
                string name = Text(f, "name") ?? throw new FormatException($"has a file entry without a name (entry {(entries.Count + 1).ToString(CultureInfo.InvariantCulture)})");
                if (name.Length == 0 || name != Path.GetFileName(name) || name is "." or ".." || name.Contains('/') || name.Contains('\\'))
                    throw new FormatException($"lists '{name}', which is not a plain file name");
                string sha = Text(f, "sha256") ?? throw new FormatException($"has no sha256 for {name}");
                entries.Add(new ManifestEntry(name, bytes, sha));
            }
            return new OutputManifest
            {
                DesignName = Text(root, "design") ?? "",
                ToolVersion = Text(root, "tool_version") ?? "",
                DesignSha256 = Text(root, "design_sha256") ?? "",
                Files = entries.OrderBy(e => e.Name, StringComparer.Ordinal).ToArray(),
            };
        }
    }

    private static string? Text(JsonElement e, string key) =>
        e.TryGetProperty(key, out var v) && v.ValueKind == JsonValueKind.String ? v.GetString() : null;
}
