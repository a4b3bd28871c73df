namespace PartForge.Export.Drawings;

/// <summary>Axis ticks at 1, 2 or 5 times a power of ten covering a range.</summary>
public static class NiceTicks
{
    public static (double Min, double Max, double Step) For(double min, double max, int targetCount = 6)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max)) return (0, 1, 0.2);
        if (max < min) (min, max) = (max, min);
        if (max - min < 1e-12)
        {
            double pad = Math.Abs(max) > 1e-12 ? Math.Abs(max) * 0.1 : 1;
            min -= pad; max += pad;
        }
        double raw = (max - min) / Math.Max(1, targetCount);
        double mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double norm = raw / mag;
        double step = (norm <= 1 ? 1 : norm <= 2 ? 2 : norm <= 5 ? 5 : 10) * mag;
        double lo = Math.Floor(min / step + 1e-9) * step;
        double hi = Math.Ceiling(max / step - 1e-9) * step;
        return (lo, hi, step);
    }
}
