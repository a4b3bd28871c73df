using System.Buffers.Binary;
using System.IO.Compression;
using System.Text;

namespace PartForge.Formats.ThreeMf;

/// <summary>
/// A minimal ZIP writer (PKWARE APPNOTE 6.3: local headers, central directory, end record; no Zip64, no
/// data descriptors, no extra fields) whose output depends only on its input: entries in the order given,
/// every timestamp 1980-01-01 00:00 (the DOS epoch), "version made by" MS-DOS, no external attributes,
/// one fixed deflate level. On a seekable stream each entry is compressed straight into it and its local header
/// patched afterwards (the sizes are then known), so no entry is ever held in memory whole; on any other
/// writable stream each entry is compressed into memory first, by the same calls, so the bytes are the same.
/// </summary>
internal static class DeterministicZip
{
    /// <summary>DOS date of 1980-01-01: ((1980 - 1980) &lt;&lt; 9) | (1 &lt;&lt; 5) | 1.</summary>
    private const ushort DosDate = 0x0021;
    private const ushort DosTime = 0;
    private const ushort Version = 20; // 2.0: deflate
    private const ushort MethodDeflate = 8;

    /// <summary>
    /// Writes the package with each entry's content produced by a writer callback. On a seekable output the
    /// content is compressed straight into it and the local header is patched afterwards (the content is never
    /// held in memory whole); otherwise each entry is produced into memory first. Both give the same bytes.
    /// </summary>
    public static void Write(Stream output, IReadOnlyList<(string Name, Action<Stream> Content)> entries, CompressionLevel level)
    {
        var central = new MemoryStream();
        long start = output.CanSeek ? output.Position : 0;
        long offset = 0;
        foreach (var (name, content) in entries)
        {
            byte[] nameBytes = Encoding.ASCII.GetBytes(name);
            if (nameBytes.Length > ushort.MaxValue || name.Any(ch => ch > 0x7E || ch < 0x20)) throw new ArgumentException($"unsupported entry name {name}");
            uint crc;
            long packedLength, dataLength;
            if (output.CanSeek)
            {
                long headerAt = output.Position;
                output.Write(LocalHeader(0, 0, 0, nameBytes.Length));
                output.Write(nameBytes);
                long dataAt = output.Position;
                (crc, dataLength) = Compress(output, content, level);
                packedLength = output.Position - dataAt;
                CheckSizes(dataLength, packedLength, headerAt - start);
                output.Position = headerAt;
                output.Write(LocalHeader(crc, packedLength, dataLength, nameBytes.Length));
                output.Position = dataAt + packedLength;
            }
            else
            {
                // The same compression calls into memory, so the bytes equal those of the seekable path.
                var packed = new MemoryStream();
                (crc, dataLength) = Compress(packed, content, level);
                packedLength = packed.Length;
                CheckSizes(dataLength, packedLength, offset);
                output.Write(LocalHeader(crc, packedLength, dataLength, nameBytes.Length));
                output.Write(nameBytes);
                output.Write(packed.GetBuffer().AsSpan(0, (int)packed.Length));
            }

            Span<byte> dir = stackalloc byte[46];
            BinaryPrimitives.WriteUInt32LittleEndian(dir[0..], 0x02014b50);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[4..], Version); // made by: MS-DOS, 2.0
            BinaryPrimitives.WriteUInt16LittleEndian(dir[6..], Version);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[8..], 0);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[10..], MethodDeflate);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[12..], DosTime);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[14..], DosDate);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[16..], crc);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[20..], (uint)packedLength);
            BinaryPrimitives.WriteUInt32LittleEndian(dir[24..], (uint)dataLength);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[28..], (ushort)nameBytes.Length);
            BinaryPrimitives.WriteUInt16LittleEndian(dir[30..], 0); // extra
            BinaryPrimitives.WriteUInt16LittleEndian(dir[32..], 0); // comment
            BinaryPrimitives.WriteUInt16LittleEndian(dir[34..], 0); // disk
            BinaryPrimitives.WriteUInt16LittleEndian(dir[36..], 0); // internal attributes
            BinaryPrimitives.WriteUInt32LittleEndian(dir[38..], 0); // external attributes
            BinaryPrimitives.WriteUInt32LittleEndian(dir[42..], (uint)offset);
            central.Write(dir);
            central.Write(nameBytes);

            offset += 30 + nameBytes.Length + packedLength;
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

    private static void CheckSizes(long data, long packed, long offset)
    {
        if ((ulong)data >= uint.MaxValue || (ulong)packed >= uint.MaxValue || offset >= uint.MaxValue)
            throw new InvalidOperationException("the package would need Zip64 (over 4 GiB), which this writer does not produce");
    }

    private static byte[] LocalHeader(uint crc, long packed, long data, int nameLength)
    {
        var local = new byte[30];
        BinaryPrimitives.WriteUInt32LittleEndian(local.AsSpan(0), 0x04034b50);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(4), Version);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(6), 0); // flags
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(8), MethodDeflate);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(10), DosTime);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(12), DosDate);
        BinaryPrimitives.WriteUInt32LittleEndian(local.AsSpan(14), crc);
        BinaryPrimitives.WriteUInt32LittleEndian(local.AsSpan(18), (uint)packed);
        BinaryPrimitives.WriteUInt32LittleEndian(local.AsSpan(22), (uint)data);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(26), (ushort)nameLength);
        BinaryPrimitives.WriteUInt16LittleEndian(local.AsSpan(28), 0); // extra length
        return local;
    }

    /// <summary>Counts the bytes written through it.</summary>
    private sealed class CountingStream(Stream target) : Stream
    {
        public long Count { get; private set; }
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }
        public override void Flush() => target.Flush();
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

        public override void Write(ReadOnlySpan<byte> data)
        {
            target.Write(data);
            Count += data.Length;
        }
    }

    /// <summary>
    /// Passes a gzip stream (RFC 1952) through as its raw deflate body: drops the 10-byte header (checked to
    /// be the plain one, no optional fields) and holds back the last 8 bytes, the trailer with the CRC-32 of
    /// the input (the same CRC as ZIP, APPNOTE 4.4.7) and its length mod 2^32.
    /// </summary>
    private sealed class GzipBodyStream(Stream target) : Stream
    {
        private readonly byte[] _head = new byte[10];
        private int _headLen;
        private readonly byte[] _tail = new byte[8];
        private int _tailLen;

        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }
        public override void Flush() { }
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

        public override void Write(ReadOnlySpan<byte> data)
        {
            if (_headLen < 10)
            {
                int h = Math.Min(10 - _headLen, data.Length);
                data[..h].CopyTo(_head.AsSpan(_headLen));
                _headLen += h;
                data = data[h..];
                if (_headLen == 10 && !(_head[0] == 0x1f && _head[1] == 0x8b && _head[2] == 8 && _head[3] == 0))
                    throw new InvalidOperationException("the compression library wrote a gzip header with optional fields");
            }
            if (data.Length == 0) return;
            if (_tailLen + data.Length <= 8)
            {
                data.CopyTo(_tail.AsSpan(_tailLen));
                _tailLen += data.Length;
                return;
            }
            // Emit everything but the last 8 bytes of (held tail + data).
            int emitFromTail = Math.Min(_tailLen, _tailLen + data.Length - 8);
            target.Write(_tail.AsSpan(0, emitFromTail));
            var rest = _tail.AsSpan(emitFromTail, _tailLen - emitFromTail).ToArray();
            int emitFromData = data.Length - (8 - rest.Length);
            target.Write(data[..emitFromData]);
            rest.CopyTo(_tail);
            data[emitFromData..].CopyTo(_tail.AsSpan(rest.Length));
            _tailLen = 8;
        }

        /// <summary>The trailer's CRC-32 and input length (once the gzip stream is closed).</summary>
        public (uint Crc, long Length) Trailer()
        {
            if (_headLen < 10 || _tailLen < 8) throw new InvalidOperationException("the gzip stream ended early");
            return (BinaryPrimitives.ReadUInt32LittleEndian(_tail), BinaryPrimitives.ReadUInt32LittleEndian(_tail.AsSpan(4)));
        }
    }

    /// <summary>
    /// Raw deflate data of what <paramref name="content"/> writes, into <paramref name="target"/>, with the CRC-32
    /// and length of the input. Compressed through the gzip wrapper (RFC 1952), whose body is the same raw
    /// deflate stream and whose trailer carries the CRC-32 (the same CRC as ZIP, APPNOTE 4.4.7) computed by the
    /// compression library in the same pass; the 10-byte header and 8-byte trailer are stripped on the way.
    /// The compressed bytes depend on the input and on how it is cut into writes, so every path feeds the
    /// compressor the same way.
    /// </summary>
    private static (uint Crc, long Length) Compress(Stream target, Action<Stream> content, CompressionLevel level)
    {
        var body = new GzipBodyStream(target);
        long counted;
        using (var z = new GZipStream(body, level, leaveOpen: true))
        {
            var counter = new CountingStream(z);
            content(counter);
            counted = counter.Count;
        }
        var (crc, mod32) = body.Trailer();
        if (mod32 != (counted & 0xFFFFFFFFL)) throw new InvalidOperationException("gzip trailer size does not match the input");
        return (crc, counted);
    }
}
