namespace PartForge.Bench;

/// <summary>Least-squares slope of log(y) against log(x): the growth exponent k in y ~ x^k.</summary>
public static class ScalingFit
{
    public static double Exponent(IReadOnlyList<(double X, double Y)> points)
    {
        var p = points.Where(q => q.X > 0 && q.Y > 0).Select(q => (Math.Log(q.X), Math.Log(q.Y))).ToArray();
        if (p.Length < 2) return double.NaN;
        double mx = p.Average(q => q.Item1), my = p.Average(q => q.Item2);
        double sxy = p.Sum(q => (q.Item1 - mx) * (q.Item2 - my)), sxx = p.Sum(q => (q.Item1 - mx) * (q.Item1 - mx));
        return sxx == 0 ? double.NaN : sxy / sxx;
    }
}
