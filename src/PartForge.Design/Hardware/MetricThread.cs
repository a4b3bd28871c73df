namespace PartForge.Design.Hardware;

/// <summary>
/// One ISO metric coarse thread with the hardware sized from it: the pitch (ISO 261 coarse series), the
/// clearance holes (ISO 273 fine / medium / coarse) and the plain washer's outside diameter (ISO 7089, normal
/// series) and the hex nut (ISO 4032: width across flats s, height m). All from memory: the values commonly printed in fastener catalogues.
/// </summary>
public sealed record MetricThread(string Size, double NominalMm, double PitchMm, double FineHoleMm, double MediumHoleMm, double CoarseHoleMm, double WasherOdMm,
    double NutAcrossFlatsMm, double NutHeightMm)
{
    /// <summary>
    /// Tensile stress area, mm^2: A_s = pi/4 (d - 0.9382 P)^2, the mean of the pitch and minor diameters of the
    /// basic profile (ISO 898-1, with the basic dimensions of ISO 724).
    /// </summary>
    public double StressAreaMm2 => Math.PI / 4 * Math.Pow(NominalMm - 0.9382 * PitchMm, 2);

    /// <summary>The bearing annulus under a washer on a part with a hole of this diameter, mm^2.</summary>
    public double WasherBearingAreaMm2(double holeMm) => Math.PI / 4 * (WasherOdMm * WasherOdMm - holeMm * holeMm);

    /// <summary>Bearing area of the nut's hex face on a part with a hole of this diameter, mm^2: (sqrt 3 / 2) s^2 - pi/4 hole^2.</summary>
    public double NutBearingAreaMm2(double holeMm) => Math.Sqrt(3) / 2 * NutAcrossFlatsMm * NutAcrossFlatsMm - Math.PI / 4 * holeMm * holeMm;

    public override string ToString() => Size;
}

/// <summary>The metric coarse threads PartForge sizes fasteners from, smallest first (one table).</summary>
public static class MetricThreads
{
    /// <summary>Size, d, P, ISO 273 fine / medium / coarse holes, ISO 7089 washer OD, ISO 4032 nut s and m (mm, from memory).</summary>
    public static readonly IReadOnlyList<MetricThread> All =
    [
        new("M1.6", 1.6, 0.35, 1.7, 1.8, 2.0, 4.0, 3.2, 1.3),
        new("M2", 2.0, 0.4, 2.2, 2.4, 2.6, 5.0, 4, 1.6),
        new("M2.5", 2.5, 0.45, 2.7, 2.9, 3.1, 6.0, 5, 2),
        new("M3", 3.0, 0.5, 3.2, 3.4, 3.6, 7.0, 5.5, 2.4),
        new("M4", 4.0, 0.7, 4.3, 4.5, 4.8, 9.0, 7, 3.2),
        new("M5", 5.0, 0.8, 5.3, 5.5, 5.8, 10.0, 8, 4.7),
        new("M6", 6.0, 1.0, 6.4, 6.6, 7.0, 12.0, 10, 5.2),
        new("M8", 8.0, 1.25, 8.4, 9.0, 10.0, 16.0, 13, 6.8),
        new("M10", 10.0, 1.5, 10.5, 11.0, 12.0, 20.0, 16, 8.4),
        new("M12", 12.0, 1.75, 13.0, 13.5, 14.5, 24.0, 18, 10.8),
        new("M16", 16.0, 2.0, 17.0, 17.5, 18.5, 30.0, 24, 14.8),
        new("M20", 20.0, 2.5, 21.0, 22.0, 24.0, 37.0, 30, 18),
        new("M24", 24.0, 3.0, 25.0, 26.0, 28.0, 44.0, 36, 21.5),
        new("M30", 30.0, 3.5, 31.0, 33.0, 35.0, 56.0, 46, 25.6),
    ];

    /// <summary>
    /// The thread for a clearance hole, with the ISO 273 series the hole falls in: the largest thread whose
    /// fine-series hole is not larger than the hole, so the screw always passes; null below M1.6's.
    /// </summary>
    public static (MetricThread Thread, string Series)? ForHole(double holeMm)
    {
        for (int i = All.Count - 1; i >= 0; i--)
        {
            var t = All[i];
            if (holeMm + 1e-9 >= t.FineHoleMm)
            {
                string series = holeMm + 1e-9 >= t.CoarseHoleMm ? "coarse or looser" : holeMm + 1e-9 >= t.MediumHoleMm ? "medium" : "fine";
                return (t, series);
            }
        }
        return null;
    }
}

/// <summary>
/// The steel of a fastener: ISO 898-1 property class 8.8 (d &lt;= 16 mm), proof stress 580 MPa, minimum
/// 0.2% proof strength 640 MPa (from memory). One class is used for every stud and bolt.
/// </summary>
public static class FastenerSteel
{
    public const string PropertyClass = "8.8";

    /// <summary>Proof stress S_p of class 8.8, d &lt;= 16 mm, MPa (ISO 898-1, from memory).</summary>
    public const double ProofStressMpa = 580;

    /// <summary>Preload as a fraction of the proof load: 0.75 (common practice for reusable joints, from memory).</summary>
    public const double PreloadFractionOfProof = 0.75;

    /// <summary>Highest working tensile stress a check allows: half the proof stress (our choice, safety factor 2).</summary>
    public const double AllowableStressMpa = ProofStressMpa / 2;
}
