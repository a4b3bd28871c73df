using System.Diagnostics.Contracts;

namespace PartForge.Geometry.Primitives;

/// <summary>A point or vector in the plane, millimetres.</summary>
public readonly record struct Vec2(double X, double Y)
{
    public static Vec2 operator +(Vec2 a, Vec2 b) => new(a.X + b.X, a.Y + b.Y);
    public static Vec2 operator -(Vec2 a, Vec2 b) => new(a.X - b.X, a.Y - b.Y);
    public static Vec2 operator *(Vec2 a, double s) => new(a.X * s, a.Y * s);
    public static Vec2 operator *(double s, Vec2 a) => new(a.X * s, a.Y * s);

    [Pure] public double Length => Math.Sqrt(X * X + Y * Y);
    [Pure] public double Dot(Vec2 o) => X * o.X + Y * o.Y;
    [Pure] public double Cross(Vec2 o) => X * o.Y - Y * o.X;

    /// <summary>Unit vector at an angle in degrees, exact at multiples of 90.</summary>
    [Pure] public static Vec2 FromAngleDeg(double deg) => new(Angle.CosDeg(deg), Angle.SinDeg(deg));

    /// <summary>This point rotated about the origin by an angle in degrees.</summary>
    [Pure]
    public Vec2 RotatedDeg(double deg)
    {
        double c = Angle.CosDeg(deg), s = Angle.SinDeg(deg);
        return new(c * X - s * Y, s * X + c * Y);
    }
}
