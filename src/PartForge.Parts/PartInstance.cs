using PartForge.Design.Parts;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts;

/// <summary>
/// Where one copy of a part sits in the machine frame (nominal, not exploded). The machine frame is the
/// one of <see cref="PartForge.Design.Stack.AxialStack"/>: z along the shaft, z = 0 its mid-plane.
/// A part-local point (x, y, z) maps to the machine as follows:
/// <list type="number">
/// <item>xy: moved by (<see cref="OffsetXMm"/>, 0), then rotated by <see cref="RotationDeg"/> about the axis
/// (this places a former at its coil position in its stator);</item>
/// <item>if <see cref="Flipped"/>, turned over about the machine x axis (y -> -y, z -> -z), a proper rotation,
/// so a flipped part is the same physical part facing -z (its mesh keeps its outward orientation);</item>
/// <item>z: <c>BottomZMm + z</c> unflipped, <c>BottomZMm + (HeightMm - z)</c> flipped, so BottomZMm is always the
/// lowest machine z of the part.</item>
/// </list>
/// </summary>
/// <param name="Index">Copy number (0 for a single part; for formers stator index x coils + k, where k is the machine
/// coil index: the copy sits in seat-k of its host stator, at machine angle k x 360 / coils).</param>
/// <param name="Host">For formers: the stator part they sit in; otherwise the part itself.</param>
/// <param name="BottomZMm">Machine z of the part's lowest face.</param>
/// <param name="HeightMm">Part height (thickness of the layered solid).</param>
/// <param name="Flipped">Part faces -z (its local top face points down in the machine).</param>
/// <param name="RotationDeg">Rotation about the axis, after the offset.</param>
/// <param name="OffsetXMm">Radial offset before the rotation (a former's coil pitch radius), else 0.</param>
/// <param name="ExplodeRank">Signed multiple of <c>assembly.explode</c> added to z in the exploded assembly.</param>
public readonly record struct PartInstance(int Index, PartId Host, double BottomZMm, double HeightMm, bool Flipped,
    double RotationDeg, double OffsetXMm, double ExplodeRank)
{
    /// <summary>A part-local xy point in the machine frame.</summary>
    public Vec2 ToMachine(Vec2 p)
    {
        var q = (p + new Vec2(OffsetXMm, 0)).RotatedDeg(RotationDeg);
        return Flipped ? new Vec2(q.X, -q.Y) : q;
    }

    /// <summary>A part-local z in the machine frame (nominal).</summary>
    public double ToMachineZ(double z) => Flipped ? BottomZMm + (HeightMm - z) : BottomZMm + z;

    /// <summary>A part-local exact contour in the machine frame (exact: arcs stay arcs).</summary>
    public Contour ToMachine(Contour c)
    {
        var q = OffsetXMm != 0 ? c.Translated(new Vec2(OffsetXMm, 0)) : c;
        if (RotationDeg != 0) q = q.RotatedDeg(RotationDeg);
        return Flipped ? q.MirroredY() : q;
    }

    /// <summary>Machine z of the part's top face.</summary>
    public double TopZMm => BottomZMm + HeightMm;
}
