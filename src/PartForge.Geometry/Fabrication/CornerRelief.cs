using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// Corner reliefs: a round tool (cutter, laser beam, extruded bead) leaves a round of its radius in every
/// corner of a cut whose angle, seen from the cut, is under 180 degrees (the corners of a rectangular hole;
/// the inner corners of a slot in an outer edge). These corners, concave from the material's side, get a
/// circular notch from a <see cref="CornerReliefRule"/>; corners that are convex from the material's side
/// can be reached and are left alone, as are tangent joints.
/// </summary>
/// <remarks>
/// The result is a new exact contour (lines and arcs) in the same loop direction: each relieved corner's
/// two segments are trimmed where they leave the notch circle and joined by the notch arc, which runs
/// through the material. A line meets the notch arc at the arc's computed end point exactly; an arc meets
/// it within rounding (1e-12 mm). A corner is relieved only where the round the tool would leave is deeper
/// than the chordal tolerance of the precision given: r (1 / sin(alpha / 2) - 1) for a tool of radius r and
/// a corner angle alpha, so the corners of a finely polygonised curve are not notched. It throws an
/// <see cref="ArgumentException"/> rather than return a bad outline when a notch needs more of a segment
/// than there is, two notches overlap, or the notch runs into another part of the contour.
/// </remarks>
public static class CornerRelief
{
    private const double TangentTurnRad = 1e-9;
    private const double ClosureMm = 1e-6;

    /// <summary>A hole's contour (material outside it) with its unreachable corners relieved.</summary>
    [Pure]
    public static Contour RelieveHole(Contour hole, CornerReliefRule rule, Precision precision) => Relieve(hole, cutIsInside: true, rule, precision);

    /// <summary>An outer contour (material inside it) with its unreachable (reflex) corners relieved.</summary>
    [Pure]
    public static Contour RelieveOuter(Contour outer, CornerReliefRule rule, Precision precision) => Relieve(outer, cutIsInside: false, rule, precision);

    /// <summary>Every outer and hole of a profile relieved. Notches that break into another contour are not
    /// detected here (the part's own clearance checks see them).</summary>
    [Pure]
    public static Profile Relieve(Profile profile, CornerReliefRule rule, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(profile);
        return new Profile(profile.Outers.Select(c => RelieveOuter(c, rule, precision)).ToArray(),
            profile.Holes.Select(c => RelieveHole(c, rule, precision)).ToArray());
    }

    private static Contour Relieve(Contour contour, bool cutIsInside, CornerReliefRule rule, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(contour);
        ArgumentNullException.ThrowIfNull(rule);
        ArgumentNullException.ThrowIfNull(precision);
        rule.Validate();
        if (!(precision.ChordalToleranceMm > 0)) throw new ArgumentOutOfRangeException(nameof(precision), "the chordal tolerance must be positive");
        if (contour.Circle is not null) return contour;
        var segs = contour.Segments;
        int n = segs.Count;
        for (int i = 0; i < n; i++)
        {
            if (Length(segs[i]) < ContourOffset.MinLengthMm) throw new ArgumentException($"segment {i} of the contour has no length", nameof(contour));
            if ((segs[i].End - segs[(i + 1) % n].Start).Length > ClosureMm) throw new ArgumentException($"the contour is not closed after segment {i}", nameof(contour));
        }
        double area = ContourOffset.SignedArea(contour);
        if (Math.Abs(area) < ContourOffset.MinLengthMm) throw new ArgumentException("the contour encloses no area", nameof(contour));
        // The cut lies to the left of the direction of travel for a counter-clockwise hole or a clockwise outer.
        double cutSide = (area > 0) == cutIsInside ? 1 : -1;
        double reach = rule.ReachRadiusMm;

        var notches = new ArcSegment?[n];   // notch at the joint after segment i
        var newStart = new Vec2?[n];
        var newEnd = new Vec2?[n];
        bool any = false;
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            Vec2 v = segs[j].Start;
            Vec2 t1 = EndTangent(segs[i]), t2 = StartTangent(segs[j]);
            double turn = Math.Atan2(t1.Cross(t2), t1.Dot(t2));
            if (Math.Abs(turn) < TangentTurnRad || turn * cutSide < 0) continue;
            double alpha = Math.PI - Math.Abs(turn);
            if (alpha < TangentTurnRad) throw new ArgumentException(FormattableString.Invariant($"the contour turns back on itself at ({v.X}, {v.Y})"), nameof(contour));
            double leftOver = reach * (1 / Math.Sin(alpha / 2) - 1);
            if (leftOver <= precision.ChordalToleranceMm) continue;

            Vec2 b = Unit(t2 - t1);
            var (c, r, via) = rule.Notch(v, b, alpha);
            Vec2 p1 = Exit(segs[i], atEnd: true, c, r, v, i);
            Vec2 p2 = Exit(segs[j], atEnd: false, c, r, v, j);
            double a1 = AngleDeg(p1 - c), a2 = AngleDeg(p2 - c), av = AngleDeg(via - c);
            double ccw = Angle.Normalize360(a2 - a1), viaCcw = Angle.Normalize360(av - a1);
            double sweep = viaCcw < ccw ? ccw : -(360 - ccw);
            var notch = new ArcSegment(c, r, a1, sweep);
            notches[i] = notch;
            newEnd[i] = notch.Start;
            newStart[j] = notch.End;
            any = true;
        }
        if (!any) return contour;

        var result = new List<Segment>(3 * n);
        for (int i = 0; i < n; i++)
        {
            result.Add(Trim(segs[i], newStart[i], newEnd[i], i));
            if (notches[i] is { } a) result.Add(a);
        }
        var relieved = Contour.FromSegments(result);
        if (ContourOffset.FindSelfCrossing(relieved) is { } hit)
            throw new ArgumentException(FormattableString.Invariant(
                $"a corner relief runs into another part of the contour near ({hit.X}, {hit.Y}): the feature is too small for the tool"), nameof(contour));
        double newArea = ContourOffset.SignedArea(relieved);
        bool grewCut = cutIsInside ? Math.Abs(newArea) > Math.Abs(area) : Math.Abs(newArea) < Math.Abs(area);
        if (Math.Sign(newArea) != Math.Sign(area) || !grewCut)
            throw new ArgumentException("the corner reliefs turned the contour inside out: the feature is too small for the tool", nameof(contour));
        return relieved;
    }

    /// <summary>Where a segment leaves the notch circle, going away from the corner v (at its end or its start).</summary>
    private static Vec2 Exit(Segment s, bool atEnd, Vec2 c, double r, Vec2 v, int index)
    {
        double best = double.PositiveInfinity;
        Vec2 bestP = default;
        double len = Length(s);
        switch (s)
        {
            case LineSegment l:
            {
                Vec2 far = atEnd ? l.From : l.To;
                Vec2 u = Unit(far - v);
                // |v + t u - c|^2 = r^2: t^2 + 2 t u.(v - c) + |v - c|^2 - r^2 = 0; the larger root.
                Vec2 w = v - c;
                double bq = u.Dot(w), cq = w.Dot(w) - r * r;
                double disc = bq * bq - cq;
                if (disc < 0) break;
                double t = -bq + Math.Sqrt(disc);
                if (t > ContourOffset.MinLengthMm && t < len) { best = t; bestP = v + u * t; }
                break;
            }
            case ArcSegment a:
            {
                double sign = Math.Sign(a.SweepDeg);
                double av = AngleDeg(v - a.Center);
                foreach (var p in CircleCircle(a.Center, a.Radius, c, r))
                {
                    double ap = AngleDeg(p - a.Center);
                    // Angle travelled from v along the segment, away from the corner.
                    double phi = atEnd ? Angle.Normalize360(sign * (av - ap)) : Angle.Normalize360(sign * (ap - av));
                    double arcLen = phi * Math.PI / 180 * a.Radius;
                    if (arcLen > 1e-9 && arcLen < len && arcLen < best) { best = arcLen; bestP = p; }
                }
                break;
            }
        }
        if (double.IsPositiveInfinity(best))
            throw new ArgumentException(FormattableString.Invariant(
                $"segment {index} is too short for the corner relief at ({v.X}, {v.Y}) (notch radius {r} mm)"));
        return bestP;
    }

    private static Segment Trim(Segment s, Vec2? from, Vec2? to, int index)
    {
        if (from is null && to is null) return s;
        switch (s)
        {
            case LineSegment l:
            {
                Vec2 a = from ?? l.From, b = to ?? l.To;
                if ((b - a).Dot(l.To - l.From) <= ContourOffset.MinLengthMm * (l.To - l.From).Length)
                    throw new ArgumentException($"the corner reliefs at both ends of segment {index} overlap: the segment is too short for the tool");
                return new LineSegment(a, b);
            }
            case ArcSegment arc:
            {
                double sign = Math.Sign(arc.SweepDeg);
                double start = from is { } f ? AngleDeg(f - arc.Center) : arc.StartDeg;
                double end = to is { } t ? AngleDeg(t - arc.Center) : arc.EndDeg;
                double off0 = from is null ? 0 : Angle.Normalize360(sign * (start - arc.StartDeg));
                double off1 = to is null ? Math.Abs(arc.SweepDeg) : Angle.Normalize360(sign * (end - arc.StartDeg));
                if (off1 == 0 && to is not null) off1 = 360; // rounding at a full turn
                double sweep = off1 - off0;
                if (!(sweep > ContourOffset.MinLengthMm) || off1 > Math.Abs(arc.SweepDeg) + 1e-9)
                    throw new ArgumentException($"the corner reliefs at both ends of segment {index} overlap: the segment is too short for the tool");
                return new ArcSegment(arc.Center, arc.Radius, arc.StartDeg + sign * off0, sign * sweep);
            }
            default:
                throw new ArgumentException("unknown segment type");
        }
    }

    private static IEnumerable<Vec2> CircleCircle(Vec2 c0, double r0, Vec2 c1, double r1)
    {
        Vec2 dc = c1 - c0;
        double dist = dc.Length;
        if (dist == 0) yield break;
        double a = (r0 * r0 - r1 * r1 + dist * dist) / (2 * dist);
        double h2 = r0 * r0 - a * a;
        if (h2 < 0) yield break;
        double h = Math.Sqrt(h2);
        Vec2 u = dc * (1.0 / dist);
        Vec2 m = c0 + u * a;
        Vec2 perp = new(-u.Y, u.X);
        yield return m + perp * h;
        yield return m - perp * h;
    }

    private static double Length(Segment s) => s switch
    {
        LineSegment l => (l.To - l.From).Length,
        ArcSegment a => Math.Abs(a.SweepDeg) * Math.PI / 180 * a.Radius,
        _ => throw new ArgumentException("unknown segment type"),
    };

    private static double AngleDeg(Vec2 v) => Math.Atan2(v.Y, v.X) * 180.0 / Math.PI;

    private static Vec2 Unit(Vec2 v) => v * (1.0 / v.Length);

    private static Vec2 StartTangent(Segment s) => s switch
    {
        LineSegment l => Unit(l.To - l.From),
        ArcSegment a => ArcTangent(a, a.StartDeg),
        _ => throw new ArgumentException("unknown segment type"),
    };

    private static Vec2 EndTangent(Segment s) => s switch
    {
        LineSegment l => Unit(l.To - l.From),
        ArcSegment a => ArcTangent(a, a.EndDeg),
        _ => throw new ArgumentException("unknown segment type"),
    };

    private static Vec2 ArcTangent(ArcSegment a, double atDeg)
    {
        var radial = Vec2.FromAngleDeg(atDeg);
        var ccw = new Vec2(-radial.Y, radial.X);
        return a.SweepDeg > 0 ? ccw : ccw * -1;
    }
}
