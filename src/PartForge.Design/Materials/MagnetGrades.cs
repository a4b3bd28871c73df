using System.Globalization;
using System.Text.RegularExpressions;

namespace PartForge.Design.Materials;

/// <summary>
/// Remanence of sintered NdFeB grades N35 ... N52 (optionally with a temperature suffix M, H, SH, UH, EH,
/// which changes the coercivity class, not Br much: treated as the same Br). Makers' grade tables give
/// N35 1.17-1.22 T, N42 1.28-1.32 T, N52 1.42-1.48 T; the middle of each range is used (1.195, 1.30, 1.45 T)
/// and grades in between are interpolated linearly in the grade number between those anchors (an
/// approximation of ours: the tables list each grade's own range).
/// </summary>
public static partial class MagnetGrades
{
    private static readonly (int Grade, double Br)[] Anchors = { (35, 1.195), (42, 1.30), (52, 1.45) };

    [GeneratedRegex("^N(3[5-9]|4[0-9]|5[0-2])(M|H|SH|UH|EH)?$")]
    private static partial Regex GradePattern();

    /// <summary>Mid-range remanence of a grade, tesla; null when the grade is not N35..N52 (with optional suffix).</summary>
    public static double? MidRangeBrTesla(string? grade)
    {
        if (grade is null) return null;
        var m = GradePattern().Match(grade);
        if (!m.Success) return null;
        int n = int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
        for (int i = 0; i < Anchors.Length - 1; i++)
        {
            var (g0, b0) = Anchors[i];
            var (g1, b1) = Anchors[i + 1];
            if (n >= g0 && n <= g1) return b0 + (b1 - b0) * (n - g0) / (g1 - g0);
        }
        return null;
    }
}
