using System.Globalization;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Cutting;

/// <summary>
/// Turns a design profile into the centre-line paths of a cutter with a given kerf: every outer boundary
/// grows by kerf/2, every hole shrinks by kerf/2 (exact offsets: circles change radius, arcs stay
/// concentric, lines stay parallel, convex corners are rounded, concave corners trimmed); marks are left
/// as they are. The cut part then measures what was designed.
/// </summary>
public static class KerfCompensation
{
    /// <summary>Largest kerf accepted (mm); anything wider is surely a unit mistake.</summary>
    public const double MaxKerfMm = 10;

    public static CutPlan Apply(CutSheet sheet)
    {
        ArgumentNullException.ThrowIfNull(sheet);
        string name = sheet.PartName ?? "";
        if (sheet.Cuts is null || sheet.Cuts.Outers is null || sheet.Cuts.Holes is null)
            throw new KerfCompensationException($"part '{name}': the cut profile is missing");
        if (!double.IsFinite(sheet.KerfMm) || sheet.KerfMm < 0 || sheet.KerfMm > MaxKerfMm)
            throw new KerfCompensationException(string.Create(CultureInfo.InvariantCulture,
                $"part '{name}': kerf {sheet.KerfMm} mm is outside 0..{MaxKerfMm} mm"));
        if (sheet.Cuts.Outers.Count == 0)
            throw new KerfCompensationException($"part '{name}': the cut profile has no outer boundary");

        double half = sheet.KerfMm / 2;
        var paths = new List<CutPath>();
        var marks = sheet.Marks ?? Array.Empty<Contour>();
        for (int i = 0; i < marks.Count; i++)
            paths.Add(new CutPath(CutPathKind.Mark, marks[i] ?? throw new KerfCompensationException($"part '{name}': mark {i} is missing"), i));
        for (int i = 0; i < sheet.Cuts.Holes.Count; i++)
            paths.Add(new CutPath(CutPathKind.Hole, Orient(Compensate(sheet.Cuts.Holes[i], -half, name, "hole", i), counterClockwise: false), i));
        for (int i = 0; i < sheet.Cuts.Outers.Count; i++)
            paths.Add(new CutPath(CutPathKind.Outline, Orient(Compensate(sheet.Cuts.Outers[i], half, name, "outline", i), counterClockwise: true), i));

        var min = new Vec2(double.PositiveInfinity, double.PositiveInfinity);
        var max = new Vec2(double.NegativeInfinity, double.NegativeInfinity);
        foreach (var p in paths) ContourBounds.Extend(p.Contour, ref min, ref max);
        if (!double.IsFinite(min.X) || !double.IsFinite(min.Y) || !double.IsFinite(max.X) || !double.IsFinite(max.Y))
            throw new KerfCompensationException($"part '{name}': a contour has a coordinate that is not a finite number");
        return new CutPlan(name, sheet.KerfMm, paths, min, max) { Frame = sheet.Frame };
    }

    private static Contour Compensate(Contour? c, double distanceMm, string part, string what, int index)
    {
        if (c is null) throw new KerfCompensationException($"part '{part}': {what} {index} is missing");
        if (distanceMm == 0) return c;
        try
        {
            return ContourOffset.Offset(c, distanceMm);
        }
        catch (ArgumentException e)
        {
            throw new KerfCompensationException(string.Create(CultureInfo.InvariantCulture,
                $"part '{part}': {what} {index} cannot be compensated by {distanceMm} mm for the kerf: {e.Message}"), e);
        }
    }

    private static Contour Orient(Contour c, bool counterClockwise)
    {
        if (c.Circle is not null) return c;
        bool isCcw = ContourOffset.SignedArea(c) > 0;
        return isCcw == counterClockwise ? c : ContourOffset.Reversed(c);
    }
}
