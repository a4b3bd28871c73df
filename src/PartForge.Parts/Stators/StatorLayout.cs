using PartForge.Design.Machines;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Stators;

/// <summary>
/// Angles shared by the stator ring(s) and the dual-stator spacer. Decisions:
/// <list type="bullet">
/// <item>Terminal exit (where every lead leaves the ring at its rim) at 180 degrees, the -x axis: the set of
/// ring features is then unchanged when a ring is turned over about the x axis, so the same ring serves
/// either side.</item>
/// <item>Mount hole j at phi0 + j x 360 / count with phi0 either 0 or half a hole spacing (both sets are
/// symmetric about the x axis), whichever keeps the holes farther (in angle) from the coil channels, the
/// sensor channels and the terminal exit; 0 on a tie.</item>
/// </list>
/// </summary>
internal static class StatorLayout
{
    public const double TerminalAngleDeg = 180;

    public static double MountOffsetDeg(MachineModel d, IReadOnlyList<double> sensorAnglesDeg)
    {
        if (d.Stator.Mount is not { } m) return 0;
        var avoid = Enumerable.Range(0, d.CoilsPerStator).Select(k => DesignGeometry.CoilAngleDeg(d, k))
            .Concat(sensorAnglesDeg).Concat(sensorAnglesDeg.Select(a => -a)).Append(TerminalAngleDeg).ToArray();
        double Score(double phi0) => Enumerable.Range(0, m.Count)
            .Min(j => avoid.Min(a => AngularDistance(phi0 + j * 360.0 / m.Count, a)));
        double half = 180.0 / m.Count;
        return Score(half) > Score(0) + 1e-9 ? half : 0;
    }

    public static double MountAngleDeg(MachineModel d, double offsetDeg, int j) => offsetDeg + j * 360.0 / d.Stator.Mount!.Count;

    public static double AngularDistance(double a, double b)
    {
        double x = Math.Abs(((a - b) % 360 + 360) % 360);
        return Math.Min(x, 360 - x);
    }
}
