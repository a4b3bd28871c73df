"""Reads nested cut-sheet DXF files with ezdxf and measures them, independently of the writer.

Usage: python3 read_dxf_sheets.py FLATTEN_MM FILE...; prints one JSON document with one entry per file. Reader: Debian's
python3-ezdxf (ezdxf.path.make_path turns CIRCLE, ARC, LINE and POLYLINE with bulges into paths; flattening(d)
puts points on the true curve no more than d apart from it in sagitta). Every closed path on the CUT layer is a
loop; a loop inside no other loop is a part's outline, a loop inside one outline is that part's hole (containment
by ray casting on a point of the loop). Per file: the sheet's size (the closed POLYLINE on the NOTES layer), the
audit's errors, and per part: loop area (shoelace) of the outline minus its holes, the hole count, the least
distance from the outline to the sheet edge (negative when outside), and the least distance between every
two outlines (segment to segment, by the point-to-segment distances both ways).
"""
import sys, json, math, ezdxf
from ezdxf import path as ezpath

flat = float(sys.argv[1])

def loops_of(msp, layer):
    out = []
    for e in msp:
        if e.dxf.layer != layer or e.dxftype() not in ("CIRCLE", "ARC", "LINE", "POLYLINE", "LWPOLYLINE"):
            continue
        p = ezpath.make_path(e)
        pts = [(v.x, v.y) for v in p.flattening(flat)]
        if len(pts) > 1 and math.hypot(pts[0][0] - pts[-1][0], pts[0][1] - pts[-1][1]) < 1e-9:
            pts = pts[:-1]
        out.append(pts)
    return out

def area(pts):
    return sum(pts[i][0] * pts[(i + 1) % len(pts)][1] - pts[(i + 1) % len(pts)][0] * pts[i][1] for i in range(len(pts))) / 2

def inside(pt, poly):
    x, y = pt; c = False
    for i in range(len(poly)):
        x0, y0 = poly[i]; x1, y1 = poly[(i + 1) % len(poly)]
        if (y0 > y) != (y1 > y) and x < x0 + (y - y0) * (x1 - x0) / (y1 - y0):
            c = not c
    return c

def bbox(pts):
    xs = [p[0] for p in pts]; ys = [p[1] for p in pts]
    return min(xs), min(ys), max(xs), max(ys)

def pseg(p, a, b):
    ax, ay = a; bx, by = b; px, py = p
    dx, dy = bx - ax, by - ay
    L = dx * dx + dy * dy
    t = 0 if L == 0 else max(0, min(1, ((px - ax) * dx + (py - ay) * dy) / L))
    return math.hypot(px - ax - t * dx, py - ay - t * dy)

def dist(A, B, cutoff):
    """Least distance between closed polylines A and B (as point-to-segment both ways; exact for polylines
    that do not cross). Only vertices within cutoff of the other's box are tried; returns cutoff when none is."""
    best = cutoff
    for P, Q in ((A, B), (B, A)):
        x0, y0, x1, y1 = bbox(Q)
        near = [p for p in P if x0 - cutoff <= p[0] <= x1 + cutoff and y0 - cutoff <= p[1] <= y1 + cutoff]
        for p in near:
            for i in range(len(Q)):
                d = pseg(p, Q[i], Q[(i + 1) % len(Q)])
                if d < best: best = d
    return best

result = []
for f in sys.argv[2:]:
    doc = ezdxf.readfile(f)
    aud = doc.audit()
    msp = doc.modelspace()
    frames = [e for e in msp.query("POLYLINE") if e.dxf.layer == "NOTES" and e.is_closed]
    w = h = None
    if frames:
        xs = [v.dxf.location.x for v in frames[0].vertices]; ys = [v.dxf.location.y for v in frames[0].vertices]
        w, h = max(xs) - min(xs), max(ys) - min(ys)
    loops = loops_of(msp, "CUT")
    parent = []
    for i, L in enumerate(loops):
        holders = [j for j, M in enumerate(loops) if j != i and inside(L[0], M) and abs(area(M)) > abs(area(L))]
        parent.append(holders)
    outers = [i for i in range(len(loops)) if not parent[i]]
    parts = []
    for o in outers:
        holes = [i for i in range(len(loops)) if parent[i] == [o]]
        deep = [i for i in range(len(loops)) if len(parent[i]) > 1]
        a = abs(area(loops[o])) - sum(abs(area(loops[i])) for i in holes)
        x0, y0, x1, y1 = bbox(loops[o])
        edge = min(x0, y0, (w or 0) - x1, (h or 0) - y1) if w is not None else None
        parts.append({"area": a, "holes": len(holes), "edge": edge, "box": [x0, y0, x1, y1]})
    gaps = []
    for a in range(len(outers)):
        for b in range(a + 1, len(outers)):
            gaps.append([a, b, dist(loops[outers[a]], loops[outers[b]], 50.0)])
    nested = sum(1 for i in range(len(loops)) if len(parent[i]) > 1)
    result.append({"file": f, "errors": len(aud.errors), "width": w, "height": h, "loops": len(loops),
                   "nested_loops": nested, "parts": parts, "gaps": gaps})
print(json.dumps(result))
