# Independent reader of 3MF build items for the print-plate tests: reads the package with zipfile and
# ElementTree (3MF Core Specification: resources/object/mesh, build/item with a row-vector transform), places every
# item, and reports per item its extent, the flat face areas at its lowest and highest z, its signed volume, and per
# package the least distance in plan between the convex hulls of any two items (separating axes, then segment distances).
import sys, json, zipfile, xml.etree.ElementTree as ET
import numpy as np
NS = '{http://schemas.microsoft.com/3dmanufacturing/core/2015/02}'
def hull(p):
    p = sorted(set(map(tuple, np.round(p, 9))))
    if len(p) < 3: return p
    def cr(o, a, b): return (a[0]-o[0])*(b[1]-o[1]) - (a[1]-o[1])*(b[0]-o[0])
    lo, up = [], []
    for q in p:
        while len(lo) >= 2 and cr(lo[-2], lo[-1], q) <= 0: lo.pop()
        lo.append(q)
    for q in reversed(p):
        while len(up) >= 2 and cr(up[-2], up[-1], q) <= 0: up.pop()
        up.append(q)
    return lo[:-1] + up[:-1]
def seg_dist(P, A, B):
    # distances from points P (n,2) to segments A->B (m,2): (n,m)
    d = B - A; L = (d*d).sum(1); L[L == 0] = 1e-30
    t = ((P[:, None, :] - A[None]) * d[None]).sum(2) / L[None]
    t = np.clip(t, 0, 1)
    C = A[None] + t[..., None] * d[None]
    return np.sqrt(((P[:, None, :] - C)**2).sum(2))
def overlap(h1, h2):
    for h in (h1, h2):
        for i in range(len(h)):
            e = h[(i+1) % len(h)] - h[i]; n = np.array([-e[1], e[0]])
            a = h1 @ n; b = h2 @ n
            if a.max() <= b.min() + 1e-9 or b.max() <= a.min() + 1e-9: return False
    return True
def dist(h1, h2):
    if overlap(h1, h2): return 0.0
    r1 = np.roll(h1, -1, 0); r2 = np.roll(h2, -1, 0)
    return float(min(seg_dist(h1, h2, r2).min(), seg_dist(h2, h1, r1).min()))
out = {}
for path in sys.argv[1:]:
    z = zipfile.ZipFile(path)
    root = ET.fromstring(z.read('3D/3dmodel.model'))
    objs = {}
    for o in root.iter(NS + 'object'):
        v = np.array([[float(x.get('x')), float(x.get('y')), float(x.get('z'))] for x in o.iter(NS + 'vertex')])
        t = np.array([[int(x.get('v1')), int(x.get('v2')), int(x.get('v3'))] for x in o.iter(NS + 'triangle')])
        objs[o.get('id')] = (o.get('name'), v, t)
    items = []
    for it in root.iter(NS + 'item'):
        name, v, t = objs[it.get('objectid')]
        m = [float(x) for x in it.get('transform', '1 0 0 0 1 0 0 0 1 0 0 0').split()]
        M = np.array(m[:9]).reshape(3, 3); T = np.array(m[9:])
        w = v @ M + T
        a, b, c = w[t[:, 0]], w[t[:, 1]], w[t[:, 2]]
        n = np.cross(b - a, c - a); area = 0.5 * np.linalg.norm(n, axis=1)
        z0, z1 = w[:, 2].min(), w[:, 2].max()
        flat = lambda zz: np.all(np.abs(np.stack([a[:, 2], b[:, 2], c[:, 2]], 1) - zz) < 1e-6, axis=1)
        down = float(area[flat(z0) & (n[:, 2] < 0)].sum()); upf = float(area[flat(z1) & (n[:, 2] > 0)].sum())
        h = np.array(hull(w[:, :2]))
        items.append({'name': name, 'xmin': float(w[:, 0].min()), 'xmax': float(w[:, 0].max()), 'ymin': float(w[:, 1].min()),
                      'ymax': float(w[:, 1].max()), 'zmin': float(z0), 'zmax': float(z1), 'bottom': down, 'top': upf,
                      'volume': float((np.einsum('ij,ij->i', a, np.cross(b, c))).sum() / 6), 'hull': h})
    gaps = []
    for i in range(len(items)):
        for j in range(i + 1, len(items)):
            p, q = items[i], items[j]
            if p['xmin'] > q['xmax'] + 50 or q['xmin'] > p['xmax'] + 50 or p['ymin'] > q['ymax'] + 50 or q['ymin'] > p['ymax'] + 50: continue
            gaps.append(dist(p['hull'], q['hull']))
    for it in items: del it['hull']
    out[path] = {'items': items, 'min_gap': min(gaps) if gaps else None}
print(json.dumps(out))
