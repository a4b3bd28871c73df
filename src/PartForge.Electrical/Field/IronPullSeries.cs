using PartForge.Design.Machines.Magnets;

namespace PartForge.Electrical.Field;

/// <summary>
/// Axial pull between the two rotors of a dual-rotor machine with back iron, by the image series of two
/// parallel iron faces. Between two ideal (infinitely permeable, unsaturated) iron planes the field of the
/// magnets is that of the magnets and the endless lattice of their images (each magnet mirrored in one face,
/// that image in the other, and so on; an image in ideal iron keeps the magnetisation's z-component). The
/// force on the upper rotor (its magnets and its iron) is the Maxwell stress across any plane in the gap, which
/// equals the force between every source above that plane and every source below it; so the pull includes the
/// magnets' attraction to the far iron and the attraction between the two iron discs. Every ring in the lattice
/// has the same shape, angles and pole pattern, so the force between two rings depends only on the axial gap
/// between their facing faces: <c>f(h)</c>, the surface-charge force of <see cref="MagneticPull.AxialForceN"/>
/// summed over the poles. An image in iron that is not ideal is weakened by that iron's image strength
/// (a factor between 0 and 1, multiplied along each chain of reflections).
/// The series is summed in order of growing h until the next group of terms changes the total by less than
/// <see cref="RelativeTolerance"/>.
/// </summary>
public sealed class IronPullSeries
{
    /// <summary>Stop when the next group of terms changes the pull by less than this fraction.</summary>
    public const double RelativeTolerance = 1e-4;

    /// <summary>Most reflections followed along one chain of images.</summary>
    public const int MaxReflections = 40;

    private readonly MagnetShape _shape;
    private readonly int _poles;
    private readonly double _br;
    private readonly double _far;
    private readonly int _order;
    private readonly double _tolerance;
    private readonly Dictionary<long, double> _cache = new();

    /// <param name="shape">the magnet (all rings alike)</param>
    /// <param name="poles">magnets per ring, alternating</param>
    /// <param name="brTesla">remanence of the real magnets</param>
    /// <param name="farFactor">dipole cut-over of the sources (see <see cref="MagnetSource"/>)</param>
    /// <param name="order">Gauss order of the face quadrature</param>
    /// <param name="tolerance">relative change that ends the series (default <see cref="RelativeTolerance"/>)</param>
    public IronPullSeries(MagnetShape shape, int poles, double brTesla, double farFactor, int order = 4, double tolerance = RelativeTolerance)
    {
        _tolerance = tolerance;
        _shape = shape;
        _poles = poles;
        _br = brTesla;
        _far = farFactor;
        _order = order;
    }

    /// <summary>
    /// Attraction between two rings of the lattice (unit strength) whose facing faces are <paramref name="gapMm"/>
    /// apart, N (positive: they attract).
    /// </summary>
    public double RingForceN(double gapMm)
    {
        long key = BitConverter.DoubleToInt64Bits(Math.Round(gapMm, 9));
        if (_cache.TryGetValue(key, out double f)) return f;
        double t = _shape.ThicknessMm;
        var target = new MagnetSource(_shape, 0, gapMm, gapMm + t, _br, _far);
        var ring = Enumerable.Range(0, _poles)
            .Select(k => new MagnetSource(_shape, k * 360.0 / _poles, -t, 0, (k % 2 == 0 ? 1 : -1) * _br, _far)).ToList();
        double grade = gapMm > 1e-9 ? gapMm : t;
        f = -_poles * MagneticPull.AxialForceN(target, ring, grade, _order);
        _cache[key] = f;
        return f;
    }

    /// <summary>
    /// Net pull on the upper rotor towards the lower one, N. The upper rotor's magnets span
    /// [<paramref name="upperMinMm"/>, upper + thickness] with its iron face at <paramref name="upperIronMm"/>
    /// (null: no iron); the lower rotor's magnets end at <paramref name="lowerMaxMm"/> with its iron face at
    /// <paramref name="lowerIronMm"/>. <paramref name="upperImage"/> and <paramref name="lowerImage"/> are the
    /// irons' image strengths (1: ideal iron).
    /// </summary>
    public double PullN(double upperMinMm, double lowerMaxMm, double? upperIronMm, double? lowerIronMm,
        double upperImage = 1, double lowerImage = 1)
    {
        double t = _shape.ThicknessMm;
        // Lattice members as (zMin, strength); above = upper rotor's side of the gap.
        var above = new List<(double Z, double S)> { (upperMinMm, 1) };
        var below = new List<(double Z, double S)> { (lowerMaxMm - t, 1) };
        double span = Math.Max((upperIronMm ?? upperMinMm + t) - (lowerIronMm ?? lowerMaxMm - t), t);
        foreach (var start in new[] { (Z: upperMinMm, Up: true), (Z: lowerMaxMm - t, Up: false) })
        {
            // Two chains from each real ring: first reflected in the upper iron, or first in the lower one.
            foreach (bool firstUpper in new[] { true, false })
            {
                double z = start.Z, s = 1;
                bool inUpper = firstUpper;
                for (int n = 0; n < MaxReflections; n++)
                {
                    double? plane = inUpper ? upperIronMm : lowerIronMm;
                    if (plane is not { } p) break;
                    z = 2 * p - (z + t);
                    s *= inUpper ? upperImage : lowerImage;
                    if (s == 0) break;
                    (inUpper ? above : below).Add((z, s));
                    inUpper = !inUpper;
                    if (n > 2 && Math.Abs(z - start.Z) > 4 * span + 200) break;
                }
            }
        }
        // Group the pairs by the gap between their facing faces.
        var groups = new SortedDictionary<double, double>();
        foreach (var u in above)
            foreach (var l in below)
            {
                double h = Math.Round(u.Z - (l.Z + t), 9);
                if (h < -1e-9) continue; // cannot happen for a valid stack; ignore rather than fail
                groups[Math.Max(h, 0)] = groups.GetValueOrDefault(Math.Max(h, 0)) + u.S * l.S;
            }
        double total = 0;
        int small = 0;
        foreach (var (h, weight) in groups)
        {
            double term = weight * RingForceN(h);
            total += term;
            // f falls off with h (at least as fast as the pole pattern's exp(-pi h / pole pitch)); two small groups
            // in a row end the series.
            small = Math.Abs(term) < _tolerance * Math.Abs(total) ? small + 1 : 0;
            if (small >= 2) break;
        }
        return total;
    }
}
