namespace PartForge.Geometry.Primitives;

/// <summary>Degree-based trigonometry that is exact at multiples of 90 degrees.</summary>
public static class Angle
{
    public static double Normalize360(double deg)
    {
        double r = deg % 360.0;
        return r < 0 ? r + 360.0 : r;
    }

    public static double SinDeg(double deg)
    {
        double r = Normalize360(deg);
        if (r == 0 || r == 180) return 0;
        if (r == 90) return 1;
        if (r == 270) return -1;
        return Math.Sin(r * Math.PI / 180.0);
    }

    public static double CosDeg(double deg)
    {
        double r = Normalize360(deg);
        if (r == 90 || r == 270) return 0;
        if (r == 0) return 1;
        if (r == 180) return -1;
        return Math.Cos(r * Math.PI / 180.0);
    }
}
