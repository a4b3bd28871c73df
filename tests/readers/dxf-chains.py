"""Reads a DXF file with ezdxf, audits it, and walks its LINE and ARC entities into chains.

Usage: python3 dxf-chains.py FILE; prints one JSON document. Reader: Debian's python3-ezdxf. A chain starts at
an entity and follows, in file order, the entity that shares the current end point (an ARC may be walked from
its end angle back to its start angle; ezdxf computes its end points from centre, radius and angles itself)
until it returns to where it started. Each chain reports [layer, entity count, closed, largest gap between
consecutive end points, signed area (shoelace over the end points plus each arc's circular segment, signed by
the walking direction)]. For comparison, every POLYLINE is reported as [layer, closed, signed area] with its
arcs from the VERTEX bulges (group 42, bulge = tan(sweep / 4), DXF reference R12).
"""
import sys, json, math, ezdxf
doc = ezdxf.readfile(sys.argv[1])
auditor = doc.audit()
msp = doc.modelspace()
TOL = 1e-6
ents = []
for e in msp:
    t = e.dxftype()
    if t == "LINE":
        s, q = e.dxf.start, e.dxf.end
        ents.append({"t": "LINE", "layer": e.dxf.layer, "a": (s.x, s.y), "b": (q.x, q.y)})
    elif t == "ARC":
        s, q = e.start_point, e.end_point
        span = (e.dxf.end_angle - e.dxf.start_angle) % 360.0
        if span == 0: span = 360.0
        ents.append({"t": "ARC", "layer": e.dxf.layer, "a": (s.x, s.y), "b": (q.x, q.y), "r": e.dxf.radius, "span": span})
def dist(p, q): return math.hypot(p[0] - q[0], p[1] - q[1])
def walk(start, first_rev):
    # returns (end index, closed, max gap, area) walking from ents[start]
    e = ents[start]
    a, b = (e["b"], e["a"]) if first_rev else (e["a"], e["b"])
    origin, cur, gap, area, k = a, b, 0.0, 0.0, start
    def add(e, p, q, rev):
        nonlocal area
        area += (p[0] * q[1] - q[0] * p[1]) / 2
        if e["t"] == "ARC":
            phi = math.radians(e["span"]) * (-1 if rev else 1)
            area += e["r"] ** 2 / 2 * (phi - math.sin(phi))
    add(e, a, b, first_rev)
    while dist(cur, origin) > TOL:
        k += 1
        if k >= len(ents): return None
        e = ents[k]
        if dist(cur, e["a"]) <= TOL: rev = False; p, q = e["a"], e["b"]
        elif dist(cur, e["b"]) <= TOL: rev = True; p, q = e["b"], e["a"]
        else: return None
        gap = max(gap, dist(cur, p)); add(e, p, q, rev); cur = q
    gap = max(gap, dist(cur, origin))
    return k, gap, area
chains, i = [], 0
while i < len(ents):
    r = walk(i, False) or walk(i, True)
    if r is None:
        chains.append([ents[i]["layer"], 1, False, -1.0, 0.0]); i += 1; continue
    k, gap, area = r
    chains.append([ents[i]["layer"], k - i + 1, True, gap, area]); i = k + 1
def polyline_area(pl):
    pts = [(v.dxf.location.x, v.dxf.location.y, v.dxf.bulge) for v in pl.vertices]
    area = 0.0
    for i, (x0, y0, b) in enumerate(pts):
        x1, y1, _ = pts[(i + 1) % len(pts)]
        area += (x0 * y1 - x1 * y0) / 2
        if b != 0:
            theta = 4 * math.atan(b)
            r = math.hypot(x1 - x0, y1 - y0) / (2 * abs(math.sin(theta / 2)))
            area += r * r / 2 * (theta - math.sin(theta))
    return area
out = {
  "errors": len(auditor.errors),
  "fixes": len(auditor.fixes),
  "types": [e.dxftype() for e in msp],
  "arcs": [[e.dxf.layer, e.dxf.center.x, e.dxf.center.y, e.dxf.radius, e.start_point.x, e.start_point.y, e.end_point.x, e.end_point.y]
           for e in msp.query("ARC")],
  "circles": [[e.dxf.layer, e.dxf.center.x, e.dxf.center.y, e.dxf.radius] for e in msp.query("CIRCLE")],
  "chains": chains,
  "polylines": [[e.dxf.layer, e.is_closed, polyline_area(e)] for e in msp.query("POLYLINE")],
}
print(json.dumps(out))
