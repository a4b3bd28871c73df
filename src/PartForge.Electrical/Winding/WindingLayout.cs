using System.Globalization;
using System.Numerics;

namespace PartForge.Electrical.Winding;

/// <summary>
/// Which coil belongs to which phase and which way round, from the star of slots (Cros and Viarouge, IEEE
/// Trans. Energy Conv. 17(2) 2002; Bianchi and Dai Pre, IEE Proc. EPA 153(3) 2006): coil k's EMF phasor lies
/// at k p 360/Q electrical degrees (its flux peaks that much later as the rotor turns counter-clockwise);
/// 60-degree phase belts A+ [-30, 30), C- [30, 90), B+ [90, 150), A- [150, 210), C+ [210, 270), B- [270, 330)
/// give each coil a phase and a direction, so that phase B lags A by 120 and C lags B by 120 degrees.
/// A 3-phase combination is valid when Q is a multiple of 3 and the three phase sums are equal and 120
/// degrees apart (the usual rule: Q / (3 gcd(Q, p)) is a whole number). A 1-phase combination is valid when
/// every coil is in phase or in antiphase (2p a multiple of Q: one coil per magnet, or one per pole pair).
///
/// Winding factor: kw1 = kp kd with the tooth-coil pitch factor kp = |sin(pi p / Q)| (a coil spanning one coil
/// pitch) and the distribution factor kd = |sum of a phase's phasors| / coils per phase. For 1-phase layouts
/// both are 1 (all coils aligned). For coreless coils the real coil-span effect is already inside the
/// integrated flux linkage, so the EMF never applies kp again; kw1 is reported for comparison with the
/// literature.
/// </summary>
public sealed record WindingLayout
{
    public required int Coils { get; init; }
    public required int Poles { get; init; }
    public required int Phases { get; init; }
    public int PolePairs => Poles / 2;

    /// <summary>False when the combination cannot make a balanced winding; see <see cref="Reason"/>.</summary>
    public required bool IsValid { get; init; }

    /// <summary>Why the combination is rejected (null when valid).</summary>
    public string? Reason { get; init; }

    /// <summary>One row per coil (empty when invalid).</summary>
    public required IReadOnlyList<CoilConnection> Table { get; init; }

    public required double PitchFactor { get; init; }
    public required double DistributionFactor { get; init; }
    public double WindingFactor => PitchFactor * DistributionFactor;

    /// <summary>Coils of one phase.</summary>
    public int CoilsPerPhase => Phases == 3 ? Coils / 3 : Coils;

    /// <summary>
    /// |sum over phase A of d_k exp(-i n p psi_k)| / coils per phase: the distribution factor for the n-th
    /// electrical harmonic.
    /// </summary>
    public double HarmonicDistributionFactor(int n) => Table.Count == 0 ? 0 : PhaseSum('A', n).Magnitude / CoilsPerPhase;

    /// <summary>Sum over the coils of a phase of d_k exp(-i n p psi_k) (psi_k the coil angle).</summary>
    public Complex PhaseSum(char phase, int n)
    {
        var s = Complex.Zero;
        foreach (var c in Table)
            if (c.Phase == phase)
                s += c.Direction * Complex.FromPolarCoordinates(1, -n * PolePairs * c.AngleDeg * Math.PI / 180);
        return s;
    }

    /// <summary>The layout for a combination; an invalid one carries its reason.</summary>
    public static WindingLayout For(int coils, int poles, int phases)
    {
        var inv = CultureInfo.InvariantCulture;
        WindingLayout Bad(string reason) => new()
        {
            Coils = coils, Poles = poles, Phases = phases, IsValid = false, Reason = reason,
            Table = Array.Empty<CoilConnection>(), PitchFactor = 0, DistributionFactor = 0,
        };
        if (coils < 1) return Bad("machine.coils must be at least 1.");
        if (poles < 2 || poles % 2 != 0) return Bad(string.Format(inv, "machine.poles {0} must be an even number of at least 2 (north and south alternate).", poles));
        if (phases != 1 && phases != 3) return Bad(string.Format(inv, "machine.phases {0} is not supported; use 1 or 3.", phases));
        int p = poles / 2;
        var rows = new List<CoilConnection>();
        if (phases == 1)
        {
            if ((2 * p) % coils != 0)
                return Bad(string.Format(inv, "{0} coils with {1} poles are not all in phase for a 1-phase winding (their EMFs would partly cancel); use coils = poles ({1}) or coils = poles/2 ({2}), or 3 phases.", coils, poles, p));
            for (int k = 0; k < coils; k++)
            {
                long num = (long)k * p % coils; // phasor = num * 360 / coils
                double ph = 360.0 * num / coils;
                int dir = 2 * num == coils ? -1 : 1; // 0 or 180 only
                rows.Add(new CoilConnection(k, 360.0 * k / coils, 'A', dir, ph));
            }
            return new WindingLayout { Coils = coils, Poles = poles, Phases = 1, IsValid = true, Table = rows, PitchFactor = 1, DistributionFactor = 1 };
        }
        if (coils % 3 != 0)
            return Bad(string.Format(inv, "machine.coils {0} is not a multiple of 3, so the coils cannot be shared equally by 3 phases; use {1} or {2} coils, or machine.phases: 1.", coils, coils / 3 * 3 == 0 ? 3 : coils / 3 * 3, coils / 3 * 3 + 3));
        char[] belts = { 'A', 'C', 'B', 'A', 'C', 'B' };
        int[] dirs = { 1, -1, 1, -1, 1, -1 };
        for (int k = 0; k < coils; k++)
        {
            // belt = floor((k p 360/Q + 30) / 60) mod 6 = floor((12 k p + Q) / (2Q)) mod 6, in integers.
            long kp = (long)k * p % coils;
            long belt = (12 * kp + coils) / (2L * coils) % 6;
            rows.Add(new CoilConnection(k, 360.0 * k / coils, belts[belt], dirs[belt], 360.0 * kp / coils));
        }
        var tmp = new WindingLayout { Coils = coils, Poles = poles, Phases = 3, IsValid = true, Table = rows, PitchFactor = 0, DistributionFactor = 0 };
        var sa = tmp.PhaseSum('A', 1);
        var sb = tmp.PhaseSum('B', 1);
        var sc = tmp.PhaseSum('C', 1);
        int na = rows.Count(r => r.Phase == 'A'), nb = rows.Count(r => r.Phase == 'B'), nc = rows.Count(r => r.Phase == 'C');
        int t = Gcd(coils, p);
        string rule = string.Format(inv, "machine.coils {0} with machine.poles {1} give no balanced 3-phase winding (coils / (3 x gcd(coils, pole pairs)) = {0}/{2} must be a whole number); choose e.g. 9 coils with 12 poles, 12 with 10 or 14, or 9 with 8 or 10.", coils, poles, 3 * t);
        if (na != coils / 3 || nb != coils / 3 || nc != coils / 3 || sa.Magnitude < 1e-9 * coils) return Bad(rule);
        double tol = 1e-6 * Math.Max(1, sa.Magnitude);
        // B lags A by 120: (phasor convention exp(-i n p psi)) sb = sa * exp(-i 120 deg)
        var rot = Complex.FromPolarCoordinates(1, -2 * Math.PI / 3);
        if ((sb - sa * rot).Magnitude > tol || (sc - sb * rot).Magnitude > tol) return Bad(rule);
        return tmp with
        {
            PitchFactor = Math.Abs(Math.Sin(Math.PI * p / coils)),
            DistributionFactor = sa.Magnitude / (coils / 3),
        };
    }

    private static int Gcd(int a, int b) => b == 0 ? a : Gcd(b, a % b);
}
