using System.Buffers.Binary;
using System.IO.Compression;

namespace PartForge.Formats.Png;

/// <summary>
/// Writes an <see cref="RgbImage"/> as a PNG file: signature, IHDR (8-bit truecolour, no interlace), one
/// IDAT (zlib stream at a fixed compression level), IEND. No time stamp, gamma or text chunks, so the same
/// pixels always give the same bytes. Source: PNG Specification (W3C Recommendation, 2nd ed., 2003),
/// sections 5 (datastream), 9 (filtering, with the minimum-sum-of-absolute-differences heuristic of 12.8)
/// and 11.2 (IHDR, IDAT, IEND).
/// </summary>
public static class PngEncoder
{
    private static readonly byte[] Signature = [137, 80, 78, 71, 13, 10, 26, 10];

    /// <summary>The fixed zlib level: every build of the same pixels is byte-identical.</summary>
    public const CompressionLevel Level = CompressionLevel.Optimal;

    public static byte[] Encode(RgbImage image)
    {
        using var file = new MemoryStream();
        file.Write(Signature);

        Span<byte> ihdr = stackalloc byte[13];
        BinaryPrimitives.WriteInt32BigEndian(ihdr, image.Width);
        BinaryPrimitives.WriteInt32BigEndian(ihdr[4..], image.Height);
        ihdr[8] = 8;   // bit depth
        ihdr[9] = 2;   // colour type: truecolour
        ihdr[10] = 0;  // compression method: deflate
        ihdr[11] = 0;  // filter method 0
        ihdr[12] = 0;  // no interlace
        WriteChunk(file, "IHDR"u8, ihdr);

        WriteChunk(file, "IDAT"u8, Compress(Filter(image)));
        WriteChunk(file, "IEND"u8, ReadOnlySpan<byte>.Empty);
        return file.ToArray();
    }

    /// <summary>Filters each scanline with the filter type (0-4) that gives the smallest sum of absolute values.</summary>
    private static byte[] Filter(RgbImage image)
    {
        const int bpp = 3;
        int stride = image.Width * bpp;
        var src = image.Pixels;
        var outBuf = new byte[(stride + 1) * image.Height];
        var candidates = new byte[5][];
        for (int f = 0; f < 5; f++) candidates[f] = new byte[stride];
        var zero = new byte[stride];

        for (int y = 0; y < image.Height; y++)
        {
            ReadOnlySpan<byte> row = src.Slice(y * stride, stride);
            ReadOnlySpan<byte> prev = y > 0 ? src.Slice((y - 1) * stride, stride) : zero;
            int best = 0;
            long bestSum = long.MaxValue;
            for (int f = 0; f < 5; f++)
            {
                var c = candidates[f];
                long sum = 0;
                for (int i = 0; i < stride; i++)
                {
                    int a = i >= bpp ? row[i - bpp] : 0;
                    int b = prev[i];
                    int cc = i >= bpp ? prev[i - bpp] : 0;
                    int pred = f switch
                    {
                        0 => 0,
                        1 => a,
                        2 => b,
                        3 => (a + b) >> 1,
                        _ => Paeth(a, b, cc),
                    };
                    byte v = (byte)(row[i] - pred);
                    c[i] = v;
                    sum += v < 128 ? v : 256 - v;
                }
                if (sum < bestSum) { bestSum = sum; best = f; }
            }
            int o = y * (stride + 1);
            outBuf[o] = (byte)best;
            candidates[best].CopyTo(outBuf.AsSpan(o + 1));
        }
        return outBuf;
    }

    private static int Paeth(int a, int b, int c)
    {
        int p = a + b - c;
        int pa = Math.Abs(p - a), pb = Math.Abs(p - b), pc = Math.Abs(p - c);
        if (pa <= pb && pa <= pc) return a;
        return pb <= pc ? b : c;
    }

    private static byte[] Compress(byte[] data)
    {
        using var ms = new MemoryStream();
        using (var z = new ZLibStream(ms, Level, leaveOpen: true)) z.Write(data);
        return ms.ToArray();
    }

    private static void WriteChunk(Stream s, ReadOnlySpan<byte> type, ReadOnlySpan<byte> data)
    {
        Span<byte> len = stackalloc byte[4];
        BinaryPrimitives.WriteInt32BigEndian(len, data.Length);
        s.Write(len);
        s.Write(type);
        s.Write(data);
        uint crc = Crc32.Update(0xFFFFFFFFu, type);
        crc = Crc32.Update(crc, data) ^ 0xFFFFFFFFu;
        BinaryPrimitives.WriteUInt32BigEndian(len, crc);
        s.Write(len);
    }
}
