namespace PartForge.Design.Materials;

/// <summary>
/// A part material with every property any stage uses, from the one table (<see cref="MaterialTable"/>).
/// </summary>
/// <param name="Name">Design-file spelling (PLA, PETG, ..., aluminium, steel, acrylic, plywood).</param>
/// <param name="IsFilament">A printing filament (printed by default); otherwise a metal or sheet good (cut by default).</param>
/// <param name="IsMagneticSteel">A soft magnetic steel that carries flux (acts as back iron).</param>
/// <param name="DensityKgM3">Density, kg/m^3 (printed parts: solid, 100% infill).</param>
/// <param name="YoungsModulusMpa">Elastic modulus E, MPa.</param>
/// <param name="PoissonRatio">Poisson's ratio nu.</param>
/// <param name="StrengthMpa">Tensile strength used for checks: for printed plastics the lower end of printed parts
/// (layer direction), for metals the yield strength, MPa.</param>
/// <param name="SofteningC">Temperature above which the material softens or loses its strength (glass transition for
/// amorphous plastics), C.</param>
/// <param name="SafetyFactor">Safety factor applied to StrengthMpa in every stress check.</param>
/// <param name="Source">Where the numbers come from.</param>
public sealed record Material(
    string Name,
    bool IsFilament,
    bool IsMagneticSteel,
    double DensityKgM3,
    double YoungsModulusMpa,
    double PoissonRatio,
    double StrengthMpa,
    double SofteningC,
    double SafetyFactor,
    string Source)
{
    /// <summary>Thermal conductivity, W/(m K) (the table's column; heat through a former's flange).</summary>
    public required double ThermalConductivityWPerMK { get; init; }

    /// <summary>Strength divided by the safety factor: the stress a check allows, MPa.</summary>
    public double AllowableStressMpa => StrengthMpa / SafetyFactor;

    /// <summary>Shear strength estimate, MPa: half the tensile strength (Tresca; common practice).</summary>
    public double ShearStrengthMpa => 0.5 * StrengthMpa;

    /// <summary>Mass in grams of a volume in mm^3.</summary>
    public double MassG(double volumeMm3) => DensityKgM3 * volumeMm3 * 1e-6;

    public override string ToString() => Name;
}
