namespace PartForge.Formats.Png;

/// <summary>An 8-bit-per-channel sRGB colour.</summary>
public readonly record struct Rgb(byte R, byte G, byte B)
{
    /// <summary>Parses "#rrggbb".</summary>
    public static Rgb FromHex(string hex)
    {
        if (hex.Length != 7 || hex[0] != '#') throw new ArgumentException("expected #rrggbb", nameof(hex));
        int v = int.Parse(hex.AsSpan(1), System.Globalization.NumberStyles.HexNumber, System.Globalization.CultureInfo.InvariantCulture);
        return new Rgb((byte)(v >> 16), (byte)(v >> 8), (byte)v);
    }
}
