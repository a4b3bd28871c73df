namespace PartForge.Export.Bom;

/// <summary>
/// Metric coarse-thread bolt sizes and their clearance holes, fine / medium / coarse series, after
/// ISO 273 (from memory; the values are the ones commonly printed in fastener catalogues). A hole takes the
/// largest bolt whose fine-series clearance hole is not larger than it, so the bolt always passes.
/// </summary>
public static class ClearanceHoles
{
    /// <summary>(size, nominal diameter mm, fine, medium, coarse hole mm).</summary>
    public static readonly IReadOnlyList<(string Size, double Nominal, double Fine, double Medium, double Coarse)> Table =
    [
        ("M1.6", 1.6, 1.7, 1.8, 2.0),
        ("M2", 2.0, 2.2, 2.4, 2.6),
        ("M2.5", 2.5, 2.7, 2.9, 3.1),
        ("M3", 3.0, 3.2, 3.4, 3.6),
        ("M4", 4.0, 4.3, 4.5, 4.8),
        ("M5", 5.0, 5.3, 5.5, 5.8),
        ("M6", 6.0, 6.4, 6.6, 7.0),
        ("M8", 8.0, 8.4, 9.0, 10.0),
        ("M10", 10.0, 10.5, 11.0, 12.0),
        ("M12", 12.0, 13.0, 13.5, 14.5),
        ("M16", 16.0, 17.0, 17.5, 18.5),
        ("M20", 20.0, 21.0, 22.0, 24.0),
        ("M24", 24.0, 25.0, 26.0, 28.0),
        ("M30", 30.0, 31.0, 33.0, 35.0),
    ];

    /// <summary>The bolt for a hole, with the series the hole falls in; null when the hole is below M1.6's.</summary>
    public static (string Size, string Series)? ForHole(double holeMm)
    {
        for (int i = Table.Count - 1; i >= 0; i--)
        {
            var t = Table[i];
            if (holeMm + 1e-9 >= t.Fine)
            {
                string series = holeMm + 1e-9 >= t.Coarse ? "coarse or looser" : holeMm + 1e-9 >= t.Medium ? "medium" : "fine";
                return (t.Size, series);
            }
        }
        return null;
    }
}
