using System.Buffers.Binary;
using System.IO.Compression;
using System.Text;
using PartForge.Formats.Png;

namespace PartForge.Formats.ThreeMf;

/// <summary>
/// A minimal ZIP writer (PKWARE APPNOTE 6.3: local headers, central directory, end record; no Zip64, no
/// data descriptors, no extra fields) whose output depends only on its input: entries in the order given,
/// every timestamp 1980-01-01 00:00 (the DOS epoch), "version made by" MS-DOS, no external attributes,
/// one fixed deflate level. Works on any writable stream (sizes are known before each header is written).
/// </summary>
internal static class DeterministicZip
{
    /// <summary>DOS date of 1980-01-01: ((1980 - 1980) &lt;&lt; 9) | (1 &lt;&lt; 5) | 1.</summary>
    private const ushort DosDate = 0x0021;
    private const ushort DosTime = 0;
    private const ushort Version = 20; // 2.0: deflate
    private const ushort MethodDeflate = 8;

    public static void Write(Stream output, IReadOnlyList<(string Name, ReadOnlyMemory<byte> Data)> entries, CompressionLevel level)
    {
        var central = new MemoryStream();
        long offset = 0;
        foreach (var (name, data) in entries)
        {
            byte[] nameBytes = Encoding.ASCII.GetBytes(name);
            if (nameBytes.Length > ushort.MaxValue || name.Any(ch => ch > 0x7E || ch < 0x20)) throw new ArgumentException($"unsupported entry name {name}");
            var (packed, crc) = Deflate(data.Span, level);
            if ((ulong)data.Length >= uint.MaxValue || (ulong)packed.Length >= uint.MaxValue || offset >= uint.MaxValue)
                throw new InvalidOperationException("the package would need Zip64 (over 4 GiB), which this writer does not produce");

            Span<byte> local = stackalloc byte[30];
            BinaryPrimitives.WriteUInt32LittleEndian(local[0..], 0x04034b50);
            BinaryPrimitives.WriteUInt16LittleEndian(local[4..], Version);
            BinaryPrimitives.WriteUInt16LittleEndian(local[6..], 0); // flags
            BinaryPrimitives.WriteUInt16LittleEndian(local[8..], MethodDeflate);
            BinaryPrimitives.WriteUInt16LittleEndian(local[10..], DosTime);
            BinaryPrimitives.WriteUInt16LittleEndian(local[12..], DosDate);
            BinaryPrimitives.WriteUInt32LittleEndian(local[14..], crc);
            BinaryPrimitives.WriteUInt32LittleEndian(local[18..], (uint)packed.Length);
            BinaryPrimitives.WriteUInt32LittleEndian(local[22..], (uint)data.Length);
            BinaryPrimitives.WriteUInt16LittleEndian(local[26..], (ushort)nameBytes.Length);
            BinaryPrimitives.WriteUInt16LittleEndian(local[28..], 0); // extra length
            output.Write(local);
            output.Write(nameBytes);
            output.Write(packed.Span);

            Span<byte> dir = stackalloc byte[46];
            BinaryPrimitives.WriteUInt32LittleEndian(dir[0..], 0x02014b50);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[4..], Version); // made by: MS-DOS, 2.0
            BinaryPrimitives.WriteUInt16LittleEndian(dir[6..], Version);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[8..], 0);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[10..], MethodDeflate);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[12..], DosTime);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[14..], DosDate);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[16..], crc);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[20..], (uint)packed.Length);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[24..], (uint)data.Length);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[28..], (ushort)nameBytes.Length);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[30..], 0); // extra
            BinaryPrimitives.WriteUInt16LittleEndian(dir[32..], 0); // comment
            BinaryPrimitives.WriteUInt16LittleEndian(dir[34..], 0); // disk
            BinaryPrimitives.WriteUInt16LittleEndian(dir[36..], 0); // internal attributes
            BinaryPrimitives.WriteUInt32LittleEndian(dir[38..], 0); // external attributes
            BinaryPrimitives.WriteUInt32LittleEndian(dir[42..], (uint)offset);
            central.Write(dir);
            central.Write(nameBytes);

            offset += local.Length + nameBytes.Length + packed.Length;
        }
        if (entries.Count > ushort.MaxValue || offset >= uint.MaxValue) throw new InvalidOperationException("too many entries for a ZIP without Zip64");
        central.Position = 0;
        central.CopyTo(output);

        Span<byte> end = stackalloc byte[22];
        BinaryPrimitives.WriteUInt32LittleEndian(end[0..], 0x06054b50);
        BinaryPrimitives.WriteUInt16LittleEndian(end[4..], 0);
        BinaryPrimitives.WriteUInt16LittleEndian(end[6..], 0);
        BinaryPrimitives.WriteUInt16LittleEndian(end[8..], (ushort)entries.Count);
        BinaryPrimitives.WriteUInt16LittleEndian(end[10..], (ushort)entries.Count);
        BinaryPrimitives.WriteUInt32LittleEndian(end[12..], (uint)central.Length);
        BinaryPrimitives.WriteUInt32LittleEndian(end[16..], (uint)offset);
        BinaryPrimitives.WriteUInt16LittleEndian(end[20..], 0);
        output.Write(end);
    }

    /// <summary>
    /// Raw deflate data and the CRC-32 of the input. Compressed through the gzip wrapper (RFC 1952), whose
    /// body is the same raw deflate stream and whose trailer carries the CRC-32 (the same CRC as ZIP,
    /// APPNOTE 4.4.7) computed by the compression library in the same pass; the 10-byte header and 8-byte
    /// trailer are stripped. Falls back to computing the CRC here if the header is not the plain one.
    /// </summary>
    private static (ReadOnlyMemory<byte> Packed, uint Crc) Deflate(ReadOnlySpan<byte> data, CompressionLevel level)
    {
        var ms = new MemoryStream(data.Length / 4 + 64);
        using (var z = new GZipStream(ms, level, leaveOpen: true)) z.Write(data);
        byte[] gz = ms.GetBuffer();
        int len = (int)ms.Length;
        bool plainHeader = len >= 18 && gz[0] == 0x1f && gz[1] == 0x8b && gz[2] == 8 && gz[3] == 0;
        if (!plainHeader)
        {
            var raw = new MemoryStream(data.Length / 4 + 64);
            using (var z = new DeflateStream(raw, level, leaveOpen: true)) z.Write(data);
            return (raw.ToArray(), Crc32.Compute(data));
        }
        uint crc = BinaryPrimitives.ReadUInt32LittleEndian(gz.AsSpan(len - 8));
        uint size = BinaryPrimitives.ReadUInt32LittleEndian(gz.AsSpan(len - 4));
        if (size != (uint)data.Length) throw new InvalidOperationException("gzip trailer size does not match the input");
        return (new ReadOnlyMemory<byte>(gz, 10, len - 18), crc);
    }
}
