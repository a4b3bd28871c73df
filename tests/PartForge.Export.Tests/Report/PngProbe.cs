using System.Diagnostics;

namespace PartForge.Export.Tests.Report;

/// <summary>
/// Decodes any 8-bit RGB or RGBA non-interlaced PNG with /usr/bin/python3 (zlib + struct only, per the PNG
/// Specification 2nd ed.) and reports its size, the most common colour and how many pixels differ from it.
/// </summary>
internal static class PngProbe
{
    private const string Script = """
import sys, struct, zlib, collections
data = open(sys.argv[1], 'rb').read()
assert data[:8] == b'\x89PNG\r\n\x1a\n'
pos, idat, hdr = 8, b'', None
while pos < len(data):
    n, = struct.unpack('>I', data[pos:pos+4]); typ = data[pos+4:pos+8]; body = data[pos+8:pos+8+n]
    assert zlib.crc32(typ + body) & 0xffffffff == struct.unpack('>I', data[pos+8+n:pos+12+n])[0]
    if typ == b'IHDR': hdr = struct.unpack('>IIBBBBB', body)
    elif typ == b'IDAT': idat += body
    pos += 12 + n
w, h, depth, ctype, _, _, inter = hdr
assert depth == 8 and ctype in (2, 6) and inter == 0, hdr
bpp = 3 if ctype == 2 else 4; stride = w * bpp
raw = zlib.decompress(idat); prev = bytearray(stride); counts = collections.Counter()
for y in range(h):
    f = raw[y*(stride+1)]; line = bytearray(raw[y*(stride+1)+1:(y+1)*(stride+1)])
    for i in range(stride):
        a = line[i-bpp] if i >= bpp else 0; b = prev[i]; c = prev[i-bpp] if i >= bpp else 0
        if f == 1: line[i] = (line[i] + a) & 255
        elif f == 2: line[i] = (line[i] + b) & 255
        elif f == 3: line[i] = (line[i] + (a + b) // 2) & 255
        elif f == 4:
            q = a + b - c; pa, pb, pc = abs(q-a), abs(q-b), abs(q-c)
            line[i] = (line[i] + (a if pa <= pb and pa <= pc else (b if pb <= pc else c))) & 255
    for x in range(w): counts[bytes(line[x*bpp:x*bpp+3])] += 1
    prev = line
bg, nbg = counts.most_common(1)[0]
print(w, h, bg.hex(), w * h - nbg, len(counts))
""";

    public static (int Width, int Height, string Background, int NonBackground, int Colours) Probe(string png)
    {
        string script = Path.Combine(Path.GetTempPath(), "pf-pngprobe-" + Environment.ProcessId + ".py");
        File.WriteAllText(script, Script);
        var psi = new ProcessStartInfo("/usr/bin/python3", [script, png]) { RedirectStandardOutput = true, RedirectStandardError = true };
        using var p = Process.Start(psi)!;
        string o = p.StandardOutput.ReadToEnd();
        string e = p.StandardError.ReadToEnd();
        p.WaitForExit();
        if (p.ExitCode != 0) throw new InvalidOperationException("python could not decode the PNG: " + e);
        var f = o.Trim().Split(' ');
        return (int.Parse(f[0]), int.Parse(f[1]), f[2], int.Parse(f[3]), int.Parse(f[4]));
    }
}
