namespace PartForge.Electrical.Field;

/// <summary>Axial magnetic forces, newtons (attractions reported as positive magnitudes).</summary>
public sealed record MagneticPullResult
{
    /// <summary>
    /// Attraction between one magnet and its rotor's back iron (image method: the magnet and all its
    /// rotor's magnets mirrored in the iron face), N; 0 without back iron. This force is internal to the
    /// rotor (it loads the magnet's seat and bond, not the bearing).
    /// </summary>
    public required double MagnetToBackIronN { get; init; }

    /// <summary>
    /// Net axial force pulling each rotor towards the other across the stator (dual-rotor), N; 0 for the other
    /// layouts (the coreless stator holds no iron, so a single rotor or the rotor of a dual-stator machine feels
    /// no net axial pull). This is the load that deflects the rotor disc.
    /// </summary>
    public required double RotorToRotorN { get; init; }

    /// <summary>The same per magnet, N.</summary>
    public required double RotorToRotorPerMagnetN { get; init; }

    /// <summary>Axial distance between facing magnet faces of the two rotors, mm (0 when not dual-rotor).</summary>
    public required double FaceToFaceMm { get; init; }

    /// <summary>
    /// Pull between the rotors against the face-to-face gap of their magnets while they are brought together
    /// (the first point is the running gap; then wider, until the pull is below 1 % of the running pull). Empty
    /// when not dual-rotor.
    /// </summary>
    public IReadOnlyList<PullCurvePoint> AssemblyCurve { get; init; } = Array.Empty<PullCurvePoint>();

    /// <summary>Model and approximations, one sentence.</summary>
    public required string Method { get; init; }
}
