namespace PartForge.Electrical.Flux;

/// <summary>
/// Flux linkage of coil 0 (centred on +x) against the mechanical rotor angle theta (rotor turning
/// counter-clockwise seen from +z, magnet 0 over coil 0 at theta = 0), as a cosine series in the electrical
/// angle: lambda(theta) = Sum_n C_n cos(n p theta), n odd (the rotor's alternating poles give half-wave
/// symmetry; a coil centred on a symmetric pattern gives an even function). With same-pole magnets the field
/// period is one magnet pitch (PolePairs then holds the field periods per revolution, = poles), every order
/// n = 1, 2, 3 ... appears, and the linkage has a steady part <see cref="OffsetWb"/> (a non-zero mean); the EMF is the derivative, so the offset makes none.
/// </summary>
public sealed record FluxLinkageSeries
{
    /// <summary>Field periods per revolution: pole pairs p with alternating magnets, the magnet count with same-pole magnets.</summary>
    public required int PolePairs { get; init; }

    /// <summary>The steady part of the linkage, Wb-turns (0 with alternating magnets).</summary>
    public double OffsetWb { get; init; }

    /// <summary>Odd harmonic orders n (electrical), ascending.</summary>
    public required IReadOnlyList<int> Orders { get; init; }

    /// <summary>C_n, weber-turns, one per order.</summary>
    public required IReadOnlyList<double> CoefficientsWb { get; init; }

    /// <summary>lambda at a mechanical angle, Wb-turns.</summary>
    public double At(double thetaMechRad)
    {
        double s = OffsetWb;
        for (int i = 0; i < Orders.Count; i++) s += CoefficientsWb[i] * Math.Cos(Orders[i] * PolePairs * thetaMechRad);
        return s;
    }

    /// <summary>d lambda / d theta (per mechanical radian), Wb-turns/rad.</summary>
    public double Derivative(double thetaMechRad)
    {
        double s = 0;
        for (int i = 0; i < Orders.Count; i++)
        {
            double k = Orders[i] * PolePairs;
            s -= CoefficientsWb[i] * k * Math.Sin(k * thetaMechRad);
        }
        return s;
    }

    /// <summary>The series of sources <paramref name="factor"/> times as strong (the field is linear in the magnets' Br while no steel saturates).
    /// The steady part (same-pole magnets) scales with the rest.</summary>
    public FluxLinkageSeries Scaled(double factor) => this with { OffsetWb = OffsetWb * factor, CoefficientsWb = CoefficientsWb.Select(c => c * factor).ToArray() };

    /// <summary>Largest |lambda| over one electrical period, Wb-turns (sampled, then refined; see HarmonicSynth.Peak).</summary>
    public double PeakWb() => OffsetWb == 0
        ? HarmonicSynth.Peak(CoefficientsWb.Select(c => new System.Numerics.Complex(c, 0)).ToArray(), Orders)
        : HarmonicSynth.Peak(CoefficientsWb.Select(c => new System.Numerics.Complex(c, 0)).Prepend(new System.Numerics.Complex(OffsetWb, 0)).ToArray(), Orders.Prepend(0).ToArray());
}
