using System.Security.Cryptography;

namespace PartForge.Formats.Io;

/// <summary>
/// What a manifest says about where its set came from: the design name (its file is
/// <c>&lt;DesignName&gt;-manifest.json</c>), the version of the program that wrote it, and the SHA-256 of
/// the design file's bytes (lowercase hex).
/// </summary>
public sealed record ManifestInfo
{
    public required string DesignName { get; init; }
    public required string ToolVersion { get; init; }
    public required string DesignSha256 { get; init; }

    /// <summary>The info for a design file given as its bytes, exactly as read from disk.</summary>
    public static ManifestInfo For(string designName, string toolVersion, ReadOnlySpan<byte> designFileBytes) => new()
    {
        DesignName = designName,
        ToolVersion = toolVersion,
        DesignSha256 = Convert.ToHexStringLower(SHA256.HashData(designFileBytes)),
    };
}
