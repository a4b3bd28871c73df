using System.Diagnostics;

namespace PartForge.Formats.Tests.Png;

/// <summary>Decodes a PNG with /usr/bin/python3 (zlib + struct only) and writes the raw RGB bytes.</summary>
internal static class PythonDecode
{
    private const string Script = """
import sys, struct, zlib
data = open(sys.argv[1], 'rb').read()
assert data[:8] == b'\x89PNG\r\n\x1a\n', 'signature'
pos, idat, hdr, seen_end = 8, b'', None, False
while pos < len(data):
    n, = struct.unpack('>I', data[pos:pos+4]); typ = data[pos+4:pos+8]; body = data[pos+8:pos+8+n]
    crc, = struct.unpack('>I', data[pos+8+n:pos+12+n])
    assert zlib.crc32(typ + body) & 0xffffffff == crc, 'crc ' + typ.decode()
    if typ == b'IHDR': hdr = struct.unpack('>IIBBBBB', body)
    elif typ == b'IDAT': idat += body
    elif typ == b'IEND': seen_end = True
    pos += 12 + n
assert seen_end and pos == len(data), 'IEND last'
w, h, depth, ctype, comp, filt, inter = hdr
assert depth == 8 and ctype == 2 and inter == 0
raw = zlib.decompress(idat); bpp = 3; stride = w * bpp
out = bytearray(); prev = bytearray(stride)
for y in range(h):
    f = raw[y*(stride+1)]; line = bytearray(raw[y*(stride+1)+1:(y+1)*(stride+1)])
    for i in range(stride):
        a = line[i-bpp] if i >= bpp else 0; b = prev[i]; c = prev[i-bpp] if i >= bpp else 0
        if f == 0: p = 0
        elif f == 1: p = a
        elif f == 2: p = b
        elif f == 3: p = (a + b) // 2
        elif f == 4:
            q = a + b - c; pa, pb, pc = abs(q-a), abs(q-b), abs(q-c)
            p = a if pa <= pb and pa <= pc else (b if pb <= pc else c)
        else: raise ValueError('filter')
        line[i] = (line[i] + p) & 255
    out += line; prev = line
open(sys.argv[2], 'wb').write(out)
print(w, h, depth, ctype)
""";

    public static (int Code, string Output) Run(string png, string rawOut)
    {
        string script = Path.Combine(Path.GetDirectoryName(rawOut)!, "decode.py");
        File.WriteAllText(script, Script);
        var psi = new ProcessStartInfo("/usr/bin/python3", [script, png, rawOut])
        { RedirectStandardOutput = true, RedirectStandardError = true };
        using var p = Process.Start(psi)!;
        string o = p.StandardOutput.ReadToEnd() + p.StandardError.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, o);
    }
}
