using System.Diagnostics.Contracts;

namespace PartForge.Checks.Mechanics;

/// <summary>
/// Flat annular plate, inner edge clamped (the hub), outer edge free (the rim), loaded by a ring load or a
/// uniform pressure on the face. Source: Roark's Formulas for Stress and Strain, 7th ed., Table 11.2,
/// case 1j (annular line load w at radius r0) and case 2j (uniform pressure q from r0 to the rim), with the
/// plate constants C2, C3, C8, C9 and the loading terms L3, L9, L11, L17 of that table.
/// Units: millimetres, newtons, MPa (N/mm^2); a line load in N/mm; a moment per unit length in N mm/mm
/// (numerically equal to N m/m).
/// </summary>
public static class AnnularPlate
{
    /// <summary>Flexural rigidity D = E t^3 / (12 (1 - nu^2)), N mm.</summary>
    [Pure]
    public static double Rigidity(double youngsMpa, double poisson, double thicknessMm) =>
        youngsMpa * thicknessMm * thicknessMm * thicknessMm / (12 * (1 - poisson * poisson));

    [Pure] public static double C2(double a, double b) { double q = b / a; return 0.25 * (1 - q * q * (1 + 2 * Math.Log(a / b))); }
    [Pure] public static double C3(double a, double b) { double q = b / a; return b / (4 * a) * ((q * q + 1) * Math.Log(a / b) + q * q - 1); }
    [Pure] public static double C8(double a, double b, double nu) { double q = b / a; return 0.5 * (1 + nu + (1 - nu) * q * q); }
    [Pure] public static double C9(double a, double b, double nu) { double q = b / a; return q * ((1 + nu) / 2 * Math.Log(a / b) + (1 - nu) / 4 * (1 - q * q)); }

    /// <summary>Loading term L3 (ring load at r0); same form as C3 with b replaced by r0.</summary>
    [Pure] public static double L3(double a, double r0) => r0 >= a ? 0 : C3(a, r0);

    /// <summary>Loading term L9 (ring load at r0); same form as C9 with b replaced by r0.</summary>
    [Pure] public static double L9(double a, double r0, double nu) => r0 >= a ? 0 : C9(a, r0, nu);

    /// <summary>
    /// Case 1j: deflection of the free outer edge under a total force spread as a ring load at radius r0
    /// (b &lt;= r0 &lt;= a), mm, negative in the direction of the load.
    /// y_a = -(w a^3 / D) [ (C2/C8)((r0/b) C9 - L9) - (r0/b) C3 + L3 ], w = F / (2 pi r0).
    /// </summary>
    [Pure]
    public static double RimDeflectionRingLoad(double totalForceN, double r0, double a, double b, double youngsMpa, double nu, double t)
    {
        double w = totalForceN / (2 * Math.PI * r0);
        double d = Rigidity(youngsMpa, nu, t);
        double bracket = C2(a, b) / C8(a, b, nu) * (r0 / b * C9(a, b, nu) - L9(a, r0, nu)) - r0 / b * C3(a, b) + L3(a, r0);
        return -w * a * a * a / d * bracket;
    }

    /// <summary>Case 1j: radial bending moment at the clamped edge, N mm/mm: M_rb = -(w a / C8) ((r0/b) C9 - L9).</summary>
    [Pure]
    public static double RootMomentRingLoad(double totalForceN, double r0, double a, double b, double nu)
    {
        double w = totalForceN / (2 * Math.PI * r0);
        return -w * a / C8(a, b, nu) * (r0 / b * C9(a, b, nu) - L9(a, r0, nu));
    }

    /// <summary>Bending stress at the surface for a moment per unit length: sigma = 6 M / t^2, MPa.</summary>
    [Pure]
    public static double BendingStress(double momentNmmPerMm, double t) => 6 * Math.Abs(momentNmmPerMm) / (t * t);
}
