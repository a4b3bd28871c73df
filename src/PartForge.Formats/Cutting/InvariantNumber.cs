using System.Globalization;

namespace PartForge.Formats.Cutting;

/// <summary>
/// Numbers for text formats (DXF, SVG, 3MF XML): invariant culture, the shortest text that reads back as
/// the same double, never an exponent (some readers reject it), and no negative zero.
/// </summary>
internal static class InvariantNumber
{
    /// <summary>Longest text produced: sign, 17 digits, a point and up to 330 zeros for the tiniest doubles.</summary>
    public const int MaxChars = 400;

    public static string Format(double v)
    {
        Span<char> buf = stackalloc char[MaxChars];
        int n = Format(v, buf);
        return new string(buf[..n]);
    }

    /// <summary>Writes the number into <paramref name="dest"/> (at least <see cref="MaxChars"/> long); returns the length.</summary>
    public static int Format(double v, Span<char> dest)
    {
        if (!double.IsFinite(v)) throw new ArgumentOutOfRangeException(nameof(v), "not a finite number");
        if (v == 0) { dest[0] = '0'; return 1; }
        if (TryFormatGrid(v, dest, out int fast)) return fast;
        return FormatRoundTrip(v, dest);
    }

    /// <summary>
    /// Fast path for values on a 1e-4 grid (the kernel's snap grid): if v is exactly the double nearest to
    /// k / 10^4 for an integer k, the decimal k / 10^4 with trailing zeros removed has at most 15
    /// significant digits, so it is the unique shortest text that reads back as v: the same text as the
    /// general path, produced without the round-trip search.
    /// </summary>
    internal static bool TryFormatGrid(double v, Span<char> dest, out int length)
    {
        length = 0;
        if (!(Math.Abs(v) < 1e11)) return false;
        double k = Math.Round(v * 10000.0);
        if (k == 0 || k / 10000.0 != v) return false;
        long n = (long)k;
        int pos = 0;
        if (n < 0) { dest[pos++] = '-'; n = -n; }
        Span<char> digits = stackalloc char[20];
        int count = 0;
        for (long x = n; x > 0; x /= 10) digits[count++] = (char)('0' + (int)(x % 10)); // least significant first
        int trailing = 0; // zeros dropped from the end of the 4 fraction digits
        while (trailing < 4 && (trailing >= count || digits[trailing] == '0')) trailing++;
        if (count <= 4) dest[pos++] = '0';
        else for (int i = count - 1; i >= 4; i--) dest[pos++] = digits[i];
        if (trailing < 4)
        {
            dest[pos++] = '.';
            for (int i = 3; i >= trailing; i--) dest[pos++] = i < count ? digits[i] : '0';
        }
        length = pos;
        return true;
    }

    /// <summary>The same fast path writing ASCII bytes (for the 3MF model part, which is built as bytes).</summary>
    internal static bool TryFormatGridUtf8(double v, Span<byte> dest, out int length)
    {
        length = 0;
        if (!(Math.Abs(v) < 1e11)) return false;
        double k = Math.Round(v * 10000.0);
        if (k == 0 || k / 10000.0 != v) return false;
        long n = (long)k;
        int pos = 0;
        if (n < 0) { dest[pos++] = (byte)'-'; n = -n; }
        Span<byte> digits = stackalloc byte[20];
        int count = 0;
        for (long x = n; x > 0; x /= 10) digits[count++] = (byte)('0' + (int)(x % 10));
        int trailing = 0;
        while (trailing < 4 && (trailing >= count || digits[trailing] == '0')) trailing++;
        if (count <= 4) dest[pos++] = (byte)'0';
        else for (int i = count - 1; i >= 4; i--) dest[pos++] = digits[i];
        if (trailing < 4)
        {
            dest[pos++] = (byte)'.';
            for (int i = 3; i >= trailing; i--) dest[pos++] = i < count ? digits[i] : (byte)'0';
        }
        length = pos;
        return true;
    }

    /// <summary>General path: the runtime's shortest round-trip text, with any exponent expanded.</summary>
    internal static int FormatRoundTrip(double v, Span<char> dest)
    {
        if (v == 0) { dest[0] = '0'; return 1; }
        Span<char> r = stackalloc char[32];
        if (!v.TryFormat(r, out int len, "R", CultureInfo.InvariantCulture)) throw new InvalidOperationException("number formatting failed");
        r = r[..len];
        int e = r.IndexOf('E');
        if (e < 0) { r.CopyTo(dest); return len; }

        // d.dddE+xx or d.dddE-xx: move the decimal point.
        int exp = int.Parse(r[(e + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        var mant = r[..e];
        int pos = 0;
        if (mant[0] == '-') { dest[pos++] = '-'; mant = mant[1..]; }
        Span<char> digits = stackalloc char[20];
        int nd = 0, pointAt = -1;
        foreach (char ch in mant)
        {
            if (ch == '.') pointAt = nd;
            else digits[nd++] = ch;
        }
        if (pointAt < 0) pointAt = nd;
        int intDigits = pointAt + exp; // digits before the decimal point
        if (intDigits <= 0)
        {
            dest[pos++] = '0';
            dest[pos++] = '.';
            for (int i = 0; i < -intDigits; i++) dest[pos++] = '0';
            for (int i = 0; i < nd; i++) dest[pos++] = digits[i];
        }
        else
        {
            for (int i = 0; i < intDigits; i++) dest[pos++] = i < nd ? digits[i] : '0';
            if (intDigits < nd)
            {
                dest[pos++] = '.';
                for (int i = intDigits; i < nd; i++) dest[pos++] = digits[i];
            }
        }
        return pos;
    }
}
