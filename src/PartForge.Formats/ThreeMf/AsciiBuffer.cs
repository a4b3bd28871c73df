using System.Globalization;
using PartForge.Formats.Cutting;

namespace PartForge.Formats.ThreeMf;

/// <summary>A growable byte buffer for ASCII markup with invariant numbers written straight into it (no encoder).</summary>
internal sealed class AsciiBuffer
{
    private byte[] _buf;
    private readonly char[] _chars = new char[InvariantNumber.MaxChars];
    private int _len;

    private readonly Stream? _sink;

    public AsciiBuffer(int capacity) => _buf = new byte[Math.Max(256, capacity)];

    /// <summary>A buffer of fixed size that hands its text to <paramref name="sink"/> whenever it fills up
    /// (call <see cref="Flush"/> at the end): the text is never held whole.</summary>
    public AsciiBuffer(Stream sink, int capacity = 1 << 16)
    {
        _sink = sink;
        _buf = new byte[Math.Max(256, capacity)];
    }

    /// <summary>Hands what is buffered to the sink (no-op without one).</summary>
    public void Flush()
    {
        if (_sink is null || _len == 0) return;
        _sink.Write(_buf.AsSpan(0, _len));
        _len = 0;
    }

    public int Length => _len;

    public void Append(ReadOnlySpan<byte> ascii)
    {
        Ensure(ascii.Length);
        ascii.CopyTo(_buf.AsSpan(_len));
        _len += ascii.Length;
    }

    /// <summary>Any text, UTF-8 encoded (names and titles, already escaped).</summary>
    public void AppendText(string s)
    {
        int max = System.Text.Encoding.UTF8.GetMaxByteCount(s.Length);
        Ensure(max);
        _len += new System.Text.UTF8Encoding(false).GetBytes(s, _buf.AsSpan(_len));
    }

    public void Append(int v)
    {
        Ensure(11);
        v.TryFormat(_buf.AsSpan(_len), out int n, default, CultureInfo.InvariantCulture);
        _len += n;
    }

    public void Append(double v)
    {
        Ensure(InvariantNumber.MaxChars);
        if (v == 0) { _buf[_len++] = (byte)'0'; return; }
        if (InvariantNumber.TryFormatGridUtf8(v, _buf.AsSpan(_len), out int fast)) { _len += fast; return; }
        var chars = _chars.AsSpan();
        int n = InvariantNumber.Format(v, chars);
        var dest = _buf.AsSpan(_len, n);
        for (int i = 0; i < n; i++) dest[i] = (byte)chars[i];
        _len += n;
    }

    public byte[] ToArray() => _buf.AsSpan(0, _len).ToArray();

    public ReadOnlySpan<byte> Span => _buf.AsSpan(0, _len);

    private void Ensure(int extra)
    {
        if (_len + extra <= _buf.Length) return;
        if (_sink is not null)
        {
            Flush();
            if (extra <= _buf.Length) return;
        }
        long want = Math.Max((long)_buf.Length * 2, (long)_len + extra);
        if (want > Array.MaxLength) throw new InvalidOperationException("the 3MF model part would exceed the largest array");
        Array.Resize(ref _buf, (int)want);
    }
}
