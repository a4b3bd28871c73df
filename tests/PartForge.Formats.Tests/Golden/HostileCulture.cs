using System.Globalization;

namespace PartForge.Formats.Tests.Golden;

/// <summary>Runs code under a culture with a comma decimal separator and an odd minus sign, to show that
/// writers never format numbers with the current culture.</summary>
internal static class HostileCulture
{
    public static T Run<T>(Func<T> f)
    {
        var saved = CultureInfo.CurrentCulture;
        try
        {
            var c = (CultureInfo)CultureInfo.InvariantCulture.Clone();
            c.NumberFormat.NumberDecimalSeparator = ",";
            c.NumberFormat.NumberGroupSeparator = ".";
            c.NumberFormat.NegativeSign = "~";
            CultureInfo.CurrentCulture = c;
            return f();
        }
        finally { CultureInfo.CurrentCulture = saved; }
    }
}
