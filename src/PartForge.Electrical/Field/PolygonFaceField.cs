namespace PartForge.Electrical.Field;

/// <summary>
/// Bz of a uniformly charged plane polygon: a magnet face in the surface-charge model. A face of charge
/// density +Br/mu0 at height zf gives Bz = Br/(4 pi) x Omega at a point, Omega the solid angle the face
/// subtends, positive above the face. Omega of the polygon is the signed sum over a fan of triangles from
/// any point of the plane, each by the exact formula of Van Oosterom and Strackee (IEEE Trans. Biomed.
/// Eng. 30(2), 1983): tan(Omega/2) = R1.(R2 x R3) / (|R1||R2||R3| + (R1.R2)|R3| + (R1.R3)|R2| + (R2.R3)|R1|).
/// Used for arc magnets, whose arcs are replaced by polygons fine enough to converge (see RotorField).
/// </summary>
public static class PolygonFaceField
{
    /// <summary>
    /// Solid angle, steradian, of the polygon (vertices xs, ys counter-clockwise seen from +z, in the plane z = zf)
    /// seen from (x, y, z): positive when z &gt; zf.
    /// </summary>
    public static double SolidAngle(ReadOnlySpan<double> xs, ReadOnlySpan<double> ys, double zf, double x, double y, double z)
    {
        int n = xs.Length;
        double h = zf - z;
        // Fan apex: the foot of the point on the plane (its R vector is (0,0,h)).
        double r1x = 0, r1y = 0, r1z = h, l1 = Math.Abs(h);
        double sum = 0;
        double px = xs[n - 1] - x, py = ys[n - 1] - y;
        double lp = Math.Sqrt(px * px + py * py + h * h);
        for (int i = 0; i < n; i++)
        {
            double qx = xs[i] - x, qy = ys[i] - y;
            double lq = Math.Sqrt(qx * qx + qy * qy + h * h);
            // triple product R1 . (Rp x Rq) with R1 = (0,0,h): h (px qy - py qx)
            double trip = r1z * (px * qy - py * qx);
            double d12 = r1x * px + r1y * py + r1z * h; // = h^2
            double d13 = r1x * qx + r1y * qy + r1z * h;
            double d23 = px * qx + py * qy + h * h;
            double den = l1 * lp * lq + d12 * lq + d13 * lp + d23 * l1;
            sum += 2 * Math.Atan2(trip, den);
            px = qx; py = qy; lp = lq;
        }
        // For a CCW polygon below the point (h < 0) the triple products are negative: flip to "positive above".
        return -sum;
    }
}
