using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using PartForge.Formats.Io;
using PartForge.Geometry.Meshes;

namespace PartForge.Formats.Stl;

/// <summary>
/// STL output, millimetres. Binary: 80-byte header (fixed text, no timestamp), uint32 triangle count, then
/// 50 bytes per triangle: normal, three vertices (little-endian float32), attribute 0. ASCII:
/// "solid NAME" .. "endsolid NAME", invariant culture, float32 values written in round-trip form so both
/// encodings carry the same vertex bits. Normals are computed from the float32 vertices.
/// Deterministic: the same mesh gives the same bytes.
/// </summary>
public static class StlWriter
{
    public static void WriteBinary(Stream s, Mesh m, string solidName)
    {
        ArgumentNullException.ThrowIfNull(s);
        ArgumentNullException.ThrowIfNull(m);
        var header = new byte[80];
        // Must not start with "solid": readers would take the file for ASCII.
        var text = Encoding.ASCII.GetBytes("binary STL, mm, " + SafeName(solidName));
        Array.Copy(text, header, Math.Min(80, text.Length));
        for (int i = text.Length; i < 80; i++) header[i] = (byte)' ';
        s.Write(header);
        Span<byte> u32 = stackalloc byte[4];
        BinaryPrimitives.WriteUInt32LittleEndian(u32, (uint)m.TriangleCount);
        s.Write(u32);
        const int chunkTris = 4096;
        var buf = new byte[50 * chunkTris];
        int inBuf = 0;
        Span<float> f = stackalloc float[12];
        for (int t = 0; t < m.TriangleCount; t++)
        {
            Corners(m, t, f);
            int o = inBuf * 50;
            for (int k = 0; k < 12; k++) BinaryPrimitives.WriteSingleLittleEndian(buf.AsSpan(o + 4 * k), f[k]);
            buf[o + 48] = 0; buf[o + 49] = 0;
            if (++inBuf == chunkTris) { s.Write(buf, 0, inBuf * 50); inBuf = 0; }
        }
        if (inBuf > 0) s.Write(buf, 0, inBuf * 50);
    }

    public static void WriteAscii(Stream s, Mesh m, string solidName)
    {
        ArgumentNullException.ThrowIfNull(s);
        ArgumentNullException.ThrowIfNull(m);
        string name = SafeName(solidName);
        var inv = CultureInfo.InvariantCulture;
        using var w = new StreamWriter(s, new UTF8Encoding(false), 1 << 16, leaveOpen: true) { NewLine = "\n" };
        w.WriteLine("solid " + name);
        Span<float> f = stackalloc float[12];
        var sb = new StringBuilder(256);
        for (int t = 0; t < m.TriangleCount; t++)
        {
            Corners(m, t, f);
            sb.Clear();
            sb.Append("  facet normal ").Append(F(f[0], inv)).Append(' ').Append(F(f[1], inv)).Append(' ').Append(F(f[2], inv)).Append('\n');
            sb.Append("    outer loop\n");
            for (int k = 1; k <= 3; k++)
                sb.Append("      vertex ").Append(F(f[3 * k], inv)).Append(' ').Append(F(f[3 * k + 1], inv)).Append(' ').Append(F(f[3 * k + 2], inv)).Append('\n');
            sb.Append("    endloop\n  endfacet\n");
            w.Write(sb);
        }
        w.WriteLine("endsolid " + name);
    }

    /// <summary>Writes a binary STL file atomically.</summary>
    public static void WriteBinaryFile(string path, Mesh m, string solidName) => AtomicFile.Write(path, s => WriteBinary(s, m, solidName));

    /// <summary>Writes an ASCII STL file atomically.</summary>
    public static void WriteAsciiFile(string path, Mesh m, string solidName) => AtomicFile.Write(path, s => WriteAscii(s, m, solidName));

    /// <summary>Bytes of a binary STL (for hashing and tests).</summary>
    public static byte[] ToBinaryBytes(Mesh m, string solidName)
    {
        var ms = new MemoryStream(84 + 50 * m.TriangleCount);
        WriteBinary(ms, m, solidName);
        return ms.ToArray();
    }

    /// <summary>Size of the binary encoding in bytes.</summary>
    public static long BinarySize(Mesh m) => 84L + 50L * m.TriangleCount;

    /// <summary>The solid name reduced to printable ASCII without spaces (letters, digits, '-', '_', '.'), at most 60 characters.</summary>
    public static string SafeName(string? name)
    {
        var sb = new StringBuilder();
        foreach (char c in name ?? "")
        {
            if (sb.Length >= 60) break;
            sb.Append(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '_');
        }
        return sb.Length == 0 ? "part" : sb.ToString();
    }

    private static string F(float v, IFormatProvider inv) => (v == 0 ? 0f : v).ToString("R", inv);

    /// <summary>Normal (from the float32 corners) followed by the three corners, as float32.</summary>
    private static void Corners(Mesh m, int t, Span<float> f)
    {
        var (a, b, c) = m.Triangle(t);
        float ax = (float)a.X, ay = (float)a.Y, az = (float)a.Z;
        float bx = (float)b.X, by = (float)b.Y, bz = (float)b.Z;
        float cx = (float)c.X, cy = (float)c.Y, cz = (float)c.Z;
        double ux = (double)bx - ax, uy = (double)by - ay, uz = (double)bz - az;
        double vx = (double)cx - ax, vy = (double)cy - ay, vz = (double)cz - az;
        double nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
        double len = Math.Sqrt(nx * nx + ny * ny + nz * nz);
        if (len > 0 && double.IsFinite(len)) { nx /= len; ny /= len; nz /= len; } else { nx = ny = nz = 0; }
        f[0] = (float)nx; f[1] = (float)ny; f[2] = (float)nz;
        f[3] = ax; f[4] = ay; f[5] = az; f[6] = bx; f[7] = by; f[8] = bz; f[9] = cx; f[10] = cy; f[11] = cz;
    }
}
