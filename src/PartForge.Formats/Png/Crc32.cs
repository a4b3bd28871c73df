namespace PartForge.Formats.Png;

/// <summary>
/// CRC-32 as PNG uses it (ISO 3309 / ITU-T V.42 polynomial 0xEDB88320, reflected, initial and final
/// value 0xFFFFFFFF). Source: PNG Specification (W3C, 2nd ed.), section 5.5 and Annex D.
/// </summary>
public static class Crc32
{
    private static readonly uint[] Table = BuildTable();

    private static uint[] BuildTable()
    {
        var t = new uint[256];
        for (uint n = 0; n < 256; n++)
        {
            uint c = n;
            for (int k = 0; k < 8; k++) c = (c & 1) != 0 ? 0xEDB88320u ^ (c >> 1) : c >> 1;
            t[n] = c;
        }
        return t;
    }

    /// <summary>Continues a running CRC (start with 0xFFFFFFFF, finish by xor with 0xFFFFFFFF).</summary>
    public static uint Update(uint crc, ReadOnlySpan<byte> data)
    {
        foreach (byte b in data) crc = Table[(crc ^ b) & 0xFF] ^ (crc >> 8);
        return crc;
    }

    public static uint Compute(ReadOnlySpan<byte> data) => Update(0xFFFFFFFFu, data) ^ 0xFFFFFFFFu;
}
