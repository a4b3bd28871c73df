using PartForge.Design.Machines;
using PartForge.Design.Materials;

namespace PartForge.Checks.Mechanics;

/// <summary>
/// A rotor disc seen as an annular plate clamped at its hub (Roark Table 11.2, case 1j), loaded by the
/// magnetic pull as a ring load at the magnets' pitch radius.
///
/// Assumptions (documented in the report):
/// <list type="bullet">
/// <item>Hub radius b: the bolt circle radius when there is a bolt circle (the clamp is taken to end at the
/// bolt line, ignoring any hub flange beyond it: conservative); otherwise the bore radius + 5 mm (a shaft
/// collar or set-screw hub, common practice from memory), at least 5 mm.</item>
/// <item>Plate thickness: the full rotor thickness; the pockets' loss of stiffness is not modelled, nor the
/// stiffening by a back-iron disc (which the part builders leave unbonded).</item>
/// <item>The deflection used for the gap is the rim's (r = a), the largest anywhere on the disc.</item>
/// </list>
/// </summary>
public sealed record RotorPlate(double OuterRadiusMm, double HubRadiusMm, double LoadRadiusMm, double ThicknessMm, Material Material)
{
    public const double CollarMm = 5;

    public static double HubRadius(RotorSpec rotor) =>
        rotor.BoltCircle is { } bc ? Math.Max(bc.CircleDiameterMm / 2, 1e-3) : Math.Max(rotor.BoreMm / 2 + CollarMm, CollarMm);

    /// <summary>True when the clamp reaches the load (a hub as large as the magnet ring): no bending.</summary>
    public bool Rigid => HubRadiusMm >= LoadRadiusMm || HubRadiusMm >= OuterRadiusMm;

    /// <summary>Rim deflection under a pull of F newtons, mm (positive, toward the pull).</summary>
    public double RimDeflectionMm(double pullN) => Rigid || pullN <= 0 ? 0
        : -AnnularPlate.RimDeflectionRingLoad(pullN, LoadRadiusMm, OuterRadiusMm, HubRadiusMm, Material.YoungsModulusMpa, Material.PoissonRatio, ThicknessMm);

    /// <summary>Bending stress at the hub under a pull of F newtons, MPa.</summary>
    public double RootStressMpa(double pullN) => Rigid || pullN <= 0 ? 0
        : AnnularPlate.BendingStress(AnnularPlate.RootMomentRingLoad(pullN, LoadRadiusMm, OuterRadiusMm, HubRadiusMm, Material.PoissonRatio), ThicknessMm);

    /// <summary>Thickness at which the rim deflection falls to the given value (deflection scales as 1/t^3), mm.</summary>
    public double ThicknessForDeflection(double pullN, double deflectionMm)
    {
        double now = RimDeflectionMm(pullN);
        if (now <= 0 || deflectionMm <= 0) return ThicknessMm;
        return ThicknessMm * Math.Cbrt(now / deflectionMm);
    }
}
