using System.Diagnostics.Contracts;
using NetTopologySuite.Algorithm;
using NetTopologySuite.Geometries;
using NetTopologySuite.Geometries.Utilities;
using NetTopologySuite.Operation.Buffer;
using NetTopologySuite.Operation.Distance;
using NetTopologySuite.Operation.Overlay;
using NetTopologySuite.Operation.OverlayNG;
using NetTopologySuite.Operation.Valid;
using NetTopologySuite.Precision;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace PartForge.Geometry.Regions;

/// <summary>
/// An immutable planar region (polygons with holes) on the fixed grid of a <see cref="Precision"/>.
/// Every coordinate is a multiple of the grid; rings are oriented outer counter-clockwise and holes clockwise,
/// seen from +z. Coordinates are snapped once, when the region is made; booleans round only the new
/// intersection points (snap rounding on the same grid), so existing vertices never move.
/// </summary>
public sealed class Region
{
    private static readonly GeometryFactory FloatingFactory = new();
    private double? _area;

    private Region(NtsGeometry geometry, Precision precision)
    {
        Geometry = geometry;
        Precision = precision;
    }

    /// <summary>The region as a NetTopologySuite Polygon or MultiPolygon (read only: do not mutate it).</summary>
    public NtsGeometry Geometry { get; }

    /// <summary>The grid and chordal tolerance the region was made with.</summary>
    public Precision Precision { get; }

    /// <summary>The empty region on the default grid (booleans with it adopt the other operand's precision).</summary>
    public static Region Empty { get; } = new(FloatingFactory.CreateMultiPolygon(), Precision.FromChordalTolerance(0.01));

    public bool IsEmpty => Geometry.IsEmpty;

    /// <summary>Area in mm^2.</summary>
    public double Area => _area ??= Geometry.Area;

    /// <summary>Axis-aligned bounds; both corners are (0,0) for an empty region.</summary>
    public (Vec2 Min, Vec2 Max) Bounds
    {
        get
        {
            if (IsEmpty) return (new Vec2(0, 0), new Vec2(0, 0));
            var e = Geometry.EnvelopeInternal;
            return (new Vec2(e.MinX, e.MinY), new Vec2(e.MaxX, e.MaxY));
        }
    }

    /// <summary>
    /// Polar second moment of the region about the origin, Int (x^2 + y^2) dA, mm^4: each ring's exact polygon
    /// formula (Green's theorem), J = 1/12 Sum (x_i y_(i+1) - x_(i+1) y_i)(x_i^2 + x_i x_(i+1) + x_(i+1)^2 + y_i^2 + y_i y_(i+1) + y_(i+1)^2),
    /// the shell's counted positive and each hole's negative.
    /// </summary>
    public double PolarMomentMm4
    {
        get
        {
            double j = 0;
            foreach (var poly in Polygons)
            {
                j += Math.Abs(RingMoment(poly.ExteriorRing.Coordinates));
                foreach (var hole in poly.InteriorRings) j -= Math.Abs(RingMoment(hole.Coordinates));
            }
            return j;
        }
    }

    private static double RingMoment(Coordinate[] c)
    {
        double s = 0;
        for (int i = 0; i + 1 < c.Length; i++)
        {
            double x0 = c[i].X, y0 = c[i].Y, x1 = c[i + 1].X, y1 = c[i + 1].Y;
            s += (x0 * y1 - x1 * y0) * (x0 * x0 + x0 * x1 + x1 * x1 + y0 * y0 + y0 * y1 + y1 * y1);
        }
        return s / 12;
    }

    /// <summary>The polygons of the region (each with outer CCW and holes CW).</summary>
    public IReadOnlyList<Polygon> Polygons
    {
        get
        {
            var res = new List<Polygon>(Geometry.NumGeometries);
            for (int i = 0; i < Geometry.NumGeometries; i++)
                if (Geometry.GetGeometryN(i) is Polygon p && !p.IsEmpty) res.Add(p);
            return res;
        }
    }

    /// <summary>
    /// Discretises an exact profile: outers with vertices on the true arcs, holes with vertices on r/cos(pi/n)
    /// (never undersize). n comes from the chordal tolerance; full circles about the origin round n up to a
    /// multiple of <paramref name="symmetry"/> (off-centre circles start at their centre's polar angle, so a
    /// pattern of them repeats exactly). Valid input (holes strictly inside one outer, nothing overlapping) is
    /// assembled directly; anything else goes through a boolean union/difference, so the result is always valid.
    /// </summary>
    [Pure]
    public static Region FromProfile(Profile p, Precision prec, int symmetry = 1)
    {
        ArgumentNullException.ThrowIfNull(p);
        Validate(prec);
        var f = FactoryFor(prec);
        var outers = p.Outers.Select(c => Disc.Make(c, prec, false, symmetry)).Where(d => d.Ring.Count >= 3).ToList();
        var holes = p.Holes.Select(c => Disc.Make(c, prec, true, symmetry)).Where(d => d.Ring.Count >= 3).ToList();
        if (outers.Count == 0) return EmptyOn(prec);

        var direct = Disc.TryAssemble(outers, holes, f);
        if (direct is not null) return new Region(direct, prec);

        NtsGeometry shell = f.CreateMultiPolygon();
        foreach (var o in outers) shell = Overlay(shell, GeometryFixer.Fix(o.ToPolygon(f)), SpatialFunction.Union, prec);
        NtsGeometry cut = f.CreateMultiPolygon();
        foreach (var h in holes) cut = Overlay(cut, GeometryFixer.Fix(h.ToPolygon(f)), SpatialFunction.Union, prec);
        return FromNts(Overlay(shell, cut, SpatialFunction.Difference, prec), prec);
    }

    /// <summary>
    /// The region of a profile when it can be assembled directly (every hole strictly inside one outer,
    /// nothing overlapping: the fast path of <see cref="FromProfile"/>), else null, so that a caller with a
    /// cheaper boolean route of its own (e.g. a layer that is the one below with a few more cuts) can take it.
    /// </summary>
    [Pure]
    public static Region? TryFromProfileDirect(Profile p, Precision prec, int symmetry = 1)
    {
        ArgumentNullException.ThrowIfNull(p);
        Validate(prec);
        var f = FactoryFor(prec);
        var outers = p.Outers.Select(c => Disc.Make(c, prec, false, symmetry)).Where(d => d.Ring.Count >= 3).ToList();
        var holes = p.Holes.Select(c => Disc.Make(c, prec, true, symmetry)).Where(d => d.Ring.Count >= 3).ToList();
        if (outers.Count == 0) return EmptyOn(prec);
        return Disc.TryAssemble(outers, holes, f) is { } direct ? new Region(direct, prec) : null;
    }

    /// <summary>The region inside one contour, with its vertices placed as for an outer, or as for a hole
    /// (outside the true arcs, for a region that will be cut away).</summary>
    [Pure]
    public static Region FromContour(Contour c, Precision prec, bool asHole = false, int symmetry = 1)
    {
        ArgumentNullException.ThrowIfNull(c);
        Validate(prec);
        var d = Disc.Make(c, prec, asHole, symmetry);
        if (d.Ring.Count < 3) return EmptyOn(prec);
        var f = FactoryFor(prec);
        var poly = d.ToPolygon(f);
        if (poly.IsValid) return FromNts(poly, prec, alreadyOnGrid: true);
        return FromNts(Overlay(GeometryFixer.Fix(poly), f.CreateMultiPolygon(), SpatialFunction.Union, prec), prec);
    }

    /// <summary>Wraps an existing NetTopologySuite polygonal geometry, snapping it to the grid (once).</summary>
    [Pure]
    public static Region FromGeometry(NtsGeometry g, Precision prec)
    {
        ArgumentNullException.ThrowIfNull(g);
        Validate(prec);
        var polys = PolygonalPart(g);
        var reduced = GeometryPrecisionReducer.Reduce(GeometryFixer.Fix(polys), new PrecisionModel(prec.Scale));
        return FromNts(reduced, prec);
    }

    [Pure] public Region Union(Region other) => Boolean(other, SpatialFunction.Union);
    [Pure] public Region Difference(Region other) => Boolean(other, SpatialFunction.Difference);
    [Pure] public Region Intersection(Region other) => Boolean(other, SpatialFunction.Intersection);

    /// <summary>Union of many regions at once (cheaper than a chain of pairwise unions).</summary>
    [Pure]
    public static Region UnionAll(IEnumerable<Region> regions, Precision prec)
    {
        Validate(prec);
        var f = FactoryFor(prec);
        var parts = regions.Where(r => !r.IsEmpty).SelectMany(r => r.Polygons).Cast<NtsGeometry>().ToArray();
        if (parts.Length == 0) return EmptyOn(prec);
        var all = f.CreateGeometryCollection(parts);
        return FromNts(UnaryUnionNG.Union((NtsGeometry)all, f.PrecisionModel), prec);
    }

    /// <summary>
    /// Outward (positive) or inward (negative) offset by <paramref name="mm"/>, round joins discretised to
    /// the chordal tolerance; the result is snapped to the grid.
    /// </summary>
    [Pure]
    public Region Offset(double mm)
    {
        if (!double.IsFinite(mm)) throw new ArgumentOutOfRangeException(nameof(mm), "offset must be finite");
        if (IsEmpty || mm == 0) return this;
        int n = ArcSegmentation.FullCircle(Math.Abs(mm), Precision.ChordalToleranceMm, 4, extraAllowed: 3);
        var bp = new BufferParameters { QuadrantSegments = Math.Max(1, n / 4), JoinStyle = JoinStyle.Round, EndCapStyle = EndCapStyle.Round };
        var buffered = BufferOp.Buffer(Geometry, mm, bp);
        return FromGeometry(buffered, Precision);
    }

    /// <summary>Rotated about the origin (exact at multiples of 90 degrees). Other angles re-snap the vertices;
    /// where exactness matters rotate the <see cref="Profile"/> and discretise it instead.</summary>
    [Pure]
    public Region RotatedDeg(double deg)
    {
        if (IsEmpty) return this;
        double c = Angle.CosDeg(deg), s = Angle.SinDeg(deg);
        var t = Geometry.Copy();
        t.Apply(new CoordinateFilter(p => new Coordinate(c * p.X - s * p.Y, s * p.X + c * p.Y)));
        t.GeometryChanged();
        return FromGeometry(t, Precision);
    }

    /// <summary>Moved by a vector (snapped to the grid first, so the move is exact).</summary>
    [Pure]
    public Region Translated(Vec2 d)
    {
        if (IsEmpty) return this;
        double dx = ContourDiscretiser.Snap(d.X, Precision.Scale), dy = ContourDiscretiser.Snap(d.Y, Precision.Scale);
        var t = Geometry.Copy();
        t.Apply(new CoordinateFilter(p => new Coordinate(ContourDiscretiser.Snap(p.X + dx, Precision.Scale), ContourDiscretiser.Snap(p.Y + dy, Precision.Scale))));
        t.GeometryChanged();
        return FromNts(t, Precision, alreadyOnGrid: true);
    }

    /// <summary>Mirrored in the x axis (y -> -y); exact on the grid, orientation restored.</summary>
    [Pure]
    public Region MirroredY()
    {
        if (IsEmpty) return this;
        var t = Geometry.Copy();
        t.Apply(new CoordinateFilter(p => new Coordinate(p.X, p.Y == 0 ? 0 : -p.Y)));
        t.GeometryChanged();
        return FromNts(t, Precision, alreadyOnGrid: true);
    }

    /// <summary>Minimum distance between the two regions (0 when they touch or overlap).</summary>
    [Pure]
    public double DistanceTo(Region other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (IsEmpty || other.IsEmpty) return double.PositiveInfinity;
        if (Geometry.EnvelopeInternal.Intersects(other.Geometry.EnvelopeInternal) && Geometry.Intersects(other.Geometry)) return 0;
        return IndexedFacetDistance.Distance(Geometry, other.Geometry);
    }

    /// <summary>True when the point lies inside or on the boundary.</summary>
    [Pure]
    public bool Contains(Vec2 p) => !IsEmpty && Geometry.Intersects(FloatingFactory.CreatePoint(new Coordinate(p.X, p.Y)));

    public override string ToString() => $"Region({Polygons.Count} polygons, area {Area.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)} mm^2)";

    // ---- internals ----

    private Region Boolean(Region other, SpatialFunction op)
    {
        ArgumentNullException.ThrowIfNull(other);
        var prec = ReferenceEquals(this, Empty) ? other.Precision : Precision;
        if (!ReferenceEquals(this, Empty) && !ReferenceEquals(other, Empty) && other.Precision.GridMm != Precision.GridMm)
            throw new ArgumentException("regions on different grids", nameof(other));
        switch (op)
        {
            case SpatialFunction.Union when other.IsEmpty: return IsEmpty ? EmptyOn(prec) : this;
            case SpatialFunction.Union when IsEmpty: return other;
            case SpatialFunction.Difference when IsEmpty || other.IsEmpty: return IsEmpty ? EmptyOn(prec) : this;
            case SpatialFunction.Intersection when IsEmpty || other.IsEmpty: return EmptyOn(prec);
        }
        if (op == SpatialFunction.Difference && !Geometry.EnvelopeInternal.Intersects(other.Geometry.EnvelopeInternal)) return this;
        if (op == SpatialFunction.Intersection && !Geometry.EnvelopeInternal.Intersects(other.Geometry.EnvelopeInternal)) return EmptyOn(prec);
        return FromNts(Overlay(Geometry, other.Geometry, op, prec), prec);
    }

    private static NtsGeometry Overlay(NtsGeometry a, NtsGeometry b, SpatialFunction op, Precision prec)
    {
        var pm = new PrecisionModel(prec.Scale);
        var ov = new OverlayNG(a, b, pm, op) { StrictMode = true };
        return ov.GetResult();
    }

    internal static Region EmptyOn(Precision prec) => new(FactoryFor(prec).CreateMultiPolygon(), prec);

    internal static GeometryFactory FactoryFor(Precision prec) => new(new PrecisionModel(prec.Scale));

    private static void Validate(Precision prec)
    {
        ArgumentNullException.ThrowIfNull(prec);
        if (!(prec.GridMm > 0) || !double.IsFinite(prec.GridMm)) throw new ArgumentOutOfRangeException(nameof(prec), "grid must be positive");
        if (!(prec.ChordalToleranceMm > 0) || !double.IsFinite(prec.ChordalToleranceMm)) throw new ArgumentOutOfRangeException(nameof(prec), "chordal tolerance must be positive");
    }

    private static NtsGeometry PolygonalPart(NtsGeometry g)
    {
        var polys = new List<Polygon>();
        for (int i = 0; i < g.NumGeometries; i++)
        {
            var gi = g.GetGeometryN(i);
            if (gi is Polygon p) { if (!p.IsEmpty) polys.Add(p); }
            else if (gi is GeometryCollection gc && gi != g) { var sub = PolygonalPart(gc); for (int k = 0; k < sub.NumGeometries; k++) polys.Add((Polygon)sub.GetGeometryN(k)); }
        }
        return g.Factory.CreateMultiPolygon(polys.ToArray());
    }

    /// <summary>Normalises ring orientation (outer CCW, holes CW), drops non-polygonal parts and wraps.</summary>
    internal static Region FromNts(NtsGeometry g, Precision prec, bool alreadyOnGrid = true)
    {
        var f = FactoryFor(prec);
        var polys = new List<Polygon>();
        void Add(NtsGeometry x)
        {
            if (x is Polygon p)
            {
                if (p.IsEmpty || p.Area <= 0) return;
                var shell = Oriented(p.Shell, ccw: true, f);
                var holes = new LinearRing[p.NumInteriorRings];
                for (int i = 0; i < holes.Length; i++) holes[i] = Oriented(p.GetInteriorRingN(i), ccw: false, f);
                polys.Add(f.CreatePolygon(shell, holes));
            }
            else if (x is GeometryCollection gc)
            {
                for (int i = 0; i < gc.NumGeometries; i++) Add(gc.GetGeometryN(i));
            }
        }
        Add(g);
        NtsGeometry res = polys.Count == 1 ? polys[0] : f.CreateMultiPolygon(polys.ToArray());
        res = PinchOpener.Open(res, f);
        return new Region(res, prec);
    }

    private static LinearRing Oriented(LineString ring, bool ccw, GeometryFactory f)
    {
        var coords = ring.Coordinates;
        bool isCcw = Orientation.IsCCW(coords);
        if (isCcw != ccw) Array.Reverse(coords);
        return f.CreateLinearRing(coords.Select(c => new Coordinate(c.X, c.Y)).ToArray());
    }

    private sealed class CoordinateFilter(Func<Coordinate, Coordinate> map) : IEntireCoordinateSequenceFilter
    {
        public bool Done => false;
        public bool GeometryChanged => true;
        public void Filter(CoordinateSequence seq)
        {
            for (int i = 0; i < seq.Count; i++)
            {
                var c = map(new Coordinate(seq.GetX(i), seq.GetY(i)));
                seq.SetX(i, c.X);
                seq.SetY(i, c.Y);
            }
        }
    }
}
