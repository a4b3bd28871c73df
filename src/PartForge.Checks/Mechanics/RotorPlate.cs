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
/// <item>Plate thickness: the full rotor thickness; the pockets' loss of stiffness is not modelled.</item>
/// <item>A back-iron disc bolted behind the rotor (<see cref="Backing"/>) stiffens it as a second plate that is
/// clamped at the same hub and bends with it but is NOT bonded to it: the two flexural rigidities add
/// (D = D_rotor + D_steel, each about its own mid-plane), and the rotor carries its share D_rotor / D of the pull.
/// A bonded disc would be stiffer (the steel's parallel-axis term); leaving that out is the conservative choice.
/// The steel counts only when it reaches the magnets' pitch radius, where the pull acts.</item>
/// <item>The deflection used for the gap is the rim's (r = a), the largest anywhere on the disc.</item>
/// </list>
/// </summary>
public sealed record RotorPlate(double OuterRadiusMm, double HubRadiusMm, double LoadRadiusMm, double ThicknessMm, Material Material)
{
    public const double CollarMm = 5;

    /// <summary>A steel disc bolted behind the rotor (outer radius, thickness, material), or null.</summary>
    public PlateBacking? Backing { get; init; }

    /// <summary>Flexural rigidity E t^3 / (12 (1 - nu^2)) of a plate, N mm.</summary>
    public static double Rigidity(Material m, double tMm) => m.YoungsModulusMpa * tMm * tMm * tMm / (12 * (1 - m.PoissonRatio * m.PoissonRatio));

    /// <summary>The fraction of the pull the rotor disc itself carries (1 without a backing disc).</summary>
    public double RotorShare
    {
        get
        {
            if (Backing is not { } b || b.OuterRadiusMm < LoadRadiusMm || b.ThicknessMm <= 0) return 1;
            double dr = Rigidity(Material, ThicknessMm), ds = Rigidity(b.Material, b.ThicknessMm);
            return dr / (dr + ds);
        }
    }

    public static double HubRadius(RotorSpec rotor) =>
        rotor.BoltCircle is { } bc ? Math.Max(bc.CircleDiameterMm / 2, 1e-3) : Math.Max(rotor.BoreMm / 2 + CollarMm, CollarMm);

    /// <summary>True when the clamp reaches the load (a hub as large as the magnet ring): no bending.</summary>
    public bool Rigid => HubRadiusMm >= LoadRadiusMm || HubRadiusMm >= OuterRadiusMm;

    /// <summary>Rim deflection under a pull of F newtons, mm (positive, toward the pull).</summary>
    public double RimDeflectionMm(double pullN) => Rigid || pullN <= 0 ? 0
        : -AnnularPlate.RimDeflectionRingLoad(pullN * RotorShare, LoadRadiusMm, OuterRadiusMm, HubRadiusMm, Material.YoungsModulusMpa, Material.PoissonRatio, ThicknessMm);

    /// <summary>Bending stress at the hub under a pull of F newtons, MPa.</summary>
    public double RootStressMpa(double pullN) => Rigid || pullN <= 0 ? 0
        : AnnularPlate.BendingStress(AnnularPlate.RootMomentRingLoad(pullN * RotorShare, LoadRadiusMm, OuterRadiusMm, HubRadiusMm, Material.PoissonRatio), ThicknessMm);

    /// <summary>Rotor thickness at which the rim deflection falls to the given value, mm (without a backing disc the
    /// deflection scales as 1/t^3; with one, solved by bisection on the same model).</summary>
    public double ThicknessForDeflection(double pullN, double deflectionMm)
    {
        double now = RimDeflectionMm(pullN);
        if (now <= 0 || deflectionMm <= 0) return ThicknessMm;
        double guess = ThicknessMm * Math.Cbrt(now / deflectionMm);
        if (Backing is null || RotorShare >= 1) return guess;
        if (now <= deflectionMm) return ThicknessMm;
        double lo = ThicknessMm, hi = Math.Max(guess, ThicknessMm * 1.01);
        while ((this with { ThicknessMm = hi }).RimDeflectionMm(pullN) > deflectionMm) hi *= 2;
        for (int i = 0; i < 60; i++)
        {
            double mid = (lo + hi) / 2;
            if ((this with { ThicknessMm = mid }).RimDeflectionMm(pullN) > deflectionMm) lo = mid; else hi = mid;
        }
        return hi;
    }
}

/// <summary>A steel disc bolted behind a rotor: its outer radius and thickness, mm, and material.</summary>
public sealed record PlateBacking(double OuterRadiusMm, double ThicknessMm, Material Material);
