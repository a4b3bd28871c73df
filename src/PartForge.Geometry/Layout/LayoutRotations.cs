namespace PartForge.Geometry.Layout;

/// <summary>Common sets of allowed rotations (degrees, counter-clockwise about the part-local origin).</summary>
public static class LayoutRotations
{
    /// <summary>0 only: the parts keep their orientation (grain direction, a printed part's seam side).</summary>
    public static IReadOnlyList<double> None { get; } = new[] { 0.0 };

    /// <summary>0, 90, 180 and 270 degrees (exact: no re-discretisation at quarter turns).</summary>
    public static IReadOnlyList<double> QuarterTurns { get; } = new[] { 0.0, 90.0, 180.0, 270.0 };

    /// <summary>0, step, 2 step, ... below 360 degrees (step in (0, 360]).</summary>
    public static IReadOnlyList<double> Every(double stepDeg)
    {
        if (!(stepDeg > 0) || stepDeg > 360 || !double.IsFinite(stepDeg)) throw new ArgumentOutOfRangeException(nameof(stepDeg), "the rotation step must be in (0, 360] degrees");
        var r = new List<double>();
        for (int k = 0; k * stepDeg < 360 - 1e-9; k++) r.Add(k * stepDeg);
        return r;
    }
}
