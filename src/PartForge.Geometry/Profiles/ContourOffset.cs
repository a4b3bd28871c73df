using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Profiles;

/// <summary>
/// Exact offset of a closed contour made of lines and arcs (and of full circles): lines move parallel,
/// arcs stay concentric, corners that open up on the offset side get a round arc about the original
/// corner, corners that close up are trimmed at the intersection of the two offset pieces. The result is
/// again lines and arcs, so writers keep true arcs (used for kerf compensation of cut parts).
/// </summary>
/// <remarks>
/// It fails with an <see cref="ArgumentException"/> instead of returning a wrong outline when a piece of
/// the contour vanishes (an arc whose radius drops to zero, a segment trimmed away by its neighbours, a
/// circle that shrinks to nothing) or when pieces far apart along the contour run into each other (a neck
/// or gap narrower than twice the offset), found by testing every pair of non-neighbouring pieces.
/// </remarks>
public static class ContourOffset
{
    /// <summary>Segments shorter than this (mm, or degrees of sweep for arcs) are treated as absent.</summary>
    public const double MinLengthMm = 1e-9;

    /// <summary>Consecutive segments whose ends are further apart than this are reported as an open contour.</summary>
    public const double ClosureToleranceMm = 1e-6;

    /// <summary>Turns smaller than this (radians) are treated as tangent-continuous joints.</summary>
    private const double TangentTurnRad = 1e-9;

    /// <summary>
    /// A joint whose offset pieces would be less than this far apart (turn x offset, mm) is treated as
    /// tangent: no joint arc, no trim; the writers join the pieces at the next piece's start, a shift of at
    /// most this much (keeps finely polygonised input free of ill-conditioned sliver joints).
    /// </summary>
    public const double JointGapMm = 1e-5;

    /// <summary>
    /// The contour moved outward by <paramref name="distanceMm"/> (away from the area it encloses);
    /// a negative distance moves it inward. The loop direction of the input is kept.
    /// </summary>
    [Pure]
    public static Contour Offset(Contour contour, double distanceMm)
    {
        ArgumentNullException.ThrowIfNull(contour);
        if (!double.IsFinite(distanceMm)) throw new ArgumentOutOfRangeException(nameof(distanceMm), "offset distance must be finite");
        if (contour.Circle is { } circle)
        {
            double r = circle.Radius + distanceMm;
            if (!(r > MinLengthMm))
                throw new ArgumentException(FormattableString.Invariant(
                    $"a circle of radius {circle.Radius} mm vanishes under an inward offset of {-distanceMm} mm"), nameof(contour));
            return Contour.FullCircle(circle.Center, r);
        }
        if (distanceMm == 0) return contour;

        var segs = contour.Segments.Where(s => !IsNegligible(s)).ToArray();
        if (segs.Length == 0) throw new ArgumentException("the contour has no segment of non-zero length", nameof(contour));
        for (int i = 0; i < segs.Length; i++)
        {
            var gap = (segs[i].End - segs[(i + 1) % segs.Length].Start).Length;
            if (gap > ClosureToleranceMm)
                throw new ArgumentException(FormattableString.Invariant(
                    $"the contour is not closed: segment {i} ends {gap} mm from the start of the next"), nameof(contour));
        }
        double area = SignedArea(contour);
        if (Math.Abs(area) < MinLengthMm) throw new ArgumentException("the contour encloses no area", nameof(contour));

        // Offset to the right of the direction of travel by d: for a counter-clockwise loop that is outward.
        double d = area > 0 ? distanceMm : -distanceMm;
        int n = segs.Length;
        var pieces = new Piece[n];
        for (int i = 0; i < n; i++) pieces[i] = Piece.Of(segs[i], d, i);

        var joints = new ArcSegment?[n]; // joint between piece i and piece i+1
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            Vec2 corner = Mid(segs[i].End, segs[j].Start);
            Vec2 t1 = EndTangent(segs[i]), t2 = StartTangent(segs[j]);
            double turn = Math.Atan2(t1.Cross(t2), t1.Dot(t2));
            if (Math.Abs(turn) < TangentTurnRad || Math.Abs(turn * d) < JointGapMm) continue;
            if (Math.PI - Math.Abs(turn) < TangentTurnRad)
                throw new ArgumentException(FormattableString.Invariant($"the contour turns back on itself at ({corner.X}, {corner.Y})"), nameof(contour));
            if (turn * d > 0)
            {
                // The corner opens up on the offset side: a round arc about the original corner.
                Vec2 from = RightNormal(t1) * d;
                joints[i] = new ArcSegment(corner, Math.Abs(d), AngleDeg(from), turn * 180.0 / Math.PI);
            }
            else
            {
                // The corner closes up: trim both pieces at their intersection nearest the corner.
                Vec2 x = Intersect(pieces[i], pieces[j], corner, Math.Abs(d));
                pieces[i].NewEnd = x;
                pieces[j].NewStart = x;
            }
        }

        var result = new List<Segment>(2 * n);
        for (int i = 0; i < n; i++)
        {
            result.Add(pieces[i].Finish());
            if (joints[i] is { } arc) result.Add(arc);
        }
        var offset = Contour.FromSegments(result);
        double newArea = SignedArea(offset);
        bool sameSense = Math.Sign(newArea) == Math.Sign(area);
        bool rightSize = distanceMm > 0 ? Math.Abs(newArea) > Math.Abs(area) : Math.Abs(newArea) < Math.Abs(area);
        if (!sameSense || !rightSize)
            throw new ArgumentException(FormattableString.Invariant(
                $"the contour turns inside out under an offset of {distanceMm} mm (a feature is smaller than the offset)"), nameof(contour));
        if (FindSelfCrossing(offset) is { } hit)
            throw new ArgumentException(FormattableString.Invariant(
                $"the offset contour crosses itself near ({hit.X}, {hit.Y}): a neck or gap is narrower than twice the offset of {Math.Abs(distanceMm)} mm"), nameof(contour));
        return offset;
    }

    /// <summary>
    /// Signed enclosed area in mm^2, positive for a counter-clockwise loop (exact for arcs: chord polygon
    /// plus the circular segments). A full circle counts as counter-clockwise.
    /// </summary>
    [Pure]
    public static double SignedArea(Contour contour)
    {
        ArgumentNullException.ThrowIfNull(contour);
        if (contour.Circle is { } c) return Math.PI * c.Radius * c.Radius;
        double twice = 0;
        foreach (var s in contour.Segments)
        {
            twice += s.Start.Cross(s.End);
            if (s is ArcSegment a)
            {
                double phi = a.SweepDeg * Math.PI / 180.0;
                twice += a.Radius * a.Radius * (phi - Math.Sin(phi));
            }
        }
        return twice / 2;
    }

    /// <summary>The same loop travelled the other way (a full circle is returned unchanged).</summary>
    [Pure]
    public static Contour Reversed(Contour contour)
    {
        ArgumentNullException.ThrowIfNull(contour);
        if (contour.Circle is not null) return contour;
        var segs = new Segment[contour.Segments.Count];
        for (int i = 0; i < segs.Length; i++)
        {
            segs[segs.Length - 1 - i] = contour.Segments[i] switch
            {
                LineSegment l => new LineSegment(l.To, l.From),
                ArcSegment a => new ArcSegment(a.Center, a.Radius, a.StartDeg + a.SweepDeg, -a.SweepDeg),
                _ => throw new ArgumentException("unknown segment type", nameof(contour)),
            };
        }
        return Contour.FromSegments(segs);
    }

    /// <summary>A point where two pieces that do not follow each other cross or touch, if any (a sweep over the pieces' boxes sorted by x). Also used by the corner reliefs to check their result.</summary>
    internal static Vec2? FindSelfCrossing(Contour c)
    {
        var segs = c.Segments;
        int n = segs.Count;
        if (n < 3) return null;
        var boxes = new (Vec2 Min, Vec2 Max)[n];
        for (int i = 0; i < n; i++) boxes[i] = Box(segs[i]);
        // Sweep over the boxes sorted by their left edge: only pairs whose x ranges overlap are tested.
        var order = Enumerable.Range(0, n).OrderBy(k => boxes[k].Min.X).ToArray();
        var hits = new List<Vec2>(2);
        for (int oi = 0; oi < n; oi++)
        {
            int i = order[oi];
            var (a0, a1) = boxes[i];
            for (int oj = oi + 1; oj < n && boxes[order[oj]].Min.X <= a1.X + ClosureToleranceMm; oj++)
            {
                int j = order[oj];
                int gap = Math.Abs(i - j);
                if (gap <= 1 || gap == n - 1) continue; // neighbours share an end
                var (b0, b1) = boxes[j];
                if (a1.Y < b0.Y - ClosureToleranceMm || b1.Y < a0.Y - ClosureToleranceMm) continue;
                hits.Clear();
                Carriers(segs[i], segs[j], hits);
                foreach (var p in hits)
                    if (OnSegment(segs[i], p) && OnSegment(segs[j], p)) return p;
            }
        }
        return null;
    }

    private static (Vec2 Min, Vec2 Max) Box(Segment s)
    {
        if (s is ArcSegment a)
        {
            // The circle's box: cheap and never too small.
            var r = new Vec2(a.Radius, a.Radius);
            return (a.Center - r, a.Center + r);
        }
        return (new Vec2(Math.Min(s.Start.X, s.End.X), Math.Min(s.Start.Y, s.End.Y)), new Vec2(Math.Max(s.Start.X, s.End.X), Math.Max(s.Start.Y, s.End.Y)));
    }

    private static void Carriers(Segment s, Segment t, List<Vec2> into)
    {
        switch (s, t)
        {
            case (LineSegment a, LineSegment b):
            {
                Vec2 da = a.To - a.From, db = b.To - b.From;
                double den = da.Cross(db);
                if (den != 0) into.Add(a.From + da * ((b.From - a.From).Cross(db) / den));
                break;
            }
            case (LineSegment a, ArcSegment b): LineCircle(a.From, a.To, b.Center, b.Radius, into); break;
            case (ArcSegment a, LineSegment b): LineCircle(b.From, b.To, a.Center, a.Radius, into); break;
            case (ArcSegment a, ArcSegment b): CircleCircle(a.Center, a.Radius, b.Center, b.Radius, into); break;
        }
    }

    private static bool OnSegment(Segment s, Vec2 p)
    {
        const double eps = ClosureToleranceMm;
        if (s is LineSegment l)
        {
            Vec2 d = l.To - l.From;
            double len = d.Length;
            double t = (p - l.From).Dot(d) / len;
            return t >= -eps && t <= len + eps && Math.Abs((p - l.From).Cross(d) / len) <= eps;
        }
        var a = (ArcSegment)s;
        if (Math.Abs((p - a.Center).Length - a.Radius) > eps) return false;
        double rel = Angle.Normalize360(Math.Sign(a.SweepDeg) * (AngleDeg(p - a.Center) - a.StartDeg));
        double tolDeg = eps / a.Radius * 180.0 / Math.PI;
        return rel <= Math.Abs(a.SweepDeg) + tolDeg || rel >= 360 - tolDeg;
    }

    private static bool IsNegligible(Segment s) => s switch
    {
        LineSegment l => (l.To - l.From).Length < MinLengthMm,
        ArcSegment a => Math.Abs(a.SweepDeg) < MinLengthMm || a.Radius < MinLengthMm,
        _ => throw new ArgumentException("unknown segment type"),
    };

    private static Vec2 Mid(Vec2 a, Vec2 b) => new((a.X + b.X) / 2, (a.Y + b.Y) / 2);

    private static Vec2 RightNormal(Vec2 t) => new(t.Y, -t.X);

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

    private static double Wrap180(double deg) => deg - 360.0 * Math.Round(deg / 360.0);

    /// <summary>The intersection of the two offset pieces' carriers (lines, full circles) nearest the corner.</summary>
    private static Vec2 Intersect(in Piece a, in Piece b, Vec2 corner, double reach)
    {
        var candidates = new List<Vec2>(2);
        if (!a.IsArc && !b.IsArc)
        {
            Vec2 da = a.P1 - a.P0, db = b.P1 - b.P0;
            double den = da.Cross(db);
            if (den != 0) candidates.Add(a.P0 + da * ((b.P0 - a.P0).Cross(db) / den));
        }
        else if (a.IsArc && b.IsArc) CircleCircle(a.Center, a.Radius, b.Center, b.Radius, candidates);
        else if (a.IsArc) LineCircle(b.P0, b.P1, a.Center, a.Radius, candidates);
        else LineCircle(a.P0, a.P1, b.Center, b.Radius, candidates);

        if (candidates.Count == 0)
        {
            // Carriers that just miss each other (tangent within rounding): meet halfway between the piece ends.
            Vec2 m = Mid(a.EndPoint, b.StartPoint);
            if ((a.EndPoint - b.StartPoint).Length <= 1e-7 * Math.Max(1, reach)) return m;
            throw new ArgumentException(FormattableString.Invariant(
                $"the offset pieces at ({corner.X}, {corner.Y}) do not meet (a feature is smaller than the offset)"));
        }
        Vec2 best = candidates[0];
        for (int k = 1; k < candidates.Count; k++)
            if ((candidates[k] - corner).Length < (best - corner).Length) best = candidates[k];
        return best;
    }

    private static void LineCircle(Vec2 p0, Vec2 p1, Vec2 c, double r, List<Vec2> into)
    {
        Vec2 d = Unit(p1 - p0);
        Vec2 f = p0 - c;
        double b = f.Dot(d);
        double disc = b * b - (f.Dot(f) - r * r);
        if (disc < 0)
        {
            if (disc > -1e-12 * Math.Max(1, r * r)) into.Add(p0 + d * -b);
            return;
        }
        double s = Math.Sqrt(disc);
        into.Add(p0 + d * (-b - s));
        into.Add(p0 + d * (-b + s));
    }

    private static void CircleCircle(Vec2 c0, double r0, Vec2 c1, double r1, List<Vec2> into)
    {
        Vec2 dc = c1 - c0;
        double dist = dc.Length;
        if (dist == 0) return;
        double a = (r0 * r0 - r1 * r1 + dist * dist) / (2 * dist);
        double h2 = r0 * r0 - a * a;
        Vec2 u = dc * (1.0 / dist);
        Vec2 basePt = c0 + u * a;
        if (h2 < 0)
        {
            if (h2 > -1e-12 * Math.Max(1, r0 * r0)) into.Add(basePt);
            return;
        }
        double h = Math.Sqrt(h2);
        var perp = new Vec2(-u.Y, u.X);
        into.Add(basePt + perp * h);
        into.Add(basePt - perp * h);
    }

    /// <summary>One segment moved to the right by d, with optional trimmed ends.</summary>
    private struct Piece
    {
        public bool IsArc;
        public int Index;
        // line
        public Vec2 P0, P1, Direction;
        // arc
        public Vec2 Center;
        public double Radius, StartDeg, SweepDeg;
        public Vec2? NewStart, NewEnd;

        public readonly Vec2 StartPoint => NewStart ?? (IsArc ? Center + Vec2.FromAngleDeg(StartDeg) * Radius : P0);
        public readonly Vec2 EndPoint => NewEnd ?? (IsArc ? Center + Vec2.FromAngleDeg(StartDeg + SweepDeg) * Radius : P1);

        public static Piece Of(Segment s, double d, int index)
        {
            switch (s)
            {
                case LineSegment l:
                {
                    Vec2 t = Unit(l.To - l.From);
                    Vec2 shift = RightNormal(t) * d;
                    return new Piece { Index = index, P0 = l.From + shift, P1 = l.To + shift, Direction = t };
                }
                case ArcSegment a:
                {
                    double r = a.Radius + d * Math.Sign(a.SweepDeg);
                    if (!(r > MinLengthMm))
                        throw new ArgumentException(FormattableString.Invariant(
                            $"segment {index}: an arc of radius {a.Radius} mm vanishes under an offset of {Math.Abs(d)} mm"));
                    return new Piece { IsArc = true, Index = index, Center = a.Center, Radius = r, StartDeg = a.StartDeg, SweepDeg = a.SweepDeg };
                }
                default:
                    throw new ArgumentException("unknown segment type");
            }
        }

        public readonly Segment Finish()
        {
            if (!IsArc)
            {
                Vec2 from = NewStart ?? P0, to = NewEnd ?? P1;
                if ((to - from).Dot(Direction) <= MinLengthMm)
                    throw new ArgumentException(FormattableString.Invariant(
                        $"segment {Index}: a straight piece is trimmed away by its neighbours (a feature is smaller than the offset)"));
                return new LineSegment(from, to);
            }
            double sign = Math.Sign(SweepDeg);
            double start = StartDeg, sweepAbs = Math.Abs(SweepDeg);
            if (NewStart is { } ps)
            {
                double moved = Wrap180(sign * (AngleDeg(ps - Center) - StartDeg));
                start = StartDeg + sign * moved;
                sweepAbs -= moved;
            }
            if (NewEnd is { } pe)
            {
                double extended = Wrap180(sign * (AngleDeg(pe - Center) - (StartDeg + SweepDeg)));
                sweepAbs += extended;
            }
            if (!(sweepAbs > MinLengthMm) || sweepAbs >= 360)
                throw new ArgumentException(FormattableString.Invariant(
                    $"segment {Index}: an arc is trimmed away by its neighbours (a feature is smaller than the offset)"));
            return new ArcSegment(Center, Radius, start, sign * sweepAbs);
        }
    }
}
