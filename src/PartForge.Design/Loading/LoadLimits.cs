namespace PartForge.Design.Loading;

/// <summary>
/// Resource limits of the loader, so that a hostile or broken file is refused at once instead of exhausting
/// time or memory. A design file is a few kilobytes; these leave a wide margin.
/// </summary>
public static class LoadLimits
{
    /// <summary>Largest design file accepted, bytes (1 MiB). Larger files are refused before reading them.</summary>
    public const int MaxFileBytes = 1 << 20;

    /// <summary>Deepest nesting of sections/lists accepted (the model itself is 3 deep).</summary>
    public const int MaxDepth = 32;

    /// <summary>Most alias references (*name) accepted in one file.</summary>
    public const int MaxAliases = 64;

    /// <summary>Most YAML nodes accepted in one file (a full design has about 120).</summary>
    public const int MaxNodes = 20000;

    /// <summary>Most errors reported for one file; the rest are summarised in one line.</summary>
    public const int MaxErrors = 100;
}
