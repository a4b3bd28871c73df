using System.Buffers.Binary;
using System.IO.Compression;

namespace PartForge.Cli.Tests.Watch;

/// <summary>
/// Decodes an 8-bit RGB or RGBA, non-interlaced PNG (what Chromium's screenshots are) to RGB pixels, written here
/// from the PNG specification (W3C PNG, second edition: chunks, zlib IDAT, filter types 0-4 with the Paeth predictor).
/// </summary>
public static class PngPixels
{
    public static (int W, int H, byte[] Rgb) Decode(byte[] png)
    {
        int pos = 8, w = 0, h = 0, channels = 0;
        using var idat = new MemoryStream();
        while (pos < png.Length)
        {
            int len = BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(pos));
            string type = System.Text.Encoding.ASCII.GetString(png, pos + 4, 4);
            var data = png.AsSpan(pos + 8, len);
            if (type == "IHDR")
            {
                w = BinaryPrimitives.ReadInt32BigEndian(data); h = BinaryPrimitives.ReadInt32BigEndian(data[4..]);
                Assert.Equal(8, data[8]);
                channels = data[9] switch { 2 => 3, 6 => 4, _ => throw new NotSupportedException($"PNG colour type {data[9]}") };
                Assert.Equal(0, data[12]);
            }
            else if (type == "IDAT") idat.Write(data);
            else if (type == "IEND") break;
            pos += 12 + len;
        }
        idat.Position = 0;
        using var z = new ZLibStream(idat, CompressionMode.Decompress);
        int stride = w * channels;
        var raw = new byte[h * (stride + 1)];
        int read = 0;
        while (read < raw.Length) { int k = z.Read(raw, read, raw.Length - read); if (k == 0) break; read += k; }
        var cur = new byte[stride];
        var prev = new byte[stride];
        var rgb = new byte[w * h * 3];
        for (int y = 0; y < h; y++)
        {
            int f = raw[y * (stride + 1)];
            for (int i = 0; i < stride; i++)
            {
                int x = raw[y * (stride + 1) + 1 + i], a = i >= channels ? cur[i - channels] : 0, b = prev[i], c = i >= channels ? prev[i - channels] : 0;
                int pred = f switch
                {
                    0 => 0, 1 => a, 2 => b, 3 => (a + b) / 2,
                    4 => Paeth(a, b, c),
                    _ => throw new NotSupportedException($"PNG filter {f}"),
                };
                cur[i] = (byte)(x + pred);
            }
            for (int px = 0; px < w; px++)
                for (int k = 0; k < 3; k++) rgb[(y * w + px) * 3 + k] = cur[px * channels + k];
            (prev, cur) = (cur, prev);
        }
        return (w, h, rgb);
    }

    private static int Paeth(int a, int b, int c)
    {
        int p = a + b - c, pa = Math.Abs(p - a), pb = Math.Abs(p - b), pc = Math.Abs(p - c);
        return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
    }

    /// <summary>Variance of the grey level (mean of R, G, B) over the picture.</summary>
    public static double GreyVariance(byte[] rgb)
    {
        int n = rgb.Length / 3;
        double sum = 0, sq = 0;
        for (int i = 0; i < n; i++) { double g = (rgb[3 * i] + rgb[3 * i + 1] + rgb[3 * i + 2]) / 3.0; sum += g; sq += g * g; }
        double mean = sum / n;
        return sq / n - mean * mean;
    }

    /// <summary>Pixels that differ by more than <paramref name="tolerance"/> in any channel.</summary>
    public static int Differing(byte[] a, byte[] b, int tolerance = 8)
    {
        int n = 0;
        for (int i = 0; i < a.Length; i += 3)
            if (Math.Abs(a[i] - b[i]) > tolerance || Math.Abs(a[i + 1] - b[i + 1]) > tolerance || Math.Abs(a[i + 2] - b[i + 2]) > tolerance) n++;
        return n;
    }
}
