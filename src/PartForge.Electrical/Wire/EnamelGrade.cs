namespace PartForge.Electrical.Wire;

/// <summary>
/// Maximum overall diameter of enamelled round copper wire by grade (IEC 60317-0-1, grades 1, 2 and 3), from
/// the rows of the standard's dimension table listed below (via a national adoption table).
///
/// Between rows the value is interpolated linearly in the nominal diameter: this is an APPROXIMATION, the
/// standard tabulates only its rows (e.g. at 0.200 mm the interpolation gives 0.2263 / 0.2404 against the
/// tabulated 0.226 / 0.239, recalled from memory). Beyond the table the enamel increment (overall - nominal)
/// is scaled in proportion to the nominal diameter from the nearest end row (below 0.100 mm: the 0.100 row's
/// increment ratio; above 0.508 mm: the 0.508 row's) — a documented extrapolation rule of ours, not a
/// value of the standard.
/// </summary>
public static class EnamelGrade
{
    private static readonly double[] Nominal = { 0.100, 0.125, 0.160, 0.254, 0.315, 0.508 };
    private static readonly double[][] Max =
    {
        new[] { 0.117, 0.144, 0.182, 0.286, 0.349, 0.554 }, // grade 1
        new[] { 0.125, 0.154, 0.194, 0.303, 0.367, 0.578 }, // grade 2
        new[] { 0.132, 0.163, 0.205, 0.319, 0.384, 0.601 }, // grade 3
    };

    /// <summary>Smallest tabulated nominal diameter, mm.</summary>
    public static double TableMinMm => Nominal[0];

    /// <summary>Largest tabulated nominal diameter, mm.</summary>
    public static double TableMaxMm => Nominal[^1];

    /// <summary>Parses "grade-1" | "grade-2" | "grade-3" to 1..3; null for anything else.</summary>
    public static int? Parse(string? enamel) => enamel switch
    {
        "grade-1" => 1,
        "grade-2" => 2,
        "grade-3" => 3,
        _ => null,
    };

    /// <summary>True when <paramref name="nominalMm"/> lies on a tabulated row (no interpolation needed).</summary>
    public static bool IsTabulated(double nominalMm) => Nominal.Any(n => Math.Abs(n - nominalMm) < 1e-9);

    /// <summary>Maximum overall diameter, mm, for the nominal bare diameter and grade (1..3); see the class notes.</summary>
    public static double MaxOverallMm(double nominalMm, int grade)
    {
        if (grade < 1 || grade > 3) throw new ArgumentOutOfRangeException(nameof(grade));
        var m = Max[grade - 1];
        if (nominalMm <= Nominal[0]) return nominalMm * (m[0] / Nominal[0]);
        if (nominalMm >= Nominal[^1]) return nominalMm * (m[^1] / Nominal[^1]);
        int i = 0;
        while (Nominal[i + 1] < nominalMm) i++;
        double t = (nominalMm - Nominal[i]) / (Nominal[i + 1] - Nominal[i]);
        return m[i] + t * (m[i + 1] - m[i]);
    }
}
