using PartForge.Design.Model;

namespace PartForge.Design.Loading;

/// <summary>
/// Radial extent and neighbour web of the magnet pocket pattern, in closed form, for the loader's "do the
/// pockets fit at all" rules (the checker judges whether what fits is printable).
///
/// Pockets are the magnet grown by <c>rotor.pocket_clearance</c> (disc: on the diameter; block: on the
/// length and the width; arc: c/2 on each side of the radial and tangential size), centred on the pitch radius,
/// <c>machine.poles</c> of them evenly spaced. Neighbouring pockets are mirror images across the bisector
/// between them, so the web between them is twice the distance of one pocket from that line:
/// disc: 2 R sin(pi/n) - (D + c); block: 2 (r_in sin(pi/n) - (W + c)/2 cos(pi/n)) with r_in = R - (L + c)/2,
/// the inner corners being nearest; arc: 2 r_i sin(g/2) - c between the inner corners, g the angular gap.
/// (Geometry of a regular pattern; derivation in the comments of each case.)
/// </summary>
public readonly record struct PocketLayout(double InnerRadiusMm, double OuterRadiusMm, double WebMm, double PitchRadiusMm)
{
    /// <summary>Null when the magnet's size keys for its shape are missing.</summary>
    public static PocketLayout? From(Magnets m, Rotor r, int poles)
    {
        double c = r.PocketClearance;
        double half = Math.PI / poles;
        switch (m.Shape)
        {
            case "disc" when m.Diameter is { } dia && m.PitchRadius is { } R:
            {
                double rp = (dia + c) / 2;
                // Centres 2 R sin(pi/n) apart; each pocket reaches rp towards the other.
                return new PocketLayout(R - rp, R + rp, 2 * R * Math.Sin(half) - 2 * rp, R);
            }
            case "block" when m.Length is { } len && m.Width is { } wid && m.PitchRadius is { } R:
            {
                double l = len + c, w = wid + c;
                double rin = R - l / 2;
                // Farthest point: outer corner; nearest to the bisector: inner corner (rin, w/2).
                double rout = Math.Sqrt((R + l / 2) * (R + l / 2) + w * w / 4);
                double web = 2 * (rin * Math.Sin(half) - w / 2 * Math.Cos(half));
                return new PocketLayout(rin, rout, web, R);
            }
            case "arc" when m.InnerRadius is { } ri && m.OuterRadius is { } ro && m.Span is { } span:
            {
                double gap = 2 * half - span * Math.PI / 180;
                // Radial side edges an angle g apart: nearest points are the inner corners, 2 ri sin(g/2) apart.
                double web = gap <= 0 ? gap * ri - c : 2 * ri * Math.Sin(gap / 2) - c;
                return new PocketLayout(ri - c / 2, ro + c / 2, web, (ri + ro) / 2);
            }
            default:
                return null;
        }
    }
}
