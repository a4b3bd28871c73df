namespace PartForge.Checks.Materials;

/// <summary>
/// Mechanical and thermal properties of a part material, as the checks use them.
/// </summary>
/// <param name="Name">Design-file spelling (PLA, PETG, ..., aluminium, steel, acrylic, plywood).</param>
/// <param name="YoungsModulusMpa">Elastic modulus E, MPa.</param>
/// <param name="PoissonRatio">Poisson's ratio nu.</param>
/// <param name="DensityKgM3">Density, kg/m^3.</param>
/// <param name="StrengthMpa">Tensile strength used for checks: for printed plastics the lower end of printed
/// parts (layer direction), for metals the yield strength, MPa.</param>
/// <param name="SofteningC">Temperature above which the material softens or loses its strength (glass
/// transition for amorphous plastics), C.</param>
/// <param name="SafetyFactor">Safety factor applied to StrengthMpa in every stress check.</param>
/// <param name="Source">Where the numbers come from ("REFERENCE.md section 4 [pub]", "from memory", ...).</param>
public sealed record Material(
    string Name,
    double YoungsModulusMpa,
    double PoissonRatio,
    double DensityKgM3,
    double StrengthMpa,
    double SofteningC,
    double SafetyFactor,
    string Source)
{
    /// <summary>Strength divided by the safety factor: the stress a check allows, MPa.</summary>
    public double AllowableStressMpa => StrengthMpa / SafetyFactor;

    /// <summary>Shear strength estimate, MPa: half the tensile strength (Tresca; common practice).</summary>
    public double ShearStrengthMpa => 0.5 * StrengthMpa;

    /// <summary>True for materials that are 3D-printed by default (plastics).</summary>
    public bool IsPlastic => Name is "PLA" or "PETG" or "ABS" or "ASA" or "PA";
}
