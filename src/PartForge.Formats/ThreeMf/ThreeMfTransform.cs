using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.ThreeMf;

/// <summary>
/// An affine placement as the 3MF Core Specification writes it (section 3.3, "3D Matrices"): a 3 x 3
/// linear part and a translation, applied to row vectors, p' = p * M + t, i.e.
/// x' = x M00 + y M10 + z M20 + Tx and so on; written as "m00 m01 m02 m10 m11 m12 m20 m21 m22 m30 m31 m32".
/// </summary>
public readonly record struct ThreeMfTransform(
    double M00, double M01, double M02,
    double M10, double M11, double M12,
    double M20, double M21, double M22,
    double Tx, double Ty, double Tz)
{
    public static ThreeMfTransform Identity => new(1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0);

    public static ThreeMfTransform Translation(Vec3 d) => new(1, 0, 0, 0, 1, 0, 0, 0, 1, d.X, d.Y, d.Z);

    /// <summary>Rotation about the z axis by an angle in degrees (counter-clockwise seen from +z, exact at
    /// multiples of 90), then a translation.</summary>
    public static ThreeMfTransform RotationZDeg(double deg, Vec3 translation)
    {
        double c = Angle.CosDeg(deg), s = Angle.SinDeg(deg);
        // Row-vector convention: x' = x c - y s, y' = x s + y c.
        return new(c, s, 0, -s, c, 0, 0, 0, 1, translation.X, translation.Y, translation.Z);
    }

    /// <summary>Where the placement puts a point.</summary>
    [Pure]
    public Vec3 Apply(Vec3 p) => new(
        p.X * M00 + p.Y * M10 + p.Z * M20 + Tx,
        p.X * M01 + p.Y * M11 + p.Z * M21 + Ty,
        p.X * M02 + p.Y * M12 + p.Z * M22 + Tz);

    /// <summary>Determinant of the linear part: positive for a placement that keeps the mesh outward.</summary>
    [Pure]
    public double Determinant =>
        M00 * (M11 * M22 - M12 * M21) - M01 * (M10 * M22 - M12 * M20) + M02 * (M10 * M21 - M11 * M20);

    [Pure]
    public bool IsIdentity => this == Identity;

    internal IEnumerable<double> Values()
    {
        yield return M00; yield return M01; yield return M02;
        yield return M10; yield return M11; yield return M12;
        yield return M20; yield return M21; yield return M22;
        yield return Tx; yield return Ty; yield return Tz;
    }
}
