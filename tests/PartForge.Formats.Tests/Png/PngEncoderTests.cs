using System.Diagnostics;
using PartForge.Formats.Png;

namespace PartForge.Formats.Tests.Png;

public class PngEncoderTests
{
    private static RgbImage Gradient(int w, int h)
    {
        var px = new byte[w * h * 3];
        for (int y = 0; y < h; y++)
            for (int x = 0; x < w; x++)
            {
                int i = (y * w + x) * 3;
                px[i] = (byte)(x * 255 / Math.Max(1, w - 1));
                px[i + 1] = (byte)(y * 255 / Math.Max(1, h - 1));
                px[i + 2] = (byte)((x * 7 + y * 13) % 256);
            }
        return new RgbImage(w, h, px);
    }

    [Fact]
    public void Crc32_matches_the_standard_check_value()
    {
        // Source: the CRC-32 (ISO 3309 / ITU-T V.42) check value of the ASCII string "123456789" is 0xCBF43926.
        Assert.Equal(0xCBF43926u, Crc32.Compute("123456789"u8));
        // Source: PNG Specification 2nd ed.: every IEND chunk ends with the CRC AE 42 60 82.
        Assert.Equal(0xAE426082u, Crc32.Compute("IEND"u8));
    }

    [Fact]
    public void Starts_with_the_signature_and_ends_with_IEND()
    {
        byte[] png = PngEncoder.Encode(Gradient(5, 3));
        // Source: PNG Specification 2nd ed., 5.2: signature 137 80 78 71 13 10 26 10.
        Assert.Equal(new byte[] { 137, 80, 78, 71, 13, 10, 26, 10 }, png[..8]);
        Assert.Equal(new byte[] { 0, 0, 0, 0, 73, 69, 78, 68, 0xAE, 0x42, 0x60, 0x82 }, png[^12..]);
    }

    [Fact]
    public void Same_pixels_give_identical_bytes()
    {
        Assert.Equal(PngEncoder.Encode(Gradient(64, 48)), PngEncoder.Encode(Gradient(64, 48)));
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(7, 5)]
    [InlineData(200, 120)]
    public void An_independent_decoder_reads_back_the_same_pixels(int w, int h)
    {
        // Reference reader: python3's zlib and struct, decoding chunks, CRCs and all five filter types
        // per the PNG Specification (2nd ed., section 9) in a script that shares no code with the encoder.
        var img = Gradient(w, h);
        string dir = Directory.CreateTempSubdirectory("pf-png-").FullName;
        try
        {
            string png = Path.Combine(dir, "t.png"), raw = Path.Combine(dir, "t.raw");
            File.WriteAllBytes(png, PngEncoder.Encode(img));
            var (code, output) = PythonDecode.Run(png, raw);
            Assert.True(code == 0, output);
            Assert.Equal($"{w} {h} 8 2", output.Trim());
            Assert.Equal(img.Pixels.ToArray(), File.ReadAllBytes(raw));
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void The_file_tool_recognises_it()
    {
        if (!File.Exists("/usr/bin/file")) return; // `file` is a Debian base tool; absent only on minimal images
        string dir = Directory.CreateTempSubdirectory("pf-png-").FullName;
        try
        {
            string png = Path.Combine(dir, "t.png");
            File.WriteAllBytes(png, PngEncoder.Encode(Gradient(31, 17)));
            var psi = new ProcessStartInfo("/usr/bin/file", ["-b", png]) { RedirectStandardOutput = true };
            using var p = Process.Start(psi)!;
            string o = p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            Assert.Contains("PNG image data, 31 x 17, 8-bit/color RGB", o);
        }
        finally { Directory.Delete(dir, true); }
    }
}
