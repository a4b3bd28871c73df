namespace PartForge.Parts;

/// <summary>
/// Densities of the part materials the design file accepts, g/cm^3. Values are the usual nominal figures:
/// <list type="bullet">
/// <item>PLA 1.24: filament makers' datasheets, also ../shared/REFERENCE.md section 4 (common practice).</item>
/// <item>PETG 1.27, ABS 1.04, ASA 1.07, PA (nylon 6/12 family) 1.14: typical filament datasheet values (from memory).</item>
/// <item>Aluminium 2.70: pure and most wrought alloys 2.66-2.80 (handbook value, from memory).</item>
/// <item>Steel 7.85: the design density of structural steel, 7850 kg/m^3 (EN 1993-1-1, 3.2.6; from memory).</item>
/// <item>Acrylic (PMMA) 1.18: cast sheet datasheets (from memory).</item>
/// <item>Plywood 0.60: birch/poplar laser ply varies 0.45-0.75 (common practice, from memory).</item>
/// </list>
/// Printed densities assume a solid part (100% infill); a slicer's infill lowers the real mass.
/// </summary>
public static class Materials
{
    private static readonly Dictionary<string, double> Density = new(StringComparer.Ordinal)
    {
        ["PLA"] = 1.24,
        ["PETG"] = 1.27,
        ["ABS"] = 1.04,
        ["ASA"] = 1.07,
        ["PA"] = 1.14,
        ["aluminium"] = 2.70,
        ["steel"] = 7.85,
        ["acrylic"] = 1.18,
        ["plywood"] = 0.60,
    };

    /// <summary>Every material name the table knows, in the design file's spelling.</summary>
    public static IReadOnlyCollection<string> Names => Density.Keys;

    /// <summary>Density in g/cm^3; false for an unknown name.</summary>
    public static bool TryGetDensity(string material, out double gPerCm3) => Density.TryGetValue(material, out gPerCm3);

    /// <summary>Density in g/cm^3 (throws for an unknown name; the design validator only lets known names through).</summary>
    public static double DensityGPerCm3(string material) =>
        Density.TryGetValue(material, out double v) ? v : throw new ArgumentException($"unknown material '{material}'", nameof(material));

    /// <summary>True for the filament plastics (printable); false for metals and sheet goods.</summary>
    public static bool IsFilament(string material) => material is "PLA" or "PETG" or "ABS" or "ASA" or "PA";

    /// <summary>Mass in grams of a volume in mm^3 (1 cm^3 = 1000 mm^3).</summary>
    public static double MassG(string material, double volumeMm3) => DensityGPerCm3(material) * volumeMm3 / 1000.0;
}
