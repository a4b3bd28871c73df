using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// How a corner that a round tool (a cutter, a laser beam, an extruded bead) cannot reach is relieved:
/// the closed set <see cref="DogBoneRelief"/> (cut parts) and <see cref="CornerCircleRelief"/> (printed parts).
/// </summary>
public abstract record CornerReliefRule
{
    private protected CornerReliefRule() { }

    /// <summary>
    /// The radius of the round tool whose reach the relief restores: after the relief, a disc of this
    /// radius placed inside the cut touches the nominal corner point.
    /// </summary>
    internal abstract double ReachRadiusMm { get; }

    /// <summary>The notch circle at a corner V whose cut-side interior angle is alpha (radians), with b the
    /// unit bisector into the cut, and a point the notch arc passes through on the material side.</summary>
    internal abstract (Vec2 Center, double Radius, Vec2 Via) Notch(Vec2 v, Vec2 b, double alphaRad);

    internal abstract void Validate();
}
