using System.Globalization;

namespace PartForge.Checks;

/// <summary>
/// Turns a value and a limit into a status and a signed margin, with the warning bands used by every check.
///
/// Warning bands (our own rule, documented here and in the report):
/// - minimum checks (clearances, walls): warn when the value is above the limit by less than
///   max(0.1 mm, 25% of the limit) — a printed part is rarely more accurate than 0.1 mm;
/// - maximum checks (stress, current density, force ratios): warn when the value is within 20% below the limit;
/// - temperatures: warn within 10 C below the limit.
/// </summary>
public static class Judge
{
    public const double MinAbsoluteBandMm = 0.1;
    public const double MinRelativeBand = 0.25;
    public const double MaxRelativeBand = 0.20;
    public const double TemperatureBandC = 10;

    /// <summary>Warning band above a minimum limit: max(0.1, 25% of the limit).</summary>
    public static double MinBand(double limit) => Math.Max(MinAbsoluteBandMm, MinRelativeBand * Math.Abs(limit));

    /// <summary>The value must be at least the limit.</summary>
    public static (CheckStatus Status, double Margin) AtLeast(double value, double limit, double warnBand)
    {
        double margin = value - limit;
        if (!double.IsFinite(value) || margin < 0) return (CheckStatus.Fail, margin);
        return (margin < warnBand ? CheckStatus.Warn : CheckStatus.Pass, margin);
    }

    /// <summary>The value must be at most the limit.</summary>
    public static (CheckStatus Status, double Margin) AtMost(double value, double limit, double warnBand)
    {
        double margin = limit - value;
        if (!double.IsFinite(value) || margin < 0) return (CheckStatus.Fail, margin);
        return (margin < warnBand ? CheckStatus.Warn : CheckStatus.Pass, margin);
    }

    /// <summary>A number for a message: invariant culture, up to 3 decimals, no trailing zeros.</summary>
    public static string F(double v) => Math.Round(v, 3).ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>A number rounded up (for a value to raise to) at 0.01 resolution.</summary>
    /// <summary>True when the design file's schema allows <paramref name="value"/> for the key (a fix never names a value the loader refuses).</summary>
    public static bool InSchema(string keyPath, double value) =>
        PartForge.Design.Keys.SectionSpec.Root.Resolve(keyPath, out _) is { } chain && (chain[^1].Range is not { } r || chain[^1].InRange(value));

    public static string Up(double v) => (Math.Ceiling(v * 100 - 1e-9) / 100).ToString("0.##", CultureInfo.InvariantCulture);

    /// <summary>A number rounded down (for a value to lower to) at 0.01 resolution.</summary>
    public static string Down(double v) => (Math.Floor(v * 100 + 1e-9) / 100).ToString("0.##", CultureInfo.InvariantCulture);
}
