namespace PartForge.Electrical.Coils;

/// <summary>Self-inductance of an air-core coil.</summary>
public static class CoilInductance
{
    /// <summary>
    /// Wheeler's multilayer formula (Proc. IRE 16(10), 1928): L[uH] = 0.031496 a^2 N^2 / (6a + 9b + 10c), with
    /// a the mean radius, b the axial length and c the radial depth, all in mm. About 1 % for circular coils
    /// whose three terms are of similar size.
    /// </summary>
    public static double WheelerMicrohenry(double meanRadiusMm, double axialLengthMm, double radialDepthMm, double turns) =>
        0.031496 * meanRadiusMm * meanRadiusMm * turns * turns / (6 * meanRadiusMm + 9 * axialLengthMm + 10 * radialDepthMm);
}
