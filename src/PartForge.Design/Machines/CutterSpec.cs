using System.Globalization;

namespace PartForge.Design.Machines;

/// <summary>The laser cutter (<c>cutter.*</c>): cutting area, kerf (resolved: cutter.kerf, else process.kerf), the spacing between parts, and the sheets in order of preference.</summary>
public sealed record CutterSpec(double BedXMm, double BedYMm, double KerfMm, double SpacingMm, IReadOnlyList<SheetSize> Sheets)
{
    /// <summary>
    /// Reads <c>cutter.sheets</c> ("600x400:2, 300x200"); null or blank gives one size, the bed's, without a count.
    /// The text has passed the key's pattern, so each item is WIDTHxHEIGHT[:COUNT].
    /// </summary>
    public static IReadOnlyList<SheetSize> ParseSheets(string? text, double bedXMm, double bedYMm)
    {
        if (string.IsNullOrWhiteSpace(text)) return new[] { new SheetSize(bedXMm, bedYMm, null) };
        var list = new List<SheetSize>();
        foreach (var item in text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var sizeAndCount = item.Split(':');
            var wh = sizeAndCount[0].Split('x');
            int? count = sizeAndCount.Length > 1 ? int.Parse(sizeAndCount[1], CultureInfo.InvariantCulture) : null;
            list.Add(new SheetSize(double.Parse(wh[0], CultureInfo.InvariantCulture), double.Parse(wh[1], CultureInfo.InvariantCulture), count));
        }
        return list;
    }
}
