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

    /// <summary>
    /// Reversible temperature coefficient of the remanence of sintered NdFeB, per kelvin: Br(T) = Br20 (1 + alpha (T - 20)).
    /// Makers' grade tables give about -0.11 to -0.12 %/K (published; the figure here from memory); the steeper end is
    /// taken, so a hot magnet is never credited with more flux than it has. Reversible: the loss comes back on cooling,
    /// as long as the magnet stays below its grade's maximum working temperature.
    /// </summary>
    public const double BrTemperatureCoefficientPerK = -0.0012;

    /// <summary>The temperature the grade tables (and <c>magnets.br</c>) give Br at, C.</summary>
    public const double BrReferenceC = 20;

    /// <summary>Br at a magnet temperature from Br at 20 C (linear reversible coefficient; see <see cref="BrTemperatureCoefficientPerK"/>).</summary>
    public static double BrAt(double br20Tesla, double temperatureC) =>
        br20Tesla * (1 + BrTemperatureCoefficientPerK * (temperatureC - BrReferenceC));

    /// <summary>
    /// Maximum working temperature of sintered NdFeB by the grade's suffix, C (common practice, from memory: makers'
    /// grade tables give N 80, M 100, H 120, SH 150, UH 180, EH 200 C, for a magnet of moderate shape, length over
    /// diameter about 0.7 or more; thin magnets in an open circuit start to lose flux lower). Above it the loss is no
    /// longer reversible.
    /// </summary>
    public static double MaxWorkingTemperatureC(string? grade)
    {
        var m = grade is null ? null : GradePattern().Match(grade);
        string suffix = m is { Success: true } ? m.Groups[2].Value : "";
        foreach (var (sfx, maxC) in Suffixes) if (sfx == suffix) return maxC;
        return Suffixes[0].MaxC;
    }

    /// <summary>The grade suffixes in order of working temperature (empty: plain N), with their maximum working temperatures, C.</summary>
    public static IReadOnlyList<(string Suffix, double MaxC)> Suffixes { get; } =
        [("", 80), ("M", 100), ("H", 120), ("SH", 150), ("UH", 180), ("EH", 200)];

    /// <summary>The grade's number (35 ... 52), or null.</summary>
    public static int? Number(string? grade)
    {
        var m = grade is null ? null : GradePattern().Match(grade);
        return m is { Success: true } ? int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) : null;
    }

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
