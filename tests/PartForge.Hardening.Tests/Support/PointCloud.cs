using PartForge.Geometry.Primitives;
using PartForge.Parts;

namespace PartForge.Hardening.Tests.Support;

/// <summary>
/// Points on the surface of exported meshes placed in the machine frame: every vertex plus random points on
/// the triangles (area-weighted, seeded), and the brute-force minimum distance between two clouds with a
/// uniform grid. Points lie on the surfaces, so the minimum point-pair distance is an upper bound of the true
/// minimum distance between the surfaces; it exceeds it by at most the two clouds' sampling radii.
/// </summary>
public sealed class PointCloud
{
    public List<(double X, double Y, double Z)> Points { get; } = new();

    /// <summary>Adds a part's STL mesh at one instance's nominal place (see <see cref="PartInstance"/>).</summary>
    public void Add(StlMesh mesh, PartInstance at, double pointsPerMm2, Random rnd)
    {
        var xyz = mesh.Xyz;
        (double, double, double) Place(double x, double y, double z)
        {
            var p = at.ToMachine(new Vec2(x, y));
            return (p.X, p.Y, at.ToMachineZ(z));
        }
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            var a = (X: (double)xyz[9 * t], Y: (double)xyz[9 * t + 1], Z: (double)xyz[9 * t + 2]);
            var b = (X: (double)xyz[9 * t + 3], Y: (double)xyz[9 * t + 4], Z: (double)xyz[9 * t + 5]);
            var c = (X: (double)xyz[9 * t + 6], Y: (double)xyz[9 * t + 7], Z: (double)xyz[9 * t + 8]);
            Points.Add(Place(a.X, a.Y, a.Z));
            double ux = b.X - a.X, uy = b.Y - a.Y, uz = b.Z - a.Z, vx = c.X - a.X, vy = c.Y - a.Y, vz = c.Z - a.Z;
            double area = 0.5 * Math.Sqrt(Math.Pow(uy * vz - uz * vy, 2) + Math.Pow(uz * vx - ux * vz, 2) + Math.Pow(ux * vy - uy * vx, 2));
            double expect = area * pointsPerMm2;
            int n = (int)expect + (rnd.NextDouble() < expect - Math.Floor(expect) ? 1 : 0);
            for (int k = 0; k < n; k++)
            {
                double r1 = rnd.NextDouble(), r2 = rnd.NextDouble();
                if (r1 + r2 > 1) { r1 = 1 - r1; r2 = 1 - r2; }
                Points.Add(Place(a.X + r1 * ux + r2 * vx, a.Y + r1 * uy + r2 * vy, a.Z + r1 * uz + r2 * vz));
            }
        }
    }

    /// <summary>Minimum distance between this cloud turned by <paramref name="angleDeg"/> about z and another, looking no further than <paramref name="within"/>.</summary>
    public double MinDistance(PointCloud other, double angleDeg, double within)
    {
        double cell = Math.Max(0.5, within);
        var grid = new Dictionary<(long, long, long), List<int>>();
        for (int i = 0; i < other.Points.Count; i++)
        {
            var p = other.Points[i];
            var key = ((long)Math.Floor(p.X / cell), (long)Math.Floor(p.Y / cell), (long)Math.Floor(p.Z / cell));
            if (!grid.TryGetValue(key, out var list)) grid[key] = list = new List<int>();
            list.Add(i);
        }
        double c = Math.Cos(angleDeg * Math.PI / 180), s = Math.Sin(angleDeg * Math.PI / 180);
        double best = double.PositiveInfinity;
        int reach = (int)Math.Ceiling(within / cell);
        foreach (var q in Points)
        {
            double x = c * q.X - s * q.Y, y = s * q.X + c * q.Y, z = q.Z;
            long gx = (long)Math.Floor(x / cell), gy = (long)Math.Floor(y / cell), gz = (long)Math.Floor(z / cell);
            for (long i = gx - reach; i <= gx + reach; i++)
                for (long j = gy - reach; j <= gy + reach; j++)
                    for (long k = gz - reach; k <= gz + reach; k++)
                    {
                        if (!grid.TryGetValue((i, j, k), out var list)) continue;
                        foreach (int idx in list)
                        {
                            var p = other.Points[idx];
                            double d = Math.Sqrt((p.X - x) * (p.X - x) + (p.Y - y) * (p.Y - y) + (p.Z - z) * (p.Z - z));
                            if (d < best) best = d;
                        }
                    }
        }
        return best <= within ? best : double.PositiveInfinity;
    }
}
