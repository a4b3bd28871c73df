namespace PartForge.Formats.Png;

/// <summary>
/// A width x height picture, 3 bytes a pixel (R, G, B), rows top to bottom. The pixel buffer is copied in
/// and never exposed for writing, so an image is a value.
/// </summary>
public sealed class RgbImage
{
    private readonly byte[] _rgb;

    public int Width { get; }
    public int Height { get; }

    public RgbImage(int width, int height, ReadOnlySpan<byte> rgb)
    {
        if (width <= 0 || height <= 0) throw new ArgumentOutOfRangeException(nameof(width), "image size must be positive");
        if ((long)width * height * 3 != rgb.Length) throw new ArgumentException("pixel buffer does not match the size", nameof(rgb));
        Width = width;
        Height = height;
        _rgb = rgb.ToArray();
    }

    /// <summary>The pixel bytes, R G B per pixel, rows top to bottom.</summary>
    public ReadOnlySpan<byte> Pixels => _rgb;

    public Rgb this[int x, int y]
    {
        get
        {
            int i = (y * Width + x) * 3;
            return new Rgb(_rgb[i], _rgb[i + 1], _rgb[i + 2]);
        }
    }

    /// <summary>Number of pixels whose colour differs from the given one.</summary>
    public int CountPixelsNotEqual(Rgb colour)
    {
        int n = 0;
        for (int i = 0; i < _rgb.Length; i += 3)
            if (_rgb[i] != colour.R || _rgb[i + 1] != colour.G || _rgb[i + 2] != colour.B) n++;
        return n;
    }
}
