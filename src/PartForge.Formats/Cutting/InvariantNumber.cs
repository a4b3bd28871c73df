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
