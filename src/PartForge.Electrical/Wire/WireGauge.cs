namespace PartForge.Electrical.Wire;

/// <summary>American Wire Gauge, ASTM B258: d = 0.127 mm x 92^((36 - n) / 39).</summary>
public static class WireGauge
{
    /// <summary>Bare diameter of AWG <paramref name="awg"/> from the ASTM B258 formula, mm (not rounded).</summary>
    public static double AwgDiameterMm(int awg) => 0.127 * Math.Pow(92.0, (36.0 - awg) / 39.0);

    /// <summary>
    /// The diameter a published AWG table prints: the formula value rounded to 0.0001 inch, in mm. Published
    /// tables compute resistance from this rounded value (ASTM B258 practice).
    /// </summary>
    public static double AwgTableDiameterMm(int awg) =>
        Math.Round(AwgDiameterMm(awg) / 25.4 * 1e4, MidpointRounding.AwayFromZero) / 1e4 * 25.4;

    /// <summary>The thickest AWG (smallest gauge number, 0..50) whose formula diameter does not exceed <paramref name="maxDiameterMm"/>; null if even AWG 50 is too thick.</summary>
    public static int? ThickestAwgWithin(double maxDiameterMm)
    {
        for (int n = 0; n <= 50; n++)
            if (AwgDiameterMm(n) <= maxDiameterMm) return n;
        return null;
    }
}
